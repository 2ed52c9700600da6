import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { boltDownHoles, boltDowns, boltDownWrites } from '../database/schema/index.js';

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
}

/**
 * The outcome of a hole write: applied (with the hole as it was before), a repeat of a write
 * already applied, or an id already used for something else.
 */
export type HoleWriteOutcome =
  | { kind: 'applied'; before: BoltDownHoleRow | null }
  | { kind: 'repeat' }
  | { kind: 'id-taken' };

@Injectable()
export class BoltDownsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(values: BoltDownInsert): Promise<BoltDownRow> {
    const [row] = await this.db.insert(boltDowns).values(values).returning();
    return row;
  }

  async find(workshopId: string, id: string): Promise<BoltDownRow | null> {
    const [row] = await this.db.select().from(boltDowns).where(and(eq(boltDowns.workshopId, workshopId), eq(boltDowns.id, id)));
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
    const rows = await this.db
      .select({ hole: boltDownHoles })
      .from(boltDownHoles)
      .innerJoin(boltDowns, eq(boltDowns.id, boltDownHoles.boltDownId))
      .where(and(eq(boltDowns.workshopId, workshopId), inArray(boltDownHoles.boltDownId, ids)))
      .orderBy(asc(boltDownHoles.holeIndex));
    for (const { hole } of rows) out.get(hole.boltDownId)!.push(hole);
    return out;
  }

  async writeSeen(writeId: string) {
    const [row] = await this.db.select().from(boltDownWrites).where(eq(boltDownWrites.writeId, writeId));
    return row ?? null;
  }

  /**
   * Applies one hole write exactly once. The write id goes in first: a second copy of the same
   * write (a retry after a lost answer, even one racing the first) finds it taken and changes
   * nothing. The bolt-down row is locked so fixes are numbered in the order they land.
   */
  recordHole(workshopId: string, boltDownId: string, write: HoleWrite): Promise<HoleWriteOutcome> {
    const target = `hole:${write.holeIndex}`;
    return this.db.transaction(async (tx) => {
      const [claimed] = await tx
        .insert(boltDownWrites)
        .values({ writeId: write.writeId, workshopId, boltDownId, target })
        .onConflictDoNothing()
        .returning();
      if (!claimed) {
        const [seen] = await tx.select().from(boltDownWrites).where(eq(boltDownWrites.writeId, write.writeId));
        const same = seen && seen.workshopId === workshopId && seen.boltDownId === boltDownId && seen.target === target;
        return same ? { kind: 'repeat' } : { kind: 'id-taken' };
      }
      await tx.select({ id: boltDowns.id }).from(boltDowns).where(eq(boltDowns.id, boltDownId)).for('update');
      const [before] = await tx
        .select()
        .from(boltDownHoles)
        .where(and(eq(boltDownHoles.boltDownId, boltDownId), eq(boltDownHoles.holeIndex, write.holeIndex)));
      const now = new Date();
      let fixing: Pick<BoltDownHoleRow, 'fixSeq' | 'fixedAt' | 'fixedById' | 'fixedByName'>;
      if (!write.fixed) fixing = { fixSeq: null, fixedAt: null, fixedById: null, fixedByName: null };
      else if (before?.fixed) fixing = { fixSeq: before.fixSeq, fixedAt: before.fixedAt, fixedById: write.actor.id, fixedByName: write.actor.name };
      else {
        const [counter] = await tx
          .update(boltDowns)
          .set({ fixCounter: sql`${boltDowns.fixCounter} + 1` })
          .where(eq(boltDowns.id, boltDownId))
          .returning({ seq: boltDowns.fixCounter });
        fixing = { fixSeq: counter.seq, fixedAt: now, fixedById: write.actor.id, fixedByName: write.actor.name };
      }
      const values = { readingRaw: write.readingRaw, readingMm: write.readingMm, fixed: write.fixed, ...fixing, lastWriteId: write.writeId, updatedAt: now };
      await tx
        .insert(boltDownHoles)
        .values({ boltDownId, holeIndex: write.holeIndex, ...values })
        .onConflictDoUpdate({ target: [boltDownHoles.boltDownId, boltDownHoles.holeIndex], set: values });
      await tx.update(boltDowns).set({ updatedAt: now }).where(eq(boltDowns.id, boltDownId));
      return { kind: 'applied', before: before ?? null };
    });
  }

  /** Links the final sweep unless another one got there first; returns the linked sweep id. */
  async linkFinalSweep(workshopId: string, id: string, sweepId: string): Promise<string | null> {
    await this.db
      .update(boltDowns)
      .set({ finalSweepId: sweepId, updatedAt: new Date() })
      .where(and(eq(boltDowns.workshopId, workshopId), eq(boltDowns.id, id), sql`${boltDowns.finalSweepId} is null`));
    return (await this.find(workshopId, id))?.finalSweepId ?? null;
  }
}
