ALTER TABLE "rail_sweeps" ADD COLUMN "reading_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD COLUMN "face" text DEFAULT 'side' NOT NULL;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD COLUMN "warnings" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "rails" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "rails" ADD COLUMN "spacing_mm" double precision;--> statement-breakpoint
ALTER TABLE "rails" ADD COLUMN "end_distance_mm" double precision;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD COLUMN "reading_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "hole_patterns" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;