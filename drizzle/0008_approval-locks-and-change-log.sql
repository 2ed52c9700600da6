-- Before one open request and one standing approval per machine are enforced: close the older
-- duplicates that concurrent requests could leave, and end approvals that no longer stand.
UPDATE approval_requests r SET status = 'closed'
WHERE r.status = 'open' AND EXISTS (
  SELECT 1 FROM approval_requests n
  WHERE n.machine_id = r.machine_id AND n.status = 'open' AND (n.requested_at, n.id) > (r.requested_at, r.id));
--> statement-breakpoint
UPDATE approvals a SET ended_at = now(), end_reason = 'Superseded by a later approval of the same machine'
WHERE a.ended_at IS NULL AND EXISTS (
  SELECT 1 FROM approvals n WHERE n.machine_id = a.machine_id AND (n.approved_at, n.id) > (a.approved_at, a.id));
--> statement-breakpoint
UPDATE approvals a SET ended_at = now(), end_reason = 'The machine had left ready to cut'
WHERE a.ended_at IS NULL AND EXISTS (
  SELECT 1 FROM machines m WHERE m.id = a.machine_id AND m.state NOT IN ('ready-to-cut', 'recheck-due'));
--> statement-breakpoint
-- The machine a row belongs to: its own machine_id, or its parent's for child rows.
CREATE OR REPLACE FUNCTION rw_row_machine(tbl text, r jsonb) RETURNS uuid AS $$
BEGIN
  IF tbl = 'machines' THEN RETURN (r->>'id')::uuid; END IF;
  IF r ? 'machine_id' THEN RETURN (r->>'machine_id')::uuid; END IF;
  IF r ? 'bolt_down_id' THEN RETURN (SELECT machine_id FROM bolt_downs WHERE id = (r->>'bolt_down_id')::uuid); END IF;
  IF r ? 'walk_id' THEN RETURN (SELECT machine_id FROM safety_walks WHERE id = (r->>'walk_id')::uuid); END IF;
  RETURN NULL;
END $$ LANGUAGE plpgsql STABLE;
--> statement-breakpoint
-- While an approval stands, what it stands on is read-only, whatever route or role writes. The
-- machine's row is locked first, so a write and an approval of one machine never interleave.
CREATE OR REPLACE FUNCTION rw_guard_approved() RETURNS trigger AS $$
DECLARE
  mid uuid;
  m record;
BEGIN
  mid := rw_row_machine(TG_TABLE_NAME, to_jsonb(COALESCE(NEW, OLD)));
  IF mid IS NULL THEN RETURN COALESCE(NEW, OLD); END IF;
  SELECT name, state INTO m FROM machines WHERE id = mid FOR NO KEY UPDATE;
  IF m.state IN ('ready-to-cut', 'recheck-due') THEN
    RAISE EXCEPTION USING ERRCODE = 'RW409', MESSAGE = format(
      '%s is approved as ready to cut: what the approval stands on is read-only while it stands. The owner can reopen the machine with a reason to change it.', m.name);
  END IF;
  RETURN COALESCE(NEW, OLD);
END $$ LANGUAGE plpgsql;
--> statement-breakpoint
-- The machine's own row: its specification is frozen while approved; its state may move on.
CREATE OR REPLACE FUNCTION rw_guard_machine() RETURNS trigger AS $$
BEGIN
  IF OLD.state IN ('ready-to-cut', 'recheck-due')
     AND (NEW.name, NEW.kind, NEW.work_area_x_mm, NEW.work_area_y_mm, NEW.notes, NEW.target_set_id)
         IS DISTINCT FROM (OLD.name, OLD.kind, OLD.work_area_x_mm, OLD.work_area_y_mm, OLD.notes, OLD.target_set_id) THEN
    RAISE EXCEPTION USING ERRCODE = 'RW409', MESSAGE = format(
      '%s is approved as ready to cut: its specification is read-only while the approval stands. The owner can reopen the machine with a reason to change it.', OLD.name);
  END IF;
  RETURN NEW;
