import { Inject, Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import { compiledQuery, type Slots } from '../database/compiled-statement.js';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import type { CheckInsert } from '../records/records.repository.js';
import { rowFromDriver } from '../database/row-from-driver.js';
import { machines, rails, railSweeps, targetSets } from '../database/schema/index.js';

export type RailRow = typeof rails.$inferSelect;
type TargetSetRow = typeof targetSets.$inferSelect;
export type SweepRow = typeof railSweeps.$inferSelect;
type RailInsert = typeof rails.$inferInsert;

/** What the readiness board and the rails tab need of a rail's newest sweep: no reading arrays. */
export interface LatestSweep {
  id: string;
  railId: string;
  takenAt: Date;
  phase: SweepRow['phase'];
  datum: string | null;
  status: SweepRow['status'];
  leastSquaresStraightness: number;
  minimumZoneStraightness: number;
  stationCount: number;
  target: SweepRow['target'];
  face: SweepRow['face'];
  readingUnit: SweepRow['readingUnit'];
  lengthUnit: SweepRow['lengthUnit'];
  /** In readingUnit, as typed. */
  resolution: number | null;
  /** First to last station, mm. */
  spanMm: number;
  /** Largest local slope kept with the result, mm/m; null on sweeps saved before it was kept. */
  localSlopeMmPerM: number | null;
}

/** A sweep as partner parallelism compares it: stations and readings, no fitted result. */
export type DatumSweep = Pick<SweepRow, 'id' | 'railId' | 'datum' | 'face' | 'takenAt' | 'positionsMm' | 'readingsMm'>;

/** A sweep as a page of the rail's list shows it: summary columns only. */
export interface SweepListRow extends LatestSweep {
  machineId: string;
  takenBy: string;
  createdAt: Date;
}

const uuidArray = (ids: string[]) =>
  sql`array[${sql.join(
    ids.map((id) => sql`${id}`),
    sql`, `,
  )}]::uuid[]`;
type SweepInsert = typeof railSweeps.$inferInsert;
/** A new sweep as the service writes it: its times are always given. */
export type SweepValues = SweepInsert & { createdAt: Date; takenAt: Date };

@Injectable()
export class RailsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  listRails(workshopId: string, machineId: string): Promise<RailRow[]> {
    return this.db
      .select()
      .from(rails)
      .where(and(eq(rails.workshopId, workshopId), eq(rails.machineId, machineId)))
      .orderBy(asc(rails.axis), asc(rails.label), asc(rails.createdAt));
  }

  async findRail(workshopId: string, id: string): Promise<RailRow | null> {
    const [row] = await this.db
      .select()
      .from(rails)
      .where(and(eq(rails.workshopId, workshopId), eq(rails.id, id)));
    return row ?? null;
  }

  /** Inserts or updates a rail and keeps the partner link symmetric, all in one transaction. */
  async saveRail(
    workshopId: string,
    id: string | null,
    values: Partial<RailInsert>,
    partner: { set: boolean; partnerId: string | null },
  ): Promise<RailRow> {
    return this.db.transaction(async (tx) => {
      let row: RailRow;
      if (id) {
        [row] = await tx
          .update(rails)
          .set({ ...values, updatedAt: new Date() })
          .where(and(eq(rails.workshopId, workshopId), eq(rails.id, id)))
          .returning();
      } else {
        [row] = await tx
          .insert(rails)
          .values({ ...(values as RailInsert), workshopId, partnerRailId: null })
          .returning();
      }
      if (!partner.set) return row;
      const railId = row.id;
      // Whoever pointed at either rail loses that link first, then the pair names each other.
      const touched = [railId, ...(partner.partnerId ? [partner.partnerId] : [])];
      await tx
        .update(rails)
        .set({ partnerRailId: null })
        .where(and(eq(rails.workshopId, workshopId), inArray(rails.partnerRailId, touched)));
      await tx
        .update(rails)
        .set({ partnerRailId: null })
        .where(and(eq(rails.workshopId, workshopId), inArray(rails.id, touched)));
      if (partner.partnerId) {
        await tx
          .update(rails)
          .set({ partnerRailId: partner.partnerId })
          .where(and(eq(rails.workshopId, workshopId), eq(rails.id, railId)));
        await tx
          .update(rails)
          .set({ partnerRailId: railId })
          .where(and(eq(rails.workshopId, workshopId), eq(rails.id, partner.partnerId)));
      }
      const [fresh] = await tx.select().from(rails).where(eq(rails.id, railId));
      return fresh;
    });
  }

  async deleteRail(workshopId: string, id: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      await tx
        .update(rails)
        .set({ partnerRailId: null })
        .where(and(eq(rails.workshopId, workshopId), eq(rails.partnerRailId, id)));
      await tx.delete(railSweeps).where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.railId, id)));
      await tx.delete(rails).where(and(eq(rails.workshopId, workshopId), eq(rails.id, id)));
    });
  }

  listSweeps(workshopId: string, railId: string): Promise<SweepRow[]> {
    return this.db
      .select()
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.railId, railId)))
      .orderBy(desc(railSweeps.takenAt), desc(railSweeps.createdAt));
  }

  /** Every sweep of the given rails, newest first (for readiness and the rails tab). */
  /** How many sweeps each rail has: counted on the index, no sweep row is read. */
  async sweepCounts(workshopId: string, railIds: string[]): Promise<Map<string, number>> {
    if (!railIds.length) return new Map();
    const rows = await this.db
      .select({ railId: railSweeps.railId, n: count() })
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), inArray(railSweeps.railId, railIds)))
      .groupBy(railSweeps.railId);
    return new Map(rows.map((r) => [r.railId, Number(r.n)]));
  }

  /**
   * The newest sweep of each rail listed, one index step per rail (rail_sweeps_latest_idx), so
   * the cost does not grow with the number of sweeps recorded.
   */
  async latestSweeps(workshopId: string, railIds: string[]): Promise<Map<string, LatestSweep>> {
    if (!railIds.length) return new Map();
    const { rows } = await this.db.execute<NewestSweepColumns>(sql`
      select s.* from unnest(${uuidArray(railIds)}) as r(id)
      cross join lateral (${newestSweepOf(sql`r.id`, workshopId)}) s`);
    return new Map(rows.map((r) => [r.rail_id, latestSweepOf(r)]));
  }

  /**
   * A machine's rails in their order, each with its newest sweep (summary columns), in one
   * statement: what the readiness board and the rails tab start from.
   */
  async railsWithNewestSweeps(workshopId: string, machineId: string): Promise<RailsWithNewestSweeps> {
    const { rows } = await this.db.execute<Record<string, unknown>>(railsWithNewestSweepsQuery(workshopId, machineId));
    return this.railsWithNewestSweepsFrom(rows);
  }

  /** The same read as one SQL expression whose value is the rows as a JSON array, to send along another statement. */
  railsWithNewestSweepsAsJson(workshopId: string, machineId: string): SQL {
    return sql`select coalesce(jsonb_agg(to_jsonb(q) order by q.axis, q.label, q.created_at), '[]'::jsonb)
      from (${railsWithNewestSweepsQuery(workshopId, machineId)}) q`;
  }

  /** The rails and their newest sweeps from the rows of either read. */
  railsWithNewestSweepsFrom(rows: Record<string, unknown>[]): RailsWithNewestSweeps {
    const latest = new Map<string, LatestSweep>();
    const railRows = rows.map((raw) => {
      const newest = raw.newest_sweep as NewestSweepColumns | null;
      if (newest) latest.set(newest.rail_id, latestSweepOf(newest));
      return rowFromDriver(rails, raw);
    });
    return { rails: railRows, latest };
  }

  /**
   * The newest sweep of each rail against each datum it names (what partner parallelism compares),
   * with stations and readings. The datums of a rail are walked through the index one at a time
   * (a loose index scan), so the cost follows the number of datums, not of sweeps.
   */
  async latestSweepsPerDatum(workshopId: string, railIds: string[]): Promise<DatumSweep[]> {
    if (!railIds.length) return [];
    const { rows } = await this.db.execute<{
      id: string;
      rail_id: string;
      datum: string;
      face: SweepRow['face'];
      taken_at: string;
      positions_mm: number[];
      readings_mm: number[];
    }>(sql`
      with recursive keys(rail_id, dkey) as (
        select r.id, (select lower(x.datum) from rail_sweeps x where x.rail_id = r.id and x.datum is not null order by lower(x.datum) limit 1)
        from unnest(${uuidArray(railIds)}) as r(id)
        union all
        select k.rail_id, (select lower(x.datum) from rail_sweeps x where x.rail_id = k.rail_id and x.datum is not null and lower(x.datum) > k.dkey order by lower(x.datum) limit 1)
        from keys k where k.dkey is not null
      )
      select s.id, s.rail_id, s.datum, s.face, s.taken_at, s.positions_mm, s.readings_mm
      from keys k
      cross join (values ('side'), ('top')) as f(face)
      cross join lateral (
        select x.id, x.rail_id, x.datum, x.face, x.taken_at, x.positions_mm, x.readings_mm from rail_sweeps x
        where x.rail_id = k.rail_id and x.datum is not null and lower(x.datum) = k.dkey and x.face = f.face and x.workshop_id = ${workshopId}
        order by x.taken_at desc, x.created_at desc
        limit 1
      ) s
      where k.dkey is not null`);
    return rows.map((r) => ({
      id: r.id,
      railId: r.rail_id,
      datum: r.datum,
      face: r.face,
      takenAt: new Date(r.taken_at),
      positionsMm: r.positions_mm,
      readingsMm: r.readings_mm,
    }));
  }

  /** One page of a rail's sweeps, newest first, after the given one; one row more than asked tells there is a next page. */
  async sweepPage(workshopId: string, railId: string, afterId: string | null, limit: number): Promise<SweepListRow[]> {
    const { rows } = await this.db.execute<
      {
        id: string;
        rail_id: string;
        machine_id: string;
        taken_by: string;
        taken_at: string;
        created_at: string;
        phase: SweepRow['phase'];
        datum: string | null;
        status: SweepRow['status'];
        target: SweepRow['target'];
        ls: number;
        mz: number;
        stations: number;
      } & SummaryExtras
    >(sql`
      select s.id, s.rail_id, s.machine_id, s.taken_by, s.taken_at, s.created_at, s.phase, s.datum, s.status, s.target,
             case when jsonb_typeof(s.result #> '{leastSquares,straightness}') = 'number' then (s.result #>> '{leastSquares,straightness}')::float8 end as ls,
             case when jsonb_typeof(s.result #> '{minimumZone,straightness}') = 'number' then (s.result #>> '{minimumZone,straightness}')::float8 end as mz,
             jsonb_array_length(s.positions_mm) as stations,
             s.face, s.reading_unit, s.length_unit, s.resolution,
             (select max(v::float8) - min(v::float8) from jsonb_array_elements_text(s.positions_mm) v) as span,
             case when jsonb_typeof(s.result #> '{localSlope,mmPerM}') = 'number' then (s.result #>> '{localSlope,mmPerM}')::float8 end as slope
      from rail_sweeps s
      where s.workshop_id = ${workshopId} and s.rail_id = ${railId}
        ${afterId ? sql`and (s.taken_at, s.id) < (select c.taken_at, c.id from rail_sweeps c where c.id = ${afterId} and c.rail_id = ${railId})` : sql``}
      order by s.taken_at desc, s.id desc
      limit ${limit + 1}`);
    return rows.map((r) => ({
      id: r.id,
      railId: r.rail_id,
      machineId: r.machine_id,
      takenBy: r.taken_by,
      takenAt: new Date(r.taken_at),
      createdAt: new Date(r.created_at),
      phase: r.phase,
      datum: r.datum,
      status: r.status,
      target: r.target,
      leastSquaresStraightness: storedNumber(r.ls),
      minimumZoneStraightness: storedNumber(r.mz),
      stationCount: Number(r.stations),
      ...summaryExtras(r),
    }));
  }

  sweepIds(workshopId: string, railId: string): Promise<{ id: string }[]> {
    return this.db
      .select({ id: railSweeps.id })
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.railId, railId)));
  }

  async findSweep(workshopId: string, id: string): Promise<SweepRow | null> {
    const [row] = await this.db
      .select()
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.id, id)));
    return row ?? null;
  }

  /** Any workshop: tells a repeated client id apart from an id taken by someone else's record. */
  async sweepIdTaken(id: string): Promise<boolean> {
    const [row] = await this.db.select({ id: railSweeps.id }).from(railSweeps).where(eq(railSweeps.id, id));
    return !!row;
  }

  /** Whole sweeps by id, this workshop's only (the certificate's series read their residuals). */
  sweepsByIds(workshopId: string, ids: string[]): Promise<SweepRow[]> {
    if (!ids.length) return Promise.resolve([]);
    return this.db
      .select()
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), inArray(railSweeps.id, ids)));
  }

  /** Inserts unless the id exists already; returns null when it did (a retried save). */
  async insertSweep(values: SweepInsert): Promise<SweepRow | null> {
    const [row] = await this.db
      .insert(railSweeps)
      .values(values)
      .onConflictDoNothing({ target: railSweeps.id })
      .returning();
    return row ?? null;
  }

  /** Writes a sweep's corrected details; returns the row as it now stands. */
  async updateSweepDetails(
    workshopId: string,
    id: string,
    set: Partial<
      Pick<SweepRow, 'instrument' | 'temperatureC' | 'takenBy' | 'boltSize' | 'torqueNm' | 'datum' | 'notes'>
    >,
  ): Promise<SweepRow | null> {
    const [row] = await this.db
      .update(railSweeps)
      .set({ ...set, updatedAt: new Date() })
      .where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.id, id)))
      .returning();
    return row ?? null;
  }

  async deleteSweep(workshopId: string, id: string): Promise<void> {
    await this.db.delete(railSweeps).where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.id, id)));
  }

  /** A rail with its machine's target set and that set's targets, in one read, for recording a sweep on it. */
  async findRailForSweep(
    workshopId: string,
    railId: string,
  ): Promise<{ rail: RailRow; targetSetId: string; targets: TargetSetRow['targets'] } | null> {
    const [found] = await this.railForSweep(this.db, { workshopId, railId });
    return found ?? null;
  }

  // Every sweep's first read: built once (compiled-statement.ts).
  private readonly railForSweep = compiledQuery((s: Slots<{ workshopId: string; railId: string }>) =>
    this.db
      .select({ rail: rails, targetSetId: machines.targetSetId, targets: targetSets.targets })
      .from(rails)
      .innerJoin(machines, eq(machines.id, rails.machineId))
      .innerJoin(targetSets, and(eq(targetSets.id, machines.targetSetId), eq(targetSets.workshopId, s.workshopId)))
      .where(and(eq(rails.workshopId, s.workshopId), eq(rails.id, s.railId))),
  );

  /** A sweep's row to insert, to be sent with its audit entry (RecordsService.saveCheck). */
  sweepRecord(values: SweepValues): CheckInsert<typeof railSweeps> {
    return { table: railSweeps, values };
  }

  /** The row a sweep insert wrote, from the values it was given: no read back. */
  sweepRowOf(values: SweepValues, id: string): SweepRow {
    return {
      instrument: '',
      resolution: null,
      temperatureC: null,
      boltSize: null,
      torqueNm: null,
      datum: null,
      notes: '',
      createdById: null,
      updatedAt: values.createdAt,
      ...values,
      id,
    } as SweepRow;
  }
}

