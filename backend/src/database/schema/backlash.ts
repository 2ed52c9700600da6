import { doublePrecision, index, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf, timestamps } from './columns.js';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';
import { axes } from './drives.js';

/** One position of a backlash check as typed: where (lengthUnit) and the readings from each side (readingUnit). */
export interface BacklashPositionRecord {
  /** Where the axis was brought, in the record's `lengthUnit`. */
  position: number;
  /** Readings after approaching while moving in the positive direction, in the record's `readingUnit`. */
  up: number[];
  /** Readings after approaching while moving in the negative direction, in the record's `readingUnit`. */
  down: number[];
}

/** A backlash check of one axis: indicator readings from both sides at both ends and the middle. */
export const backlashChecks = pgTable(
  'backlash_checks',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    axisId: uuid('axis_id')
      .notNull()
      .references(() => axes.id, { onDelete: 'cascade' }),
    lengthUnit: text('length_unit').$type<LengthUnit>().notNull().default('mm'),
    readingUnit: text('reading_unit').$type<LengthUnit>().notNull().default('mm'),
    positions: jsonb('positions').$type<BacklashPositionRecord[]>().notNull(),
    /** Smallest step of the indicator, in readingUnit, when given. */
    resolution: doublePrecision('resolution'),
    /** The engine's result, mm. */
    result: jsonb('result').$type<Record<string, unknown>>().notNull(),
    notes: text('notes').notNull().default(''),
    recordedById: uuid('recorded_by_id').references(() => users.id),
    recordedByName: text('recorded_by_name').notNull(),
    ...timestamps,
  },
  (t) => [
    index('backlash_checks_axis_idx').on(t.workshopId, t.axisId, t.createdAt),
    oneOf('backlash_checks_length_unit_check', t.lengthUnit, LENGTH_UNITS),
    oneOf('backlash_checks_reading_unit_check', t.readingUnit, LENGTH_UNITS),
  ],
);
