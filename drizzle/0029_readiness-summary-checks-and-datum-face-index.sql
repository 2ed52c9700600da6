DROP INDEX "rail_sweeps_datum_idx";--> statement-breakpoint
ALTER TABLE "machine_readiness" ADD COLUMN "checks" jsonb;--> statement-breakpoint
CREATE INDEX "rail_sweeps_datum_face_idx" ON "rail_sweeps" USING btree ("rail_id",lower("datum"),"face","taken_at" DESC NULLS LAST,"created_at" DESC NULLS LAST) WHERE "rail_sweeps"."datum" is not null;