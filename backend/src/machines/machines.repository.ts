import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, getTableColumns, sql } from 'drizzle-orm';
import { DRIZZLE, ROOT_DRIZZLE, type Database } from '../database/database.tokens.js';
import { TransactionContext } from '../database/transaction-context.js';
import { machineReadiness, machines, targetSets } from '../database/schema/index.js';
import type { MachineRow } from './machine.mapper.js';
import { machineStateNow } from './machine-state.js';

// Every read of a machine gives the state it reads as now (a passed re-check date included).
const machineNow = { ...getTableColumns(machines), state: machineStateNow() };

@Injectable()
export class MachinesRepository {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(ROOT_DRIZZLE) private readonly root: Database,
    private readonly transactions: TransactionContext,
  ) {}

  /**
   * The workshop's machines with their readiness summaries (counts only): one statement, whatever
   * their history, each in the state it reads as now.
   * Outside a command it is a named prepared statement: the most read page is not rebuilt and
   * re-planned on every request.
   */
  list(workshopId: string) {
    if (this.transactions.inTransaction()) return this.listQuery(this.db, eq(machines.workshopId, workshopId));
    this.preparedList ??= this.listQuery(this.root, eq(machines.workshopId, sql.placeholder('workshopId'))).prepare(
      'machines_list',
    );
    return this.preparedList.execute({ workshopId });
  }

  private preparedList: ReturnType<ReturnType<MachinesRepository['listQuery']>['prepare']> | null = null;

  private listQuery(db: Database, workshop: ReturnType<typeof eq>) {
    return db
      .select({
        machine: machineNow,
        targetSetName: targetSets.name,
        readiness: {
          total: machineReadiness.total,
          within: machineReadiness.within,
          outside: machineReadiness.outside,
          waived: machineReadiness.waived,
          notStarted: machineReadiness.notStarted,
          firstBlocking: machineReadiness.firstBlocking,
        },
      })
      .from(machines)
      .innerJoin(targetSets, eq(targetSets.id, machines.targetSetId))
      .leftJoin(machineReadiness, eq(machineReadiness.machineId, machines.id))
      .where(workshop)
      .orderBy(desc(machines.lastActivityAt));
  }

  async find(workshopId: string, id: string) {
    const [row] = await this.db
      .select({ machine: machineNow, targetSetName: targetSets.name })
      .from(machines)
      .innerJoin(targetSets, eq(targetSets.id, machines.targetSetId))
      .where(and(eq(machines.workshopId, workshopId), eq(machines.id, id)));
    return row ?? null;
  }

  /** The machine's row, locked until the current command commits: its state cannot move meanwhile. */
  async lock(workshopId: string, id: string): Promise<MachineRow | null> {
    const [row] = await this.db
      .select(machineNow)
      .from(machines)
      .where(and(eq(machines.workshopId, workshopId), eq(machines.id, id)))
      .for('no key update');
    return row ?? null;
  }

  async insert(values: typeof machines.$inferInsert): Promise<MachineRow> {
    const [row] = await this.db.insert(machines).values(values).returning();
    return row;
  }

  async update(workshopId: string, id: string, values: Partial<typeof machines.$inferInsert>): Promise<MachineRow> {
    const [row] = await this.db
      .update(machines)
      .set({ ...values, version: sql`${machines.version} + 1`, updatedAt: new Date(), lastActivityAt: new Date() })
      .where(and(eq(machines.workshopId, workshopId), eq(machines.id, id)))
      .returning();
    return row;
  }
}
