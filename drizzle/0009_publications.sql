CREATE TABLE `survey_revision_findings` (
	`revision_id` varchar(36) NOT NULL,
	`finding_id` varchar(36) NOT NULL,
	`kind` varchar(24) NOT NULL,
	`status` varchar(24) NOT NULL,
	`condition` varchar(24),
	`tag` varchar(64),
	`location` varchar(255),
	`area_id` varchar(36),
	`area_name` varchar(160),
	`header_id` varchar(36),
	`header_name` varchar(160),
	`measure_id` varchar(36),
	`figures_current` tinyint NOT NULL,
	`steam_kg_h` double,
	`heat_kw` double,
	`fuel_gj` double,
	`cost_minor` bigint,
	`co2_kg` double,
	`water_m3` double,
	`repair_cost_minor` bigint,
	`payback_years` double,
	`priced_basis_id` varchar(36),
	`finding_version` int NOT NULL,
	CONSTRAINT `survey_revision_findings_revision_id_finding_id_pk` PRIMARY KEY(`revision_id`,`finding_id`)
);
--> statement-breakpoint
CREATE TABLE `survey_revisions` (
	`id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`published_at` datetime(3) NOT NULL,
	`published_by` varchar(36),
	`cost_basis_id` varchar(36),
	`note` text,
	`totals` json NOT NULL,
	`finding_count` int NOT NULL,
	`mail_sent` int NOT NULL DEFAULT 0,
	`mail_failed` int NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `survey_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `survey_revisions_number_uq` UNIQUE(`survey_id`,`number`)
);
--> statement-breakpoint
ALTER TABLE `survey_revision_findings` ADD CONSTRAINT `survey_revision_findings_revision_id_survey_revisions_id_fk` FOREIGN KEY (`revision_id`) REFERENCES `survey_revisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `survey_revisions` ADD CONSTRAINT `survey_revisions_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `survey_revisions` ADD CONSTRAINT `survey_revisions_published_by_users_id_fk` FOREIGN KEY (`published_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `survey_revisions` ADD CONSTRAINT `survey_revisions_cost_basis_id_cost_bases_id_fk` FOREIGN KEY (`cost_basis_id`) REFERENCES `cost_bases`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `survey_revision_findings_cost_idx` ON `survey_revision_findings` (`revision_id`,`cost_minor`);--> statement-breakpoint
CREATE INDEX `survey_revision_findings_finding_idx` ON `survey_revision_findings` (`finding_id`);