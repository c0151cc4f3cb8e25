-- Job statuses renamed (lib/vocabulary.ts): booked-in -> on-the-rack, awaiting-go-ahead -> customer-weighing-up,
-- ready -> at-the-counter. The column's default changes too. drizzle-kit would rebuild `jobs` for that, but the
-- migrator runs inside one transaction, where PRAGMA foreign_keys=OFF does nothing, so DROP TABLE `jobs` would
-- cascade-delete every job's parts, readings, files and Log. Instead the column is swapped in place.
ALTER TABLE `jobs` ADD `status_renamed` text DEFAULT 'on-the-rack' NOT NULL;--> statement-breakpoint
UPDATE `jobs` SET `status_renamed` = CASE `status` WHEN 'booked-in' THEN 'on-the-rack' WHEN 'awaiting-go-ahead' THEN 'customer-weighing-up' WHEN 'ready' THEN 'at-the-counter' ELSE `status` END;--> statement-breakpoint
DROP INDEX `jobs_workshop_status_updated`;--> statement-breakpoint
ALTER TABLE `jobs` DROP COLUMN `status`;--> statement-breakpoint
ALTER TABLE `jobs` RENAME COLUMN `status_renamed` TO `status`;--> statement-breakpoint
CREATE INDEX `jobs_workshop_status_updated` ON `jobs` (`workshop_id`,`status`,`updated_at`);--> statement-breakpoint
-- Status entries of the Log keep their words as written; the values in their data follow the rename.
UPDATE `log_entries` SET `data` = json_set(`data`, '$.to', CASE json_extract(`data`, '$.to') WHEN 'booked-in' THEN 'on-the-rack' WHEN 'awaiting-go-ahead' THEN 'customer-weighing-up' WHEN 'ready' THEN 'at-the-counter' ELSE json_extract(`data`, '$.to') END)
  WHERE `kind` = 'status' AND json_valid(`data`) AND json_extract(`data`, '$.to') IN ('booked-in', 'awaiting-go-ahead', 'ready');--> statement-breakpoint
UPDATE `log_entries` SET `data` = json_set(`data`, '$.from', CASE json_extract(`data`, '$.from') WHEN 'booked-in' THEN 'on-the-rack' WHEN 'awaiting-go-ahead' THEN 'customer-weighing-up' WHEN 'ready' THEN 'at-the-counter' ELSE json_extract(`data`, '$.from') END)
  WHERE `kind` = 'status' AND json_valid(`data`) AND json_extract(`data`, '$.from') IN ('booked-in', 'awaiting-go-ahead', 'ready');--> statement-breakpoint
ALTER TABLE `invoices` ADD `pay_token_hash` text;--> statement-breakpoint
ALTER TABLE `invoices` ADD `pay_token_expires_at` integer;--> statement-breakpoint
ALTER TABLE `invoices` ADD `sent_to` text;--> statement-breakpoint
ALTER TABLE `invoices` ADD `sent_at` integer;--> statement-breakpoint
ALTER TABLE `invoices` ADD `viewed_at` integer;--> statement-breakpoint
CREATE UNIQUE INDEX `invoices_pay_token` ON `invoices` (`pay_token_hash`);--> statement-breakpoint
CREATE INDEX `invoices_checkout_session` ON `invoices` (`checkout_session_id`);