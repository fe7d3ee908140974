CREATE TABLE `server_keys` (
	`name` varchar(32) NOT NULL,
	`secret` char(64) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `server_keys_name` PRIMARY KEY(`name`)
);
--> statement-breakpoint
-- Sessions are now kept under the SHA-256 of the cookie's token (auth/sessions.ts): a session
-- made before holds its raw token as id and is ended here; everyone signs in once more.
DELETE FROM `sessions`;
--> statement-breakpoint
ALTER TABLE `sessions` MODIFY COLUMN `id` char(64) NOT NULL;