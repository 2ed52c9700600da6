CREATE TABLE "backlash_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"axis_id" uuid NOT NULL,
	"length_unit" text DEFAULT 'mm' NOT NULL,
	"reading_unit" text DEFAULT 'mm' NOT NULL,
	"positions" jsonb NOT NULL,
	"resolution" double precision,
	"result" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_axis_id_axes_id_fk" FOREIGN KEY ("axis_id") REFERENCES "public"."axes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "backlash_checks_axis_idx" ON "backlash_checks" USING btree ("workshop_id","axis_id","created_at");