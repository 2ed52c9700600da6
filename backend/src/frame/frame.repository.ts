import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { bedGrids, diagonalChecks, testCuts } from '../database/schema/index.js';

export type DiagonalCheckRow = typeof diagonalChecks.$inferSelect;
export type BedGridRow = typeof bedGrids.$inferSelect;
export type TestCutRow = typeof testCuts.$inferSelect;

// Newest first everywhere: the first row is the machine's current result.
@Injectable()
export class FrameRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insertDiagonalCheck(values: typeof diagonalChecks.$inferInsert): Promise<DiagonalCheckRow> {
    const [row] = await this.db.insert(diagonalChecks).values(values).returning();
    return row;
  }

  listDiagonalChecks(workshopId: string, machineId: string, limit = 200): Promise<DiagonalCheckRow[]> {
    return this.db
      .select()
      .from(diagonalChecks)
      .where(and(eq(diagonalChecks.workshopId, workshopId), eq(diagonalChecks.machineId, machineId)))
      .orderBy(desc(diagonalChecks.recordedAt))
      .limit(limit);
  }

  async findDiagonalCheck(workshopId: string, id: string): Promise<DiagonalCheckRow | null> {
    const [row] = await this.db
      .select()
      .from(diagonalChecks)
      .where(and(eq(diagonalChecks.workshopId, workshopId), eq(diagonalChecks.id, id)));
    return row ?? null;
  }

  async deleteDiagonalCheck(workshopId: string, id: string): Promise<void> {
    await this.db
      .delete(diagonalChecks)
      .where(and(eq(diagonalChecks.workshopId, workshopId), eq(diagonalChecks.id, id)));
  }

  async insertBedGrid(values: typeof bedGrids.$inferInsert): Promise<BedGridRow> {
    const [row] = await this.db.insert(bedGrids).values(values).returning();
    return row;
  }

  listBedGrids(workshopId: string, machineId: string, limit = 100): Promise<BedGridRow[]> {
    return this.db
      .select()
      .from(bedGrids)
      .where(and(eq(bedGrids.workshopId, workshopId), eq(bedGrids.machineId, machineId)))
      .orderBy(desc(bedGrids.recordedAt))
      .limit(limit);
  }

  async findBedGrid(workshopId: string, id: string): Promise<BedGridRow | null> {
    const [row] = await this.db
      .select()
      .from(bedGrids)
      .where(and(eq(bedGrids.workshopId, workshopId), eq(bedGrids.id, id)));
    return row ?? null;
  }

  async deleteBedGrid(workshopId: string, id: string): Promise<void> {
    await this.db.delete(bedGrids).where(and(eq(bedGrids.workshopId, workshopId), eq(bedGrids.id, id)));
  }

  async insertTestCut(values: typeof testCuts.$inferInsert): Promise<TestCutRow> {
    const [row] = await this.db.insert(testCuts).values(values).returning();
    return row;
  }

  listTestCuts(workshopId: string, machineId: string, limit = 100): Promise<TestCutRow[]> {
    return this.db
      .select()
      .from(testCuts)
      .where(and(eq(testCuts.workshopId, workshopId), eq(testCuts.machineId, machineId)))
      .orderBy(desc(testCuts.recordedAt))
      .limit(limit);
  }

  async findTestCut(workshopId: string, id: string): Promise<TestCutRow | null> {
    const [row] = await this.db
      .select()
      .from(testCuts)
      .where(and(eq(testCuts.workshopId, workshopId), eq(testCuts.id, id)));
    return row ?? null;
  }

  async deleteTestCut(workshopId: string, id: string): Promise<void> {
    await this.db.delete(testCuts).where(and(eq(testCuts.workshopId, workshopId), eq(testCuts.id, id)));
  }
}
