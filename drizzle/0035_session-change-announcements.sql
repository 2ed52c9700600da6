-- The server keeps the sessions it read recently with the person each names. A change to a
-- session, a person or a workshop, made by any connection, is announced on one channel so that
-- every server forgets what it kept about it.
CREATE OR REPLACE FUNCTION announce_session_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_TABLE_NAME = 'session' THEN
    PERFORM pg_notify('railwright_session_changes', 'session:' || OLD.sid);
  ELSIF TG_TABLE_NAME = 'users' THEN
    PERFORM pg_notify('railwright_session_changes', 'person:' || OLD.id);
  ELSIF TG_TABLE_NAME = 'workshops' THEN
    PERFORM pg_notify('railwright_session_changes', 'workshop:' || OLD.id);
  END IF;
  RETURN NULL;
END $$;
--> statement-breakpoint
CREATE TRIGGER session_change_announced AFTER UPDATE OR DELETE ON "session"
  FOR EACH ROW EXECUTE FUNCTION announce_session_change();
--> statement-breakpoint
CREATE TRIGGER person_change_announced AFTER UPDATE OR DELETE ON users
  FOR EACH ROW EXECUTE FUNCTION announce_session_change();
--> statement-breakpoint
CREATE TRIGGER workshop_change_announced AFTER UPDATE OR DELETE ON workshops
  FOR EACH ROW EXECUTE FUNCTION announce_session_change();
