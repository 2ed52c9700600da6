CREATE TABLE "bed_grids" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"rows" integer,
	"columns" integer,
	"points" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "diagonal_checks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"side_x_mm" double precision NOT NULL,
	"side_y_mm" double precision NOT NULL,
	"diagonal1_mm" double precision NOT NULL,
	"diagonal2_mm" double precision NOT NULL,
	"gantry_span_mm" double precision,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "test_cuts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"unit" text NOT NULL,
	"sizes" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"recorded_by_id" uuid,
	"recorded_by_name" text NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_answers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"walk_id" uuid NOT NULL,
	"item_key" text NOT NULL,
	"answer" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"answered_by_id" uuid,
	"answered_by_name" text NOT NULL,
	"answered_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"section" text NOT NULL,
	"text" text NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_by_id" uuid,
	"created_by_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_walks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workshop_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "bed_grids" ADD CONSTRAINT "bed_grids_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bed_grids" ADD CONSTRAINT "bed_grids_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bed_grids" ADD CONSTRAINT "bed_grids_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD CONSTRAINT "diagonal_checks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD CONSTRAINT "diagonal_checks_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD CONSTRAINT "diagonal_checks_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD CONSTRAINT "test_cuts_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD CONSTRAINT "test_cuts_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "test_cuts" ADD CONSTRAINT "test_cuts_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_answers" ADD CONSTRAINT "safety_answers_walk_id_safety_walks_id_fk" FOREIGN KEY ("walk_id") REFERENCES "public"."safety_walks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_answers" ADD CONSTRAINT "safety_answers_answered_by_id_users_id_fk" FOREIGN KEY ("answered_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_items" ADD CONSTRAINT "safety_items_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_items" ADD CONSTRAINT "safety_items_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_walks" ADD CONSTRAINT "safety_walks_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_walks" ADD CONSTRAINT "safety_walks_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bed_grids_machine_idx" ON "bed_grids" USING btree ("workshop_id","machine_id","recorded_at");--> statement-breakpoint
CREATE INDEX "diagonal_checks_machine_idx" ON "diagonal_checks" USING btree ("workshop_id","machine_id","recorded_at");--> statement-breakpoint
CREATE INDEX "test_cuts_machine_idx" ON "test_cuts" USING btree ("workshop_id","machine_id","recorded_at");--> statement-breakpoint
CREATE UNIQUE INDEX "safety_answers_walk_item_unique" ON "safety_answers" USING btree ("walk_id","item_key");--> statement-breakpoint
CREATE INDEX "safety_items_workshop_idx" ON "safety_items" USING btree ("workshop_id");--> statement-breakpoint
CREATE INDEX "safety_walks_machine_idx" ON "safety_walks" USING btree ("workshop_id","machine_id","started_at");