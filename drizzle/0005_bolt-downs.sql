CREATE TABLE "bolt_down_holes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"bolt_down_id" uuid NOT NULL,
	"hole_index" integer NOT NULL,
	"reading_raw" double precision,
	"reading_mm" double precision,
	"fixed" boolean DEFAULT false NOT NULL,
	"fix_seq" integer,
	"fixed_at" timestamp with time zone,
	"fixed_by_id" uuid,
	"fixed_by_name" text,
	"last_write_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bolt_down_writes" (
	"write_id" uuid PRIMARY KEY NOT NULL,
	"workshop_id" uuid NOT NULL,
	"bolt_down_id" uuid NOT NULL,
	"target" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bolt_downs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"rail_id" uuid NOT NULL,
	"mode" text NOT NULL,
	"unit" text NOT NULL,
	"hole_positions_mm" jsonb NOT NULL,
	"band_mm" double precision NOT NULL,
	"fix_counter" integer DEFAULT 0 NOT NULL,
	"final_sweep_id" uuid,
	"created_by_id" uuid,
	"created_by_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "approval_requests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"requested_by_id" uuid NOT NULL,
	"requested_by_name" text NOT NULL,
	"requested_at" timestamp with time zone DEFAULT now() NOT NULL,
	"status" text DEFAULT 'open' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "approvals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"request_id" uuid,
	"approved_by_id" uuid NOT NULL,
	"approved_by_name" text NOT NULL,
	"approved_at" timestamp with time zone NOT NULL,
	"statement" text NOT NULL,
	"snapshot" jsonb NOT NULL,
	"record_hash" text NOT NULL,
	"recheck_interval_days" integer NOT NULL,
	"recheck_due_at" timestamp with time zone NOT NULL,
	"recheck_notified_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "waivers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"check_key" text NOT NULL,
	"record_type" text,
	"record_id" uuid,
	"reason" text NOT NULL,
	"waived_by_id" uuid NOT NULL,
	"waived_by_name" text NOT NULL,
	"waived_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "password_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"purpose" text DEFAULT 'invitation' NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "bolt_down_holes" ADD CONSTRAINT "bolt_down_holes_bolt_down_id_bolt_downs_id_fk" FOREIGN KEY ("bolt_down_id") REFERENCES "public"."bolt_downs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_down_holes" ADD CONSTRAINT "bolt_down_holes_fixed_by_id_users_id_fk" FOREIGN KEY ("fixed_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_down_writes" ADD CONSTRAINT "bolt_down_writes_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_down_writes" ADD CONSTRAINT "bolt_down_writes_bolt_down_id_bolt_downs_id_fk" FOREIGN KEY ("bolt_down_id") REFERENCES "public"."bolt_downs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_rail_id_rails_id_fk" FOREIGN KEY ("rail_id") REFERENCES "public"."rails"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_final_sweep_id_rail_sweeps_id_fk" FOREIGN KEY ("final_sweep_id") REFERENCES "public"."rail_sweeps"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approval_requests" ADD CONSTRAINT "approval_requests_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approval_requests" ADD CONSTRAINT "approval_requests_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approval_requests" ADD CONSTRAINT "approval_requests_requested_by_id_users_id_fk" FOREIGN KEY ("requested_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approvals" ADD CONSTRAINT "approvals_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approvals" ADD CONSTRAINT "approvals_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approvals" ADD CONSTRAINT "approvals_request_id_approval_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."approval_requests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "approvals" ADD CONSTRAINT "approvals_approved_by_id_users_id_fk" FOREIGN KEY ("approved_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "waivers" ADD CONSTRAINT "waivers_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "waivers" ADD CONSTRAINT "waivers_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "waivers" ADD CONSTRAINT "waivers_waived_by_id_users_id_fk" FOREIGN KEY ("waived_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_links" ADD CONSTRAINT "password_links_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "bolt_down_holes_unique" ON "bolt_down_holes" USING btree ("bolt_down_id","hole_index");--> statement-breakpoint
CREATE INDEX "bolt_down_writes_bolt_down_idx" ON "bolt_down_writes" USING btree ("bolt_down_id");--> statement-breakpoint
CREATE INDEX "bolt_downs_rail_idx" ON "bolt_downs" USING btree ("workshop_id","rail_id","created_at");--> statement-breakpoint
CREATE INDEX "approval_requests_machine_idx" ON "approval_requests" USING btree ("machine_id");--> statement-breakpoint
CREATE INDEX "approvals_machine_idx" ON "approvals" USING btree ("machine_id","approved_at");--> statement-breakpoint
CREATE INDEX "approvals_recheck_idx" ON "approvals" USING btree ("recheck_due_at");--> statement-breakpoint
CREATE INDEX "waivers_machine_idx" ON "waivers" USING btree ("machine_id","check_key");--> statement-breakpoint
CREATE UNIQUE INDEX "password_links_token_unique" ON "password_links" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "password_links_user_idx" ON "password_links" USING btree ("user_id");