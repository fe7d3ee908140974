ALTER TABLE `photos` DROP FOREIGN KEY `photos_finding_id_findings_id_fk`;
--> statement-breakpoint
ALTER TABLE `photos` ADD `survey_id` varchar(36) NOT NULL;--> statement-breakpoint
ALTER TABLE `photos` ADD `firm_id` varchar(36) NOT NULL;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `photos_survey_idx` ON `photos` (`survey_id`);