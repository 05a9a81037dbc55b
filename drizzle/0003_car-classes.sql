ALTER TABLE `clubs` ADD `default_car_classes` text;--> statement-breakpoint
ALTER TABLE `layouts` ADD `car_classes` text;