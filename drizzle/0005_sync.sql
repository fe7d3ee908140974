CREATE TABLE `finding_conflicts` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`finding_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`device_id` varchar(36) NOT NULL,
	`mutation_id` varchar(36) NOT NULL,
	`base_version` bigint unsigned NOT NULL,
	`server_version` bigint unsigned NOT NULL,
	`data` json,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`resolved_at` datetime(3),
	`resolved_by` varchar(36),
	CONSTRAINT `finding_conflicts_id` PRIMARY KEY(`id`),
	CONSTRAINT `finding_conflicts_mutation_id_unique` UNIQUE(`mutation_id`)
);
--> statement-breakpoint
CREATE TABLE `sync_tombstones` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`user_id` varchar(36),
	`entity` varchar(24) NOT NULL,
	`entity_id` varchar(36) NOT NULL,
	`change_seq` bigint unsigned NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sync_tombstones_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `applied_mutations` ADD `device_id` varchar(36);--> statement-breakpoint
ALTER TABLE `applied_mutations` ADD `firm_id` varchar(36);--> statement-breakpoint
ALTER TABLE `finding_conflicts` ADD CONSTRAINT `finding_conflicts_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `finding_conflicts` ADD CONSTRAINT `finding_conflicts_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `finding_conflicts` ADD CONSTRAINT `finding_conflicts_resolved_by_users_id_fk` FOREIGN KEY (`resolved_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sync_tombstones` ADD CONSTRAINT `sync_tombstones_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sync_tombstones` ADD CONSTRAINT `sync_tombstones_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `finding_conflicts_survey_idx` ON `finding_conflicts` (`survey_id`,`finding_id`);--> statement-breakpoint
CREATE INDEX `sync_tombstones_change_idx` ON `sync_tombstones` (`firm_id`,`change_seq`);--> statement-breakpoint
ALTER TABLE `applied_mutations` ADD CONSTRAINT `applied_mutations_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `surveys_change_idx` ON `surveys` (`firm_id`,`change_seq`);