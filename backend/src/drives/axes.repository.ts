import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { axes } from '../database/schema/index.js';

export type AxisRow = typeof axes.$inferSelect;
export type AxisInsert = typeof axes.$inferInsert;

@Injectable()
export class AxesRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  list(workshopId: string, machineId: string): Promise<AxisRow[]> {
    return this.db
      .select()
      .from(axes)
      .where(and(eq(axes.workshopId, workshopId), eq(axes.machineId, machineId)))
      .orderBy(asc(axes.name));
  }

  async find(workshopId: string, id: string): Promise<AxisRow | null> {
    const [row] = await this.db
      .select()
      .from(axes)
      .where(and(eq(axes.workshopId, workshopId), eq(axes.id, id)));
    return row ?? null;
  }

  async insert(values: AxisInsert): Promise<AxisRow> {
    const [row] = await this.db.insert(axes).values(values).returning();
    return row;
  }

  async update(workshopId: string, id: string, values: Partial<AxisInsert>): Promise<AxisRow> {
    const [row] = await this.db
      .update(axes)
      .set({ ...values, updatedAt: new Date() })
      .where(and(eq(axes.workshopId, workshopId), eq(axes.id, id)))
      .returning();
    return row;
  }

  async delete(workshopId: string, id: string): Promise<void> {
    await this.db.delete(axes).where(and(eq(axes.workshopId, workshopId), eq(axes.id, id)));
  }
}
