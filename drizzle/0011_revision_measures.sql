CREATE TABLE `survey_revision_measures` (
	`revision_id` varchar(36) NOT NULL,
	`measure_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`description` text,
	`access_cost_minor` bigint NOT NULL,
	`scaffold_cost_minor` bigint NOT NULL,
	`shutdown_cost_minor` bigint NOT NULL,
	`other_cost_minor` bigint NOT NULL,
	`other_cost_label` varchar(120),
	`sort_order` int NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `survey_revision_measures_revision_id_measure_id_pk` PRIMARY KEY(`revision_id`,`measure_id`)
);
--> statement-breakpoint
ALTER TABLE `survey_revision_measures` ADD CONSTRAINT `survey_revision_measures_revision_id_survey_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `survey_revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
UPDATE `survey_revisions` SET `totals` = JSON_SET(`totals`, '$.extraCostMinor', 0, '$.investmentMinor', JSON_EXTRACT(`totals`, '$.repairCostMinor')) WHERE JSON_EXTRACT(`totals`, '$.extraCostMinor') IS NULL;
