ALTER TABLE "bolt_downs" ADD COLUMN "abandoned_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD COLUMN "abandoned_reason" text;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD COLUMN "abandoned_by_name" text;