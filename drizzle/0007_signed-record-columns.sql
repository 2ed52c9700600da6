CREATE TABLE "change_log" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"txid" bigint DEFAULT txid_current() NOT NULL,
	"workshop_id" uuid,
	"machine_id" uuid,
	"table_name" text NOT NULL,
	"record_id" uuid,
	"operation" text NOT NULL,
	"old_values" jsonb,
	"new_values" jsonb,
	"actor_id" uuid,
	"actor_name" text
);
--> statement-breakpoint
DROP INDEX "audit_workshop_idx";--> statement-breakpoint
ALTER TABLE "audit_entries" ADD COLUMN "txid" bigint DEFAULT txid_current() NOT NULL;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "target_values" jsonb;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "signature" text;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "signing_key_id" text;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "signed_content" text;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "verification_token" text;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "ended_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "ended_by_id" uuid;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "ended_by_name" text;--> statement-breakpoint
ALTER TABLE "approvals" ADD COLUMN "end_reason" text;--> statement-breakpoint
CREATE INDEX "change_log_machine_idx" ON "change_log" USING btree ("machine_id","at");--> statement-breakpoint
CREATE INDEX "change_log_txid_idx" ON "change_log" USING btree ("txid");--> statement-breakpoint
CREATE INDEX "change_log_workshop_idx" ON "change_log" USING btree ("workshop_id","at");--> statement-breakpoint
ALTER TABLE "approvals" ADD CONSTRAINT "approvals_ended_by_id_users_id_fk" FOREIGN KEY ("ended_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_txid_idx" ON "audit_entries" USING btree ("txid");--> statement-breakpoint
CREATE INDEX "audit_workshop_idx" ON "audit_entries" USING btree ("workshop_id","at");