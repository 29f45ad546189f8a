CREATE TABLE `material_versions` (
	`id` varchar(32) NOT NULL,
	`material_id` varchar(32) NOT NULL,
	`version` int NOT NULL,
	`status` enum('draft','approved','rejected') NOT NULL,
	`name` varchar(120) NOT NULL,
	`properties` json NOT NULL,
	`valid_min_k` double NOT NULL,
	`valid_max_k` double NOT NULL,
	`thickness_m` double,
	`areal_mass_kg_per_m2` double,
	`cost_per_m2` double,
	`source` json NOT NULL,
	`change_note` varchar(500),
	`proposed_by_user_id` varchar(32),
	`proposed_at` datetime(3) NOT NULL,
	`decided_by_user_id` varchar(32),
	`decided_at` datetime(3),
	`decision_comment` varchar(1000),
	CONSTRAINT `material_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `material_versions_unique` UNIQUE(`material_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `materials` (
	`id` varchar(32) NOT NULL,
	`organization_id` varchar(32),
	`kind` enum('reflector','spacer','wall-finish','support-material','correlation-set','cryogen') NOT NULL,
	`name` varchar(120) NOT NULL,
	`status` enum('draft','approved','rejected','retired') NOT NULL,
	`current_version` int,
	`latest_version` int NOT NULL,
	`draft_version` int,
	`copied_from_material_id` varchar(32),
	`copied_from_version` int,
	`retired_at` datetime(3),
	`retired_by_user_id` varchar(32),
	`retire_comment` varchar(1000),
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `materials_id` PRIMARY KEY(`id`),
	CONSTRAINT `materials_org_name_unique` UNIQUE(`organization_id`,`name`)
);
--> statement-breakpoint
ALTER TABLE `material_versions` ADD CONSTRAINT `material_versions_material_id_materials_id_fk` FOREIGN KEY (`material_id`) REFERENCES `materials`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `material_versions` ADD CONSTRAINT `material_versions_proposed_by_user_id_users_id_fk` FOREIGN KEY (`proposed_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `material_versions` ADD CONSTRAINT `material_versions_decided_by_user_id_users_id_fk` FOREIGN KEY (`decided_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `materials` ADD CONSTRAINT `materials_organization_id_organizations_id_fk` FOREIGN KEY (`organization_id`) REFERENCES `organizations`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `materials` ADD CONSTRAINT `materials_retired_by_user_id_users_id_fk` FOREIGN KEY (`retired_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `materials_org_kind_idx` ON `materials` (`organization_id`,`kind`);