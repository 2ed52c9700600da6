CREATE TABLE "machine_readiness" (
	"machine_id" uuid PRIMARY KEY NOT NULL,
	"workshop_id" uuid NOT NULL,
	"total" integer NOT NULL,
	"not_started" integer NOT NULL,
	"within" integer NOT NULL,
	"outside" integer NOT NULL,
	"waived" integer NOT NULL,
	"first_blocking" jsonb,
	"version" integer NOT NULL,
	"refreshed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "machine_readiness" ADD CONSTRAINT "machine_readiness_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machine_readiness" ADD CONSTRAINT "machine_readiness_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rail_sweeps_latest_idx" ON "rail_sweeps" USING btree ("rail_id","taken_at" DESC NULLS LAST,"created_at" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "rail_sweeps_datum_idx" ON "rail_sweeps" USING btree ("rail_id",lower("datum"),"taken_at" DESC NULLS LAST,"created_at" DESC NULLS LAST) WHERE "rail_sweeps"."datum" is not null;