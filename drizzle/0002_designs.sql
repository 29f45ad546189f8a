CREATE TABLE `design_revisions` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32) NOT NULL,
	`design_id` varchar(32) NOT NULL,
	`revision` int NOT NULL,
	`name` varchar(120) NOT NULL,
	`content` json NOT NULL,
	`materials` json NOT NULL,
	`prediction` json NOT NULL,
	`change_note` varchar(500),
	`created_by_user_id` varchar(32),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `design_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `design_revision_unique` UNIQUE(`design_id`,`revision`)
);
--> statement-breakpoint
CREATE TABLE `designs` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32) NOT NULL,
	`name` varchar(120) NOT NULL,
	`vessel_label` varchar(120),
	`geometry_kind` enum('planar','cylinder','sphere') NOT NULL,
	`latest_revision` int NOT NULL,
	`cold_heat_w` double,
	`boil_off_l_per_day` double,
	`created_by_user_id` varchar(32),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `designs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_design_id_designs_id_fk` FOREIGN KEY (`design_id`) REFERENCES `designs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `design_revisions` ADD CONSTRAINT `design_revisions_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `designs` ADD CONSTRAINT `designs_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `designs` ADD CONSTRAINT `designs_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `design_revisions_org_idx` ON `design_revisions` (`organization_id`);--> statement-breakpoint
CREATE INDEX `designs_org_idx` ON `designs` (`organization_id`,`updated_at`);