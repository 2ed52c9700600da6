import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { positioningRuns, travelTrials } from '../database/schema/index.js';

export type TravelTrialRow = typeof travelTrials.$inferSelect;
export type PositioningRunRow = typeof positioningRuns.$inferSelect;

/** The newest trial or run of an axis as readiness reads it; `result` holds only the headline figures unless full. */
export interface LatestAxisCheck {
  id: string;
  axisId: string;
  createdAt: Date;
  result: Record<string, unknown>;
}
export type LatestTrial = LatestAxisCheck & { stepsPerMmUsed: number; appliedAt: Date | null };

/** The figures the board and the Drives tab read; the certificate's series needs the whole result. */
const TRIAL_FIGURES = ['errorPercent', 'correctedStepsPerMm'];
const RUN_FIGURES = ['accuracyMm', 'repeatabilityMm', 'reversalMm'];
const figures = (names: string[]) => sql.raw(`jsonb_build_object(${names.map((n) => `'${n}', x.result->'${n}'`).join(', ')})`);
const uuidArray = (ids: string[]) => sql`array[${sql.join(ids.map((id) => sql`${id}`), sql`, `)}]::uuid[]`;

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

  /**
   * The newest trial of each axis listed: one index step per axis (travel_trials_axis_idx), so the
   * cost does not grow with the trials recorded; the whole stored result only when `full`.
   */
  async latestTrials(workshopId: string, axisIds: string[], full = true): Promise<Map<string, LatestTrial>> {
    if (!axisIds.length) return new Map();
    const { rows } = await this.db.execute<{ id: string; axis_id: string; created_at: string; steps_per_mm_used: number; applied_at: string | null; result: Record<string, unknown> }>(sql`
      select t.* from unnest(${uuidArray(axisIds)}) as a(id)
      cross join lateral (
        select x.id, x.axis_id, x.created_at, x.steps_per_mm_used, x.applied_at, ${full ? sql`x.result` : figures(TRIAL_FIGURES)} as result
        from travel_trials x where x.workshop_id = ${workshopId} and x.axis_id = a.id
        order by x.created_at desc limit 1
      ) t`);
    return new Map(
      rows.map((r) => [
        r.axis_id,
        { id: r.id, axisId: r.axis_id, createdAt: new Date(r.created_at), stepsPerMmUsed: Number(r.steps_per_mm_used), appliedAt: r.applied_at ? new Date(r.applied_at) : null, result: r.result },
      ]),
    );
  }

  /** The newest run of each axis listed, the same way. */
  async latestRuns(workshopId: string, axisIds: string[], full = true): Promise<Map<string, LatestAxisCheck>> {
    if (!axisIds.length) return new Map();
    const { rows } = await this.db.execute<{ id: string; axis_id: string; created_at: string; result: Record<string, unknown> }>(sql`
      select r.* from unnest(${uuidArray(axisIds)}) as a(id)
      cross join lateral (
        select x.id, x.axis_id, x.created_at, ${full ? sql`x.result` : figures(RUN_FIGURES)} as result
        from positioning_runs x where x.workshop_id = ${workshopId} and x.axis_id = a.id
        order by x.created_at desc limit 1
      ) r`);
    return new Map(rows.map((r) => [r.axis_id, { id: r.id, axisId: r.axis_id, createdAt: new Date(r.created_at), result: r.result }]));
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
