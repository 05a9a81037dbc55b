CREATE TABLE `car_profiles` (
	`id` text PRIMARY KEY NOT NULL,
	`user_id` text NOT NULL,
	`preset_id` text NOT NULL,
	`profile` text NOT NULL,
	`created_at` integer DEFAULT (unixepoch() * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch() * 1000) NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `car_profiles_user` ON `car_profiles` (`user_id`);--> statement-breakpoint
CREATE TABLE `published_versions` (
	`id` text PRIMARY KEY NOT NULL,
	`layout_id` text NOT NULL,
	`version_number` integer NOT NULL,
	`race_date` text,
	`note` text DEFAULT '' NOT NULL,
	`published_by` text,
	`published_at` integer DEFAULT (unixepoch() * 1000) NOT NULL,
	`withdrawn_at` integer,
	`withdrawn_reason` text,
	`withdrawn_by` text,
	FOREIGN KEY (`layout_id`) REFERENCES `layouts`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`published_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`withdrawn_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`layout_id`,`version_number`) REFERENCES `layout_versions`(`layout_id`,`number`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `published_versions_layout` ON `published_versions` (`layout_id`,`version_number`);--> statement-breakpoint
CREATE TABLE `reader_choices` (
	`user_id` text PRIMARY KEY NOT NULL,
	`car` text,
	`skill` text,
	`updated_at` integer DEFAULT (unixepoch() * 1000) NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `share_links` (
	`id` text PRIMARY KEY NOT NULL,
	`layout_id` text NOT NULL,
	`publication_id` text NOT NULL,
	`token_hash` text NOT NULL,
	`created_by` text,
	`created_at` integer DEFAULT (unixepoch() * 1000) NOT NULL,
	`revoked_at` integer,
	FOREIGN KEY (`layout_id`) REFERENCES `layouts`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`publication_id`) REFERENCES `published_versions`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `share_links_token_hash_unique` ON `share_links` (`token_hash`);--> statement-breakpoint
CREATE INDEX `share_links_layout` ON `share_links` (`layout_id`);--> statement-breakpoint
-- Layouts published before race-day versions existed: their newest saved drawing becomes their published version (no race date).
INSERT INTO `published_versions` (`id`, `layout_id`, `version_number`, `race_date`, `note`, `published_by`, `published_at`)
SELECT lower(hex(randomblob(4))) || '-' || lower(hex(randomblob(2))) || '-4' || substr(lower(hex(randomblob(2))), 2) || '-a' || substr(lower(hex(randomblob(2))), 2) || '-' || lower(hex(randomblob(6))),
	`layouts`.`id`,
	(SELECT max(`number`) FROM `layout_versions` WHERE `layout_versions`.`layout_id` = `layouts`.`id`),
	NULL, '', NULL, `layouts`.`updated_at`
FROM `layouts`
WHERE `layouts`.`status` = 'published'
	AND EXISTS (SELECT 1 FROM `layout_versions` WHERE `layout_versions`.`layout_id` = `layouts`.`id`);
--> statement-breakpoint
-- A "published" layout that was never drawn has nothing to publish: it goes back to draft.
UPDATE `layouts` SET `status` = 'draft'
WHERE `status` = 'published'
	AND NOT EXISTS (SELECT 1 FROM `layout_versions` WHERE `layout_versions`.`layout_id` = `layouts`.`id`);
