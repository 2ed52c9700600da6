-- A hole names the write that last changed it. Every hole the product wrote was written with
-- its write in one statement; one naming no write (a hand edit) forgets it first. A migration
-- is not a change of an approved record: the approval guard and the change log stay out.
DO $$
BEGIN
  IF EXISTS (SELECT 1 FROM bolt_down_holes h WHERE h.last_write_id IS NOT NULL AND NOT EXISTS (SELECT 1 FROM bolt_down_writes w WHERE w.write_id = h.last_write_id)) THEN
    ALTER TABLE bolt_down_holes DISABLE TRIGGER USER;
    UPDATE bolt_down_holes h SET last_write_id = NULL
      WHERE h.last_write_id IS NOT NULL AND NOT EXISTS (SELECT 1 FROM bolt_down_writes w WHERE w.write_id = h.last_write_id);
    ALTER TABLE bolt_down_holes ENABLE TRIGGER USER;
  END IF;
END $$;
--> statement-breakpoint
ALTER TABLE "bolt_down_holes" ADD CONSTRAINT "bolt_down_holes_last_write_id_bolt_down_writes_write_id_fk" FOREIGN KEY ("last_write_id") REFERENCES "public"."bolt_down_writes"("write_id") ON DELETE no action ON UPDATE no action;