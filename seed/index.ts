import type { INestApplicationContext } from '@nestjs/common';
import type { SeedContext } from './context.js';
import { seedPeople } from './people.js';
import { seedMachines } from './machines.js';
import { seedFrame } from './frame.js';
import { seedSafety } from './safety.js';
import { seedRails } from './rails.js';
import { seedBoltDowns } from './bolt-downs.js';
import { seedDrives } from './drives.js';
import { seedApprovals } from './approvals.js';
import { seedEvidence } from './evidence.js';
import { seedHolePatterns } from './hole-patterns.js';
import { seedImperialRouter } from './imperial.js';

/** The demo workshop, built through the product's own services so results match the engine. */
export async function runDemoSeed(app: INestApplicationContext): Promise<SeedContext> {
  const ctx: SeedContext = { app, ...(await seedPeople(app)) };
  ctx.machines = await seedMachines(ctx);
  await seedFrame(ctx);
  await seedSafety(ctx);
  await seedRails(ctx);
  await seedBoltDowns(ctx);
  await seedDrives(ctx);
  // Each domain adds its demo records here, in dependency order.
  await seedHolePatterns(ctx);
  // A third machine set up in inches end to end, as an inch shop would.
  await seedImperialRouter(ctx);
  await seedEvidence(ctx);
  await seedApprovals(ctx); // last: signs off the router on everything above
  return ctx;
}
