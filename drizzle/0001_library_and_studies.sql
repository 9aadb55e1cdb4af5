CREATE TABLE `boring_rig` (
	`id` text PRIMARY KEY NOT NULL,
	`organization_id` text NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`data_json` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	`archived_at` integer,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `boring_rig_shop_idx` ON `boring_rig` (`organization_id`,`archived_at`);--> statement-breakpoint
CREATE TABLE `case_profile` (
	`id` text PRIMARY KEY NOT NULL,
	`organization_id` text NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`data_json` text NOT NULL,
	`mouth_readings_json` text DEFAULT '[]' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	`archived_at` integer,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `case_profile_shop_idx` ON `case_profile` (`organization_id`,`archived_at`);--> statement-breakpoint
CREATE TABLE `cylinder_kit` (
	`id` text PRIMARY KEY NOT NULL,
	`organization_id` text NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`data_json` text NOT NULL,
	`readings_json` text DEFAULT '{"skirtDiameter":[],"skirtLength":[]}' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	`archived_at` integer,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `cylinder_kit_shop_idx` ON `cylinder_kit` (`organization_id`,`archived_at`);--> statement-breakpoint
CREATE TABLE `study` (
	`id` text PRIMARY KEY NOT NULL,
	`organization_id` text NOT NULL,
	`name` text NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`case_id` text NOT NULL,
	`rig_id` text,
	`cut_json` text,
	`readings_json` text,
	`limits_json` text,
	`chosen_kit_id` text,
	`write_id` text DEFAULT '' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`updated_at` integer DEFAULT (cast(unixepoch('subsecond') * 1000 as integer)) NOT NULL,
	`created_by` text NOT NULL,
	`archived_at` integer,
	FOREIGN KEY (`organization_id`) REFERENCES `organization`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`case_id`) REFERENCES `case_profile`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`rig_id`) REFERENCES `boring_rig`(`id`) ON UPDATE no action ON DELETE restrict,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `study_shop_idx` ON `study` (`organization_id`,`archived_at`);--> statement-breakpoint
CREATE INDEX `study_case_idx` ON `study` (`case_id`);--> statement-breakpoint
CREATE INDEX `study_rig_idx` ON `study` (`rig_id`);--> statement-breakpoint
CREATE TABLE `study_event` (
	`id` text PRIMARY KEY NOT NULL,
	`study_id` text NOT NULL,
	`at` integer NOT NULL,
	`by_id` text NOT NULL,
	`by_name` text NOT NULL,
	`summary` text NOT NULL,
	FOREIGN KEY (`study_id`) REFERENCES `study`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`by_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE no action
);
--> statement-breakpoint
CREATE INDEX `study_event_study_idx` ON `study_event` (`study_id`,`at`);--> statement-breakpoint
CREATE TABLE `study_kit` (
	`study_id` text NOT NULL,
	`kit_id` text NOT NULL,
	`position` integer NOT NULL,
	FOREIGN KEY (`study_id`) REFERENCES `study`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`kit_id`) REFERENCES `cylinder_kit`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE UNIQUE INDEX `study_kit_unique` ON `study_kit` (`study_id`,`kit_id`);--> statement-breakpoint
CREATE INDEX `study_kit_kit_idx` ON `study_kit` (`kit_id`);