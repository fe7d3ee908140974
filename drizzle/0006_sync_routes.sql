ALTER TABLE `audit_log` ADD `device_id` varchar(36);--> statement-breakpoint
CREATE INDEX `findings_seq_idx` ON `findings` (`change_seq`);