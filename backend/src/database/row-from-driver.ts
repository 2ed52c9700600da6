import { getTableColumns, type Column } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';

/**
 * A row of `table` read by hand-written SQL (`select t.*`: SQL names, the driver's values) as the
 * query builder would have returned it: property names, and each column's own decoding (times as
 * Date, numerics as numbers, JSON parsed).
 */
export function rowFromDriver<T extends PgTable>(table: T, raw: Record<string, unknown>): T['$inferSelect'] {
  const row: Record<string, unknown> = {};
  for (const [key, column] of Object.entries(getTableColumns(table) as Record<string, Column>)) {
    const value = raw[column.name];
    row[key] = value === null || value === undefined ? null : column.mapFromDriverValue(value);
  }
  return row as T['$inferSelect'];
}
