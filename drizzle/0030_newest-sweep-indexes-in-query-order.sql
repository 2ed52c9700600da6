DROP INDEX "rail_sweeps_latest_idx";--> statement-breakpoint
DROP INDEX "rail_sweeps_datum_face_idx";--> statement-breakpoint
CREATE INDEX "rail_sweeps_latest_desc_idx" ON "rail_sweeps" USING btree ("rail_id","taken_at" DESC NULLS FIRST,"created_at" DESC NULLS FIRST);--> statement-breakpoint
CREATE INDEX "rail_sweeps_datum_face_desc_idx" ON "rail_sweeps" USING btree ("rail_id",lower("datum"),"face","taken_at" DESC NULLS FIRST,"created_at" DESC NULLS FIRST) WHERE "rail_sweeps"."datum" is not null;