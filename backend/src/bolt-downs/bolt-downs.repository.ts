import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, sql, type SQL } from 'drizzle-orm';
import { compiledQuery, type Slots } from '../database/compiled-statement.js';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { boltDownHoles, boltDowns, boltDownWrites, machines, rails, recordLocks } from '../database/schema/index.js';
import type { MachineState } from '../database/schema/machines.js';
import { machineStateNow } from '../machines/machine-state.js';

export type BoltDownRow = typeof boltDowns.$inferSelect;
export type BoltDownHoleRow = typeof boltDownHoles.$inferSelect;
type BoltDownInsert = typeof boltDowns.$inferInsert;

export interface HoleWrite {
  writeId: string;
  holeIndex: number;
  readingRaw: number;
  readingMm: number;
  fixed: boolean;
  actor: { id: string; name: string };
  /** The hole as it stood before this write (read after the machine was locked). */
  before: BoltDownHoleRow | null;
  now: Date;
}

/**
 * The outcome of a hole write: applied (with the bolt-down and the hole as written), a repeat of
 * a write already applied, an id already used for something else, or a bolt-down that got its
 * final sweep meanwhile.
 */
export type HoleWriteOutcome =
  | { kind: 'applied'; fixCounter: number; hole: BoltDownHoleRow }
  | { kind: 'repeat' }
  | { kind: 'id-taken' }
  | { kind: 'finished' };

/** A bolt-down with what a hole write needs besides: its rail, a write id seen before, its approval lock. */
export interface HoleWriteContext {
  row: BoltDownRow;
  rail: { label: string; axis: string; lengthMm: number };
  /** The machine, its row locked for the rest of the command (state as it reads now). */
  machine: { name: string; state: MachineState };
  seen: { workshopId: string; boltDownId: string; target: string } | null;
  locked: boolean;
}

