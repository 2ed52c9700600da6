import { index, integer, pgTable, real, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, oneOf, timestamps } from './columns.js';
import { LENGTH_UNITS } from '../../engine/units.js';
import { workshops } from './workshops.js';
import { targetSets } from './target-sets.js';

export const MACHINE_KINDS = ['plasma', 'router', 'other'] as const;
export type MachineKind = (typeof MACHINE_KINDS)[number];

export const MACHINE_STATES = [
  'being-built',
  'awaiting-approval',
  'ready-to-cut',
  'recheck-due',
  'reopened',
  'retired',
] as const;
/** States in which an approval stands, so the machine's record is read-only. */
export const APPROVED_STATES: readonly MachineState[] = ['ready-to-cut', 'recheck-due'];
export type MachineState = (typeof MACHINE_STATES)[number];

export const machines = pgTable(
  'machines',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    name: text('name').notNull(),
    kind: text('kind', { enum: MACHINE_KINDS }).notNull(),
    workAreaXMm: real('work_area_x_mm').notNull(),
    workAreaYMm: real('work_area_y_mm').notNull(),
    /** The unit the work area was typed in and is shown in (the lengths are kept in mm). */
    lengthUnit: text('length_unit', { enum: LENGTH_UNITS }).notNull().default('mm'),
    notes: text('notes').notNull().default(''),
    targetSetId: uuid('target_set_id')
      .notNull()
      .references(() => targetSets.id),
    state: text('state', { enum: MACHINE_STATES }).notNull().default('being-built'),
    /** Bumped on every change, so optimistic edits can be refused when stale. */
    version: integer('version').notNull().default(1),
    lastActivityAt: timestamp('last_activity_at', { withTimezone: true }).notNull().defaultNow(),
    ...timestamps,
  },
  (t) => [
    index('machines_workshop_idx').on(t.workshopId),
    oneOf('machines_kind_check', t.kind, MACHINE_KINDS),
    oneOf('machines_state_check', t.state, MACHINE_STATES),
    oneOf('machines_length_unit_check', t.lengthUnit, LENGTH_UNITS),
  ],
);
