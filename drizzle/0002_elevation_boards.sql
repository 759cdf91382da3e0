CREATE TABLE `board` (
	`id` text PRIMARY KEY NOT NULL,
	`surface_id` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`grid_module` real DEFAULT 0.3 NOT NULL,
	`drawing_id` text,
	`drawing_x` real DEFAULT 0 NOT NULL,
	`drawing_y` real DEFAULT 0 NOT NULL,
	`drawing_metres_per_pixel` real DEFAULT 0.01 NOT NULL,
	`drawing_opacity` real DEFAULT 0.5 NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`surface_id`) REFERENCES `surface`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`drawing_id`) REFERENCES `attachment`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `board_surface_uq` ON `board` (`surface_id`);--> statement-breakpoint
CREATE TABLE `pin` (
	`id` text PRIMARY KEY NOT NULL,
	`board_id` text NOT NULL,
	`number` integer NOT NULL,
	`x` real NOT NULL,
	`y` real NOT NULL,
	`body` text NOT NULL,
	`author_id` text,
	`resolved_at` integer,
	`resolved_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`board_id`) REFERENCES `board`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`resolved_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `pin_board_idx` ON `pin` (`board_id`);--> statement-breakpoint
CREATE TABLE `pin_reply` (
	`id` text PRIMARY KEY NOT NULL,
	`pin_id` text NOT NULL,
	`body` text NOT NULL,
	`author_id` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`pin_id`) REFERENCES `pin`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `pin_reply_pin_idx` ON `pin_reply` (`pin_id`);--> statement-breakpoint
CREATE TABLE `placement` (
	`id` text PRIMARY KEY NOT NULL,
	`board_id` text NOT NULL,
	`build_up_id` text NOT NULL,
	`code` text NOT NULL,
	`x` real NOT NULL,
	`y` real NOT NULL,
	`width` real NOT NULL,
	`height` real NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	FOREIGN KEY (`board_id`) REFERENCES `board`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`build_up_id`) REFERENCES `build_up`(`id`) ON UPDATE no action ON DELETE restrict
);
--> statement-breakpoint
CREATE INDEX `placement_board_idx` ON `placement` (`board_id`);--> statement-breakpoint
ALTER TABLE `project` ADD `edge_clearance` real DEFAULT 0.05 NOT NULL;