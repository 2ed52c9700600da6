import { Inject, Injectable } from '@nestjs/common';
import { and, eq, sql } from 'drizzle-orm';
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
const TRIAL_FIGURES = ['errorPercent', 'correctedStepsPerMm', 'warnings'];
const RUN_FIGURES = ['accuracyMm', 'repeatabilityMm', 'reversalMm', 'warnings'];
const figures = (names: string[]) =>
  sql.raw(`jsonb_build_object(${names.map((n) => `'${n}', x.result->'${n}'`).join(', ')})`);
/** A travel trial as a page of its axis's list shows it: the headline figures, no moves. */
export interface TravelTrialListRow {
  id: string;
  axisId: string;
  machineId: string;
  lengthUnit: string;
  readingUnit: string;
  stepsPerMmUsed: number;
  throughOrigin: boolean;
  moveCount: number;
  /** The headline figures of the stored result only (TRIAL_LIST_FIGURES). */
  result: Record<string, unknown>;
  recordedByName: string;
  createdAt: Date;
  appliedAt: Date | null;
  appliedByName: string | null;
}

/** A repeat-and-reverse run as a page of its axis's list shows it: the headline figures, no deviations. */
export interface PositioningRunListRow {
  id: string;
  axisId: string;
  machineId: string;
  lengthUnit: string;
  readingUnit: string;
  targetCount: number;
  runCount: number;
  /** The headline figures of the stored result only (RUN_FIGURES). */
  result: Record<string, unknown>;
  recordedByName: string;
  createdAt: Date;
}

const TRIAL_LIST_FIGURES = [
  'correctedStepsPerMm',
  'errorPercent',
  'scale',
  'offsetMm',
  'residualMaxMm',
  'farFromTheory',
  'warnings',
];
// A damaged row may hold something other than a list; it counts as none rather than failing the page.
const lengthOf = (column: string) =>
  sql.raw(`case jsonb_typeof(x.${column}) when 'array' then jsonb_array_length(x.${column}) else 0 end`);
/** Rows after the cursor's record in newest-first order (none when the cursor is not of this axis). */
const afterCursor = (table: string, workshopId: string, axisId: string, afterId: string | null) =>
  afterId
    ? sql`and (x.created_at, x.id) < (select c.created_at, c.id from ${sql.raw(table)} c where c.id = ${afterId} and c.workshop_id = ${workshopId} and c.axis_id = ${axisId})`
    : sql``;
const uuidArray = (ids: string[]) =>
  sql`array[${sql.join(
    ids.map((id) => sql`${id}`),
    sql`, `,
  )}]::uuid[]`;

