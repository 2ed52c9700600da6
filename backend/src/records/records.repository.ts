import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, gte, ilike, inArray, lt, or, sql, type SQL } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { auditEntries, changeLog, machines, recordLocks } from '../database/schema/index.js';
import type { RecordType, SignedRecordType } from './kinds.js';

export interface HistoryFilter {
  machineId?: string;
  recordType?: RecordType;
  person?: string;
  from?: Date;
  toExclusive?: Date;
  /** The last entry of the page before: its time exactly as stored (text) and its id. */
  after?: { at: string; id: string };
  limit: number;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

@Injectable()
export class RecordsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insertAudit(values: typeof auditEntries.$inferInsert) {
    // The clock, not the transaction's start: several entries of one command keep their order.
    await this.db.insert(auditEntries).values({ at: sql`clock_timestamp()`, ...values });
  }

  /** The audit entry and the machine's last activity in one statement (one round trip per command). */
  async insertAuditAndTouch(values: typeof auditEntries.$inferInsert & { machineId: string }) {
    const insert = this.db.insert(auditEntries).values({ at: sql`clock_timestamp()`, ...values });
    await this.db.execute(
      sql`with audit as (${insert.getSQL()}) update ${machines} set last_activity_at = now() where ${machines.id} = ${values.machineId}`,
    );
  }

  /**
   * A record's insert (`insert … returning id`), its audit entry and the machine's last activity
   * in one statement. The entry and the touch happen only if the insert wrote a row; answers the
   * new row's id, or null when it wrote none (its id was already taken).
   */
  async insertWithAuditAndTouch(
    insert: SQL,
    values: Omit<typeof auditEntries.$inferInsert, 'recordId'> & { machineId: string },
  ): Promise<string | null> {
    const { rows } = await this.db.execute<{ id: string }>(sql`
      with rec as (${insert}), ${this.auditAndTouchAfter('rec', { ...values, recordId: sql`rec.id` })}
      select id from rec`);
    return rows[0]?.id ?? null;
  }

  /**
   * Two common table expressions for a command's own write statement: the audit entry and the
   * machine's last activity, written only if the expression named `when` yields a row (the write
   * happened). `recordId` may be a column of that expression.
   */
  auditAndTouchAfter(
    when: string,
    values: Omit<typeof auditEntries.$inferInsert, 'recordId'> & { machineId: string; recordId: string | SQL | null },
  ): SQL {
    const from = sql.identifier(when);
    const recordId =
      typeof values.recordId === 'string' ? sql`${values.recordId}::uuid` : (values.recordId ?? sql`null::uuid`);
    return sql`audit as (
        insert into ${auditEntries} (workshop_id, machine_id, record_type, record_id, action, summary, changes, actor_id, actor_name, at)
        select ${values.workshopId}::uuid, ${values.machineId}::uuid, ${values.recordType}, ${recordId}, ${values.action}, ${values.summary},
               ${values.changes === null || values.changes === undefined ? null : JSON.stringify(values.changes)}::jsonb,
               ${values.actorId ?? null}::uuid, ${values.actorName}, clock_timestamp()
        from ${from} limit 1),
      touch as (
        update ${machines} set last_activity_at = now() where ${machines.id} = ${values.machineId} and exists (select 1 from ${from}))`;
  }

  /** One page of a workshop's (or one machine's) history, newest first; one row more than asked tells there is a next page. */
  historyPage(workshopId: string, f: HistoryFilter) {
    const where: (SQL | undefined)[] = [eq(auditEntries.workshopId, workshopId)];
    if (f.machineId) where.push(eq(auditEntries.machineId, f.machineId));
    if (f.recordType) where.push(eq(auditEntries.recordType, f.recordType));
    if (f.person) {
      const byName = ilike(auditEntries.actorName, `%${likeEscape(f.person)}%`);
      where.push(UUID.test(f.person) ? or(eq(auditEntries.actorId, f.person), byName) : byName);
    }
    if (f.from) where.push(gte(auditEntries.at, f.from));
    if (f.toExclusive) where.push(lt(auditEntries.at, f.toExclusive));
    if (f.after)
      where.push(sql`(${auditEntries.at}, ${auditEntries.id}) < (${f.after.at}::timestamptz, ${f.after.id}::uuid)`);
    return this.db
      .select({
        id: auditEntries.id,
        at: auditEntries.at,
        atText: sql<string>`${auditEntries.at}::text`,
        actorName: auditEntries.actorName,
        machineId: auditEntries.machineId,
        machineName: machines.name,
        recordType: auditEntries.recordType,
        recordId: auditEntries.recordId,
        action: auditEntries.action,
        summary: auditEntries.summary,
        changes: auditEntries.changes,
        txid: auditEntries.txid,
      })
      .from(auditEntries)
      .leftJoin(machines, eq(machines.id, auditEntries.machineId))
      .where(and(...where))
      .orderBy(desc(auditEntries.at), desc(auditEntries.id))
      .limit(f.limit + 1);
  }

  /** Every summary written by these transactions (to share their row changes out among them). */
  entriesOfTransactions(workshopId: string, txids: number[]) {
    if (!txids.length) return Promise.resolve([]);
    return this.db
      .select({ id: auditEntries.id, txid: auditEntries.txid, recordId: auditEntries.recordId })
      .from(auditEntries)
      .where(and(eq(auditEntries.workshopId, workshopId), inArray(auditEntries.txid, txids)))
      .orderBy(asc(auditEntries.at), asc(auditEntries.id));
  }

  /** The row changes those transactions made, with their values before and after. */
  changesOfTransactions(workshopId: string, txids: number[]) {
    if (!txids.length) return Promise.resolve([]);
    return this.db
      .select({
        txid: changeLog.txid,
        tableName: changeLog.tableName,
        recordId: changeLog.recordId,
        operation: changeLog.operation,
        oldValues: changeLog.oldValues,
        newValues: changeLog.newValues,
      })
      .from(changeLog)
      .where(
        and(
          inArray(changeLog.txid, txids),
          or(eq(changeLog.workshopId, workshopId), sql`${changeLog.workshopId} is null`),
        ),
      )
      .orderBy(asc(changeLog.at), asc(changeLog.id));
  }

  async touchMachine(machineId: string) {
    await this.db.update(machines).set({ lastActivityAt: new Date() }).where(eq(machines.id, machineId));
  }

  async lockOf(recordType: SignedRecordType, recordId: string) {
    const [row] = await this.db
      .select()
      .from(recordLocks)
      .where(and(eq(recordLocks.recordType, recordType), eq(recordLocks.recordId, recordId)))
      .limit(1);
    return row ?? null;
  }

  async lockedIds(recordType: SignedRecordType, recordIds: string[]): Promise<Set<string>> {
    if (!recordIds.length) return new Set();
    const rows = await this.db
      .select({ id: recordLocks.recordId })
      .from(recordLocks)
      .where(and(eq(recordLocks.recordType, recordType), inArray(recordLocks.recordId, recordIds)));
    return new Set(rows.map((r) => r.id));
  }

  async insertLocks(approvalId: string, refs: { recordType: SignedRecordType; recordId: string }[]) {
    if (!refs.length) return;
    await this.db
      .insert(recordLocks)
      .values(refs.map((r) => ({ ...r, approvalId })))
      .onConflictDoNothing();
  }
}
