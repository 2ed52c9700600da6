-- Hole patterns are a shop aid for marking out, not evidence an approval stands on: they get the
-- change log like every record of a machine, and no approval guard.
CREATE TRIGGER hole_patterns_change_log AFTER INSERT OR UPDATE OR DELETE ON hole_patterns FOR EACH ROW EXECUTE FUNCTION rw_log_change();
