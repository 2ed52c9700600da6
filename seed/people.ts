import type { INestApplicationContext } from '@nestjs/common';
import { DRIZZLE, type Database } from '../backend/src/database/database.tokens.js';
import { users, workshops, type Role } from '../backend/src/database/schema/index.js';
import { hashPassword } from '../backend/src/auth/password.js';
import type { SessionUser } from '../backend/src/auth/session-user.js';
import { DEMO_PASSWORD, type SeedContext } from './context.js';

// Invented people of an invented workshop.
const DEMO_PEOPLE: { role: Role; email: string; name: string }[] = [
  { role: 'admin', email: 'admin@example.com', name: 'Ada Marlow' },
  { role: 'owner', email: 'owner@example.com', name: 'Owen Pryce' },
  { role: 'technician', email: 'tech@example.com', name: 'Tamsin Hale' },
  { role: 'builder', email: 'builder@example.com', name: 'Bram Oakes' },
  { role: 'viewer', email: 'viewer@example.com', name: 'Vera Lund' },
];

export async function seedPeople(app: INestApplicationContext): Promise<Omit<SeedContext, 'app'>> {
  const db = app.get<Database>(DRIZZLE);
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const [demo] = await db.insert(workshops).values({ name: 'Harbour Lane Fabrication' }).returning();
  const [other] = await db.insert(workshops).values({ name: 'Kestrel Yard Makerspace' }).returning();
  const people = {} as Record<Role, SessionUser>;
  for (const p of DEMO_PEOPLE) {
    const [row] = await db
      .insert(users)
      .values({ workshopId: demo.id, ...p, passwordHash })
      .returning();
    people[p.role] = {
      id: row.id,
      email: row.email,
      name: row.name,
      role: row.role,
      workshopId: demo.id,
      workshopName: demo.name,
    };
  }
  const [otherOwner] = await db
    .insert(users)
    .values({ workshopId: other.id, role: 'owner', email: 'other@example.com', name: 'Odile Ferris', passwordHash })
    .returning();
  return {
    demo: { workshopId: demo.id, people },
    other: {
      workshopId: other.id,
      people: {
        owner: {
          id: otherOwner.id,
          email: otherOwner.email,
          name: otherOwner.name,
          role: 'owner',
          workshopId: other.id,
          workshopName: other.name,
        },
      },
    },
  };
}