END $$ LANGUAGE plpgsql;
--> statement-breakpoint
-- Every change of every record, before and after, in the writing transaction. Secrets are kept
-- out (shown as changed), and bookkeeping columns alone do not make an entry.
CREATE OR REPLACE FUNCTION rw_log_change() RETURNS trigger AS $$
DECLARE
  old_row jsonb := CASE WHEN TG_OP = 'INSERT' THEN NULL ELSE to_jsonb(OLD) END;
  new_row jsonb := CASE WHEN TG_OP = 'DELETE' THEN NULL ELSE to_jsonb(NEW) END;
  secret text;
  any_row jsonb;
BEGIN
  FOREACH secret IN ARRAY COALESCE(TG_ARGV, ARRAY[]::text[]) LOOP
    IF old_row ? secret AND new_row ? secret AND old_row->secret IS DISTINCT FROM new_row->secret THEN
      old_row := jsonb_set(old_row, ARRAY[secret], '"(secret)"');
      new_row := jsonb_set(new_row, ARRAY[secret], '"(secret, changed)"');
    ELSE
      IF old_row ? secret THEN old_row := jsonb_set(old_row, ARRAY[secret], '"(secret)"'); END IF;
      IF new_row ? secret THEN new_row := jsonb_set(new_row, ARRAY[secret], '"(secret)"'); END IF;
    END IF;
  END LOOP;
  IF TG_OP = 'UPDATE' AND (old_row - 'updated_at' - 'last_activity_at' - 'version') = (new_row - 'updated_at' - 'last_activity_at' - 'version') THEN
    RETURN NULL;
  END IF;
  any_row := COALESCE(new_row, old_row);
  INSERT INTO change_log (workshop_id, machine_id, table_name, record_id, operation, old_values, new_values, actor_id, actor_name)
  VALUES (
    COALESCE((any_row->>'workshop_id')::uuid, NULLIF(current_setting('railwright.workshop_id', true), '')::uuid),
    rw_row_machine(TG_TABLE_NAME, any_row),
    TG_TABLE_NAME,
    (any_row->>'id')::uuid,
    lower(TG_OP),
    old_row,
    new_row,
    NULLIF(current_setting('railwright.actor_id', true), '')::uuid,
    NULLIF(current_setting('railwright.actor_name', true), '')
  );
  RETURN NULL;