/** Travel trials and repeat-and-reverse runs of axes, newest first. */
@Injectable()
export class AxisChecksRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /**
   * A page of the axis's trials, newest first, summary columns only: `limit + 1` rows so the
   * caller knows whether another page follows. Walks travel_trials_axis_idx from the cursor.
   */
  async trialPage(
    workshopId: string,
    axisId: string,
    afterId: string | null,
    limit: number,
  ): Promise<TravelTrialListRow[]> {
    const { rows } = await this.db.execute<{
      id: string;
      axis_id: string;
      machine_id: string;
      length_unit: string;
      reading_unit: string;
      steps_per_mm_used: number;
      through_origin: boolean;
      move_count: number;
      result: Record<string, unknown>;
      recorded_by_name: string;
      created_at: string;
      applied_at: string | null;
      applied_by_name: string | null;
    }>(sql`
      select x.id, x.axis_id, x.machine_id, x.length_unit, x.reading_unit, x.steps_per_mm_used, x.through_origin, ${lengthOf('moves')} as move_count,
             ${figures(TRIAL_LIST_FIGURES)} as result, x.recorded_by_name, x.created_at, x.applied_at, x.applied_by_name
      from travel_trials x
      where x.workshop_id = ${workshopId} and x.axis_id = ${axisId} ${afterCursor('travel_trials', workshopId, axisId, afterId)}
      order by x.created_at desc, x.id desc
      limit ${limit + 1}`);
    return rows.map((r) => ({
      id: r.id,
      axisId: r.axis_id,
      machineId: r.machine_id,
      lengthUnit: r.length_unit,
      readingUnit: r.reading_unit,
      stepsPerMmUsed: Number(r.steps_per_mm_used),
      throughOrigin: r.through_origin,
      moveCount: Number(r.move_count),
      result: r.result,
      recordedByName: r.recorded_by_name,
      createdAt: new Date(r.created_at),
      appliedAt: r.applied_at ? new Date(r.applied_at) : null,
      appliedByName: r.applied_by_name,
    }));
  }

  async trial(workshopId: string, axisId: string, id: string): Promise<TravelTrialRow | null> {
    const [row] = await this.db
      .select()
      .from(travelTrials)
      .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.axisId, axisId), eq(travelTrials.id, id)));
    return row ?? null;
  }

  async trialById(workshopId: string, id: string): Promise<TravelTrialRow | null> {
    const [row] = await this.db
      .select()
      .from(travelTrials)
      .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.id, id)));
    return row ?? null;
  }

  async runById(workshopId: string, id: string): Promise<PositioningRunRow | null> {
    const [row] = await this.db
      .select()
      .from(positioningRuns)
      .where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.id, id)));
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

  /** A page of the axis's runs, newest first, summary columns only (`limit + 1` rows, as trialPage). */
  async runPage(
    workshopId: string,
    axisId: string,
    afterId: string | null,
    limit: number,
  ): Promise<PositioningRunListRow[]> {
    const { rows } = await this.db.execute<{
      id: string;
      axis_id: string;
      machine_id: string;
      length_unit: string;
      reading_unit: string;
      target_count: number;
      run_count: number;
      result: Record<string, unknown>;
      recorded_by_name: string;
      created_at: string;
    }>(sql`
      select x.id, x.axis_id, x.machine_id, x.length_unit, x.reading_unit, ${lengthOf('targets')} as target_count, ${lengthOf('runs')} as run_count,
             ${figures(RUN_FIGURES)} as result, x.recorded_by_name, x.created_at
      from positioning_runs x
      where x.workshop_id = ${workshopId} and x.axis_id = ${axisId} ${afterCursor('positioning_runs', workshopId, axisId, afterId)}
      order by x.created_at desc, x.id desc
      limit ${limit + 1}`);
    return rows.map((r) => ({
      id: r.id,
      axisId: r.axis_id,
      machineId: r.machine_id,
      lengthUnit: r.length_unit,
      readingUnit: r.reading_unit,
      targetCount: Number(r.target_count),
      runCount: Number(r.run_count),
      result: r.result,
      recordedByName: r.recorded_by_name,
      createdAt: new Date(r.created_at),
    }));
  }

  async run(workshopId: string, axisId: string, id: string): Promise<PositioningRunRow | null> {
    const [row] = await this.db
      .select()
      .from(positioningRuns)
      .where(
        and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.axisId, axisId), eq(positioningRuns.id, id)),
      );
    return row ?? null;
  }

  async insertRun(values: typeof positioningRuns.$inferInsert): Promise<PositioningRunRow> {
    const [row] = await this.db.insert(positioningRuns).values(values).returning();
    return row;
  }

  async deleteRun(workshopId: string, id: string): Promise<void> {
    await this.db
      .delete(positioningRuns)
      .where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.id, id)));
  }

  /**
   * The newest trial of each axis listed: one index step per axis (travel_trials_axis_idx), so the
   * cost does not grow with the trials recorded; the whole stored result only when `full`.
   */
  async latestTrials(workshopId: string, axisIds: string[], full = true): Promise<Map<string, LatestTrial>> {
    if (!axisIds.length) return new Map();
    const { rows } = await this.db.execute<{
      id: string;
      axis_id: string;
      created_at: string;
      steps_per_mm_used: number;
      applied_at: string | null;
      result: Record<string, unknown>;
    }>(sql`
      select t.* from unnest(${uuidArray(axisIds)}) as a(id)
      cross join lateral (
        select x.id, x.axis_id, x.created_at, x.steps_per_mm_used, x.applied_at, ${full ? sql`x.result` : figures(TRIAL_FIGURES)} as result
        from travel_trials x where x.workshop_id = ${workshopId} and x.axis_id = a.id
        order by x.created_at desc limit 1
      ) t`);
    return new Map(
      rows.map((r) => [
        r.axis_id,
        {
          id: r.id,
          axisId: r.axis_id,
          createdAt: new Date(r.created_at),
          stepsPerMmUsed: Number(r.steps_per_mm_used),
          appliedAt: r.applied_at ? new Date(r.applied_at) : null,
          result: r.result,
        },
      ]),
    );
  }

  /** The newest run of each axis listed, the same way. */
  async latestRuns(workshopId: string, axisIds: string[], full = true): Promise<Map<string, LatestAxisCheck>> {
    if (!axisIds.length) return new Map();
    const { rows } = await this.db.execute<{
      id: string;
      axis_id: string;
      created_at: string;
      result: Record<string, unknown>;
    }>(sql`
      select r.* from unnest(${uuidArray(axisIds)}) as a(id)
      cross join lateral (
        select x.id, x.axis_id, x.created_at, ${full ? sql`x.result` : figures(RUN_FIGURES)} as result
        from positioning_runs x where x.workshop_id = ${workshopId} and x.axis_id = a.id
        order by x.created_at desc limit 1
      ) r`);
    return new Map(
      rows.map((r) => [
        r.axis_id,
        { id: r.id, axisId: r.axis_id, createdAt: new Date(r.created_at), result: r.result },
      ]),
    );
  }

  /** Ids of every trial and run of an axis (to check approval locks before deleting it). */
  async idsOfAxis(workshopId: string, axisId: string) {
    const [trials, runs] = await Promise.all([
      this.db
        .select({ id: travelTrials.id })
        .from(travelTrials)
        .where(and(eq(travelTrials.workshopId, workshopId), eq(travelTrials.axisId, axisId))),
      this.db
        .select({ id: positioningRuns.id })
        .from(positioningRuns)
        .where(and(eq(positioningRuns.workshopId, workshopId), eq(positioningRuns.axisId, axisId))),
    ]);
    return { trialIds: trials.map((t) => t.id), runIds: runs.map((r) => r.id) };
  }
}
