CREATE TABLE `cost_bases` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`basis` json NOT NULL,
	`note` varchar(255),
	`created_by` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `cost_bases_id` PRIMARY KEY(`id`),
	CONSTRAINT `cost_bases_site_number_uq` UNIQUE(`site_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `sync_devices` (
	`user_id` varchar(36) NOT NULL,
	`device_id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`last_push_at` datetime(3),
	`last_pull_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sync_devices_user_id_device_id_pk` PRIMARY KEY(`user_id`,`device_id`)
);
--> statement-breakpoint
ALTER TABLE `headers` ADD `operating_hours` double;--> statement-breakpoint
ALTER TABLE `sites` ADD `atmospheric_pressure_mpa` double;--> statement-breakpoint
ALTER TABLE `sites` ADD `unit_system` char(2) DEFAULT 'SI' NOT NULL;--> statement-breakpoint
ALTER TABLE `sites` ADD `currency` char(3) DEFAULT 'EUR' NOT NULL;--> statement-breakpoint
ALTER TABLE `sites` ADD `cost_basis_id` varchar(36);--> statement-breakpoint
ALTER TABLE `findings` ADD `condition` varchar(24);--> statement-breakpoint
ALTER TABLE `findings` ADD `flows` json;--> statement-breakpoint
ALTER TABLE `findings` ADD `physics` json;--> statement-breakpoint
ALTER TABLE `findings` ADD `physics_engine` varchar(32);--> statement-breakpoint
ALTER TABLE `findings` ADD `priced_basis_id` varchar(36);--> statement-breakpoint
ALTER TABLE `findings` ADD `priced_at` datetime(3);--> statement-breakpoint
ALTER TABLE `findings` ADD `pricing_note` varchar(255);--> statement-breakpoint
ALTER TABLE `findings` ADD `steam_kg_h` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `heat_kw` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `fuel_gj` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `cost_minor` bigint;--> statement-breakpoint
ALTER TABLE `findings` ADD `co2_kg` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `water_m3` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `payback_years` double;--> statement-breakpoint
ALTER TABLE `findings` ADD `reviewed_at` datetime(3);--> statement-breakpoint
ALTER TABLE `findings` ADD `reviewed_by` varchar(36);--> statement-breakpoint
ALTER TABLE `surveys` ADD `cost_basis_id` varchar(36);--> statement-breakpoint
ALTER TABLE `surveys` ADD `reviewed_at` datetime(3);--> statement-breakpoint
ALTER TABLE `surveys` ADD `reviewed_by` varchar(36);--> statement-breakpoint
ALTER TABLE `finding_conflicts` ADD `resolution_kind` varchar(24);--> statement-breakpoint
ALTER TABLE `finding_conflicts` ADD `resolution` json;--> statement-breakpoint
ALTER TABLE `cost_bases` ADD CONSTRAINT `cost_bases_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `cost_bases` ADD CONSTRAINT `cost_bases_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sync_devices` ADD CONSTRAINT `sync_devices_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sync_devices` ADD CONSTRAINT `sync_devices_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `sync_devices_firm_idx` ON `sync_devices` (`firm_id`);--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_priced_basis_id_cost_bases_id_fk` FOREIGN KEY (`priced_basis_id`) REFERENCES `cost_bases`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_reviewed_by_users_id_fk` FOREIGN KEY (`reviewed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_cost_basis_id_cost_bases_id_fk` FOREIGN KEY (`cost_basis_id`) REFERENCES `cost_bases`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_reviewed_by_users_id_fk` FOREIGN KEY (`reviewed_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `findings_survey_cost_idx` ON `findings` (`survey_id`,`cost_minor`);--> statement-breakpoint
CREATE INDEX `findings_survey_status_idx` ON `findings` (`survey_id`,`status`);--> statement-breakpoint
-- Each site's cost basis becomes version 1 of its history (the site keeps its own atmosphere);
-- ids are v4-shaped, made from the site id so the step is repeatable.
INSERT INTO `cost_bases` (`id`, `site_id`, `number`, `basis`, `note`)
	SELECT CONCAT(SUBSTR(h, 1, 8), '-', SUBSTR(h, 9, 4), '-4', SUBSTR(h, 14, 3), '-8', SUBSTR(h, 18, 3), '-', SUBSTR(h, 21, 12)),
		`id`, 1, JSON_REMOVE(`cost_basis`, '$.elevation', '$.atmosphericPressure'), 'The site’s cost basis before versions were kept'
	FROM (SELECT `id`, `cost_basis`, MD5(CONCAT(`id`, '/cost-basis/1')) AS h FROM `sites` WHERE `cost_basis` IS NOT NULL) AS s;--> statement-breakpoint
UPDATE `sites` s JOIN `cost_bases` c ON c.`site_id` = s.`id` AND c.`number` = 1
	SET s.`cost_basis_id` = c.`id`,
		s.`currency` = COALESCE(JSON_VALUE(s.`cost_basis`, '$.currency'), s.`currency`),
		s.`atmospheric_pressure_mpa` = JSON_VALUE(s.`cost_basis`, '$.atmosphericPressure'),
		s.`elevation_m` = COALESCE(s.`elevation_m`, JSON_VALUE(s.`cost_basis`, '$.elevation'));--> statement-breakpoint
UPDATE `sites` s JOIN `firms` f ON f.`id` = s.`firm_id`
	SET s.`unit_system` = f.`default_unit_system`,
		s.`currency` = IF(s.`cost_basis_id` IS NULL, f.`default_currency`, s.`currency`);--> statement-breakpoint
-- A survey already with the client keeps the basis it was priced on.
UPDATE `surveys` v JOIN `sites` s ON s.`id` = v.`site_id`
	SET v.`cost_basis_id` = s.`cost_basis_id` WHERE v.`status` IN ('published', 'closed');--> statement-breakpoint
UPDATE `findings` SET `condition` = COALESCE(JSON_VALUE(`inputs`, '$.condition'), JSON_VALUE(`inputs`, '$.sizeClass'));--> statement-breakpoint
-- The figures themselves are recomputed by the engine after migrating (scripts/migrate.ts).
ALTER TABLE `sites` DROP COLUMN `cost_basis`;--> statement-breakpoint
ALTER TABLE `findings` DROP COLUMN `results`;