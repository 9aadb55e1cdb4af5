CREATE TABLE `case_photo` (
	`id` text PRIMARY KEY NOT NULL,
	`case_id` text NOT NULL,
	`organization_id` text NOT NULL,
	`object_key` text NOT NULL,
	`content_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`width_px` integer,
	`height_px` integer,
	`state` text DEFAULT 'pending' NOT NULL,
	`refused_reason` text,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	FOREIGN KEY (`case_id`) REFERENCES `case_profile`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE UNIQUE INDEX `case_photo_object_key_unique` ON `case_photo` (`object_key`);--> statement-breakpoint
CREATE INDEX `case_photo_case_idx` ON `case_photo` (`case_id`,`state`);