import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, isNull, ne, or } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { machineReadiness, machines, targetSets, waivers } from '../database/schema/index.js';

export type ReadinessSummaryRow = typeof machineReadiness.$inferSelect;
export type SummaryWaiverRow = typeof waivers.$inferSelect;

/** The reads a readiness count needs besides the contributors', and the summary rows themselves. */
@Injectable()
export class ReadinessSummaryRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async targetSet(workshopId: string, id: string) {
    const [row] = await this.db
      .select({ id: targetSets.id, name: targetSets.name, targets: targetSets.targets })
      .from(targetSets)
      .where(and(eq(targetSets.workshopId, workshopId), eq(targetSets.id, id)));
    return row ?? null;
  }

  async machine(workshopId: string, id: string) {
    const [row] = await this.db
      .select({
        id: machines.id,
        workshopId: machines.workshopId,
        targetSetId: machines.targetSetId,
        kind: machines.kind,
        workAreaXMm: machines.workAreaXMm,
        workAreaYMm: machines.workAreaYMm,
      })
      .from(machines)
      .where(and(eq(machines.workshopId, workshopId), eq(machines.id, id)));
    return row ?? null;
  }

  /** Newest first, as the board picks the newest waiver of a check. */
  waivers(workshopId: string, machineId: string): Promise<SummaryWaiverRow[]> {
    return this.db
      .select()
      .from(waivers)
      .where(and(eq(waivers.workshopId, workshopId), eq(waivers.machineId, machineId)))
      .orderBy(desc(waivers.waivedAt));
  }

  async machineIds(workshopId: string, targetSetId?: string): Promise<string[]> {
    const rows = await this.db
      .select({ id: machines.id })
      .from(machines)
      .where(and(eq(machines.workshopId, workshopId), targetSetId ? eq(machines.targetSetId, targetSetId) : undefined));
    return rows.map((r) => r.id);
  }

  /** Machines of every workshop whose summary is missing or was counted another way. */
  missingOrOlder(version: number) {
    return this.db
      .select({ id: machines.id, workshopId: machines.workshopId })
      .from(machines)
      .leftJoin(machineReadiness, eq(machineReadiness.machineId, machines.id))
      .where(or(isNull(machineReadiness.machineId), ne(machineReadiness.version, version)));
  }

  async upsert(values: typeof machineReadiness.$inferInsert): Promise<void> {
    const { machineId: _m, ...rest } = values;
    await this.db
      .insert(machineReadiness)
      .values(values)
      .onConflictDoUpdate({ target: machineReadiness.machineId, set: { ...rest, refreshedAt: new Date() } });
  }
}
