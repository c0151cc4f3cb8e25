CREATE TABLE `drill_assignments` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`workshop_id` integer NOT NULL,
	`assigned_by` integer,
	`apprentice_id` integer NOT NULL,
	`kinds` text NOT NULL,
	`count` integer NOT NULL,
	`due_date` text NOT NULL,
	`note` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`assigned_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`apprentice_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `drill_assignments_workshop_apprentice` ON `drill_assignments` (`workshop_id`,`apprentice_id`,`due_date`);--> statement-breakpoint
CREATE TABLE `drills` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`workshop_id` integer NOT NULL,
	`user_id` integer NOT NULL,
	`kind` text NOT NULL,
	`slug` text NOT NULL,
	`seed` integer NOT NULL,
	`problem` text NOT NULL,
	`solution` text NOT NULL,
	`assignment_id` integer,
	`source_calculation_id` integer,
	`answer` text,
	`verdict` text,
	`correct` integer,
	`answered_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`workshop_id`) REFERENCES `workshops`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`assignment_id`) REFERENCES `drill_assignments`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`source_calculation_id`) REFERENCES `calculations`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `drills_workshop_user_answered` ON `drills` (`workshop_id`,`user_id`,`answered_at`);--> statement-breakpoint
CREATE INDEX `drills_assignment` ON `drills` (`assignment_id`);