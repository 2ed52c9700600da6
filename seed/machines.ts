import { MachinesService } from '../backend/src/machines/machines.service.js';
import { TargetSetsService } from '../backend/src/target-sets/target-sets.service.js';
import { PLASMA, type SeedContext } from './context.js';

/** The two invented machines of the demo workshop, and the default target sets. */
export async function seedMachines(ctx: SeedContext): Promise<NonNullable<SeedContext['machines']>> {
  const { builder } = ctx.demo.people;
  await ctx.app.get(TargetSetsService).ensureDefaults(ctx.demo.workshopId);
  await ctx.app.get(TargetSetsService).ensureDefaults(ctx.other.workshopId);
  const machines = ctx.app.get(MachinesService);
  const plasma = await machines.create(builder, {
    name: 'Big plasma table',
    kind: 'plasma',
    workArea: PLASMA.workArea,
    notes:
      'Welded 100 × 100 × 4 box-section frame, 1500 × 3000 mm bed of slats, 20 mm profile rails; the gantry runs the long axis (Y) on racks with a motor each side (Y1, Y2), 1750 mm apart. Being commissioned.',
  });
  const router = await machines.create(builder, {
    name: 'Small router',
    kind: 'router',
    workArea: { x: 900, y: 600 },
    notes: 'Bolted aluminium frame, 15 mm profile rails, 16 × 5 rolled ball screws on every axis.',
  });
  const other = await machines.create(ctx.other.people.owner, {
    name: 'Makerspace engraver',
    kind: 'router',
    workArea: { x: 400, y: 300 },
  });
  return { plasma: plasma.id, router: router.id, other: other.id };
}