/** A figure read out of a stored result: missing or not a number stays NaN, so readers flag it instead of showing 0. */
/** The newest sweep's summary columns as newestSweepOf selects them. */
type NewestSweepColumns = {
  id: string;
  rail_id: string;
  taken_at: string;
  phase: SweepRow['phase'];
  datum: string | null;
  status: SweepRow['status'];
  ls: number | null;
  mz: number | null;
  stations: number;
  target: SweepRow['target'];
} & SummaryExtras;

/** The newest sweep of the rail `railId` names (summary columns, no arrays): one index step. */
/** A machine's rails in their order, each with its newest sweep (summary columns) as JSON. */
const railsWithNewestSweepsQuery = (workshopId: string, machineId: string) => sql`
  select rl.*, to_jsonb(s) as newest_sweep from rails rl
  left join lateral (${newestSweepOf(sql`rl.id`, workshopId)}) s on true
  where rl.workshop_id = ${workshopId} and rl.machine_id = ${machineId}
  order by rl.axis, rl.label, rl.created_at`;

export interface RailsWithNewestSweeps {
  rails: RailRow[];
  latest: Map<string, LatestSweep>;
}

const newestSweepOf = (railId: SQL, workshopId: string) => sql`
  select x.id, x.rail_id, x.taken_at, x.phase, x.datum, x.status, x.target,
         case when jsonb_typeof(x.result #> '{leastSquares,straightness}') = 'number' then (x.result #>> '{leastSquares,straightness}')::float8 end as ls,
         case when jsonb_typeof(x.result #> '{minimumZone,straightness}') = 'number' then (x.result #>> '{minimumZone,straightness}')::float8 end as mz,
         jsonb_array_length(x.positions_mm) as stations,
         x.face, x.reading_unit, x.length_unit, x.resolution,
         (select max(v::float8) - min(v::float8) from jsonb_array_elements_text(x.positions_mm) v) as span,
         case when jsonb_typeof(x.result #> '{localSlope,mmPerM}') = 'number' then (x.result #>> '{localSlope,mmPerM}')::float8 end as slope
  from rail_sweeps x
  where x.rail_id = ${railId} and x.workshop_id = ${workshopId}
  order by x.taken_at desc, x.created_at desc
  limit 1`;

function latestSweepOf(r: NewestSweepColumns): LatestSweep {
  return {
    id: r.id,
    railId: r.rail_id,
    takenAt: new Date(r.taken_at),
    phase: r.phase,
    datum: r.datum,
    status: r.status,
    leastSquaresStraightness: storedNumber(r.ls),
    minimumZoneStraightness: storedNumber(r.mz),
    stationCount: Number(r.stations),
    target: r.target,
    ...summaryExtras(r),
  };
}

function storedNumber(v: unknown): number {
  return v === null || v === undefined ? NaN : Number(v);
}

type SummaryExtras = {
  face: SweepRow['face'];
  reading_unit: SweepRow['readingUnit'];
  length_unit: SweepRow['lengthUnit'];
  resolution: number | null;
  span: number | null;
  slope: number | null;
};

function summaryExtras(r: SummaryExtras) {
  return {
    face: r.face,
    readingUnit: r.reading_unit,
    lengthUnit: r.length_unit,
    resolution: r.resolution === null ? null : Number(r.resolution),
    spanMm: r.span === null ? 0 : Number(r.span),
    localSlopeMmPerM: r.slope === null ? null : Number(r.slope),
  };
}
