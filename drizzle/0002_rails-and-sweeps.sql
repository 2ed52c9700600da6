CREATE TABLE "rail_sweeps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"rail_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"positions_mm" jsonb NOT NULL,
	"readings_raw" jsonb NOT NULL,
	"readings_mm" jsonb NOT NULL,
	"instrument" text DEFAULT '' NOT NULL,
	"resolution" double precision,
	"temperature_c" double precision,
	"phase" text NOT NULL,
	"taken_by" text NOT NULL,
	"bolt_size" text,
	"torque_nm" double precision,
	"datum" text,
	"notes" text DEFAULT '' NOT NULL,
	"result" jsonb NOT NULL,
	"status" text NOT NULL,
	"target" jsonb NOT NULL,
	"created_by_id" uuid,
	"taken_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rails" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"label" text NOT NULL,
	"axis" text NOT NULL,
	"length_mm" double precision NOT NULL,
	"profile_size_mm" integer,
	"hole_pitch_mm" double precision NOT NULL,
	"first_hole_mm" double precision NOT NULL,
	"partner_rail_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_rail_id_rails_id_fk" FOREIGN KEY ("rail_id") REFERENCES "public"."rails"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rails" ADD CONSTRAINT "rails_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rails" ADD CONSTRAINT "rails_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rail_sweeps_rail_idx" ON "rail_sweeps" USING btree ("rail_id","taken_at");--> statement-breakpoint
CREATE INDEX "rails_machine_idx" ON "rails" USING btree ("workshop_id","machine_id");