import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { auditEntries, machines, recordLocks } from '../database/schema/index.js';

@Injectable()
export class RecordsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insertAudit(values: typeof auditEntries.$inferInsert) {
    await this.db.insert(auditEntries).values(values);
  }

  history(workshopId: string, machineId: string, limit: number) {
    return this.db
      .select()
      .from(auditEntries)
      .where(and(eq(auditEntries.workshopId, workshopId), eq(auditEntries.machineId, machineId)))
      .orderBy(desc(auditEntries.at))
      .limit(limit);
  }

  async touchMachine(machineId: string) {
    await this.db.update(machines).set({ lastActivityAt: new Date() }).where(eq(machines.id, machineId));
  }

  async lockOf(recordType: string, recordId: string) {
    const [row] = await this.db
      .select()
      .from(recordLocks)
      .where(and(eq(recordLocks.recordType, recordType), eq(recordLocks.recordId, recordId)))
      .limit(1);
    return row ?? null;
  }

  async lockedIds(recordType: string, recordIds: string[]): Promise<Set<string>> {
    if (!recordIds.length) return new Set();
    const rows = await this.db
      .select({ id: recordLocks.recordId })
      .from(recordLocks)
      .where(and(eq(recordLocks.recordType, recordType), inArray(recordLocks.recordId, recordIds)));
    return new Set(rows.map((r) => r.id));
  }

  async insertLocks(approvalId: string, refs: { recordType: string; recordId: string }[]) {
    if (!refs.length) return;
    await this.db.insert(recordLocks).values(refs.map((r) => ({ ...r, approvalId }))).onConflictDoNothing();
  }
}
