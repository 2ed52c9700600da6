-- The two unit families: a sweep's and a bolt-down's old `unit` was the unit of readings only
-- (positions were always typed in mm); a hole pattern's `unit` was the unit of every length.
-- Sweeps recorded no face: they are kept as side-face sweeps, so none of them yields a height.
-- Approved records are converted too: this is the same data under its new name, not a change.
ALTER TABLE rail_sweeps DISABLE TRIGGER USER;--> statement-breakpoint
UPDATE rail_sweeps SET reading_unit = unit, length_unit = 'mm', face = 'side';--> statement-breakpoint
ALTER TABLE rail_sweeps ENABLE TRIGGER USER;--> statement-breakpoint
ALTER TABLE bolt_downs DISABLE TRIGGER USER;--> statement-breakpoint
UPDATE bolt_downs SET reading_unit = unit, length_unit = 'mm';--> statement-breakpoint
ALTER TABLE bolt_downs ENABLE TRIGGER USER;--> statement-breakpoint
ALTER TABLE hole_patterns DISABLE TRIGGER USER;--> statement-breakpoint
UPDATE hole_patterns SET length_unit = unit;--> statement-breakpoint
ALTER TABLE hole_patterns ENABLE TRIGGER USER;--> statement-breakpoint
-- The height difference target scales with rail spacing (S = a × K). A stored length target was
-- read at 500 mm spacing (the catalogue figure it came from), so K = S / 500 mm, in µm per mm.
UPDATE target_sets SET targets = jsonb_set(targets, '{railHeightDifference}', jsonb_build_object(
  'value', round(((targets->'railHeightDifference'->>'value')::numeric
    * CASE targets->'railHeightDifference'->>'unit' WHEN 'mm' THEN 1000 WHEN 'um' THEN 1 WHEN 'in' THEN 25400 ELSE 25.4 END) / 500, 4)::float8,
  'unit', 'um/mm',
  'source', format('K from the former target of %s %s read at 500 mm rail spacing (S = a × K; one maker''s catalogue: about 130 µm at 500 mm spacing for light preload)',
    targets->'railHeightDifference'->>'value', targets->'railHeightDifference'->>'unit')))
WHERE targets->'railHeightDifference'->>'unit' IN ('mm', 'um', 'in', 'thou');--> statement-breakpoint
-- Straightness is judged on minimum zone (ISO 1101's definition) unless a set says otherwise.
UPDATE target_sets SET targets = jsonb_set(targets, '{railStraightness,reference}', '"minimum-zone"')
WHERE targets ? 'railStraightness' AND NOT (targets->'railStraightness' ? 'reference');
