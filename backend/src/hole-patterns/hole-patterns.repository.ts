import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { holePatterns } from '../database/schema/index.js';

export type HolePatternRow = typeof holePatterns.$inferSelect;
export type HolePatternValues = Omit<
  typeof holePatterns.$inferInsert,
  'id' | 'workshopId' | 'machineId' | 'createdAt' | 'updatedAt'
>;

@Injectable()
export class HolePatternsRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  list(workshopId: string, machineId: string): Promise<HolePatternRow[]> {
    return this.db
      .select()
      .from(holePatterns)
      .where(and(eq(holePatterns.workshopId, workshopId), eq(holePatterns.machineId, machineId)))
      .orderBy(asc(holePatterns.name), asc(holePatterns.createdAt));
  }

  async find(workshopId: string, id: string): Promise<HolePatternRow | null> {
    const [row] = await this.db
      .select()
      .from(holePatterns)
      .where(and(eq(holePatterns.workshopId, workshopId), eq(holePatterns.id, id)));
    return row ?? null;
  }

  async insert(workshopId: string, machineId: string, values: HolePatternValues): Promise<HolePatternRow> {
    const [row] = await this.db
      .insert(holePatterns)
      .values({ ...values, workshopId, machineId })
      .returning();
    return row;
  }

  async update(workshopId: string, id: string, values: HolePatternValues): Promise<HolePatternRow> {
    const [row] = await this.db
      .update(holePatterns)
      .set({ ...values, updatedAt: new Date() })
      .where(and(eq(holePatterns.workshopId, workshopId), eq(holePatterns.id, id)))
      .returning();
    return row;
  }

  async delete(workshopId: string, id: string): Promise<void> {
    await this.db.delete(holePatterns).where(and(eq(holePatterns.workshopId, workshopId), eq(holePatterns.id, id)));
  }
}
