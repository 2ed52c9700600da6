import type { INestApplicationContext } from '@nestjs/common';
import type { Role } from '../backend/src/database/schema/users.js';
import type { SessionUser } from '../backend/src/auth/session-user.js';

/** What each part of the demo seed receives: the app (for services) and the demo people. */
export interface SeedContext {
  app: INestApplicationContext;
  /** Harbour Lane Fabrication, the demo workshop, one person per role. */
  demo: { workshopId: string; people: Record<Role, SessionUser> };
  /** A second invented workshop, so isolation can be seen. */
  other: { workshopId: string; people: { owner: SessionUser } };
  /** The demo machines, once seeded: a plasma table being commissioned and an approved router. */
  machines?: { plasma: string; router: string; other: string };
}

export const DEMO_PASSWORD = 'railwright-demo';
