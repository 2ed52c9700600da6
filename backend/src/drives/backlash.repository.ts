import { Inject, Injectable } from '@nestjs/common';
import { and, eq, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { backlashChecks } from '../database/schema/index.js';

export type BacklashCheckRow = typeof backlashChecks.$inferSelect;

/** The newest backlash check of an axis as readiness reads it. */
export interface LatestBacklash {
  id: string;
  axisId: string;
  createdAt: Date;
  readingUnit: string;
  resolution: number | null;
  result: Record<string, unknown>;
}

const uuidArray = (ids: string[]) =>
  sql`array[${sql.join(
    ids.map((id) => sql`${id}`),
    sql`, `,
  )}]::uuid[]`;

/** Backlash checks of axes, newest first. */
@Injectable()
export class BacklashRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** A page of the axis's checks, newest first: `limit + 1` rows so the caller knows whether more follow. */
  async page(workshopId: string, axisId: string, afterId: string | null, limit: number): Promise<BacklashCheckRow[]> {
    const after = afterId
      ? sql`and (${backlashChecks.createdAt}, ${backlashChecks.id}) < (select c.created_at, c.id from backlash_checks c where c.id = ${afterId} and c.workshop_id = ${workshopId} and c.axis_id = ${axisId})`
      : sql``;
    return this.db
      .select()
      .from(backlashChecks)
      .where(sql`${backlashChecks.workshopId} = ${workshopId} and ${backlashChecks.axisId} = ${axisId} ${after}`)
      .orderBy(sql`${backlashChecks.createdAt} desc, ${backlashChecks.id} desc`)
      .limit(limit + 1);
  }

  async find(workshopId: string, axisId: string, id: string): Promise<BacklashCheckRow | null> {
    const [row] = await this.db
      .select()
      .from(backlashChecks)
      .where(
        and(eq(backlashChecks.workshopId, workshopId), eq(backlashChecks.axisId, axisId), eq(backlashChecks.id, id)),
      );
    return row ?? null;
  }

  async byId(workshopId: string, id: string): Promise<BacklashCheckRow | null> {
    const [row] = await this.db
      .select()
      .from(backlashChecks)
      .where(and(eq(backlashChecks.workshopId, workshopId), eq(backlashChecks.id, id)));
    return row ?? null;
  }

  async insert(values: typeof backlashChecks.$inferInsert): Promise<BacklashCheckRow> {
    const [row] = await this.db.insert(backlashChecks).values(values).returning();
    return row;
  }

  async delete(workshopId: string, id: string): Promise<void> {
    await this.db
      .delete(backlashChecks)
      .where(and(eq(backlashChecks.workshopId, workshopId), eq(backlashChecks.id, id)));
  }

  /** The newest check of each axis listed: one index step per axis (backlash_checks_axis_idx). */
  async latest(workshopId: string, axisIds: string[]): Promise<Map<string, LatestBacklash>> {
    if (!axisIds.length) return new Map();
    const { rows } = await this.db.execute<{
      id: string;
      axis_id: string;
      created_at: string;
      reading_unit: string;
      resolution: number | null;
      result: Record<string, unknown>;
    }>(sql`
      select b.* from unnest(${uuidArray(axisIds)}) as a(id)
      cross join lateral (
        select x.id, x.axis_id, x.created_at, x.reading_unit, x.resolution, x.result
        from backlash_checks x where x.workshop_id = ${workshopId} and x.axis_id = a.id
        order by x.created_at desc limit 1
      ) b`);
    return new Map(
      rows.map((r) => [
        r.axis_id,
        {
          id: r.id,
          axisId: r.axis_id,
          createdAt: new Date(r.created_at),
          readingUnit: r.reading_unit,
          resolution: r.resolution === null ? null : Number(r.resolution),
          result: r.result,
        },
      ]),
    );
  }
}
