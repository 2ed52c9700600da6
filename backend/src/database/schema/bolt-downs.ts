import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import { id, oneOf, timestamps } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { rails, railSweeps } from './rails.js';
import { users } from './users.js';

export const BOLT_DOWN_MODES = ['face', 'line'] as const;
export type BoltDownMode = (typeof BOLT_DOWN_MODES)[number];

export const BOLT_DOWN_UNITS = ['mm', 'um', 'in', 'thou'] as const;
export type BoltDownUnit = (typeof BOLT_DOWN_UNITS)[number];

/** One rail being fixed down hole by hole. */
export const boltDowns = pgTable(
  'bolt_downs',
  {
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
    mode: text('mode', { enum: BOLT_DOWN_MODES }).notNull(),
    /** Unit readings and the band are typed in. */
    readingUnit: text('reading_unit', { enum: BOLT_DOWN_UNITS }).notNull().default('mm'),
    /** Unit hole positions are shown in (kept in mm). */
    lengthUnit: text('length_unit', { enum: BOLT_DOWN_UNITS }).notNull().default('mm'),
    /** Hole centres when the bolt-down began, so a later change to the rail cannot shift them. */
    holePositionsMm: jsonb('hole_positions_mm').$type<number[]>().notNull(),
    /** Half-width of the band around the aim that counts as on target. */
    bandMm: doublePrecision('band_mm').notNull(),
    /** Counter handing out the order in which holes were fixed. */
    fixCounter: integer('fix_counter').notNull().default(0),
    finalSweepId: uuid('final_sweep_id').references(() => railSweeps.id, { onDelete: 'set null' }),
    /** Set when the builder gave up on this bolt-down (with why); no hole is written after it. */
    abandonedAt: timestamp('abandoned_at', { withTimezone: true }),
    abandonedReason: text('abandoned_reason'),
    abandonedByName: text('abandoned_by_name'),
    createdById: uuid('created_by_id').references(() => users.id),
    createdByName: text('created_by_name').notNull(),
    ...timestamps,
  },
  (t) => [
    index('bolt_downs_rail_idx').on(t.workshopId, t.railId, t.createdAt),
    oneOf('bolt_downs_mode_check', t.mode, BOLT_DOWN_MODES),
    oneOf('bolt_downs_reading_unit_check', t.readingUnit, BOLT_DOWN_UNITS),
    oneOf('bolt_downs_length_unit_check', t.lengthUnit, BOLT_DOWN_UNITS),
  ],
);

/** What has been typed and fixed at one hole; rows appear as holes are first written. */
export const boltDownHoles = pgTable(
  'bolt_down_holes',
  {
    id: id(),
    boltDownId: uuid('bolt_down_id')
      .notNull()
      .references(() => boltDowns.id, { onDelete: 'cascade' }),
    holeIndex: integer('hole_index').notNull(),
    /** As typed, in the bolt-down's unit. */
    readingRaw: doublePrecision('reading_raw'),
    readingMm: doublePrecision('reading_mm'),
    fixed: boolean('fixed').notNull().default(false),
    fixSeq: integer('fix_seq'),
    fixedAt: timestamp('fixed_at', { withTimezone: true }),
    fixedById: uuid('fixed_by_id').references(() => users.id),
    fixedByName: text('fixed_by_name'),
    /** The write that last changed the hole (a write id the browser sent). */
    lastWriteId: uuid('last_write_id').references((): AnyPgColumn => boltDownWrites.writeId),
    ...timestamps,
  },
  (t) => [uniqueIndex('bolt_down_holes_unique').on(t.boltDownId, t.holeIndex)],
);

/**
 * Every write id the browser has sent: a repeat of the same id is the same write and is never
 * applied twice (workshop wifi drops and the browser retries).
 */
export const boltDownWrites = pgTable(
  'bolt_down_writes',
  {
    writeId: uuid('write_id').primaryKey(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    boltDownId: uuid('bolt_down_id')
      .notNull()
      .references(() => boltDowns.id, { onDelete: 'cascade' }),
    /** "hole:<index>" or "final-sweep". */
    target: text('target').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('bolt_down_writes_bolt_down_idx').on(t.boltDownId)],
);