@Injectable()
export class BoltDownsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(values: BoltDownInsert): Promise<BoltDownRow> {
    const [row] = await this.db.insert(boltDowns).values(values).returning();
    return row;
  }

  async find(workshopId: string, id: string): Promise<BoltDownRow | null> {
    const [row] = await this.db
      .select()
      .from(boltDowns)
      .where(and(eq(boltDowns.workshopId, workshopId), eq(boltDowns.id, id)));
    return row ?? null;
  }

  listForRail(workshopId: string, railId: string): Promise<BoltDownRow[]> {
    return this.db
      .select()
      .from(boltDowns)
      .where(and(eq(boltDowns.workshopId, workshopId), eq(boltDowns.railId, railId)))
      .orderBy(desc(boltDowns.createdAt), desc(boltDowns.id));
  }

  /** Holes of bolt-downs of this workshop, by bolt-down id. */
  async holesOf(workshopId: string, ids: string[]): Promise<Map<string, BoltDownHoleRow[]>> {
    const out = new Map<string, BoltDownHoleRow[]>(ids.map((id) => [id, []]));
    if (!ids.length) return out;
    const rows = await this.holesOfIds(this.db, { workshopId, ids });
    for (const { hole } of rows) out.get(hole.boltDownId)!.push(hole);
    return out;
  }

  // Every hole write answers from this read: built once (compiled-statement.ts), one text for any
  // number of ids.
  private readonly holesOfIds = compiledQuery((s: Slots<{ workshopId: string; ids: string[] }>) =>
    this.db
      .select({ hole: boltDownHoles })
      .from(boltDownHoles)
      .innerJoin(boltDowns, eq(boltDowns.id, boltDownHoles.boltDownId))
      .where(and(eq(boltDowns.workshopId, s.workshopId), sql`${boltDownHoles.boltDownId} = any(${s.ids}::uuid[])`))
      .orderBy(asc(boltDownHoles.holeIndex)),
  );

  async writeSeen(writeId: string) {
    const [row] = await this.db.select().from(boltDownWrites).where(eq(boltDownWrites.writeId, writeId));
    return row ?? null;
  }

  /** Marks the bolt-down abandoned unless it is finished or abandoned already; returns it as it now stands. */
  async abandon(
    workshopId: string,
    id: string,
    by: { reason: string; name: string; at: Date },
  ): Promise<BoltDownRow | null> {
    const [row] = await this.db
      .update(boltDowns)
      .set({ abandonedAt: by.at, abandonedReason: by.reason, abandonedByName: by.name, updatedAt: by.at })
      .where(
        and(
          eq(boltDowns.workshopId, workshopId),
          eq(boltDowns.id, id),
          sql`${boltDowns.finalSweepId} is null`,
          sql`${boltDowns.abandonedAt} is null`,
        ),
      )
      .returning();
    return row ?? null;
  }

  /** Links the final sweep unless another one got there first; returns the linked sweep id. */
  async linkFinalSweep(workshopId: string, id: string, sweepId: string): Promise<string | null> {
    await this.db
      .update(boltDowns)
      .set({ finalSweepId: sweepId, updatedAt: new Date() })
      .where(
        and(
          eq(boltDowns.workshopId, workshopId),
          eq(boltDowns.id, id),
          sql`${boltDowns.finalSweepId} is null`,
          sql`${boltDowns.abandonedAt} is null`,
        ),
      );
    return (await this.find(workshopId, id))?.finalSweepId ?? null;
  }

  /** One read for a hole write: the bolt-down, its rail's label, the write id if seen, and whether an approval locked it. */
  /**
   * The bolt-down, its rail, an earlier use of the write id and any approval lock, with the
   * machine's row locked in the same statement: writers of one machine queue here, before any
   * write, instead of deadlocking. The bolt-down's own columns are as they were when the statement
   * began; the write itself checks again that it is neither finished nor abandoned.
   */
  async findForHoleWrite(workshopId: string, id: string, writeId: string): Promise<HoleWriteContext | null> {
    const [found] = await this.holeWriteContext(this.db, { workshopId, id, writeId });
    return found ? { ...found, seen: found.seen?.target ? found.seen : null } : null;
  }

  // Every hole write's first read: built once (compiled-statement.ts).
  private readonly holeWriteContext = compiledQuery((s: Slots<{ workshopId: string; id: string; writeId: string }>) =>
    this.db
      .select({
        row: boltDowns,
        rail: { label: rails.label, axis: rails.axis, lengthMm: rails.lengthMm },
        machine: { name: machines.name, state: machineStateNow() },
        seen: {
          workshopId: boltDownWrites.workshopId,
          boltDownId: boltDownWrites.boltDownId,
          target: boltDownWrites.target,
        },
        locked: sql<boolean>`exists (select 1 from ${recordLocks} where ${recordLocks.recordType} = 'bolt-down' and ${recordLocks.recordId} = ${boltDowns.id})`,
      })
      .from(boltDowns)
      .innerJoin(rails, eq(rails.id, boltDowns.railId))
      .innerJoin(machines, eq(machines.id, boltDowns.machineId))
      .leftJoin(boltDownWrites, eq(boltDownWrites.writeId, s.writeId))
      .where(and(eq(boltDowns.workshopId, s.workshopId), eq(boltDowns.id, s.id)))
      .for('no key update', { of: machines }),
  );

  /**
   * Applies one hole write exactly once, in one statement. The write id goes in first: a second
   * copy of the same write (a retry after a lost answer, even one racing the first) finds it taken
   * and changes nothing. Callers lock the machine first, so writers of one bolt-down take turns
   * and fixes are numbered in the order they land; a bolt-down finished meanwhile is not written.
   * `along` are more common table expressions sent in the same statement (the audit entry, which
   * may read `h`, the hole written).
   */
  async writeHole(workshopId: string, boltDownId: string, w: HoleWrite, along?: SQL): Promise<HoleWriteOutcome> {
    const target = `hole:${w.holeIndex}`;
    const newFix = w.fixed && !w.before?.fixed;
    const kept = w.fixed && w.before?.fixed ? w.before : null;
    const fixedAt = !w.fixed ? null : kept ? kept.fixedAt : w.now;
    const result = await this.db.execute<{
      claimed: number;
      fix_counter: number | null;
      hole_id: string | null;
      fix_seq: number | null;
    }>(sql`
      with claim as (
        insert into ${boltDownWrites} (write_id, workshop_id, bolt_down_id, target)
        values (${w.writeId}::uuid, ${workshopId}::uuid, ${boltDownId}::uuid, ${target})
        on conflict do nothing returning write_id
      ), b as (
        update ${boltDowns} set fix_counter = fix_counter + ${newFix ? 1 : 0}::int, updated_at = ${w.now.toISOString()}::timestamptz
        where id = ${boltDownId}::uuid and final_sweep_id is null and abandoned_at is null and exists (select 1 from claim)
        returning fix_counter
      ), h as (
        insert into ${boltDownHoles} (bolt_down_id, hole_index, reading_raw, reading_mm, fixed, fix_seq, fixed_at, fixed_by_id, fixed_by_name, last_write_id, updated_at)
        select ${boltDownId}::uuid, ${w.holeIndex}::int, ${w.readingRaw}::float8, ${w.readingMm}::float8, ${w.fixed}::boolean,
          case when ${newFix}::boolean then b.fix_counter else ${kept?.fixSeq ?? null}::int end,
          ${fixedAt ? fixedAt.toISOString() : null}::timestamptz, ${w.fixed ? w.actor.id : null}::uuid, ${w.fixed ? w.actor.name : null}::text,
          ${w.writeId}::uuid, ${w.now.toISOString()}::timestamptz
        from b
        on conflict (bolt_down_id, hole_index) do update set reading_raw = excluded.reading_raw, reading_mm = excluded.reading_mm,
          fixed = excluded.fixed, fix_seq = excluded.fix_seq, fixed_at = excluded.fixed_at, fixed_by_id = excluded.fixed_by_id,
          fixed_by_name = excluded.fixed_by_name, last_write_id = excluded.last_write_id, updated_at = excluded.updated_at
        returning id, fix_seq
      )${along ? sql`, ${along}` : sql``}
      select (select count(*) from claim)::int as claimed, (select fix_counter from b) as fix_counter,
        (select id from h) as hole_id, (select fix_seq from h) as fix_seq`);
    const out = result.rows[0];
    if (!out.claimed) {
      const seen = await this.writeSeen(w.writeId);
      const same = seen && seen.workshopId === workshopId && seen.boltDownId === boltDownId && seen.target === target;
      return same ? { kind: 'repeat' } : { kind: 'id-taken' };
    }
    if (out.hole_id === null || out.fix_counter === null) return { kind: 'finished' };
    const hole: BoltDownHoleRow = {
      id: out.hole_id,
      boltDownId,
      holeIndex: w.holeIndex,
      readingRaw: w.readingRaw,
      readingMm: w.readingMm,
      fixed: w.fixed,
      fixSeq: out.fix_seq,
      fixedAt,
      fixedById: w.fixed ? w.actor.id : null,
      fixedByName: w.fixed ? w.actor.name : null,
      lastWriteId: w.writeId,
      createdAt: w.before?.createdAt ?? w.now,
      updatedAt: w.now,
    };
    return { kind: 'applied', fixCounter: out.fix_counter, hole };
  }
}
