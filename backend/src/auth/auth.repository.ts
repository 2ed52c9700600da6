import { Inject, Injectable } from '@nestjs/common';
import { and, eq, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { users, workshops } from '../database/schema/index.js';
import type { SessionUser } from './session-user.js';

const sessionUserColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  workshopId: users.workshopId,
  workshopName: workshops.name,
};

@Injectable()
export class AuthRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  /** The person behind a session, with the moment before which their sessions no longer count. */
  async findSessionUser(userId: string): Promise<(SessionUser & { sessionsValidFrom: Date }) | null> {
    const [row] = await this.db
      .select({ ...sessionUserColumns, sessionsValidFrom: users.sessionsValidFrom })
      .from(users)
      .innerJoin(workshops, eq(workshops.id, users.workshopId))
      .where(and(eq(users.id, userId), eq(users.active, true)));
    return row ?? null;
  }

  async findActiveByEmail(email: string): Promise<(SessionUser & { passwordHash: string }) | null> {
    const [row] = await this.db
      .select({ ...sessionUserColumns, passwordHash: users.passwordHash })
      .from(users)
      .innerJoin(workshops, eq(workshops.id, users.workshopId))
      .where(and(sql`lower(${users.email}) = ${email.toLowerCase()}`, eq(users.active, true)));
    return row ?? null;
  }

  /** Any account with this address, active or not: a failed sign-in to it is kept in its workshop's history. */
  async findAccountByEmail(
    email: string,
  ): Promise<{ id: string; name: string; workshopId: string; active: boolean } | null> {
    const [row] = await this.db
      .select({ id: users.id, name: users.name, workshopId: users.workshopId, active: users.active })
      .from(users)
      .where(sql`lower(${users.email}) = ${email.toLowerCase()}`);
    return row ?? null;
  }

  /**
   * Ends every session of the person: sessions signed in before now are refused from here on, and
   * their rows leave the session store (connect-pg-simple's table, keyed by the session's userId).
   */
  async endSessions(userId: string, now: Date): Promise<void> {
    await this.db.update(users).set({ sessionsValidFrom: now }).where(eq(users.id, userId));
    await this.db.execute(sql`delete from "session" where sess->>'userId' = ${userId}`);
  }

  async findPasswordHash(userId: string): Promise<string | null> {
    const [row] = await this.db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, userId));
    return row?.hash ?? null;
  }
}
