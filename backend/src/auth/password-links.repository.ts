import { Inject, Injectable } from '@nestjs/common';
import { and, eq, isNull } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { passwordLinks, users, workshops } from '../database/schema/index.js';

@Injectable()
export class PasswordLinksRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async insert(values: typeof passwordLinks.$inferInsert) {
    const [row] = await this.db.insert(passwordLinks).values(values).returning();
    return row;
  }

  async findByHash(tokenHash: string) {
    const [row] = await this.db
      .select({ link: passwordLinks, email: users.email, name: users.name, active: users.active, workshopName: workshops.name })
      .from(passwordLinks)
      .innerJoin(users, eq(users.id, passwordLinks.userId))
      .innerJoin(workshops, eq(workshops.id, users.workshopId))
      .where(eq(passwordLinks.tokenHash, tokenHash));
    return row ?? null;
  }

  /** Marks the link used and sets the password in one step; false when someone used it first. */
  async consume(linkId: string, userId: string, passwordHash: string): Promise<boolean> {
    return this.db.transaction(async (tx) => {
      const used = await tx
        .update(passwordLinks)
        .set({ usedAt: new Date() })
        .where(and(eq(passwordLinks.id, linkId), isNull(passwordLinks.usedAt)))
        .returning({ id: passwordLinks.id });
      if (!used.length) return false;
      // Any other link still open for this person stops working too.
      await tx.update(passwordLinks).set({ usedAt: new Date() }).where(and(eq(passwordLinks.userId, userId), isNull(passwordLinks.usedAt)));
      await tx.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, userId));
      return true;
    });
  }
}
