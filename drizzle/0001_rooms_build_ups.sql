CREATE TABLE `attachment` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`purpose` text NOT NULL,
	`sha256` text NOT NULL,
	`mime` text NOT NULL,
	`size` integer NOT NULL,
	`original_name` text NOT NULL,
	`uploaded_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploaded_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `attachment_project_idx` ON `attachment` (`project_id`);--> statement-breakpoint
CREATE TABLE `project_material` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`name` text NOT NULL,
	`category` text DEFAULT 'any' NOT NULL,
	`alpha` text NOT NULL,
	`source` text NOT NULL,
	`report_id` text,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`report_id`) REFERENCES `attachment`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `project_material_project_idx` ON `project_material` (`project_id`);--> statement-breakpoint
CREATE TABLE `opening` (
	`id` text PRIMARY KEY NOT NULL,
	`surface_id` text NOT NULL,
	`kind` text NOT NULL,
	`name` text NOT NULL,
	`x` real NOT NULL,
	`y` real NOT NULL,
	`width` real NOT NULL,
	`height` real NOT NULL,
	`material` text NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`surface_id`) REFERENCES `surface`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `opening_surface_idx` ON `opening` (`surface_id`);--> statement-breakpoint
CREATE TABLE `surface` (
	`id` text PRIMARY KEY NOT NULL,
	`room_id` text NOT NULL,
	`key` text NOT NULL,
	`name` text NOT NULL,
	`kind` text NOT NULL,
	`width` real NOT NULL,
	`height` real NOT NULL,
	`finish` text NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `surface_room_key_uq` ON `surface` (`room_id`,`key`);--> statement-breakpoint
CREATE TABLE `build_up` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`name` text NOT NULL,
	`spec` text NOT NULL,
	`module_width` real NOT NULL,
	`module_height` real NOT NULL,
	`border_x` real DEFAULT 0.03 NOT NULL,
	`border_y` real DEFAULT 0.03 NOT NULL,
	`facing_material` text DEFAULT '' NOT NULL,
	`fire_standard` text DEFAULT 'none' NOT NULL,
	`fire_class` text DEFAULT '' NOT NULL,
	`fire_report_id` text,
	`notes` text DEFAULT '' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`fire_report_id`) REFERENCES `attachment`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `build_up_project_idx` ON `build_up` (`project_id`);--> statement-breakpoint
CREATE TABLE `treatment` (
	`id` text PRIMARY KEY NOT NULL,
	`room_id` text NOT NULL,
	`surface_key` text NOT NULL,
	`build_up_id` text NOT NULL,
	`area` real NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`build_up_id`) REFERENCES `build_up`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `treatment_room_idx` ON `treatment` (`room_id`);--> statement-breakpoint
ALTER TABLE `room` ADD `shape` text DEFAULT 'shoebox' NOT NULL;--> statement-breakpoint
ALTER TABLE `room` ADD `pressure` real DEFAULT 101325 NOT NULL;--> statement-breakpoint
ALTER TABLE `room` ADD `target` text;--> statement-breakpoint
ALTER TABLE `room` ADD `version` integer DEFAULT 1 NOT NULL;