CREATE TABLE "target_sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"targets" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "machines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"work_area_x_mm" real NOT NULL,
	"work_area_y_mm" real NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"target_set_id" uuid NOT NULL,
	"state" text DEFAULT 'being-built' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"last_activity_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid,
	"record_type" text NOT NULL,
	"record_id" uuid,
	"action" text NOT NULL,
	"summary" text DEFAULT '' NOT NULL,
	"changes" jsonb,
	"actor_id" uuid,
	"actor_name" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "record_locks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"record_type" text NOT NULL,
	"record_id" uuid NOT NULL,
	"approval_id" uuid NOT NULL,
	"locked_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "target_sets" ADD CONSTRAINT "target_sets_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_target_set_id_target_sets_id_fk" FOREIGN KEY ("target_set_id") REFERENCES "public"."target_sets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_entries" ADD CONSTRAINT "audit_entries_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_entries" ADD CONSTRAINT "audit_entries_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "target_sets_workshop_idx" ON "target_sets" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "machines_workshop_idx" ON "machines" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "audit_machine_idx" ON "audit_entries" USING btree ("machine_id","at");--> statement-breakpoint
CREATE INDEX "audit_workshop_idx" ON "audit_entries" USING btree ("workshop_id");--> statement-breakpoint
CREATE UNIQUE INDEX "record_locks_unique" ON "record_locks" USING btree ("record_type","record_id","approval_id");--> statement-breakpoint
CREATE INDEX "record_locks_record_idx" ON "record_locks" USING btree ("record_type","record_id");