ALTER TABLE `boil_off_tests` ADD `tare_mass_kg` double;--> statement-breakpoint
ALTER TABLE `boil_off_tests` ADD `fill_fraction` double;