CREATE TABLE `alerts` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32) NOT NULL,
	`test_id` varchar(32) NOT NULL,
	`ratio` double NOT NULL,
	`threshold` double NOT NULL,
	`measured_heat_leak_w` double NOT NULL,
	`predicted_heat_leak_w` double NOT NULL,
	`message` varchar(500) NOT NULL,
	`created_at` datetime(3) NOT NULL,
	`acknowledged_at` datetime(3),
	`acknowledged_by_user_id` varchar(32),
	CONSTRAINT `alerts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `boil_off_test_files` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32) NOT NULL,
	`test_id` varchar(32) NOT NULL,
	`kind` enum('log','attachment') NOT NULL,
	`filename` varchar(255) NOT NULL,
	`content_type` varchar(100) NOT NULL,
	`size_bytes` bigint unsigned NOT NULL,
	`sha256` char(64) NOT NULL,
	`object_key` varchar(300) NOT NULL,
	`uploaded_by_user_id` varchar(32),
	`uploaded_at` datetime(3) NOT NULL,
	CONSTRAINT `boil_off_test_files_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `boil_off_tests` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32) NOT NULL,
	`design_id` varchar(32) NOT NULL,
	`revision` int NOT NULL,
	`stage_index` int NOT NULL,
	`stage_label` varchar(120) NOT NULL,
	`cryogen` varchar(32) NOT NULL,
	`predicted_heat_leak_w` double,
	`predicted_evaporation_rate_percent_per_day` double,
	`method` enum('weighing','vent-flow','level') NOT NULL,
	`vessel_label` varchar(120) NOT NULL,
	`vent_reference` enum('normal-0C','standard-15C','standard-20C'),
	`capacity_l` double,
	`full_scale_mm` double,
	`ambient_temperature_k` double,
	`ambient_pressure_pa` double,
	`notes` text NOT NULL,
	`status` enum('logging','analysed','accepted') NOT NULL,
	`log_info` json,
	`window_start_s` double,
	`window_end_s` double,
	`window_suggested` boolean NOT NULL DEFAULT true,
	`analysis` json,
	`chart` json,
	`measured_heat_leak_w` double,
	`ratio` double,
	`tested_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`accepted_by_user_id` varchar(32),
	`created_by_user_id` varchar(32),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `boil_off_tests_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `alerts` ADD CONSTRAINT `alerts_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `alerts` ADD CONSTRAINT `alerts_test_id_boil_off_tests_id_fk` FOREIGN KEY (`test_id`) REFERENCES `boil_off_tests`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `alerts` ADD CONSTRAINT `alerts_acknowledged_by_user_id_users_id_fk` FOREIGN KEY (`acknowledged_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_test_files` ADD CONSTRAINT `boil_off_test_files_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_test_files` ADD CONSTRAINT `boil_off_test_files_test_id_boil_off_tests_id_fk` FOREIGN KEY (`test_id`) REFERENCES `boil_off_tests`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_test_files` ADD CONSTRAINT `boil_off_test_files_uploaded_by_user_id_users_id_fk` FOREIGN KEY (`uploaded_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_tests` ADD CONSTRAINT `boil_off_tests_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_tests` ADD CONSTRAINT `boil_off_tests_design_id_designs_id_fk` FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_tests` ADD CONSTRAINT `boil_off_tests_accepted_by_user_id_users_id_fk` FOREIGN KEY (`accepted_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `boil_off_tests` ADD CONSTRAINT `boil_off_tests_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `alerts_org_open_idx` ON `alerts` (`organization_id`,`acknowledged_at`);--> statement-breakpoint
CREATE INDEX `boil_off_test_files_test_idx` ON `boil_off_test_files` (`organization_id`,`test_id`,`kind`);--> statement-breakpoint
CREATE INDEX `boil_off_tests_org_idx` ON `boil_off_tests` (`organization_id`,`tested_at`);--> statement-breakpoint
CREATE INDEX `boil_off_tests_design_idx` ON `boil_off_tests` (`organization_id`,`design_id`);