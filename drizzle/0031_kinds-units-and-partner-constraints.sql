-- Units, kinds and states become CHECK constraints, and a partner rail must be a rail. Every value
-- the product ever wrote is in its list (every request was validated against the same lists); a
-- unit typed some other way (written from outside the product) is read the way people write it,
-- else as mm (the values kept in mm beside it are the measurement). A migration is not a change
-- of an approved record: the approval guard and the change log stay out of these fixes.
DO $$
DECLARE
  c record;
  bad boolean;
BEGIN
  FOR c IN SELECT * FROM (VALUES
    ('machines', 'length_unit'), ('rails', 'length_unit'), ('rail_sweeps', 'reading_unit'), ('rail_sweeps', 'length_unit'),
    ('bolt_downs', 'reading_unit'), ('bolt_downs', 'length_unit'), ('hole_patterns', 'length_unit'), ('axes', 'length_unit'),
    ('travel_trials', 'length_unit'), ('travel_trials', 'reading_unit'), ('positioning_runs', 'length_unit'), ('positioning_runs', 'reading_unit'),
    ('backlash_checks', 'length_unit'), ('backlash_checks', 'reading_unit'), ('diagonal_checks', 'length_unit'),
    ('bed_grids', 'length_unit'), ('bed_grids', 'reading_unit'), ('test_cuts', 'length_unit')
  ) AS v(t, col) LOOP
    EXECUTE format('SELECT EXISTS (SELECT 1 FROM %I WHERE %I NOT IN (''mm'', ''um'', ''in'', ''thou''))', c.t, c.col) INTO bad;
    CONTINUE WHEN NOT bad;
    EXECUTE format('ALTER TABLE %I DISABLE TRIGGER USER', c.t);
    EXECUTE format($u$UPDATE %I SET %I = CASE
        WHEN lower(btrim(%I)) IN ('mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters') THEN 'mm'
        WHEN lower(btrim(%I)) IN ('um', 'µm', 'μm', 'micron', 'microns', 'micrometre', 'micrometer') THEN 'um'
        WHEN lower(btrim(%I)) IN ('in', 'inch', 'inches', '"') THEN 'in'
        WHEN lower(btrim(%I)) IN ('thou', 'mil', 'mils', '0.001 in') THEN 'thou'
        ELSE 'mm' END
      WHERE %I NOT IN ('mm', 'um', 'in', 'thou')$u$, c.t, c.col, c.col, c.col, c.col, c.col, c.col);
    EXECUTE format('ALTER TABLE %I ENABLE TRIGGER USER', c.t);
  END LOOP;
  -- A scale material not in the list is not known: recorded as not given.
  FOR c IN SELECT * FROM (VALUES ('travel_trials'), ('positioning_runs')) AS v(t) LOOP
    EXECUTE format('SELECT EXISTS (SELECT 1 FROM %I WHERE scale_material NOT IN (''steel'', ''stainless-steel'', ''aluminium'', ''glass'', ''invar''))', c.t) INTO bad;
    CONTINUE WHEN NOT bad;
    EXECUTE format('ALTER TABLE %I DISABLE TRIGGER USER', c.t);
    EXECUTE format('UPDATE %I SET scale_material = NULL WHERE scale_material NOT IN (''steel'', ''stainless-steel'', ''aluminium'', ''glass'', ''invar'')', c.t);
    EXECUTE format('ALTER TABLE %I ENABLE TRIGGER USER', c.t);
  END LOOP;
  -- A partner left pointing at a rail that is gone (two commands racing) names no partner.
  IF EXISTS (SELECT 1 FROM rails r WHERE r.partner_rail_id IS NOT NULL AND NOT EXISTS (SELECT 1 FROM rails p WHERE p.id = r.partner_rail_id)) THEN
    ALTER TABLE rails DISABLE TRIGGER USER;
    UPDATE rails r SET partner_rail_id = NULL WHERE r.partner_rail_id IS NOT NULL AND NOT EXISTS (SELECT 1 FROM rails p WHERE p.id = r.partner_rail_id);
    ALTER TABLE rails ENABLE TRIGGER USER;
  END IF;
