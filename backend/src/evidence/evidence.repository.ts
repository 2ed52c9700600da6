import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import type { EvidenceSubjectType } from '../records/kinds.js';
import { evidence } from '../database/schema/index.js';

export type EvidenceRow = typeof evidence.$inferSelect;

@Injectable()
export class EvidenceRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(values: typeof evidence.$inferInsert): Promise<EvidenceRow> {
    const [row] = await this.db.insert(evidence).values(values).returning();
    return row;
  }

  async find(workshopId: string, id: string): Promise<EvidenceRow | null> {
    const [row] = await this.db
      .select()
      .from(evidence)
      .where(and(eq(evidence.workshopId, workshopId), eq(evidence.id, id)))
      .limit(1);
    return row ?? null;
  }

  listBySubject(workshopId: string, subjectType: string, subjectId: string): Promise<EvidenceRow[]> {
    return this.db
      .select()
      .from(evidence)
      .where(
        and(
          eq(evidence.workshopId, workshopId),
          eq(evidence.subjectType, subjectType as EvidenceSubjectType),
          eq(evidence.subjectId, subjectId),
        ),
      )
      .orderBy(desc(evidence.createdAt));
  }

  listByMachine(workshopId: string, machineId: string): Promise<EvidenceRow[]> {
    return this.db
      .select()
      .from(evidence)
      .where(and(eq(evidence.workshopId, workshopId), eq(evidence.machineId, machineId)))
      .orderBy(desc(evidence.createdAt));
  }

  async delete(workshopId: string, id: string): Promise<void> {
    await this.db.delete(evidence).where(and(eq(evidence.workshopId, workshopId), eq(evidence.id, id)));
  }
}
