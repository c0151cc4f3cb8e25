DROP INDEX `jobs_workshop_status`;--> statement-breakpoint
CREATE INDEX `jobs_workshop_status_updated` ON `jobs` (`workshop_id`,`status`,`updated_at`);