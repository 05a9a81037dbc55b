ALTER TABLE `clubs` ADD `marshal_reach` real DEFAULT 3 NOT NULL;--> statement-breakpoint
ALTER TABLE `clubs` ADD `heat_size` integer DEFAULT 10 NOT NULL;