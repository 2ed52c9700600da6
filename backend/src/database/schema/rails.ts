import { sql } from 'drizzle-orm';
import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import { id, oneOf, timestamps } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';
import type { ResultWarning } from '../../engine/warnings.js';
import type { StraightnessReference } from './target-sets.js';

export const SWEEP_PHASES = ['as-found', 'as-left'] as const;
export type SweepPhase = (typeof SWEEP_PHASES)[number];

export const SWEEP_UNITS = ['mm', 'um', 'in', 'thou'] as const;
export type SweepUnit = (typeof SWEEP_UNITS)[number];

export const SWEEP_STATUSES = ['within-target', 'outside-target'] as const;

/** Which face of the rail the indicator reads: the side (sideways straightness) or the top (heights). */
export const SWEEP_FACES = ['side', 'top'] as const;
export type SweepFace = (typeof SWEEP_FACES)[number];

/** A linear rail of a machine; its hole positions follow from length, pitch and first-hole offset. */
export const rails = pgTable(
  'rails',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    label: text('label').notNull(),
    axis: text('axis').notNull(),
    lengthMm: doublePrecision('length_mm').notNull(),
    profileSizeMm: integer('profile_size_mm'),
    holePitchMm: doublePrecision('hole_pitch_mm').notNull(),
    firstHoleMm: doublePrecision('first_hole_mm').notNull(),
    /** Unit the rail's length, pitch, first hole, spacing and end distance were typed in (values kept in mm). */
    lengthUnit: text('length_unit', { enum: SWEEP_UNITS }).notNull().default('mm'),
    /** Centre-to-centre distance to the partner rail, a in S = a × K; null until entered. */
    spacingMm: doublePrecision('spacing_mm'),
    /** Least distance from a hole centre to either end of the rail; null: the default for the bolt size. */
    endDistanceMm: doublePrecision('end_distance_mm'),
    /** Kept symmetric by the service: when A names B, B names A. */
    partnerRailId: uuid('partner_rail_id').references((): AnyPgColumn => rails.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('rails_machine_idx').on(t.workshopId, t.machineId),
    oneOf('rails_length_unit_check', t.lengthUnit, SWEEP_UNITS),
  ],
);

/** Stored engine result of a sweep; every length in mm. */
export interface StoredLine {
  /** Rise of the line per unit of position, mm/mm (a ratio of lengths). */
  slope: number;
  /** Height of the line at position 0, mm. */
  intercept: number;
  /** Straightness about the line, mm. */
  straightness: number;
  /** Each station's deviation from the line, mm. */
  residuals: number[];
}
/** Largest slope between neighbouring stations (or over a stated base), mm per metre. */
export interface StoredLocalSlope {
  mmPerM: number;
  fromMm: number;
  toMm: number;
  baseMm: number | null;
}
export interface StoredSweepResult {
  leastSquares: StoredLine;
  minimumZone: StoredLine;
  endPoint: StoredLine;
  /** Absent on sweeps saved before local slope was kept. */
  localSlope?: StoredLocalSlope;
}

/** One series of indicator readings along a rail, with the readings as entered and in mm. */
export const railSweeps = pgTable(
  'rail_sweeps',
  {
    /** Made by the browser when it can, so a retried save is the same sweep. */
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    railId: uuid('rail_id')
      .notNull()
      .references(() => rails.id, { onDelete: 'cascade' }),
    /** Unit the readings and the instrument resolution were typed in. */
    readingUnit: text('reading_unit', { enum: SWEEP_UNITS }).notNull().default('mm'),
    /** Unit the station positions were typed in (positions kept in mm). */
    lengthUnit: text('length_unit', { enum: SWEEP_UNITS }).notNull().default('mm'),
    /** Face the indicator read; only top-face sweeps against a common datum give a height. */
    face: text('face', { enum: SWEEP_FACES }).notNull().default('side'),
    positionsMm: jsonb('positions_mm').$type<number[]>().notNull(),
    /** Readings as typed, in `unit`. */
    readingsRaw: jsonb('readings_raw').$type<number[]>().notNull(),
    readingsMm: jsonb('readings_mm').$type<number[]>().notNull(),
    instrument: text('instrument').notNull().default(''),
    /** Smallest step of the instrument, in `unit`. */
    resolution: doublePrecision('resolution'),
    temperatureC: doublePrecision('temperature_c'),
    phase: text('phase', { enum: SWEEP_PHASES }).notNull(),
    takenBy: text('taken_by').notNull(),
    boltSize: text('bolt_size'),
    torqueNm: doublePrecision('torque_nm'),
    /** Label of the common datum the readings were taken against (for parallelism of partners). */
    datum: text('datum'),
    notes: text('notes').notNull().default(''),
    result: jsonb('result').$type<StoredSweepResult>().notNull(),
    /** What a person should know about the result when it was saved (engine/warnings.ts). */
    warnings: jsonb('warnings').$type<ResultWarning[]>().notNull().default([]),
    status: text('status', { enum: SWEEP_STATUSES }).notNull(),
    /** The target the sweep was judged against when it was saved. */
    target: jsonb('target').$type<{ value: number; unit: string; reference?: StraightnessReference }>().notNull(),
    createdById: uuid('created_by_id').references(() => users.id),
    takenAt: timestamp('taken_at', { withTimezone: true }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    index('rail_sweeps_rail_idx').on(t.railId, t.takenAt),
    // The newest sweep of a rail in one index step, however many it has. The order is exactly the
    // queries' (`desc` puts nulls first): an index sorted nulls last would make PostgreSQL sort
    // every sweep of the rail to find the newest.
    index('rail_sweeps_latest_desc_idx').on(t.railId, t.takenAt.desc().nullsFirst(), t.createdAt.desc().nullsFirst()),
    // The newest sweep of a rail against each named datum and face (partner parallelism), also in
    // index steps: with the face in the key, a face never swept does not walk every other sweep.
    index('rail_sweeps_datum_face_desc_idx')
      .on(t.railId, sql`lower(${t.datum})`, t.face, t.takenAt.desc().nullsFirst(), t.createdAt.desc().nullsFirst())
      .where(sql`${t.datum} is not null`),
    oneOf('rail_sweeps_reading_unit_check', t.readingUnit, SWEEP_UNITS),
    oneOf('rail_sweeps_length_unit_check', t.lengthUnit, SWEEP_UNITS),
    oneOf('rail_sweeps_face_check', t.face, SWEEP_FACES),
    oneOf('rail_sweeps_phase_check', t.phase, SWEEP_PHASES),
    oneOf('rail_sweeps_status_check', t.status, SWEEP_STATUSES),
  ],
);
