CREATE TABLE `installation` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`submittal_id` text NOT NULL,
	`placement_id` text NOT NULL,
	`code` text NOT NULL,
	`installed_at` integer,
	`installed_by` text,
	`photo_id` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`submittal_id`) REFERENCES `submittal`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`installed_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`photo_id`) REFERENCES `attachment`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `installation_placement_uq` ON `installation` (`submittal_id`,`placement_id`);--> statement-breakpoint
CREATE INDEX `installation_project_idx` ON `installation` (`project_id`);--> statement-breakpoint
CREATE TABLE `submittal` (
	`id` text PRIMARY KEY NOT NULL,
	`project_id` text NOT NULL,
	`room_id` text,
	`room_name` text NOT NULL,
	`letter` text NOT NULL,
	`state` text DEFAULT 'draft' NOT NULL,
	`snapshot` text,
	`snapshot_sha256` text,
	`issued_at` integer,
	`issued_by` text,
	`confirmed` text,
	`render_error` text,
	`outcome` text,
	`decided_at` integer,
	`decided_by` text,
	`signature` text,
	`notes` text,
	`decided_pdf_sha256` text,
	`superseded_at` integer,
	`superseded_by` text,
	`created_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`project_id`) REFERENCES `project`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`room_id`) REFERENCES `room`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`issued_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`decided_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `submittal_room_letter_uq` ON `submittal` (`room_id`,`letter`);--> statement-breakpoint
CREATE INDEX `submittal_project_idx` ON `submittal` (`project_id`);--> statement-breakpoint
CREATE TABLE `submittal_document` (
	`id` text PRIMARY KEY NOT NULL,
	`submittal_id` text NOT NULL,
	`kind` text NOT NULL,
	`units` text NOT NULL,
	`name` text NOT NULL,
	`mime` text NOT NULL,
	`sha256` text NOT NULL,
	`size` integer NOT NULL,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`submittal_id`) REFERENCES `submittal`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `submittal_document_uq` ON `submittal_document` (`submittal_id`,`kind`,`units`);--> statement-breakpoint
ALTER TABLE `project` ADD `fire_required` text;--> statement-breakpoint
ALTER TABLE `room` ADD `fire_required` text;