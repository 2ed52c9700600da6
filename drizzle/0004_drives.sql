CREATE TABLE "axes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"name" text NOT NULL,
	"drive" jsonb NOT NULL,
	"motor_steps_per_rev" integer NOT NULL,
	"microsteps" double precision NOT NULL,
	"gear_ratio" double precision DEFAULT 1 NOT NULL,
	"steps_per_mm" double precision NOT NULL,
	"max_feed_rate_mm_per_min" double precision,
	"measured_travel_mm" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"steps_history" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "positioning_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"axis_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"targets" jsonb NOT NULL,
	"runs" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "travel_trials" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"axis_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"steps_per_mm_used" double precision NOT NULL,
	"moves" jsonb NOT NULL,
	"through_origin" boolean DEFAULT false NOT NULL,
	"result" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"applied_at" timestamp with time zone,
	"applied_by_name" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "axes" ADD CONSTRAINT "axes_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "axes" ADD CONSTRAINT "axes_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_axis_id_axes_id_fk" FOREIGN KEY ("axis_id") REFERENCES "public"."axes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_axis_id_axes_id_fk" FOREIGN KEY ("axis_id") REFERENCES "public"."axes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "axes_machine_idx" ON "axes" USING btree ("workshop_id","machine_id");--> statement-breakpoint
CREATE UNIQUE INDEX "axes_machine_name_unique" ON "axes" USING btree ("machine_id",lower("name"));--> statement-breakpoint
CREATE INDEX "positioning_runs_axis_idx" ON "positioning_runs" USING btree ("workshop_id","axis_id","created_at");--> statement-breakpoint
CREATE INDEX "travel_trials_axis_idx" ON "travel_trials" USING btree ("workshop_id","axis_id","created_at");