CREATE TABLE `job` (
	`id` text PRIMARY KEY NOT NULL,
	`organization_id` text NOT NULL,
	`reference` text NOT NULL,
	`title` text NOT NULL,
	`customer_user_id` text,
	`customer_name` text NOT NULL,
	`customer_email` text NOT NULL,
	`engine_number` text DEFAULT '' NOT NULL,
	`case_number` text DEFAULT '' NOT NULL,
	`case_variant` text DEFAULT '' NOT NULL,
	`study_id` text,
	`kit_id` text,
	`plan_json` text,
	`status` text DEFAULT 'intake' NOT NULL,
	`deposit_amount` integer DEFAULT 0 NOT NULL,
	`currency` text DEFAULT 'eur' NOT NULL,
	`paid_at` integer,
	`shared_at` integer,
	`approved_at` integer,
	`approved_by_id` text,
	`approved_by_name` text,
	`approval_reason` text,
	`verify_tolerance_mm` real DEFAULT 0.05 NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`customer_user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `job_shop_idx` ON `job` (`organization_id`,`status`);--> statement-breakpoint
CREATE INDEX `job_customer_idx` ON `job` (`customer_user_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `job_shop_reference_unique` ON `job` (`organization_id`,`reference`);--> statement-breakpoint
CREATE TABLE `job_event` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`at` integer NOT NULL,
	`by_id` text,
	`by_name` text NOT NULL,
	`kind` text NOT NULL,
	`from_status` text,
	`to_status` text,
	`summary` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `job`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `job_event_job_idx` ON `job_event` (`job_id`,`at`);--> statement-breakpoint
CREATE TABLE `job_payment` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`checkout_session_id` text NOT NULL,
	`amount` integer NOT NULL,
	`currency` text NOT NULL,
	`status` text DEFAULT 'open' NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by_id` text NOT NULL,
	`paid_at` integer,
	FOREIGN KEY (`job_id`) REFERENCES `job`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `job_payment_checkout_session_id_unique` ON `job_payment` (`checkout_session_id`);--> statement-breakpoint
CREATE INDEX `job_payment_job_idx` ON `job_payment` (`job_id`);--> statement-breakpoint
CREATE TABLE `job_photo` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`organization_id` text NOT NULL,
	`object_key` text NOT NULL,
	`content_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`caption` text DEFAULT '' NOT NULL,
	`kind` text DEFAULT 'other' NOT NULL,
	`shared` integer DEFAULT false NOT NULL,
	`state` text DEFAULT 'pending' NOT NULL,
	`refused_reason` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `job`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `job_photo_object_key_unique` ON `job_photo` (`object_key`);--> statement-breakpoint
CREATE INDEX `job_photo_job_idx` ON `job_photo` (`job_id`,`state`);--> statement-breakpoint
CREATE TABLE `job_question` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`at` integer NOT NULL,
	`by_id` text NOT NULL,
	`by_name` text NOT NULL,
	`text` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `job`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `job_question_job_idx` ON `job_question` (`job_id`,`at`);--> statement-breakpoint
CREATE TABLE `job_reading` (
	`id` text PRIMARY KEY NOT NULL,
	`job_id` text NOT NULL,
	`readings_json` text NOT NULL,
	`verification_json` text NOT NULL,
	`verdict` text NOT NULL,
	`taken_at` integer NOT NULL,
	`taken_by_id` text NOT NULL,
	`taken_by_name` text NOT NULL,
	FOREIGN KEY (`job_id`) REFERENCES `job`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`taken_by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `job_reading_job_idx` ON `job_reading` (`job_id`,`taken_at`);--> statement-breakpoint
CREATE TABLE `payment_event` (
	`id` text PRIMARY KEY NOT NULL,
	`type` text NOT NULL,
	`received_at` integer NOT NULL
);
