CREATE TABLE `client_companies` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`contact_email` varchar(254),
	`notes` text,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `client_companies_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `firms` (
	`id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`default_unit_system` char(2) NOT NULL DEFAULT 'SI',
	`default_currency` char(3) NOT NULL DEFAULT 'EUR',
	`settings` json,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `firms_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`id` varchar(255) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`user_agent` varchar(255),
	CONSTRAINT `sessions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `tokens` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`purpose` varchar(24) NOT NULL,
	`token_hash` char(64) NOT NULL,
	`email` varchar(254) NOT NULL,
	`user_id` varchar(36),
	`role` varchar(24),
	`client_company_id` varchar(36),
	`created_by` varchar(36),
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`revoked` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `tokens_hash_uq` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(160) NOT NULL,
	`role` varchar(24) NOT NULL,
	`client_company_id` varchar(36),
	`password_hash` varchar(255),
	`unit_system` char(2),
	`theme` varchar(24),
	`disabled_at` datetime(3),
	`last_sign_in_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_uq` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `assets` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`kind` varchar(24) NOT NULL DEFAULT 'trap',
	`tag` varchar(64) NOT NULL,
	`location` varchar(255),
	`header_id` varchar(36),
	`details` json,
	`retired_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `assets_id` PRIMARY KEY(`id`),
	CONSTRAINT `assets_site_tag_uq` UNIQUE(`site_id`,`tag`)
);
--> statement-breakpoint
CREATE TABLE `headers` (
	`id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`name` varchar(80) NOT NULL,
	`pressure_mpa` double NOT NULL,
	`design_temperature_k` double,
	`sort_order` int NOT NULL DEFAULT 0,
	`retired_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `headers_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `sites` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`client_company_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`address` text,
	`elevation_m` double,
	`cost_basis` json,
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `sites_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `findings` (
	`id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`kind` varchar(24) NOT NULL,
	`asset_id` varchar(36),
	`header_id` varchar(36),
	`location` varchar(255),
	`notes` text,
	`inputs` json NOT NULL,
	`results` json,
	`results_engine` varchar(32),
	`repair_cost_minor` bigint,
	`measure_id` varchar(36),
	`status` varchar(24) NOT NULL DEFAULT 'draft',
	`recorded_by` varchar(36),
	`recorded_at` datetime(3),
	`deleted_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `findings_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `measures` (
	`id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`description` text,
	`repair_cost_minor` bigint,
	`sort_order` int NOT NULL DEFAULT 0,
	`deleted_at` datetime(3),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `measures_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `photos` (
	`id` varchar(36) NOT NULL,
	`finding_id` varchar(36) NOT NULL,
	`storage_key` varchar(255) NOT NULL,
	`content_type` varchar(64) NOT NULL,
	`bytes` int NOT NULL,
	`width` int,
	`height` int,
	`sha256` varchar(64) NOT NULL,
	`caption` varchar(255),
	`uploaded_by` varchar(36),
	`taken_at` datetime(3),
	`deleted_at` datetime(3),
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `photos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `survey_auditors` (
	`survey_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `survey_auditors_survey_id_user_id_pk` PRIMARY KEY(`survey_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `surveys` (
	`id` varchar(36) NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`site_id` varchar(36) NOT NULL,
	`name` varchar(160) NOT NULL,
	`starts_on` date,
	`ends_on` date,
	`status` varchar(24) NOT NULL DEFAULT 'planned',
	`published_at` datetime(3),
	`created_by` varchar(36),
	`version` int NOT NULL DEFAULT 1,
	`change_seq` bigint unsigned NOT NULL DEFAULT 0,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `surveys_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `comments` (
	`id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`finding_id` varchar(36),
	`measure_id` varchar(36),
	`author_id` varchar(36) NOT NULL,
	`body` text NOT NULL,
	`deleted_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `comments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `decisions` (
	`id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`finding_id` varchar(36),
	`measure_id` varchar(36),
	`decision` varchar(24) NOT NULL,
	`scheduled_for` date,
	`note` text,
	`decided_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `decisions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `applied_mutations` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`outcome` json,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `applied_mutations_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`firm_id` varchar(36),
	`actor_id` varchar(36),
	`entity` varchar(32) NOT NULL,
	`entity_id` varchar(64) NOT NULL,
	`action` varchar(32) NOT NULL,
	`before` json,
	`after` json,
	`address` varchar(64),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `change_counters` (
	`firm_id` varchar(36) NOT NULL,
	`value` bigint unsigned NOT NULL DEFAULT 0,
	CONSTRAINT `change_counters_firm_id` PRIMARY KEY(`firm_id`)
);
--> statement-breakpoint
ALTER TABLE `client_companies` ADD CONSTRAINT `client_companies_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tokens` ADD CONSTRAINT `tokens_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tokens` ADD CONSTRAINT `tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tokens` ADD CONSTRAINT `tokens_client_company_id_client_companies_id_fk` FOREIGN KEY (`client_company_id`) REFERENCES `client_companies`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `tokens` ADD CONSTRAINT `tokens_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `users` ADD CONSTRAINT `users_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `users` ADD CONSTRAINT `users_client_company_id_client_companies_id_fk` FOREIGN KEY (`client_company_id`) REFERENCES `client_companies`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assets` ADD CONSTRAINT `assets_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `assets` ADD CONSTRAINT `assets_header_id_headers_id_fk` FOREIGN KEY (`header_id`) REFERENCES `headers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `headers` ADD CONSTRAINT `headers_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sites` ADD CONSTRAINT `sites_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sites` ADD CONSTRAINT `sites_client_company_id_client_companies_id_fk` FOREIGN KEY (`client_company_id`) REFERENCES `client_companies`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_asset_id_assets_id_fk` FOREIGN KEY (`asset_id`) REFERENCES `assets`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_header_id_headers_id_fk` FOREIGN KEY (`header_id`) REFERENCES `headers`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_measure_id_measures_id_fk` FOREIGN KEY (`measure_id`) REFERENCES `measures`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `findings` ADD CONSTRAINT `findings_recorded_by_users_id_fk` FOREIGN KEY (`recorded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `measures` ADD CONSTRAINT `measures_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_finding_id_findings_id_fk` FOREIGN KEY (`finding_id`) REFERENCES `findings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `photos` ADD CONSTRAINT `photos_uploaded_by_users_id_fk` FOREIGN KEY (`uploaded_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `survey_auditors` ADD CONSTRAINT `survey_auditors_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `survey_auditors` ADD CONSTRAINT `survey_auditors_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_site_id_sites_id_fk` FOREIGN KEY (`site_id`) REFERENCES `sites`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `surveys` ADD CONSTRAINT `surveys_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_finding_id_findings_id_fk` FOREIGN KEY (`finding_id`) REFERENCES `findings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_measure_id_measures_id_fk` FOREIGN KEY (`measure_id`) REFERENCES `measures`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_author_id_users_id_fk` FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_finding_id_findings_id_fk` FOREIGN KEY (`finding_id`) REFERENCES `findings`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_measure_id_measures_id_fk` FOREIGN KEY (`measure_id`) REFERENCES `measures`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_decided_by_users_id_fk` FOREIGN KEY (`decided_by`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `applied_mutations` ADD CONSTRAINT `applied_mutations_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `change_counters` ADD CONSTRAINT `change_counters_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `client_companies_firm_idx` ON `client_companies` (`firm_id`);--> statement-breakpoint
CREATE INDEX `sessions_user_idx` ON `sessions` (`user_id`);--> statement-breakpoint
CREATE INDEX `tokens_email_idx` ON `tokens` (`email`);--> statement-breakpoint
CREATE INDEX `users_firm_idx` ON `users` (`firm_id`);--> statement-breakpoint
CREATE INDEX `headers_site_idx` ON `headers` (`site_id`);--> statement-breakpoint
CREATE INDEX `sites_firm_idx` ON `sites` (`firm_id`);--> statement-breakpoint
CREATE INDEX `sites_client_idx` ON `sites` (`client_company_id`);--> statement-breakpoint
CREATE INDEX `sites_change_idx` ON `sites` (`firm_id`,`change_seq`);--> statement-breakpoint
CREATE INDEX `findings_survey_idx` ON `findings` (`survey_id`);--> statement-breakpoint
CREATE INDEX `findings_asset_idx` ON `findings` (`asset_id`);--> statement-breakpoint
CREATE INDEX `findings_change_idx` ON `findings` (`survey_id`,`change_seq`);--> statement-breakpoint
CREATE INDEX `measures_survey_idx` ON `measures` (`survey_id`);--> statement-breakpoint
CREATE INDEX `photos_finding_idx` ON `photos` (`finding_id`);--> statement-breakpoint
CREATE INDEX `survey_auditors_user_idx` ON `survey_auditors` (`user_id`);--> statement-breakpoint
CREATE INDEX `surveys_firm_idx` ON `surveys` (`firm_id`);--> statement-breakpoint
CREATE INDEX `surveys_site_idx` ON `surveys` (`site_id`);--> statement-breakpoint
CREATE INDEX `comments_survey_idx` ON `comments` (`survey_id`);--> statement-breakpoint
CREATE INDEX `decisions_finding_idx` ON `decisions` (`finding_id`);--> statement-breakpoint
CREATE INDEX `decisions_measure_idx` ON `decisions` (`measure_id`);--> statement-breakpoint
CREATE INDEX `audit_entity_idx` ON `audit_log` (`entity`,`entity_id`);--> statement-breakpoint
CREATE INDEX `audit_firm_idx` ON `audit_log` (`firm_id`,`created_at`);