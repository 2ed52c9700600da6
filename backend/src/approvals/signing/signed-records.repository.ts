import { Inject, Injectable } from '@nestjs/common';
import { asc, eq, inArray } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../../database/database.tokens.js';
import { approvals, recordLocks } from '../../database/schema/index.js';
import type { ApprovalRow } from '../approvals.repository.js';
import { SIGNED_RECORDS, type SignedRecordKind } from './signed-record-kinds.js';

export type LiveRow = Record<string, unknown>;

/** Reads the live rows a signature covers; writes nothing. */
@Injectable()
export class SignedRecordsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  locksOf(approvalId: string): Promise<{ recordType: string; recordId: string }[]> {
    return this.db
      .select({ recordType: recordLocks.recordType, recordId: recordLocks.recordId })
      .from(recordLocks)
      .where(eq(recordLocks.approvalId, approvalId));
  }

  /** The rows of one kind with the given ids, each with its child rows when the kind has any. */
  async rowsOf(kind: SignedRecordKind, ids: string[]): Promise<Map<string, { row: LiveRow; children?: LiveRow[] }>> {
    const spec = SIGNED_RECORDS[kind];
    const found = new Map<string, { row: LiveRow; children?: LiveRow[] }>();
    if (!ids.length) return found;
    const rows = (await this.db.select().from(spec.table).where(inArray(spec.table.id, ids))) as LiveRow[];
    for (const row of rows) found.set(row.id as string, { row, children: spec.children ? [] : undefined });
    if (spec.children && rows.length) {
      const c = spec.children;
      const parentKey = Object.entries(c.table).find(([, col]) => col === c.parent)?.[0];
      const children = (await this.db
        .select()
        .from(c.table)
        .where(inArray(c.parent, [...found.keys()]))
        .orderBy(...c.orderBy.map((col) => asc(col)))) as LiveRow[];
      for (const child of children) found.get(child[parentKey!] as string)?.children!.push(child);
    }
    return found;
  }

  /** The approval a printed verification address names; the unique index finds it, nothing is scanned. */
  async byToken(token: string): Promise<ApprovalRow | null> {
    const [row] = await this.db.select().from(approvals).where(eq(approvals.verificationToken, token));
    return row ?? null;
  }

  async reload(id: string): Promise<ApprovalRow | null> {
    const [row] = await this.db.select().from(approvals).where(eq(approvals.id, id));
    return row ?? null;
  }
}
