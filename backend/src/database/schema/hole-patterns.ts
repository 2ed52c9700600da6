import { doublePrecision, index, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf, timestamps } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';

/** Which corner or edge of the outline is laid against the workpiece's datum. */
export const PATTERN_REFERENCES = [
  'bottom-left',
  'bottom-right',
  'top-left',
  'top-right',
  'left',
  'right',
  'bottom',
  'top',
] as const;
export type PatternReference = (typeof PATTERN_REFERENCES)[number];

/** Units a pattern may be entered in; holes are kept in mm whatever was typed. */
export const PATTERN_UNITS = ['mm', 'um', 'in', 'thou'] as const;
export type PatternUnit = (typeof PATTERN_UNITS)[number];

export const PATTERN_ENTRIES = ['list', 'grid', 'circle'] as const;
export type PatternEntryKind = (typeof PATTERN_ENTRIES)[number];

/** The pattern as the person entered it, in `lengthUnit` (so it can be edited the way it was typed). */
export type StoredPatternEntry =
  | { kind: 'list'; holes: { x: number; y: number; diameter: number }[] }
  | {
      kind: 'grid';
      /** First hole's centre from the outline's left edge, in `lengthUnit`. */
      originX: number;
      /** First hole's centre from the outline's lower edge, in `lengthUnit`. */
      originY: number;
      /** Count of rows of holes. */
      rows: number;
      /** Count of columns of holes. */
      columns: number;
      /** Distance between columns, in `lengthUnit`. */
      pitchX: number;
      /** Distance between rows, in `lengthUnit`. */
      pitchY: number;
      /** Hole diameter, in `lengthUnit`. */
      diameter: number;
    }
  | {
      kind: 'circle';
      /** Circle centre from the outline's left edge, in `lengthUnit`. */
      centreX: number;
      /** Circle centre from the outline's lower edge, in `lengthUnit`. */
      centreY: number;
      /** Diameter of the circle the hole centres lie on, in `lengthUnit`. */
      circleDiameter: number;
      /** Count of holes on the circle. */
      count: number;
      /** Angle of the first hole from the +x direction, in degrees. */
      startAngleDeg: number;
      /** Hole diameter, in `lengthUnit`. */
      diameter: number;
    };

export interface StoredHole {
  xMm: number;
  yMm: number;
  diameterMm: number;
}

/**
 * A drilling pattern of a machine (a bracket's or plate's bolt holes). Coordinates run from the
 * outline's lower-left corner, x to the right and y upwards, in mm. A shop aid for marking out,
 * not evidence an approval stands on, so it carries no approval guard.
 */
export const holePatterns = pgTable(
  'hole_patterns',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    name: text('name').notNull(),
    reference: text('reference', { enum: PATTERN_REFERENCES }).notNull(),
    /** Unit the outline and the entry were typed in (holes kept in mm). */
    lengthUnit: text('length_unit', { enum: PATTERN_UNITS }).notNull().default('mm'),
    widthMm: doublePrecision('width_mm').notNull(),
    heightMm: doublePrecision('height_mm').notNull(),
    entry: jsonb('entry').$type<StoredPatternEntry>().notNull(),
    holes: jsonb('holes').$type<StoredHole[]>().notNull(),
    notes: text('notes').notNull().default(''),
    ...timestamps,
  },
  (t) => [
    index('hole_patterns_machine_idx').on(t.workshopId, t.machineId),
    oneOf('hole_patterns_reference_check', t.reference, PATTERN_REFERENCES),
    oneOf('hole_patterns_length_unit_check', t.lengthUnit, PATTERN_UNITS),
  ],
);
