import { getTableName } from 'drizzle-orm';
import { getTableConfig, type PgTable } from 'drizzle-orm/pg-core';
import { CHECK_RECORD_TABLES, type CheckRecordType } from './check-record-tables.js';
import type { CheckTableSpec } from './check-records.js';
import { RECORD_TYPES } from './kinds.js';

// Checked by the type-checker (npm run check): only a table's own columns name its parent.
// @ts-expect-error a backlash check hangs under an axis, and has no rail
const wrongParent: CheckTableSpec<(typeof CHECK_RECORD_TABLES)['backlash-check']['table']>['parent'] = 'railId';

// One spec shape for every table, to walk them all (each entry is checked against its own table where it is written).
const entries = Object.entries(CHECK_RECORD_TABLES) as unknown as [CheckRecordType, CheckTableSpec<PgTable>][];

describe('the tables of check records', () => {
  it.each(entries)('%s is the table the kinds list names for it', (type, spec) => {
    expect(getTableName(spec.table)).toBe(RECORD_TYPES[type].table);
    expect(wrongParent).toBe('railId');
  });

  // The newest of a parent and each page are one index step only while an index leads with
  // (workshop, parent, time) in that order (PostgreSQL manual, "Indexes and ORDER BY").
  it.each(entries)('%s has an index on workshop, parent and time, in that order', (_type, spec) => {
    const columns = getTableConfig(spec.table).columns;
    const byKey = spec.table as unknown as Record<string, { name: string }>;
    const wanted = ['workshopId', spec.parent, spec.time ?? 'createdAt'].map((k) => byKey[k].name);
    const indexes = getTableConfig(spec.table).indexes.map((i) =>
      i.config.columns.map((c) => ('name' in c ? (c as { name: string }).name : '')),
    );
    expect(indexes.some((cols) => wanted.every((name, i) => cols[i] === name))).toBe(true);
    expect(columns.map((c) => c.name)).toEqual(expect.arrayContaining(wanted));
  });
});
