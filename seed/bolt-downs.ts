import { randomUUID } from 'node:crypto';
import { BoltDownsService } from '../backend/src/bolt-downs/bolt-downs.service.js';
import { RailsService } from '../backend/src/rails/rails.service.js';
import type { SeedContext } from './context.js';

/*
 * Invented: after another epoxy pour under the middle seats of the plasma table's right-hand
 * rail, the builder has begun bolting it down again hole by hole in line mode, with readings in
 * thou on a 0.0005 in dial. Nine of its holes are fixed; the guide shows the next one.
 */

// How far each fixed hole ended up from its aim, in thou (the dial reads to 0.5 thou).
const MISS_THOU = [0, 0, 0.5, -0.5, 0, 0.5, 0, -0.5, 0];
const START_THOU = [0.5, 1.0];

export async function seedBoltDowns(ctx: SeedContext): Promise<void> {
  if (!ctx.machines) throw new Error('seedBoltDowns needs the machines seeded first');
  const { builder } = ctx.demo.people;
  const rails = await ctx.app.get(RailsService).list(builder, ctx.machines.plasma);
  const rail = rails.find((r) => r.axis === 'Y2');
  if (!rail) throw new Error('seedBoltDowns needs the plasma table rails seeded first');

  const guide = ctx.app.get(BoltDownsService);
  let state = await guide.start(builder, rail.id, { mode: 'line', readingUnit: 'thou', lengthUnit: 'mm' });
  for (const [k, miss] of MISS_THOU.entries()) {
    const hole = state.nextHole!;
    const aim = state.holes[hole].target;
    const reading = aim === null || k < START_THOU.length ? START_THOU[k] : Math.round((aim + miss) * 2) / 2;
    state = await guide.recordHole(builder, state.id, String(hole), { reading, fixed: true, writeId: randomUUID() });
  }
}