END $$;
--> statement-breakpoint
ALTER TABLE "audit_entries" ADD CONSTRAINT "audit_entries_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rails" ADD CONSTRAINT "rails_partner_rail_id_rails_id_fk" FOREIGN KEY ("partner_rail_id") REFERENCES "public"."rails"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_role_check" CHECK ("role" in ('admin', 'owner', 'technician', 'builder', 'viewer'));--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_kind_check" CHECK ("kind" in ('plasma', 'router', 'other'));--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_state_check" CHECK ("state" in ('being-built', 'awaiting-approval', 'ready-to-cut', 'recheck-due', 'reopened', 'retired'));--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "audit_entries" ADD CONSTRAINT "audit_entries_record_type_check" CHECK ("record_type" in ('machine', 'rail', 'rail-sweep', 'bolt-down', 'axis', 'travel-trial', 'positioning-run', 'backlash-check', 'diagonal-check', 'bed-grid', 'test-cut', 'safety-walk', 'waiver', 'approval', 'approval-request', 'evidence', 'hole-pattern', 'safety-item', 'target-set', 'person', 'sign-in', 'password'));--> statement-breakpoint
ALTER TABLE "change_log" ADD CONSTRAINT "change_log_operation_check" CHECK ("operation" in ('insert', 'update', 'delete'));--> statement-breakpoint
ALTER TABLE "record_locks" ADD CONSTRAINT "record_locks_record_type_check" CHECK ("record_type" in ('machine', 'rail', 'rail-sweep', 'bolt-down', 'axis', 'travel-trial', 'positioning-run', 'backlash-check', 'diagonal-check', 'bed-grid', 'test-cut', 'safety-walk', 'waiver'));--> statement-breakpoint
ALTER TABLE "evidence" ADD CONSTRAINT "evidence_subject_type_check" CHECK ("subject_type" in ('machine', 'rail', 'rail-sweep', 'bolt-down', 'axis', 'travel-trial', 'positioning-run', 'backlash-check', 'diagonal-check', 'bed-grid', 'test-cut', 'safety-item'));--> statement-breakpoint
ALTER TABLE "evidence" ADD CONSTRAINT "evidence_record_type_check" CHECK ("record_type" in ('machine', 'rail', 'rail-sweep', 'bolt-down', 'axis', 'travel-trial', 'positioning-run', 'backlash-check', 'diagonal-check', 'bed-grid', 'test-cut', 'safety-walk', 'waiver'));--> statement-breakpoint
ALTER TABLE "evidence" ADD CONSTRAINT "evidence_kind_check" CHECK ("kind" in ('photo', 'file'));--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_face_check" CHECK ("face" in ('side', 'top'));--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_phase_check" CHECK ("phase" in ('as-found', 'as-left'));--> statement-breakpoint
ALTER TABLE "rail_sweeps" ADD CONSTRAINT "rail_sweeps_status_check" CHECK ("status" in ('within-target', 'outside-target'));--> statement-breakpoint
ALTER TABLE "rails" ADD CONSTRAINT "rails_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "bed_grids" ADD CONSTRAINT "bed_grids_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "bed_grids" ADD CONSTRAINT "bed_grids_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "diagonal_checks" ADD CONSTRAINT "diagonal_checks_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "test_cuts" ADD CONSTRAINT "test_cuts_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "safety_answers" ADD CONSTRAINT "safety_answers_answer_check" CHECK ("answer" in ('yes', 'no', 'na'));--> statement-breakpoint
ALTER TABLE "safety_items" ADD CONSTRAINT "safety_items_section_check" CHECK ("section" in ('stopping', 'electrical', 'cutting', 'people'));--> statement-breakpoint
ALTER TABLE "axes" ADD CONSTRAINT "axes_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "positioning_runs" ADD CONSTRAINT "positioning_runs_scale_material_check" CHECK ("scale_material" in ('steel', 'stainless-steel', 'aluminium', 'glass', 'invar'));--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "travel_trials" ADD CONSTRAINT "travel_trials_scale_material_check" CHECK ("scale_material" in ('steel', 'stainless-steel', 'aluminium', 'glass', 'invar'));--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_mode_check" CHECK ("mode" in ('face', 'line'));--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "bolt_downs" ADD CONSTRAINT "bolt_downs_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "approval_requests" ADD CONSTRAINT "approval_requests_status_check" CHECK ("status" in ('open', 'approved', 'closed'));--> statement-breakpoint
ALTER TABLE "waivers" ADD CONSTRAINT "waivers_record_type_check" CHECK ("record_type" in ('machine', 'rail', 'rail-sweep', 'bolt-down', 'axis', 'travel-trial', 'positioning-run', 'backlash-check', 'diagonal-check', 'bed-grid', 'test-cut', 'safety-walk', 'waiver'));--> statement-breakpoint
ALTER TABLE "password_links" ADD CONSTRAINT "password_links_purpose_check" CHECK ("purpose" in ('invitation', 'reset'));--> statement-breakpoint
ALTER TABLE "hole_patterns" ADD CONSTRAINT "hole_patterns_reference_check" CHECK ("reference" in ('bottom-left', 'bottom-right', 'top-left', 'top-right', 'left', 'right', 'bottom', 'top'));--> statement-breakpoint
ALTER TABLE "hole_patterns" ADD CONSTRAINT "hole_patterns_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_length_unit_check" CHECK ("length_unit" in ('mm', 'um', 'in', 'thou'));--> statement-breakpoint
ALTER TABLE "backlash_checks" ADD CONSTRAINT "backlash_checks_reading_unit_check" CHECK ("reading_unit" in ('mm', 'um', 'in', 'thou'));