CREATE TABLE `areas` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`sort_order` int NOT NULL DEFAULT 0,
	`retired_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `areas_id` PRIMARY KEY(`id`),
	CONSTRAINT `areas_site_name_uq` UNIQUE(`site_id`,`name`)
);
--> statement-breakpoint
ALTER TABLE `assets` ADD `area_id` varchar(36);--> statement-breakpoint
ALTER TABLE `findings` ADD `area_id` varchar(36);--> statement-breakpoint
ALTER TABLE `findings` ADD `photo_ids` json;--> statement-breakpoint
ALTER TABLE `areas` ADD CONSTRAINT `areas_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assets` ADD CONSTRAINT `assets_area_id_areas_id_fk` FOREIGN KEY (`area_id`) REFERENCES `areas`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_area_id_areas_id_fk` FOREIGN KEY (`area_id`) REFERENCES `areas`(`id`) ON DELETE no action ON UPDATE no action;