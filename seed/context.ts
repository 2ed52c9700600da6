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

/**
 * The demo plasma table's geometry, in one place so rails, axes, squaring and test cuts agree.
 * A 1500 × 3000 mm table: the gantry runs along Y on two driven sides (Y1, Y2) and carries the
 * torch along X on its beam. Travel is the work plus about 25 mm at each end; a rail is its
 * travel plus the carriage (77 mm for a 20 mm rail) and stop clearance; the gantry's span is the
 * distance between its two driven sides, the length the squaring correction is worked over.
 */
export const PLASMA = {
  workArea: { x: 1500, y: 3000 },
  xTravelMm: 1546,
  yTravelMm: 3060,
  xRailMm: 1800,
  yRailMm: 3200,
  gantrySpanMm: 1750,
  /** Rack module 1.5, 20-tooth pinion, 3:1 belt reduction, 200-step motor at 8 microsteps: 1600 × 3 ÷ (π × 1.5 × 20). */
  stepsPerMm: 50.9296,
} as const;
