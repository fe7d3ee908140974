CREATE TABLE `decision_digest_outbox` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`firm_id` varchar(36) NOT NULL,
	`survey_id` varchar(36) NOT NULL,
	`decision_id` varchar(36),
	`comment_id` varchar(36),
	`actor_id` varchar(36),
	`claim` varchar(36),
	`claimed_at` datetime(3),
	`sent_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `decision_digest_outbox_id` PRIMARY KEY(`id`),
	CONSTRAINT `decision_digest_outbox_one_event` CHECK((decision_id IS NULL) <> (comment_id IS NULL))
);
--> statement-breakpoint
ALTER TABLE `decisions` MODIFY COLUMN `decided_by` varchar(36);--> statement-breakpoint
ALTER TABLE `comments` ADD `decision_id` varchar(36);--> statement-breakpoint
ALTER TABLE `decisions` ADD `assignee` varchar(160);--> statement-breakpoint
ALTER TABLE `decisions` ADD `repaired_on` date;--> statement-breakpoint
ALTER TABLE `decisions` ADD `reason` text;--> statement-breakpoint
ALTER TABLE `decisions` ADD `superseded_at` datetime(3);--> statement-breakpoint
ALTER TABLE `decisions` ADD `outcome` varchar(24);--> statement-breakpoint
ALTER TABLE `decisions` ADD `outcome_at` datetime(3);--> statement-breakpoint
ALTER TABLE `decisions` ADD `outcome_survey_id` varchar(36);--> statement-breakpoint
ALTER TABLE `decisions` ADD `outcome_finding_id` varchar(36);--> statement-breakpoint
-- Data (by hand): no code wrote `decisions` before this migration, but should a row exist, its
-- note becomes the reason (nothing is dropped with the column), and of several rows on one item
-- the newest stays current and the older ones are marked superseded (history, newest wins). A
-- row with neither or both of finding and measure stops the migration at its CHECK below
-- rather than being dropped.
UPDATE `decisions` SET `reason` = `note` WHERE `note` IS NOT NULL AND `reason` IS NULL;--> statement-breakpoint
UPDATE `decisions` d JOIN `decisions` n
  ON COALESCE(n.finding_id, n.measure_id) = COALESCE(d.finding_id, d.measure_id)
 AND (n.created_at > d.created_at OR (n.created_at = d.created_at AND n.id > d.id))
SET d.superseded_at = n.created_at
WHERE d.superseded_at IS NULL;--> statement-breakpoint
ALTER TABLE `decisions` ADD `current_item` varchar(36) GENERATED ALWAYS AS (IF(superseded_at IS NULL, COALESCE(finding_id, measure_id), NULL)) STORED;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_current_uq` UNIQUE(`current_item`);--> statement-breakpoint
-- Data (by hand): a finding's status no longer holds a client's decision. A finding marked
-- approved, scheduled, repaired or declined gets that decision as its current one (decided_by
-- null: carried over; verified: repaired with the outcome verified), unless it has a current
-- decision already; then its status is its lifecycle again: published. The revisions' frozen
-- copies of the status follow.
INSERT INTO `decisions` (`id`, `survey_id`, `finding_id`, `decision`, `outcome`, `created_at`)
SELECT UUID(), f.survey_id, f.id, IF(f.status = 'verified', 'repaired', f.status),
       IF(f.status = 'verified', 'verified', NULL), f.updated_at
  FROM `findings` f
 WHERE f.status IN ('approved', 'scheduled', 'repaired', 'declined', 'verified')
   AND NOT EXISTS (SELECT 1 FROM `decisions` d WHERE d.current_item = f.id);--> statement-breakpoint
UPDATE `findings` SET `status` = 'published'
 WHERE `status` IN ('approved', 'scheduled', 'repaired', 'declined', 'verified');--> statement-breakpoint
UPDATE `survey_revision_findings` SET `status` = 'published'
 WHERE `status` IN ('approved', 'scheduled', 'repaired', 'declined', 'verified');--> statement-breakpoint
ALTER TABLE `decision_digest_outbox` ADD CONSTRAINT `decision_digest_outbox_firm_id_firms_id_fk` FOREIGN KEY (`firm_id`) REFERENCES `firms`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decision_digest_outbox` ADD CONSTRAINT `decision_digest_outbox_survey_id_surveys_id_fk` FOREIGN KEY (`survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decision_digest_outbox` ADD CONSTRAINT `decision_digest_outbox_decision_id_decisions_id_fk` FOREIGN KEY (`decision_id`) REFERENCES `decisions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decision_digest_outbox` ADD CONSTRAINT `decision_digest_outbox_comment_id_comments_id_fk` FOREIGN KEY (`comment_id`) REFERENCES `comments`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decision_digest_outbox` ADD CONSTRAINT `decision_digest_outbox_actor_id_users_id_fk` FOREIGN KEY (`actor_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `decision_digest_outbox_unsent_idx` ON `decision_digest_outbox` (`sent_at`,`id`);--> statement-breakpoint
CREATE INDEX `decision_digest_outbox_claim_idx` ON `decision_digest_outbox` (`claim`);--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_one_item` CHECK (finding_id IS NULL OR measure_id IS NULL);--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_one_item` CHECK ((finding_id IS NULL) <> (measure_id IS NULL));--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_outcome_repaired` CHECK (outcome IS NULL OR decision = 'repaired');--> statement-breakpoint
ALTER TABLE `comments` ADD CONSTRAINT `comments_decision_id_decisions_id_fk` FOREIGN KEY (`decision_id`) REFERENCES `decisions`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `decisions` ADD CONSTRAINT `decisions_outcome_survey_id_surveys_id_fk` FOREIGN KEY (`outcome_survey_id`) REFERENCES `surveys`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `comments_finding_idx` ON `comments` (`finding_id`);--> statement-breakpoint
CREATE INDEX `comments_measure_idx` ON `comments` (`measure_id`);--> statement-breakpoint
CREATE INDEX `decisions_survey_idx` ON `decisions` (`survey_id`,`created_at`);--> statement-breakpoint
ALTER TABLE `decisions` DROP COLUMN `note`;