import { Inject, Injectable } from '@nestjs/common';
import type { PgTable } from 'drizzle-orm/pg-core';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { CheckRecords, checkTableProblem, type CheckTableSpec } from './check-records.js';

/**
 * The check records of a table a check's service declares (`checkTable({ type, table, parent })`):
 * one `CheckRecords` per table, so a new check needs no repository of its own. A table that is not
 * the one kinds.ts names, or has no index for its newest-first reads, is refused at start.
 */
@Injectable()
export class CheckRecordsRepository {
  private readonly made = new Map<PgTable, CheckRecords<PgTable>>();

  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  of<T extends PgTable>(spec: CheckTableSpec<T>): CheckRecords<T> {
    let records = this.made.get(spec.table);
    if (!records) {
      const problem = checkTableProblem(spec as unknown as CheckTableSpec<PgTable>);
      if (problem) throw new Error(problem);
      records = new CheckRecords(this.db, spec as unknown as CheckTableSpec<PgTable>);
      this.made.set(spec.table, records);
    }
    return records as unknown as CheckRecords<T>;
  }
}
