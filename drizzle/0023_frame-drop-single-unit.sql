ALTER TABLE "bed_grids" DROP COLUMN "unit";--> statement-breakpoint
ALTER TABLE "diagonal_checks" DROP COLUMN "unit";--> statement-breakpoint
ALTER TABLE "test_cuts" DROP COLUMN "unit";