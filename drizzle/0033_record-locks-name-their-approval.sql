-- A lock belongs to the approval that was based on the record. Every lock the product wrote was
-- written with its approval in one transaction; one naming no approval (a hand edit) protects
-- nothing any approval stands on and is dropped before the reference is required.
DELETE FROM record_locks l WHERE NOT EXISTS (SELECT 1 FROM approvals a WHERE a.id = l.approval_id);--> statement-breakpoint
ALTER TABLE "record_locks" ADD CONSTRAINT "record_locks_approval_id_approvals_id_fk" FOREIGN KEY ("approval_id") REFERENCES "public"."approvals"("id") ON DELETE no action ON UPDATE no action;