CREATE TABLE `attempt_counters` (
	`scope` varchar(24) NOT NULL,
	`subject_hash` char(64) NOT NULL,
	`attempts` int NOT NULL DEFAULT 0,
	`last_attempt_at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `attempt_counters_scope_subject_hash_pk` PRIMARY KEY(`scope`,`subject_hash`)
);
--> statement-breakpoint
CREATE INDEX `attempt_counters_last_idx` ON `attempt_counters` (`last_attempt_at`);