import { Inject, Injectable } from '@nestjs/common';
import { and, eq, isNull, ne, or, sql, type SQL } from 'drizzle-orm';
import { compiledQuery, keysShape, slotsOf, type Slots } from '../database/compiled-statement.js';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { machineReadiness, machines, targetSets, waivers } from '../database/schema/index.js';
import { machineStateNow } from '../machines/machine-state.js';
import type { MachineState } from '../database/schema/machines.js';
import type { SummaryCheck } from '../database/schema/machine-readiness.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import type { MachineRef } from './readiness.js';
import { withDefaultTargets } from '../target-sets/default-target-sets.js';

export type ReadinessSummaryRow = typeof machineReadiness.$inferSelect;
export type SummaryWaiverRow = typeof waivers.$inferSelect;

/** Everything a readiness count needs besides the contributors' own reads, from one statement. */
export interface ReadinessContextRow {
  machine: MachineRef & { name: string; state: MachineState };
  targetSet: { id: string; name: string; targets: Record<string, TargetValue> } | null;
  /** Newest first, as the board picks the newest waiver of a check. */
  waivers: SummaryWaiverRow[];
  /** The stored summary's checks and how they were counted (only when asked for). */
  summary: { checks: SummaryCheck[] | null; version: number } | null;
  /** The values of the contributors' first reads sent along, in the order they were given. */
  firstReads: unknown[];
}

/** The reads a readiness count needs besides the contributors', and the summary rows themselves. */
@Injectable()
export class ReadinessSummaryRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /**
   * The machine, its target set and its waivers (and its stored summary when asked for) in one
   * statement: a count costs this plus the contributors' own reads, whatever the history.
   */
  async context(
    workshopId: string,
    machineId: string,
    withSummary: boolean,
    firstReads: SQL[] = [],
  ): Promise<ReadinessContextRow | null> {
    const { rows } = await this.db.execute<{
      id: string;
      workshop_id: string;
      target_set_id: string;
      kind: string;
      work_area_x_mm: number;
      work_area_y_mm: number;
      name: string;
      state: MachineState;
      t_id: string | null;
      t_name: string | null;
      targets: Record<string, TargetValue> | null;
      waivers: (Omit<SummaryWaiverRow, 'waivedAt'> & { waivedAt: string })[];
      s_checks: SummaryCheck[] | null;
      s_version: number | null;
      [firstRead: `first_read_${number}`]: unknown;
    }>(sql`
      select m.id, m.workshop_id, m.target_set_id, m.kind, m.work_area_x_mm, m.work_area_y_mm, m.name,
             ${machineStateNow(sql`m`)} as state,
             t.id as t_id, t.name as t_name, t.targets,
             coalesce((
               select jsonb_agg(jsonb_build_object(
                        'id', w.id, 'workshopId', w.workshop_id, 'machineId', w.machine_id, 'checkKey', w.check_key, 'recordType', w.record_type,
                        'recordId', w.record_id, 'reason', w.reason, 'waivedById', w.waived_by_id, 'waivedByName', w.waived_by_name, 'waivedAt', w.waived_at
                      ) order by w.waived_at desc)
               from ${waivers} w where w.workshop_id = m.workshop_id and w.machine_id = m.id
             ), '[]'::jsonb) as waivers,
             ${withSummary ? sql`r.checks` : sql`null::jsonb`} as s_checks, ${withSummary ? sql`r.version` : sql`null::int`} as s_version
             ${sql.join(
               firstReads.map((read, i) => sql`, (${read}) as ${sql.identifier(`first_read_${i}`)}`),
               sql``,
             )}
      from ${machines} m
      left join ${targetSets} t on t.id = m.target_set_id and t.workshop_id = m.workshop_id
      left join ${machineReadiness} r on ${withSummary ? sql`r.machine_id = m.id` : sql`false`}
      where m.workshop_id = ${workshopId} and m.id = ${machineId}`);
    const row = rows[0];
    if (!row) return null;
    return {
      machine: {
        id: row.id,
        workshopId: row.workshop_id,
        targetSetId: row.target_set_id,
        kind: row.kind,
        workAreaXMm: Number(row.work_area_x_mm),
        workAreaYMm: Number(row.work_area_y_mm),
        name: row.name,
        state: row.state,
      },
      // A key the stored set lacks is judged against the product's default, never a 500.
      targetSet: row.t_id ? { id: row.t_id, name: row.t_name!, targets: withDefaultTargets(row.targets) } : null,
      waivers: row.waivers.map((w) => ({ ...w, waivedAt: new Date(w.waivedAt) })),
      summary: row.s_version === null ? null : { checks: row.s_checks, version: row.s_version },
      firstReads: firstReads.map((_, i) => row[`first_read_${i}`]),
    };
  }

  async targetSet(workshopId: string, id: string) {
    const [row] = await this.db
      .select({ id: targetSets.id, name: targetSets.name, targets: targetSets.targets })
      .from(targetSets)
      .where(and(eq(targetSets.workshopId, workshopId), eq(targetSets.id, id)));
    return row ? { ...row, targets: withDefaultTargets(row.targets) } : null;
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

  /**
   * Writes a machine's summary; an existing row takes the new values from the row offered
   * (`excluded`), sent once. Built once per set of columns: every recorded check writes it.
   */
  async upsert(values: typeof machineReadiness.$inferInsert): Promise<void> {
    await this.summaryUpsert(this.db, values);
  }

  private readonly summaryUpsert = compiledQuery(
    (s: Slots<typeof machineReadiness.$inferInsert>, values: typeof machineReadiness.$inferInsert) => {
      const { machineId: _m, ...rest } = values;
      const set = Object.fromEntries(
        Object.keys(rest).map((key) => {
          const column = machineReadiness[key as keyof typeof rest];
          return [key, sql`excluded.${sql.identifier(column.name)}`];
        }),
      );
      return this.db
        .insert(machineReadiness)
        .values(slotsOf(s, values) as never)
        .onConflictDoUpdate({ target: machineReadiness.machineId, set: { ...set, refreshedAt: sql`now()` } });
    },
    keysShape,
  );
}
