ALTER TABLE `job` ADD `plan_override_reason` text;--> statement-breakpoint
ALTER TABLE `job` ADD `plan_override_by_id` text;--> statement-breakpoint
ALTER TABLE `job` ADD `plan_override_by_name` text;--> statement-breakpoint
ALTER TABLE `job` ADD `plan_override_at` integer;--> statement-breakpoint
ALTER TABLE `job` ADD `verify_override_reason` text;--> statement-breakpoint
ALTER TABLE `job` ADD `verify_override_by_id` text;--> statement-breakpoint
ALTER TABLE `job` ADD `verify_override_by_name` text;--> statement-breakpoint
ALTER TABLE `job` ADD `verify_override_at` integer;