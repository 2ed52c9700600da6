ALTER TABLE "bed_grids" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "bed_grids" ADD COLUMN "reading_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "bed_grids" ADD COLUMN "resolution_mm" double precision;--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD COLUMN "resolution_mm" double precision;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD COLUMN "plate_thickness_mm" double precision;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD COLUMN "resolution_mm" double precision;