import { and, eq, getTableColumns, getTableName, sql, type Column } from 'drizzle-orm';
import { getTableConfig, type PgTable } from 'drizzle-orm/pg-core';
import type { Database } from '../database/database.tokens.js';
import { rowFromDriver } from '../database/row-from-driver.js';
import { RECORD_TYPES, type SignedRecordType } from './kinds.js';

/**
 * A table of check records that hang under a parent (an axis, a rail or a machine): each row has
 * its own id, the workshop it belongs to, the parent, and the time it was recorded, and the table
 * has an index on (workshop, parent, time) so the newest of a parent is one index step away.
 */
export interface CheckTableSpec<T extends PgTable> {
  /** The record type (kinds.ts) whose table this is. */
  type: SignedRecordType;
  table: T;
  /** The property (not the SQL name) of the column naming the parent: `axisId`, `machineId`. */
  parent: keyof T['$inferSelect'] & string;
  /** The property of the time records are ordered by; `createdAt` unless the table keeps another. */
  time?: keyof T['$inferSelect'] & string;
}

/**
 * A check's table as its service declares it, its parent and time checked against the table's
 * columns by the type-checker: `checkTable({ type: 'backlash-check', table: backlashChecks, parent: 'axisId' })`.
 */
export const checkTable = <T extends PgTable>(spec: CheckTableSpec<T>) => spec;

/**
 * Why a declared table cannot serve as a check's records, or null: it must be the table kinds.ts
 * names for its record type, and an index must lead with (workshop, parent, time) in that order,
 * or the newest of a parent and each page stop being one index step (PostgreSQL manual, "Indexes
 * and ORDER BY"). The repository refuses such a table when the server starts.
 */
export function checkTableProblem(spec: CheckTableSpec<PgTable>): string | null {
  const name = getTableName(spec.table);
  const named = RECORD_TYPES[spec.type].table;
  if (name !== named) return `${spec.type} records are kept in ${named}, not ${name}`;
  const byKey = getTableColumns(spec.table) as Record<string, Column>;
  const wanted = ['workshopId', spec.parent, spec.time ?? 'createdAt'].map((k) => byKey[k]?.name);
  const indexes = getTableConfig(spec.table).indexes.map((i) =>
    i.config.columns.map((c) => ('name' in c ? (c as { name: string }).name : '')),
  );
  if (wanted.some((n) => !n) || !indexes.some((cols) => wanted.every((n, i) => cols[i] === n)))
    return `${name} needs an index on (${wanted.join(', ')}), in that order`;
  return null;
}

const uuidArray = (ids: string[]) =>
  sql`array[${sql.join(
    ids.map((id) => sql`${id}`),
    sql`, `,
  )}]::uuid[]`;

/**
 * The SQL of one table of check records, the same for every check: a page newest first, one record
 * under its parent or in the workshop, insert, delete, and the newest record of each parent. Every
 * method takes the workshop first and puts it in the `where`; rows come back as the table's own
 * `$inferSelect`.
 */
export class CheckRecords<T extends PgTable> {
  private readonly name: string;
  private readonly columns: Record<string, Column>;
  private readonly id: Column;
  private readonly workshop: Column;
  private readonly parent: Column;
  private readonly time: Column;

  constructor(
    private readonly db: Database,
    private readonly spec: CheckTableSpec<T>,
  ) {
    this.name = getTableName(spec.table);
    this.columns = getTableColumns(spec.table) as Record<string, Column>;
    const column = (key: string) => {
      const found = this.columns[key];
      if (!found) throw new Error(`${this.name} has no column ${key}`);
      return found;
    };
    this.id = column('id');
    this.workshop = column('workshopId');
    this.parent = column(spec.parent);
    this.time = column(spec.time ?? 'createdAt');
  }

  /**
   * A page of the parent's records, newest first (ties by id): `limit + 1` rows, so the caller
   * knows whether another page follows. The cursor is the id of the last record of the page
   * before; one of another parent or workshop matches nothing, so the page is empty.
   */
  page(workshopId: string, parentId: string, afterId: string | null, limit: number): Promise<T['$inferSelect'][]> {
    const table = sql.identifier(this.name);
    const col = (c: Column) => sql.identifier(c.name);
    const after = afterId
      ? sql`and (${this.time}, ${this.id}) < (select c.${col(this.time)}, c.${col(this.id)} from ${table} c where c.${col(this.id)} = ${afterId} and c.${col(this.workshop)} = ${workshopId} and c.${col(this.parent)} = ${parentId})`
      : sql``;
    return this.select()
      .where(sql`${this.workshop} = ${workshopId} and ${this.parent} = ${parentId} ${after}`)
      .orderBy(sql`${this.time} desc, ${this.id} desc`)
      .limit(limit + 1) as Promise<T['$inferSelect'][]>;
  }

  /** The parent's newest `count` records, newest first (ties by id): a list shown whole, or the newest alone. */
  newest(workshopId: string, parentId: string, count: number): Promise<T['$inferSelect'][]> {
    return this.page(workshopId, parentId, null, count - 1);
  }

  /** The record with this id under this parent, or null. */
  async find(workshopId: string, parentId: string, id: string): Promise<T['$inferSelect'] | null> {
    const [row] = await this.select().where(
      and(eq(this.workshop, workshopId), eq(this.parent, parentId), eq(this.id, id)),
    );
    return (row as T['$inferSelect'] | undefined) ?? null;
  }

  /** The record with this id in the workshop, whatever its parent (evidence and signing name it by id alone). */
  async byId(workshopId: string, id: string): Promise<T['$inferSelect'] | null> {
    const [row] = await this.select().where(and(eq(this.workshop, workshopId), eq(this.id, id)));
    return (row as T['$inferSelect'] | undefined) ?? null;
  }

  async insert(values: T['$inferInsert']): Promise<T['$inferSelect']> {
    const [row] = await this.db
      .insert(this.spec.table)
      .values(values as never)
      .returning();
    return row as T['$inferSelect'];
  }

  async delete(workshopId: string, id: string): Promise<void> {
    await this.db.delete(this.spec.table).where(and(eq(this.workshop, workshopId), eq(this.id, id)));
  }

  /**
   * The newest record of each parent listed (ties by id), keyed by parent: one index step per
   * parent, so the cost does not grow with the records kept. A parent without records is absent.
   */
  async latest(workshopId: string, parentIds: string[]): Promise<Map<string, T['$inferSelect']>> {
    if (!parentIds.length) return new Map();
    const col = (c: Column) => sql.identifier(c.name);
    const { rows } = await this.db.execute<Record<string, unknown>>(sql`
      select n.* from unnest(${uuidArray([...new Set(parentIds)])}) as p(id)
      cross join lateral (
        select x.* from ${sql.identifier(this.name)} x
        where x.${col(this.workshop)} = ${workshopId} and x.${col(this.parent)} = p.id
        order by x.${col(this.time)} desc, x.${col(this.id)} desc limit 1
      ) n`);
    const found = new Map<string, T['$inferSelect']>();
    for (const raw of rows) {
      const row = this.fromDriver(raw);
      found.set(row[this.spec.parent] as string, row);
    }
    return found;
  }

  private select() {
    return this.db.select().from(this.spec.table as PgTable);
  }

  /** A raw row (SQL names, driver values) as the query builder would have returned it. */
  private fromDriver(raw: Record<string, unknown>): T['$inferSelect'] {
    return rowFromDriver(this.spec.table, raw);
  }
}
