-- A backlash check is evidence an approval stands on: read-only while the approval stands, and
-- every change of it in the change log.
CREATE TRIGGER backlash_checks_guard BEFORE INSERT OR UPDATE OR DELETE ON backlash_checks FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER backlash_checks_change_log AFTER INSERT OR UPDATE OR DELETE ON backlash_checks FOR EACH ROW EXECUTE FUNCTION rw_log_change();
