import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../database/database.tokens.js';
import { users, type Role } from '../database/schema/index.js';
import type { PersonRow } from './person.mapper.js';

const columns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  active: users.active,
  passwordPending: users.passwordPending,
  createdAt: users.createdAt,
};

@Injectable()
export class PeopleRepository {
  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  list(workshopId: string): Promise<PersonRow[]> {
    return this.db.select(columns).from(users).where(eq(users.workshopId, workshopId)).orderBy(asc(users.name));
  }

  async find(workshopId: string, id: string): Promise<PersonRow | null> {
    const [row] = await this.db
      .select(columns)
      .from(users)
      .where(and(eq(users.workshopId, workshopId), eq(users.id, id)));
    return row ?? null;
  }

  async emailTaken(email: string): Promise<boolean> {
    const [row] = await this.db
      .select({ id: users.id })
      .from(users)
      .where(sql`lower(${users.email}) = ${email.toLowerCase()}`);
    return !!row;
  }

  async insert(
    workshopId: string,
    values: { name: string; email: string; role: Role; passwordHash: string; passwordPending: boolean },
  ) {
    const [row] = await this.db
      .insert(users)
      .values({ workshopId, ...values })
      .returning(columns);
    return row;
  }

  async update(workshopId: string, id: string, values: { role?: Role; active?: boolean }) {
    const [row] = await this.db
      .update(users)
      .set({ ...values, updatedAt: new Date() })
      .where(and(eq(users.workshopId, workshopId), eq(users.id, id)))
      .returning(columns);
    return row;
  }

  async setPasswordHash(id: string, passwordHash: string) {
    await this.db.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, id));
  }

  async countOtherActiveAdmins(workshopId: string, exceptId: string): Promise<number> {
    const [row] = await this.db
      .select({ n: sql<number>`count(*)::int` })
      .from(users)
      .where(
        and(eq(users.workshopId, workshopId), eq(users.role, 'admin'), eq(users.active, true), ne(users.id, exceptId)),
      );
    return row.n;
  }
}
