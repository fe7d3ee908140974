CREATE TABLE `cost_entries` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`kind` varchar(24) NOT NULL,
	`entry_key` varchar(96) NOT NULL,
	`trap_type` varchar(24),
	`dn` int,
	`thickness_mm` int,
	`fitting_kind` varchar(24),
	`size_class` varchar(24),
	`currency` char(3) NOT NULL,
	`unit_cost_minor` bigint NOT NULL,
	`labour_hours` double,
	`demo` boolean NOT NULL DEFAULT false,
	`note` varchar(255),
	`updated_by` varchar(36),
	`deleted_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `cost_entries_id` PRIMARY KEY(`id`),
	CONSTRAINT `cost_entries_key_uq` UNIQUE(`firm_id`,`entry_key`)
);
--> statement-breakpoint
ALTER TABLE `findings` ADD `repair_cost_source` varchar(24);--> statement-breakpoint
ALTER TABLE `findings` ADD `repair_cost_note` varchar(160);--> statement-breakpoint
ALTER TABLE `findings` ADD `cost_entry_id` varchar(36);--> statement-breakpoint
ALTER TABLE `findings` ADD `cost_entry_version` int;--> statement-breakpoint
ALTER TABLE `measures` ADD `access_cost_minor` bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `measures` ADD `scaffold_cost_minor` bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `measures` ADD `shutdown_cost_minor` bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `measures` ADD `other_cost_minor` bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `measures` ADD `other_cost_label` varchar(120);--> statement-breakpoint
ALTER TABLE `measures` ADD `created_by` varchar(36);--> statement-breakpoint
ALTER TABLE `cost_entries` ADD CONSTRAINT `cost_entries_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `cost_entries` ADD CONSTRAINT `cost_entries_updated_by_users_id_fk` FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `cost_entries_firm_kind_idx` ON `cost_entries` (`firm_id`,`kind`);--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_cost_entry_id_cost_entries_id_fk` FOREIGN KEY (`cost_entry_id`) REFERENCES `cost_entries`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measures` ADD CONSTRAINT `measures_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `findings_measure_idx` ON `findings` (`measure_id`);