import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { machines, targetSets, type TargetValue } from '../database/schema/index.js';
import type { TargetSetRow } from './target-set.mapper.js';
import { withDefaultTargets } from './default-target-sets.js';
import { machineStateNow } from '../machines/machine-state.js';

@Injectable()
export class TargetSetsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** Every set read here has every key: one a stored set lacks is the product's default (default-target-sets.ts). */
  async list(workshopId: string): Promise<TargetSetRow[]> {
    const rows = await this.db
      .select()
      .from(targetSets)
      .where(eq(targetSets.workshopId, workshopId))
      .orderBy(asc(targetSets.createdAt));
    return rows.map(complete);
  }

  async find(workshopId: string, id: string): Promise<TargetSetRow | null> {
    const [row] = await this.db
      .select()
      .from(targetSets)
      .where(and(eq(targetSets.workshopId, workshopId), eq(targetSets.id, id)));
    return row ? complete(row) : null;
  }

  async insert(
    workshopId: string,
    values: { name: string; description: string; targets: Record<string, TargetValue> },
  ) {
    const [row] = await this.db
      .insert(targetSets)
      .values({ workshopId, ...values })
      .returning();
    return row;
  }

  async update(
    workshopId: string,
    id: string,
    values: Partial<{ name: string; description: string; targets: Record<string, TargetValue> }>,
  ) {
    const [row] = await this.db
      .update(targetSets)
      .set({ ...values, updatedAt: new Date() })
      .where(and(eq(targetSets.workshopId, workshopId), eq(targetSets.id, id)))
      .returning();
    return row;
  }

  /** The workshop's machines judged against each target set (one query for every set). */
  machinesUsing(workshopId: string) {
    return this.db
      .select({ targetSetId: machines.targetSetId, id: machines.id, name: machines.name, state: machineStateNow() })
      .from(machines)
      .where(eq(machines.workshopId, workshopId))
      .orderBy(asc(machines.name));
  }
}

const complete = (row: TargetSetRow): TargetSetRow => ({ ...row, targets: withDefaultTargets(row.targets) });
