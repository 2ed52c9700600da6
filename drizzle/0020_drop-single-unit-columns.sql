ALTER TABLE "axes" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "reading_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "machine_temperature_c" double precision;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "scale_temperature_c" double precision;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "scale_material" text;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD COLUMN "instrument_resolution" double precision;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "length_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "reading_unit" text DEFAULT 'mm' NOT NULL;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "machine_temperature_c" double precision;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "scale_temperature_c" double precision;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "scale_material" text;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD COLUMN "instrument_resolution" double precision;--> statement-breakpoint
ALTER TABLE "rail_sweeps" DROP COLUMN "unit";--> statement-breakpoint
ALTER TABLE "bolt_downs" DROP COLUMN "unit";--> statement-breakpoint
ALTER TABLE "hole_patterns" DROP COLUMN "unit";