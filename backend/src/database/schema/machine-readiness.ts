import { integer, jsonb, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import { machines } from './machines.js';
import { workshops } from './workshops.js';
import type { CheckKind } from '../../records/kinds.js';

/** The first check that stops approval, as the machines list names it. */
export interface BlockingCheckRef {
  key: string;
  kind: CheckKind;
  subject: string;
  status: 'not-started' | 'outside-target';
}

/**
 * Each machine's readiness counted as the readiness board counts it (waivers applied), kept
 * current in the transaction of every command that changes what the board would show, so the
 * machines list reads one row per machine instead of every record behind it.
 */
/**
 * One check as the summary keeps it: enough to count it again (waivers applied) when only the
 * contributor that reports it is asked again. `contributor` is its place in the registry.
 */
export interface SummaryCheck {
  contributor: number;
  key: string;
  kind: CheckKind;
  subject: string;
  status: 'not-started' | 'within-target' | 'outside-target';
  recordId: string | null;
}

export const machineReadiness = pgTable('machine_readiness', {
  machineId: uuid('machine_id')
    .primaryKey()
    .references(() => machines.id, { onDelete: 'cascade' }),
  workshopId: uuid('workshop_id')
    .notNull()
    .references(() => workshops.id),
  total: integer('total').notNull(),
  notStarted: integer('not_started').notNull(),
  within: integer('within').notNull(),
  outside: integer('outside').notNull(),
  waived: integer('waived').notNull(),
  firstBlocking: jsonb('first_blocking').$type<BlockingCheckRef>(),
  /** Every check as counted (not read by the list): a change of one check asks only its contributor again. */
  checks: jsonb('checks').$type<SummaryCheck[]>(),
  /** How the counts were made; a start-up with a newer way recounts every machine. */
  version: integer('version').notNull(),
  refreshedAt: timestamp('refreshed_at', { withTimezone: true }).notNull().defaultNow(),
});
