CREATE TABLE `fault_candidates` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`fault_id` integer NOT NULL,
	`position` integer NOT NULL,
	`description` text NOT NULL,
	`status` text DEFAULT 'open' NOT NULL,
	`evidence` text,
	`reading_id` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`fault_id`) REFERENCES `faults`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`reading_id`) REFERENCES `readings`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `fault_candidates_fault` ON `fault_candidates` (`fault_id`);--> statement-breakpoint
CREATE TABLE `faults` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`job_id` integer NOT NULL,
	`workshop_id` integer NOT NULL,
	`symptom` text NOT NULL,
	`section` text,
	`resolution` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `faults_job` ON `faults` (`job_id`);--> statement-breakpoint
CREATE TABLE `power_up_steps` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`power_up_id` integer NOT NULL,
	`supply_voltage` real NOT NULL,
	`current_drawn` real NOT NULL,
	`minutes` real,
	`b_plus` real,
	`note` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`power_up_id`) REFERENCES `power_ups`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `power_up_steps_session` ON `power_up_steps` (`power_up_id`);--> statement-breakpoint
CREATE TABLE `power_ups` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`job_id` integer NOT NULL,
	`workshop_id` integer NOT NULL,
	`limiter` text,
	`lamp_power` real,
	`current_limit` real,
	`stop_current` real,
	`checklist` text,
	`outcome` text,
	`reason` text,
	`author_id` integer,
	`log_entry_id` integer,
	`started_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`log_entry_id`) REFERENCES `log_entries`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `power_ups_job` ON `power_ups` (`job_id`);--> statement-breakpoint
CREATE INDEX `power_ups_log_entry` ON `power_ups` (`log_entry_id`);--> statement-breakpoint
CREATE TABLE `tubes` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`job_id` integer NOT NULL,
	`workshop_id` integer NOT NULL,
	`position` text NOT NULL,
	`type` text NOT NULL,
	`function` text,
	`test_reading` real,
	`test_minimum` real,
	`verdict` text DEFAULT 'not-tested' NOT NULL,
	`substitute` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `tubes_job` ON `tubes` (`job_id`);--> statement-breakpoint
ALTER TABLE `parts` ADD `checked_by` integer REFERENCES users(id) ON DELETE set null;--> statement-breakpoint
ALTER TABLE `parts` ADD `checked_at` integer;--> statement-breakpoint
-- Data: every power-up log entry becomes a power-up session of its own (written by hand, not generated).
-- The entry stays in the Log as it was: the Log is the job's dated history and its entries are never
-- edited. The session keeps the entry's id (log_entry_id), which also keeps this step from running twice.
-- Limiter, stop current, checklist and outcome were never recorded in the Log, so they stay null.
INSERT INTO `power_ups` (`job_id`, `workshop_id`, `author_id`, `log_entry_id`, `started_at`)
SELECT l.`job_id`, l.`workshop_id`, l.`author_id`, l.`id`, l.`created_at`
FROM `log_entries` l
WHERE l.`kind` = 'power-up' AND NOT EXISTS (SELECT 1 FROM `power_ups` p WHERE p.`log_entry_id` = l.`id`)
ORDER BY l.`id`;
--> statement-breakpoint
-- The entry's supply voltage and current drawn become the session's one step, its text the step's note.
INSERT INTO `power_up_steps` (`power_up_id`, `supply_voltage`, `current_drawn`, `note`, `created_at`)
SELECT p.`id`, json_extract(l.`data`, '$.supplyVoltage'), json_extract(l.`data`, '$.currentDrawn'), l.`text`, l.`created_at`
FROM `power_ups` p JOIN `log_entries` l ON l.`id` = p.`log_entry_id`
WHERE json_valid(l.`data`)
  AND typeof(json_extract(l.`data`, '$.supplyVoltage')) IN ('integer', 'real')
  AND typeof(json_extract(l.`data`, '$.currentDrawn')) IN ('integer', 'real')
  AND NOT EXISTS (SELECT 1 FROM `power_up_steps` s WHERE s.`power_up_id` = p.`id`);
--> statement-breakpoint
-- An entry without both figures gives a session without steps; its text becomes the session's reason.
UPDATE `power_ups` SET `reason` = (SELECT l.`text` FROM `log_entries` l WHERE l.`id` = `power_ups`.`log_entry_id`)
WHERE `log_entry_id` IS NOT NULL AND `reason` IS NULL
  AND NOT EXISTS (SELECT 1 FROM `power_up_steps` s WHERE s.`power_up_id` = `power_ups`.`id`);
