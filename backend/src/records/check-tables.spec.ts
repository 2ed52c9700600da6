import { index, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { PgTable } from 'drizzle-orm/pg-core';
import { backlashChecks, diagonalChecks } from '../database/schema/index.js';
import { BACKLASH_TABLE } from '../drives/backlash.service.js';
import { BED_GRID_TABLE } from '../frame/bed-grids.service.js';
import { DIAGONAL_CHECK_TABLE } from '../frame/diagonal-checks.service.js';
import { TEST_CUT_TABLE } from '../frame/test-cuts.service.js';
import { checkTable, checkTableProblem, type CheckTableSpec } from './check-records.js';

// Checked by the type-checker (npm run check): only a table's own columns name its parent.
// @ts-expect-error a backlash check hangs under an axis, and has no rail
checkTable({ type: 'backlash-check', table: backlashChecks, parent: 'railId' });

const declared = [
  BACKLASH_TABLE,
  DIAGONAL_CHECK_TABLE,
  BED_GRID_TABLE,
  TEST_CUT_TABLE,
] as unknown as CheckTableSpec<PgTable>[];

describe('the tables check services declare', () => {
  it.each(declared.map((spec) => [spec.type, spec] as const))(
    '%s: the table kinds.ts names, with an index on workshop, parent and time',
    (_type, spec) => {
      expect(checkTableProblem(spec)).toBeNull();
    },
  );

  it('refuses a table that is not the one kinds.ts names for the record type', () => {
    const spec = { type: 'backlash-check', table: diagonalChecks, parent: 'machineId', time: 'recordedAt' };
    expect(checkTableProblem(spec as CheckTableSpec<PgTable>)).toBe(
      'backlash-check records are kept in backlash_checks, not diagonal_checks',
    );
  });

  // The newest of a parent and each page are one index step only while an index leads with
  // (workshop, parent, time) in that order (PostgreSQL manual, "Indexes and ORDER BY").
  it('refuses a table without an index leading with workshop, parent and time', () => {
    const columns = {
      id: uuid('id').primaryKey(),
      workshopId: uuid('workshop_id').notNull(),
      axisId: uuid('axis_id').notNull(),
      createdAt: timestamp('created_at').notNull(),
    };
    const unindexed = pgTable('backlash_checks', columns);
    const wrongOrder = pgTable('backlash_checks', columns, (t) => [index().on(t.axisId, t.workshopId, t.createdAt)]);
    const right = pgTable('backlash_checks', columns, (t) => [index().on(t.workshopId, t.axisId, t.createdAt)]);
    const problem = 'backlash_checks needs an index on (workshop_id, axis_id, created_at), in that order';
    for (const [table, expected] of [
      [unindexed, problem],
      [wrongOrder, problem],
      [right, null],
    ] as const)
      expect(checkTableProblem({ type: 'backlash-check', table, parent: 'axisId' } as CheckTableSpec<PgTable>)).toBe(
        expected,
      );
  });
});
