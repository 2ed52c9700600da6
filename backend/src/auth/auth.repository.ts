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

  async findSessionUser(userId: string): Promise<SessionUser | null> {
    const [row] = await this.db
      .select(sessionUserColumns)
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

  async findPasswordHash(userId: string): Promise<string | null> {
    const [row] = await this.db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, userId));
    return row?.hash ?? null;
  }
}
