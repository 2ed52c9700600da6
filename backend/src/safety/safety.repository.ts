import { Inject, Injectable } from '@nestjs/common';
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { safetyAnswers, safetyItems, safetyWalks } from '../database/schema/index.js';

export type SafetyItemRow = typeof safetyItems.$inferSelect;
export type SafetyWalkRow = typeof safetyWalks.$inferSelect;
export type SafetyAnswerRow = typeof safetyAnswers.$inferSelect;

@Injectable()
export class SafetyRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  workshopItems(workshopId: string): Promise<SafetyItemRow[]> {
    return this.db
      .select()
      .from(safetyItems)
      .where(and(eq(safetyItems.workshopId, workshopId), eq(safetyItems.active, true)))
      .orderBy(asc(safetyItems.createdAt));
  }

  async insertItem(values: typeof safetyItems.$inferInsert): Promise<SafetyItemRow> {
    const [row] = await this.db.insert(safetyItems).values(values).returning();
    return row;
  }

  async currentWalk(workshopId: string, machineId: string): Promise<SafetyWalkRow | null> {
    const [row] = await this.db
      .select()
      .from(safetyWalks)
      .where(and(eq(safetyWalks.workshopId, workshopId), eq(safetyWalks.machineId, machineId)))
      .orderBy(desc(safetyWalks.startedAt))
      .limit(1);
    return row ?? null;
  }

  async insertWalk(workshopId: string, machineId: string): Promise<SafetyWalkRow> {
    const [row] = await this.db.insert(safetyWalks).values({ workshopId, machineId }).returning();
    return row;
  }

  answers(walkId: string): Promise<SafetyAnswerRow[]> {
    return this.db.select().from(safetyAnswers).where(eq(safetyAnswers.walkId, walkId));
  }

  async upsertAnswer(values: typeof safetyAnswers.$inferInsert): Promise<SafetyAnswerRow> {
    const [row] = await this.db
      .insert(safetyAnswers)
      .values(values)
      .onConflictDoUpdate({
        target: [safetyAnswers.walkId, safetyAnswers.itemKey],
        set: {
          answer: values.answer,
          note: values.note,
          answeredById: values.answeredById,
          answeredByName: values.answeredByName,
          answeredAt: sql`now()`,
        },
      })
      .returning();
    return row;
  }

  /** An answer with its walk, for evidence attached to one item of a machine's walk. */
  async findAnswer(workshopId: string, answerId: string) {
    const [row] = await this.db
      .select({ answer: safetyAnswers, walk: safetyWalks })
      .from(safetyAnswers)
      .innerJoin(safetyWalks, eq(safetyWalks.id, safetyAnswers.walkId))
      .where(and(eq(safetyWalks.workshopId, workshopId), eq(safetyAnswers.id, answerId)));
    return row ?? null;
  }
}