END $$ LANGUAGE plpgsql;
--> statement-breakpoint
-- The history is append-only for everyone, the table owner included.
CREATE OR REPLACE FUNCTION rw_append_only() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION USING ERRCODE = 'RW403', MESSAGE = format('%s is append-only: its rows cannot be changed or deleted', TG_TABLE_NAME);
END $$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER audit_entries_append_only BEFORE UPDATE OR DELETE ON audit_entries FOR EACH ROW EXECUTE FUNCTION rw_append_only();
--> statement-breakpoint
CREATE TRIGGER audit_entries_no_truncate BEFORE TRUNCATE ON audit_entries FOR EACH STATEMENT EXECUTE FUNCTION rw_append_only();
--> statement-breakpoint
CREATE TRIGGER change_log_append_only BEFORE UPDATE OR DELETE ON change_log FOR EACH ROW EXECUTE FUNCTION rw_append_only();
--> statement-breakpoint
CREATE TRIGGER change_log_no_truncate BEFORE TRUNCATE ON change_log FOR EACH STATEMENT EXECUTE FUNCTION rw_append_only();
--> statement-breakpoint
CREATE TRIGGER machines_guard BEFORE UPDATE ON machines FOR EACH ROW EXECUTE FUNCTION rw_guard_machine();
--> statement-breakpoint
CREATE TRIGGER rails_guard BEFORE INSERT OR UPDATE OR DELETE ON rails FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER rail_sweeps_guard BEFORE INSERT OR UPDATE OR DELETE ON rail_sweeps FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER bolt_downs_guard BEFORE INSERT OR UPDATE OR DELETE ON bolt_downs FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER bolt_down_holes_guard BEFORE INSERT OR UPDATE OR DELETE ON bolt_down_holes FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER bolt_down_writes_guard BEFORE INSERT OR UPDATE OR DELETE ON bolt_down_writes FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER axes_guard BEFORE INSERT OR UPDATE OR DELETE ON axes FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER travel_trials_guard BEFORE INSERT OR UPDATE OR DELETE ON travel_trials FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER positioning_runs_guard BEFORE INSERT OR UPDATE OR DELETE ON positioning_runs FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER diagonal_checks_guard BEFORE INSERT OR UPDATE OR DELETE ON diagonal_checks FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER bed_grids_guard BEFORE INSERT OR UPDATE OR DELETE ON bed_grids FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER test_cuts_guard BEFORE INSERT OR UPDATE OR DELETE ON test_cuts FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER safety_walks_guard BEFORE INSERT OR UPDATE OR DELETE ON safety_walks FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER safety_answers_guard BEFORE INSERT OR UPDATE OR DELETE ON safety_answers FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER waivers_guard BEFORE INSERT OR UPDATE OR DELETE ON waivers FOR EACH ROW EXECUTE FUNCTION rw_guard_approved();
--> statement-breakpoint
CREATE TRIGGER workshops_change_log AFTER INSERT OR UPDATE OR DELETE ON workshops FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER users_change_log AFTER INSERT OR UPDATE OR DELETE ON users FOR EACH ROW EXECUTE FUNCTION rw_log_change('password_hash');
--> statement-breakpoint
CREATE TRIGGER target_sets_change_log AFTER INSERT OR UPDATE OR DELETE ON target_sets FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER machines_change_log AFTER INSERT OR UPDATE OR DELETE ON machines FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER rails_change_log AFTER INSERT OR UPDATE OR DELETE ON rails FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER rail_sweeps_change_log AFTER INSERT OR UPDATE OR DELETE ON rail_sweeps FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER bolt_downs_change_log AFTER INSERT OR UPDATE OR DELETE ON bolt_downs FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER bolt_down_holes_change_log AFTER INSERT OR UPDATE OR DELETE ON bolt_down_holes FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER axes_change_log AFTER INSERT OR UPDATE OR DELETE ON axes FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER travel_trials_change_log AFTER INSERT OR UPDATE OR DELETE ON travel_trials FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER positioning_runs_change_log AFTER INSERT OR UPDATE OR DELETE ON positioning_runs FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER diagonal_checks_change_log AFTER INSERT OR UPDATE OR DELETE ON diagonal_checks FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER bed_grids_change_log AFTER INSERT OR UPDATE OR DELETE ON bed_grids FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER test_cuts_change_log AFTER INSERT OR UPDATE OR DELETE ON test_cuts FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER safety_items_change_log AFTER INSERT OR UPDATE OR DELETE ON safety_items FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER safety_walks_change_log AFTER INSERT OR UPDATE OR DELETE ON safety_walks FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER safety_answers_change_log AFTER INSERT OR UPDATE OR DELETE ON safety_answers FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER waivers_change_log AFTER INSERT OR UPDATE OR DELETE ON waivers FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER approval_requests_change_log AFTER INSERT OR UPDATE OR DELETE ON approval_requests FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER approvals_change_log AFTER INSERT OR UPDATE OR DELETE ON approvals FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER record_locks_change_log AFTER INSERT OR UPDATE OR DELETE ON record_locks FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER evidence_change_log AFTER INSERT OR UPDATE OR DELETE ON evidence FOR EACH ROW EXECUTE FUNCTION rw_log_change();
--> statement-breakpoint
CREATE TRIGGER password_links_change_log AFTER INSERT OR UPDATE OR DELETE ON password_links FOR EACH ROW EXECUTE FUNCTION rw_log_change('token_hash');
--> statement-breakpoint
-- Sessions live in a table the application may use but not create: it no longer owns the schema.
CREATE TABLE IF NOT EXISTS "session" ("sid" varchar NOT NULL COLLATE "default", "sess" json NOT NULL, "expire" timestamp(6) NOT NULL, CONSTRAINT "session_pkey" PRIMARY KEY ("sid"));
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "IDX_session_expire" ON "session" ("expire");
