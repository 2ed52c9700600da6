import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { positioningRuns, travelTrials } from '../database/schema/index.js';

export type TravelTrialRow = typeof travelTrials.$inferSelect;
export type PositioningRunRow = typeof positioningRuns.$inferSelect;

/** Travel trials and repeat-and-reverse runs of axes, newest first. */
@Injectable()
export class AxisChecksRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  trials(workshopId: string, axisId: string): Promise<TravelTrialRow[]> {
    return this.db
      .select()
      .from(travelTrials)
      .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.axisId, axisId)))
      .orderBy(desc(travelTrials.createdAt));
  }

  async trial(workshopId: string, axisId: string, id: string): Promise<TravelTrialRow | null> {
    const [row] = await this.db
      .select()
      .from(travelTrials)
      .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.axisId, axisId), eq(travelTrials.id, id)));
    return row ?? null;
  }

  async trialById(workshopId: string, id: string): Promise<TravelTrialRow | null> {
    const [row] = await this.db.select().from(travelTrials).where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.id, id)));
    return row ?? null;
  }

  async runById(workshopId: string, id: string): Promise<PositioningRunRow | null> {
    const [row] = await this.db.select().from(positioningRuns).where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.id, id)));
    return row ?? null;
  }

  async insertTrial(values: typeof travelTrials.$inferInsert): Promise<TravelTrialRow> {
    const [row] = await this.db.insert(travelTrials).values(values).returning();
    return row;
  }

  async markApplied(workshopId: string, id: string, byName: string): Promise<TravelTrialRow> {
    const [row] = await this.db
      .update(travelTrials)
      .set({ appliedAt: new Date(), appliedByName: byName, updatedAt: new Date() })
      .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.id, id)))
      .returning();
    return row;
  }

  async deleteTrial(workshopId: string, id: string): Promise<void> {
    await this.db.delete(travelTrials).where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.id, id)));
  }

  runs(workshopId: string, axisId: string): Promise<PositioningRunRow[]> {
    return this.db
      .select()
      .from(positioningRuns)
      .where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.axisId, axisId)))
      .orderBy(desc(positioningRuns.createdAt));
  }

  async run(workshopId: string, axisId: string, id: string): Promise<PositioningRunRow | null> {
    const [row] = await this.db
      .select()
      .from(positioningRuns)
      .where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.axisId, axisId), eq(positioningRuns.id, id)));
    return row ?? null;
  }

  async insertRun(values: typeof positioningRuns.$inferInsert): Promise<PositioningRunRow> {
    const [row] = await this.db.insert(positioningRuns).values(values).returning();
    return row;
  }

  async deleteRun(workshopId: string, id: string): Promise<void> {
    await this.db.delete(positioningRuns).where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.id, id)));
  }

  /** The newest trial of each axis listed. */
  async latestTrials(workshopId: string, axisIds: string[]): Promise<Map<string, TravelTrialRow>> {
    if (!axisIds.length) return new Map();
    const rows = await this.db
      .select()
      .from(travelTrials)
      .where(and(eq(travelTrials.workshopId, workshopId), inArray(travelTrials.axisId, axisIds)))
      .orderBy(desc(travelTrials.createdAt));
    return firstPerAxis(rows);
  }

  /** The newest run of each axis listed. */
  async latestRuns(workshopId: string, axisIds: string[]): Promise<Map<string, PositioningRunRow>> {
    if (!axisIds.length) return new Map();
    const rows = await this.db
      .select()
      .from(positioningRuns)
      .where(and(eq(positioningRuns.workshopId, workshopId), inArray(positioningRuns.axisId, axisIds)))
      .orderBy(desc(positioningRuns.createdAt));
    return firstPerAxis(rows);
  }

  /** Ids of every trial and run of an axis (to check approval locks before deleting it). */
  async idsOfAxis(workshopId: string, axisId: string) {
    const [trials, runs] = await Promise.all([
      this.db.select({ id: travelTrials.id }).from(travelTrials).where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.axisId, axisId))),
      this.db.select({ id: positioningRuns.id }).from(positioningRuns).where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.axisId, axisId))),
    ]);
    return { trialIds: trials.map((t) => t.id), runIds: runs.map((r) => r.id) };
  }
}

function firstPerAxis<T extends { axisId: string }>(rows: T[]): Map<string, T> {
  const out = new Map<string, T>();
  for (const r of rows) if (!out.has(r.axisId)) out.set(r.axisId, r);
  return out;
}
