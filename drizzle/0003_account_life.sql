CREATE TABLE `throttle` (
	`key` text PRIMARY KEY NOT NULL,
	`hits` integer NOT NULL,
	`window_start` integer NOT NULL,
	`locked_until` integer
);
--> statement-breakpoint
CREATE INDEX `throttle_window_idx` ON `throttle` (`window_start`);--> statement-breakpoint
ALTER TABLE `user` ADD `disabled_at` integer;--> statement-breakpoint
ALTER TABLE `user` ADD `disabled_by` text;