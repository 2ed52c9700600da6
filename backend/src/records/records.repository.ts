import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, gte, ilike, inArray, lt, or, sql, type Placeholder, type SQL } from 'drizzle-orm';
import type { PgColumn, PgTable } from 'drizzle-orm/pg-core';
import { compiledSql, keysShape, slotsOf } from '../database/compiled-statement.js';
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
   * A record's insert, its audit entry and the machine's last activity in one statement. The entry
   * and the touch happen only if the insert wrote a row (`on conflict (id) do nothing`); answers
   * the new row's id, or null when it wrote none (its id was already taken). Built once per table
   * and set of columns (compiled-statement.ts): this is every sweep's write.
   */
  async insertWithAuditAndTouch<T extends RecordTable>(
    record: CheckInsert<T>,
    audit: Omit<typeof auditEntries.$inferInsert, 'recordId'> & { machineId: string },
  ): Promise<string | null> {
    let statement = this.checkInserts.get(record.table);
    if (!statement) this.checkInserts.set(record.table, (statement = this.checkInsertOf(record.table)));
    const values: Record<string, unknown> = { ...record.values };
    for (const [key, value] of Object.entries(auditSlotValues(audit))) values[`audit.${key}`] = value;
    const { rows } = await statement(this.db, values);
    return rows[0]?.id ?? null;
  }

  private readonly checkInserts = new Map<RecordTable, ReturnType<RecordsRepository['checkInsertOf']>>();

  private checkInsertOf(table: RecordTable) {
    return compiledSql<{ id: string }, Record<string, unknown>>((s, values) => {
      const recordValues = Object.fromEntries(
        Object.keys(values)
          .filter((k) => !k.startsWith('audit.'))
          .map((k) => [k, values[k]]),
      );
      const insert = this.db
        .insert(table)
        .values(slotsOf(s, recordValues) as never)
        .onConflictDoNothing({ target: table.id })
        .returning({ id: table.id });
      const a = (key: keyof AuditSlotValues) => s[`audit.${key}`];
      return sql`
      with rec as (${insert.getSQL()}), ${auditCtes('rec', {
        workshopId: a('workshopId'),
        machineId: a('machineId'),
        recordType: a('recordType'),
        recordId: sql`rec.id`,
        action: a('action'),
        summary: a('summary'),
        changes: a('changes'),
        actorId: a('actorId'),
        actorName: a('actorName'),
      })}
      select id from rec`;
    }, keysShape);
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
    const recordId =
      typeof values.recordId === 'string' ? sql`${values.recordId}::uuid` : (values.recordId ?? sql`null::uuid`);
    return auditCtes(when, { ...auditSlotValues(values), recordId });
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

/** A table a check's record goes into: its rows have a uuid `id`. */
export type RecordTable = PgTable & { id: PgColumn };

/** A check's record to insert: its table and the values of its row. */
export interface CheckInsert<T extends RecordTable = RecordTable> {
  table: T;
  values: T['$inferInsert'] & Record<string, unknown>;
}

/** An audit entry's values as they go into its statement (the changes already as JSON text). */
interface AuditSlotValues {
  workshopId: string;
  machineId: string;
  recordType: string;
  action: string;
  summary: string;
  changes: string | null;
  actorId: string | null;
  actorName: string;
}

function auditSlotValues(
  values: Omit<typeof auditEntries.$inferInsert, 'recordId'> & { machineId: string },
): AuditSlotValues {
  return {
    workshopId: values.workshopId,
    machineId: values.machineId,
    recordType: values.recordType,
    action: values.action,
    summary: values.summary ?? '',
    changes: values.changes === null || values.changes === undefined ? null : JSON.stringify(values.changes),
    actorId: values.actorId ?? null,
    actorName: values.actorName,
  };
}

type SqlValue = string | null | SQL | Placeholder;

/** The audit entry and the touch as common table expressions, from values or a compiled statement's slots. */
function auditCtes(when: string, v: { [K in keyof AuditSlotValues]: SqlValue } & { recordId: SQL }): SQL {
  const from = sql.identifier(when);
  return sql`audit as (
        insert into ${auditEntries} (workshop_id, machine_id, record_type, record_id, action, summary, changes, actor_id, actor_name, at)
        select ${v.workshopId}::uuid, ${v.machineId}::uuid, ${v.recordType}, ${v.recordId}, ${v.action}, ${v.summary},
               ${v.changes}::jsonb, ${v.actorId}::uuid, ${v.actorName}, clock_timestamp()
        from ${from} limit 1),
      touch as (
        update ${machines} set last_activity_at = now() where ${machines.id} = ${v.machineId}::uuid and exists (select 1 from ${from}))`;
}
