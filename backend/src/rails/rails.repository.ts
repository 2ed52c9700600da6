import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { machines, rails, railSweeps } from '../database/schema/index.js';

export type RailRow = typeof rails.$inferSelect;
export type SweepRow = typeof railSweeps.$inferSelect;
type RailInsert = typeof rails.$inferInsert;
type SweepInsert = typeof railSweeps.$inferInsert;

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
    const [row] = await this.db.select().from(rails).where(and(eq(rails.workshopId, workshopId), eq(rails.id, id)));
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
        [row] = await tx.insert(rails).values({ ...(values as RailInsert), workshopId, partnerRailId: null }).returning();
      }
      if (!partner.set) return row;
      const railId = row.id;
      // Whoever pointed at either rail loses that link first, then the pair names each other.
      const touched = [railId, ...(partner.partnerId ? [partner.partnerId] : [])];
      await tx.update(rails).set({ partnerRailId: null }).where(and(eq(rails.workshopId, workshopId), inArray(rails.partnerRailId, touched)));
      await tx.update(rails).set({ partnerRailId: null }).where(and(eq(rails.workshopId, workshopId), inArray(rails.id, touched)));
      if (partner.partnerId) {
        await tx.update(rails).set({ partnerRailId: partner.partnerId }).where(and(eq(rails.workshopId, workshopId), eq(rails.id, railId)));
        await tx.update(rails).set({ partnerRailId: railId }).where(and(eq(rails.workshopId, workshopId), eq(rails.id, partner.partnerId)));
      }
      const [fresh] = await tx.select().from(rails).where(eq(rails.id, railId));
      return fresh;
    });
  }

  async deleteRail(workshopId: string, id: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      await tx.update(rails).set({ partnerRailId: null }).where(and(eq(rails.workshopId, workshopId), eq(rails.partnerRailId, id)));
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
  sweepsOfRails(workshopId: string, railIds: string[]): Promise<SweepRow[]> {
    if (!railIds.length) return Promise.resolve([]);
    return this.db
      .select()
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), inArray(railSweeps.railId, railIds)))
      .orderBy(desc(railSweeps.takenAt), desc(railSweeps.createdAt));
  }

  sweepIds(workshopId: string, railId: string): Promise<{ id: string }[]> {
    return this.db
      .select({ id: railSweeps.id })
      .from(railSweeps)
      .where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.railId, railId)));
  }

  async findSweep(workshopId: string, id: string): Promise<SweepRow | null> {
    const [row] = await this.db.select().from(railSweeps).where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.id, id)));
    return row ?? null;
  }

  /** Any workshop: tells a repeated client id apart from an id taken by someone else's record. */
  async sweepIdTaken(id: string): Promise<boolean> {
    const [row] = await this.db.select({ id: railSweeps.id }).from(railSweeps).where(eq(railSweeps.id, id));
    return !!row;
  }

  /** Inserts unless the id exists already; returns null when it did (a retried save). */
  async insertSweep(values: SweepInsert): Promise<SweepRow | null> {
    const [row] = await this.db.insert(railSweeps).values(values).onConflictDoNothing({ target: railSweeps.id }).returning();
    return row ?? null;
  }

  async deleteSweep(workshopId: string, id: string): Promise<void> {
    await this.db.delete(railSweeps).where(and(eq(railSweeps.workshopId, workshopId), eq(railSweeps.id, id)));
  }

  /** A rail with its machine's target set, in one read, for recording a sweep on it. */
  async findRailForSweep(workshopId: string, railId: string): Promise<{ rail: RailRow; targetSetId: string } | null> {
    const [found] = await this.db
      .select({ rail: rails, targetSetId: machines.targetSetId })
      .from(rails)
      .innerJoin(machines, eq(machines.id, rails.machineId))
      .where(and(eq(rails.workshopId, workshopId), eq(rails.id, railId)));
    return found ?? null;
  }

  /**
   * Inserts unless the id exists already (a retried save: null). Only the columns the database
   * fills are sent back; the rest of the row is what was written.
   */
  async insertSweepFromValues(values: SweepInsert & { createdAt: Date; takenAt: Date }): Promise<SweepRow | null> {
    const [made] = await this.db.insert(railSweeps).values(values).onConflictDoNothing({ target: railSweeps.id }).returning({ id: railSweeps.id });
    if (!made) return null;
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
      id: made.id,
    } as SweepRow;
  }
}
