import { sql } from 'drizzle-orm';
import { check, timestamp, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';

/** Primary key shared by every table; uuids let the browser make ids for retried writes. */
export const id = () => uuid('id').primaryKey().defaultRandom();

export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
};

/**
 * A CHECK constraint holding a text column to a fixed list (units, states, kinds): the list is the
 * code's own (`as const` arrays, records/kinds.ts), so `npm run db:generate` writes a migration
 * whenever the list changes. NULL passes, as it does for every CHECK.
 */
export const oneOf = (name: string, column: AnyPgColumn, values: readonly string[]) =>
  check(name, sql.raw(`"${column.name}" in (${values.map((v) => `'${v.replace(/'/g, "''")}'`).join(', ')})`));
