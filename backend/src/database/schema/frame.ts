import { doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf } from './columns.js';
import { LENGTH_UNITS } from '../../engine/units.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';

/** Length units a reading may be entered in; values are stored in mm beside the entered unit. */
export type EnteredUnit = (typeof LENGTH_UNITS)[number];

/** Who recorded a frame check, and when; the name is kept so the record reads right after a rename. */
const recorded = {
  recordedById: uuid('recorded_by_id').references(() => users.id),
  recordedByName: text('recorded_by_name').notNull(),
  recordedAt: timestamp('recorded_at', { withTimezone: true }).notNull().defaultNow(),
};

/** Squareness from the two diagonals of a rectangle the machine marked or cut (or of the frame). */
export const diagonalChecks = pgTable(
  'diagonal_checks',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    /** Unit the sides, diagonals and gantry span were entered in. */
    lengthUnit: text('length_unit').$type<EnteredUnit>().notNull().default('mm'),
    /** Smallest step of the tape or rule the diagonals were read with, mm (null: not recorded). */
    resolutionMm: doublePrecision('resolution_mm'),
    sideXMm: doublePrecision('side_x_mm').notNull(),
    sideYMm: doublePrecision('side_y_mm').notNull(),
    diagonal1Mm: doublePrecision('diagonal1_mm').notNull(),
    diagonal2Mm: doublePrecision('diagonal2_mm').notNull(),
    gantrySpanMm: doublePrecision('gantry_span_mm'),
    note: text('note').notNull().default(''),
    ...recorded,
  },
  (t) => [
    index('diagonal_checks_machine_idx').on(t.workshopId, t.machineId, t.recordedAt),
    oneOf('diagonal_checks_length_unit_check', t.lengthUnit, LENGTH_UNITS),
  ],
);

export interface BedGridPointMm {
  xMm: number;
  yMm: number;
  zMm: number;
}

/** Heights over the bed or slats at grid positions (positions in mm, heights stored in mm). */
export const bedGrids = pgTable(
  'bed_grids',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    /** Unit the grid positions were entered in (stored in mm). */
    lengthUnit: text('length_unit').$type<EnteredUnit>().notNull().default('mm'),
    /** Unit the heights were read in (stored in mm). */
    readingUnit: text('reading_unit').$type<EnteredUnit>().notNull().default('mm'),
    /** Smallest step of the height gauge, mm (null: not recorded). */
    resolutionMm: doublePrecision('resolution_mm'),
    rows: integer('rows'),
    columns: integer('columns'),
    points: jsonb('points').$type<BedGridPointMm[]>().notNull(),
    note: text('note').notNull().default(''),
    ...recorded,
  },
  (t) => [
    index('bed_grids_machine_idx').on(t.workshopId, t.machineId, t.recordedAt),
    oneOf('bed_grids_length_unit_check', t.lengthUnit, LENGTH_UNITS),
    oneOf('bed_grids_reading_unit_check', t.readingUnit, LENGTH_UNITS),
  ],
);

export type CircleKind = 'hole' | 'disc';

export interface TestCutSizesMm {
  nominal: { xMm: number; yMm: number; circleMm: number };
  measured: {
    xMm: number;
    yMm: number;
    diagonal1Mm: number;
    diagonal2Mm: number;
    circleXMm: number;
    circleYMm: number;
  };
  /** Width of cut the controller did not compensate for (0 when kerf compensation was on). */
  kerfMm: number;
  circleKind: CircleKind;
  stepsPerMm: {
    /** Steps per mm of axis X when the cut was made (null when not given). */
    x: number | null;
    /** Steps per mm of axis Y when the cut was made (null when not given). */
    y: number | null;
  };
}

/** The acceptance cut: a large square with a circle, its commanded and measured sizes. */
export const testCuts = pgTable(
  'test_cuts',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    /** Unit the part sizes, diagonals, circle diameters, kerf and plate thickness were entered in. */
    lengthUnit: text('length_unit').$type<EnteredUnit>().notNull().default('mm'),
    /** Thickness of the plate cut, mm (null on cuts recorded before it was asked). */
    plateThicknessMm: doublePrecision('plate_thickness_mm'),
    /** Smallest step of the caliper or rule the sizes were read with, mm (null: not recorded). */
    resolutionMm: doublePrecision('resolution_mm'),
    sizes: jsonb('sizes').$type<TestCutSizesMm>().notNull(),
    note: text('note').notNull().default(''),
    ...recorded,
  },
  (t) => [
    index('test_cuts_machine_idx').on(t.workshopId, t.machineId, t.recordedAt),
    oneOf('test_cuts_length_unit_check', t.lengthUnit, LENGTH_UNITS),
  ],
);
