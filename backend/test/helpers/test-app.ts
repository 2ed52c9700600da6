import 'reflect-metadata';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { createApp } from '../../src/create-app.js';
import { DRIZZLE, type Database } from '../../src/database/database.tokens.js';
import { users, workshops, type Role, ROLES } from '../../src/database/schema/index.js';
import { hashPassword } from '../../src/auth/password.js';

export const TEST_PASSWORD = 'correct horse battery staple';

/** The real app (same setup as main.ts) on the throwaway database, ready for supertest. */
export async function createTestApp(): Promise<NestFastifyApplication> {
  if (!process.env.DATABASE_URL) throw new Error('API tests need DATABASE_URL: run them through npm test');
  const app = await createApp({ ...process.env, FRONTEND_DIST: '' });
  await app.init();
  await app.getHttpAdapter().getInstance().ready();
  return app;
}

export type Agent = ReturnType<typeof request.agent>;

export interface TestWorkshop {
  id: string;
  name: string;
  emails: Record<Role, string>;
  userIds: Record<Role, string>;
  /** A signed-in agent per role. */
  as: Record<Role, Agent>;
}

let hashed: Promise<string> | null = null;

/**
 * A fresh workshop with one member per role, each already signed in, so a spec never depends on
 * (or disturbs) the demo data or another spec's records.
 */
export async function createTestWorkshop(app: NestFastifyApplication, label = 'Test'): Promise<TestWorkshop> {
  const db = app.get<Database>(DRIZZLE);
  hashed ??= hashPassword(TEST_PASSWORD);
  const passwordHash = await hashed;
  const tag = randomUUID().slice(0, 8);
  const [ws] = await db
    .insert(workshops)
    .values({ name: `${label} workshop ${tag}` })
    .returning();
  const emails = {} as Record<Role, string>;
  const userIds = {} as Record<Role, string>;
  const as = {} as Record<Role, Agent>;
  for (const role of ROLES) {
    const email = `${role}.${tag}@test.example.com`;
    const [u] = await db
      .insert(users)
      .values({ workshopId: ws.id, email, name: `${role} ${tag}`, role, passwordHash })
      .returning();
    emails[role] = email;
    userIds[role] = u.id;
    as[role] = await signIn(app, email, TEST_PASSWORD);
  }
  return { id: ws.id, name: ws.name, emails, userIds, as };
}

export async function signIn(app: NestFastifyApplication, email: string, password: string): Promise<Agent> {
  const agent = request.agent(app.getHttpServer());
  const res = await agent.post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

export function anonymous(app: NestFastifyApplication) {
  return request(app.getHttpServer());
}
