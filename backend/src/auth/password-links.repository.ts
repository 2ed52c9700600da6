import { Inject, Injectable } from '@nestjs/common';
import { and, eq, isNull, sql } from 'drizzle-orm';
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
      .select({
        link: passwordLinks,
        email: users.email,
        name: users.name,
        active: users.active,
        workshopId: users.workshopId,
        workshopName: workshops.name,
      })
      .from(passwordLinks)
      .innerJoin(users, eq(users.id, passwordLinks.userId))
      .innerJoin(workshops, eq(workshops.id, users.workshopId))
      .where(eq(passwordLinks.tokenHash, tokenHash));
    return row ?? null;
  }

  /**
   * Marks the link used and sets the password in one step; false when someone used it first.
   * The change log names the person as the one who changed it (nobody is signed in on this page).
   */
  async consume(
    linkId: string,
    person: { id: string; name: string; workshopId: string },
    passwordHash: string,
  ): Promise<boolean> {
    const userId = person.id;
    return this.db.transaction(async (tx) => {
      await tx.execute(
        sql`select set_config('railwright.actor_id', ${person.id}, true), set_config('railwright.actor_name', ${person.name}, true), set_config('railwright.workshop_id', ${person.workshopId}, true)`,
      );
      const used = await tx
        .update(passwordLinks)
        .set({ usedAt: new Date() })
        .where(and(eq(passwordLinks.id, linkId), isNull(passwordLinks.usedAt)))
        .returning({ id: passwordLinks.id });
      if (!used.length) return false;
      // Any other link still open for this person stops working too.
      await tx
        .update(passwordLinks)
        .set({ usedAt: new Date() })
        .where(and(eq(passwordLinks.userId, userId), isNull(passwordLinks.usedAt)));
      await tx
        .update(users)
        .set({ passwordHash, passwordPending: false, updatedAt: new Date() })
        .where(eq(users.id, userId));
      return true;
    });
  }
}
