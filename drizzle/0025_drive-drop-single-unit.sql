ALTER TABLE "positioning_runs" DROP COLUMN "unit";--> statement-breakpoint
ALTER TABLE "travel_trials" DROP COLUMN "unit";