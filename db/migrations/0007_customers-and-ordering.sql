CREATE TABLE `customers` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`workshop_id` integer NOT NULL,
	`name` text NOT NULL,
	`email` text,
	`phone` text,
	`address` text,
	`notes` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `customers_workshop_name` ON `customers` (`workshop_id`,`name`);--> statement-breakpoint
CREATE UNIQUE INDEX `customers_workshop_email` ON `customers` (`workshop_id`,`email`);--> statement-breakpoint
ALTER TABLE `jobs` ADD `number` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `jobs` ADD `customer_id` integer REFERENCES customers(id) ON DELETE set null;--> statement-breakpoint
ALTER TABLE `jobs` ADD `serial_number` text;--> statement-breakpoint
ALTER TABLE `jobs` ADD `accessories` text;--> statement-breakpoint
ALTER TABLE `workshops` ADD `last_job_number` integer DEFAULT 0 NOT NULL;--> statement-breakpoint
-- Job numbers per workshop, in the order the jobs were booked in; each workshop's counter continues from its last.
UPDATE `jobs` SET `number` = `ranked`.`n`
FROM (SELECT `id`, row_number() OVER (PARTITION BY `workshop_id` ORDER BY `created_at`, `id`) AS `n` FROM `jobs`) AS `ranked`
WHERE `ranked`.`id` = `jobs`.`id`;--> statement-breakpoint
UPDATE `workshops` SET `last_job_number` = (SELECT coalesce(max(`number`), 0) FROM `jobs` WHERE `jobs`.`workshop_id` = `workshops`.`id`);--> statement-breakpoint
CREATE UNIQUE INDEX `jobs_workshop_number` ON `jobs` (`workshop_id`,`number`);--> statement-breakpoint
CREATE INDEX `jobs_customer` ON `jobs` (`customer_id`);--> statement-breakpoint
-- A job inserted without a number (fixtures, scripts; the app numbers its own in createJob) takes the next one.
-- SQLite drops a table's triggers with it: a later migration that rebuilds `jobs` must create this again.
CREATE TRIGGER `jobs_number` AFTER INSERT ON `jobs` FOR EACH ROW WHEN NEW.`number` = 0
BEGIN
	UPDATE `workshops` SET `last_job_number` = `last_job_number` + 1 WHERE `id` = NEW.`workshop_id`;
	UPDATE `jobs` SET `number` = coalesce((SELECT `last_job_number` FROM `workshops` WHERE `id` = NEW.`workshop_id`), 0) WHERE `id` = NEW.`id`;
END;--> statement-breakpoint
-- Customers from the jobs' own name and e-mail: one per e-mail address in a workshop, named as on their latest job ...
INSERT INTO `customers` (`workshop_id`, `name`, `email`, `created_at`, `updated_at`)
SELECT `k`.`workshop_id`,
	coalesce((SELECT trim(`j`.`customer_name`) FROM `jobs` AS `j`
		WHERE `j`.`workshop_id` = `k`.`workshop_id` AND lower(trim(`j`.`customer_email`)) = `k`.`email` AND trim(coalesce(`j`.`customer_name`, '')) <> ''
		ORDER BY `j`.`created_at` DESC, `j`.`id` DESC LIMIT 1), `k`.`email`),
	`k`.`email`, `k`.`first_at`, `k`.`last_at`
FROM (SELECT `workshop_id`, lower(trim(`customer_email`)) AS `email`, min(`created_at`) AS `first_at`, max(`updated_at`) AS `last_at`
	FROM `jobs` WHERE trim(coalesce(`customer_email`, '')) <> '' GROUP BY `workshop_id`, lower(trim(`customer_email`))) AS `k`;--> statement-breakpoint
-- ... then one per name among jobs with no e-mail, unless a customer of that name is already on file.
INSERT INTO `customers` (`workshop_id`, `name`, `created_at`, `updated_at`)
SELECT `k`.`workshop_id`,
	(SELECT trim(`j`.`customer_name`) FROM `jobs` AS `j`
		WHERE `j`.`workshop_id` = `k`.`workshop_id` AND lower(trim(`j`.`customer_name`)) = `k`.`name` AND trim(coalesce(`j`.`customer_email`, '')) = ''
		ORDER BY `j`.`created_at` DESC, `j`.`id` DESC LIMIT 1),
	`k`.`first_at`, `k`.`last_at`
FROM (SELECT `workshop_id`, lower(trim(`customer_name`)) AS `name`, min(`created_at`) AS `first_at`, max(`updated_at`) AS `last_at`
	FROM `jobs` AS `j`
	WHERE trim(coalesce(`customer_email`, '')) = '' AND trim(coalesce(`customer_name`, '')) <> ''
		AND NOT EXISTS (SELECT 1 FROM `customers` AS `c` WHERE `c`.`workshop_id` = `j`.`workshop_id` AND lower(`c`.`name`) = lower(trim(`j`.`customer_name`)))
	GROUP BY `workshop_id`, lower(trim(`customer_name`))) AS `k`;--> statement-breakpoint
UPDATE `jobs` SET `customer_id` = coalesce(
	(SELECT `c`.`id` FROM `customers` AS `c` WHERE `c`.`workshop_id` = `jobs`.`workshop_id` AND `c`.`email` = lower(trim(`jobs`.`customer_email`))),
	(SELECT `c`.`id` FROM `customers` AS `c` WHERE `c`.`workshop_id` = `jobs`.`workshop_id` AND lower(`c`.`name`) = lower(trim(`jobs`.`customer_name`)) ORDER BY `c`.`id` LIMIT 1))
WHERE trim(coalesce(`customer_email`, '')) <> '' OR trim(coalesce(`customer_name`, '')) <> '';--> statement-breakpoint
-- The job's name and e-mail columns stay as a copy of its customer's.
UPDATE `jobs` SET `customer_name` = (SELECT `name` FROM `customers` WHERE `customers`.`id` = `jobs`.`customer_id`),
	`customer_email` = (SELECT `email` FROM `customers` WHERE `customers`.`id` = `jobs`.`customer_id`)
WHERE `customer_id` IS NOT NULL;--> statement-breakpoint
ALTER TABLE `parts` ADD `quantity` integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE `parts` ADD `supplier` text;--> statement-breakpoint
ALTER TABLE `parts` ADD `supplier_part_number` text;--> statement-breakpoint
ALTER TABLE `parts` ADD `ordered_at` integer;--> statement-breakpoint
ALTER TABLE `parts` ADD `original_value_si` real;--> statement-breakpoint
ALTER TABLE `parts` ADD `original_rating_si` real;--> statement-breakpoint
ALTER TABLE `parts` ADD `replacement_value_si` real;--> statement-breakpoint
ALTER TABLE `parts` ADD `replacement_rating_si` real;--> statement-breakpoint
CREATE INDEX `parts_workshop_state` ON `parts` (`workshop_id`,`state`);
