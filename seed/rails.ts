import { seededRandom } from '../backend/src/engine/seeded-random.js';
import { RailsService } from '../backend/src/rails/rails.service.js';
import { RailSweepsService } from '../backend/src/rails/rail-sweeps.service.js';
import type { SessionUser } from '../backend/src/auth/session-user.js';
import { PLASMA, type SeedContext } from './context.js';

/*
 * Invented rails and dial-indicator sweeps. The plasma table was swept several times while its
 * rails were nudged into line (as-found well outside the 2 thou target, later sweeps better, Y2
 * still outside); the router's rails were finished before it was approved, all within target.
 * Readings follow a bow along the rail plus indicator scatter, rounded to the dial's graduation.
 */

const DAY_MS = 86_400_000;

interface SweepPlan {
  daysAgo: number;
  phase: 'as-found' | 'as-left';
  /** Bow at mid-length and tilt over the length, in the sweep unit. */
  bow: number;
  tilt: number;
  offset?: number;
  scatter: number;
  datum?: string;
  /** The rail face the indicator reads: side for straightness and parallelism, top for heights. */
  face?: 'side' | 'top';
  boltSize?: string;
  torqueNm?: number;
  notes?: string;
}

function readings(stationsMm: number[], lengthMm: number, p: SweepPlan, step: number, seed: number) {
  const rand = seededRandom(seed);
  return stationsMm.map((x) => {
    const raw =
      (p.offset ?? 0) +
      p.bow * Math.sin((Math.PI * x) / lengthMm) +
      p.tilt * (x / lengthMm) +
      (rand() - 0.5) * 2 * p.scatter;
    return Math.round(raw / step) * step;
  });
}

async function sweepRail(
  ctx: SeedContext,
  who: SessionUser,
  railId: string,
  lengthMm: number,
  stepMm: number,
  instrument: { name: string; unit: 'thou' | 'um'; resolution: number },
  plans: SweepPlan[],
  seed: number,
) {
  const sweeps = ctx.app.get(RailSweepsService);
  const stationsMm = Array.from({ length: Math.floor(lengthMm / stepMm) + 1 }, (_, i) => i * stepMm);
  for (const [k, p] of plans.entries()) {
    const values = readings(stationsMm, lengthMm, p, instrument.resolution, seed * 31 + k);
    await sweeps.record(who, railId, {
      readingUnit: instrument.unit,
      lengthUnit: 'mm',
      face: p.face ?? 'side',
      phase: p.phase,
      stations: stationsMm.map((position, i) => ({ position, reading: values[i] })),
      instrument: instrument.name,
      resolution: instrument.resolution,
      temperatureC: 17 + ((seed + k) % 5) * 0.5,
      takenBy: who.name,
      datum: p.datum,
      boltSize: p.boltSize,
      torqueNm: p.torqueNm,
      notes: p.notes,
      takenAt: new Date(Date.now() - p.daysAgo * DAY_MS).toISOString(),
    });
  }
}

export async function seedRails(ctx: SeedContext): Promise<void> {
  if (!ctx.machines) throw new Error('seedRails needs the machines seeded first');
  const rails = ctx.app.get(RailsService);
  const { builder, technician } = ctx.demo.people;

  // Plasma table: 20 mm rails, M5 bolts at 60 mm pitch; readings in thou on a 0.0005 in dial.
  // The gantry runs along Y on Y1 and Y2: 3060 mm of travel plus a 77 mm carriage and stop
  // clearance makes 3200 mm rails, spaced 1750 mm apart (the gantry's span). The X rails on the
  // gantry beam carry the torch over 1546 mm of travel: 1800 mm rails, 150 mm apart.
  const dial = { name: 'Dial indicator, 0.0005 in graduation, on a carriage', unit: 'thou' as const, resolution: 0.5 };
  const p = ctx.machines.plasma;
  const y1 = await rails.create(builder, p, {
    label: 'Y1 (left)',
    axis: 'Y1',
    lengthUnit: 'mm',
    length: PLASMA.yRailMm,
    profileSize: 20,
    holePitch: 60,
    firstHole: 40,
    spacing: PLASMA.gantrySpanMm,
  });
  const y2 = await rails.create(builder, p, {
    label: 'Y2 (right)',
    axis: 'Y2',
    lengthUnit: 'mm',
    length: PLASMA.yRailMm,
    profileSize: 20,
    holePitch: 60,
    firstHole: 40,
    spacing: PLASMA.gantrySpanMm,
    partnerRailId: y1.id,
  });
  const xf = await rails.create(builder, p, {
    label: 'X front',
    axis: 'X',
    lengthUnit: 'mm',
    length: PLASMA.xRailMm,
    profileSize: 20,
    holePitch: 60,
    firstHole: 30,
    spacing: 150,
  });
  const xr = await rails.create(builder, p, {
    label: 'X rear',
    axis: 'X',
    lengthUnit: 'mm',
    length: PLASMA.xRailMm,
    profileSize: 20,
    holePitch: 60,
    firstHole: 30,
    spacing: 150,
    partnerRailId: xf.id,
  });
  const wire = 'Taut wire along the long side';
  const beam = 'Straightedge on the gantry beam';
  const m5 = { boltSize: 'M5', torqueNm: 8.8 };
  await sweepRail(
    ctx,
    builder,
    y1.id,
    PLASMA.yRailMm,
    200,
    dial,
    [
      {
        daysAgo: 12,
        phase: 'as-found',
        bow: 9,
        tilt: 4,
        scatter: 0.6,
        notes: 'Bolts snug only; rail laid on the welded seat.',
      },
      { daysAgo: 9, phase: 'as-found', bow: 4, tilt: 1.5, scatter: 0.5, notes: 'After shimming the middle seats.' },
      {
        daysAgo: 6,
        phase: 'as-left',
        bow: 1,
        tilt: 0.5,
        scatter: 0.4,
        datum: wire,
        ...m5,
        notes: 'All bolts torqued, centre outwards.',
      },
    ],
    1,
  );
  await sweepRail(
    ctx,
    builder,
    y2.id,
    PLASMA.yRailMm,
    200,
    dial,
    [
      { daysAgo: 12, phase: 'as-found', bow: -11, tilt: 3, scatter: 0.6, notes: 'Bolts snug only.' },
      { daysAgo: 8, phase: 'as-found', bow: -6, tilt: 2, scatter: 0.5 },
      {
        daysAgo: 5,
        phase: 'as-left',
        bow: -3.5,
        tilt: 1,
        offset: 3,
        scatter: 0.4,
        datum: wire,
        ...m5,
        notes: 'Still a dip in the middle; the seat needs another epoxy pour.',
      },
    ],
    2,
  );
  await sweepRail(
    ctx,
    technician,
    xf.id,
    PLASMA.xRailMm,
    150,
    dial,
    [
      { daysAgo: 7, phase: 'as-found', bow: 6, tilt: 2, scatter: 0.5 },
      { daysAgo: 4, phase: 'as-left', bow: 0.8, tilt: 0.5, scatter: 0.3, datum: beam, ...m5 },
    ],
    3,
  );
  await sweepRail(
    ctx,
    technician,
    xr.id,
    PLASMA.xRailMm,
    150,
    dial,
    [
      { daysAgo: 7, phase: 'as-found', bow: 7, tilt: -2, scatter: 0.5 },
      { daysAgo: 4, phase: 'as-left', bow: 1.2, tilt: 0.3, offset: 1, scatter: 0.3, datum: beam, ...m5 },
    ],
    4,
  );

  // Router: 15 mm rails, M4 bolts; readings in µm on a digital indicator reading 0.001 mm.
  const digital = { name: 'Digital indicator, 0.001 mm, on a carriage', unit: 'um' as const, resolution: 1 };
  const r = ctx.machines.router;
  const ry1 = await rails.create(builder, r, {
    label: 'Y1 (left)',
    axis: 'Y1',
    lengthUnit: 'mm',
    length: 1100,
    profileSize: 15,
    holePitch: 60,
    firstHole: 40,
    spacing: 1000,
  });
  const ry2 = await rails.create(builder, r, {
    label: 'Y2 (right)',
    axis: 'Y2',
    lengthUnit: 'mm',
    length: 1100,
    profileSize: 15,
    holePitch: 60,
    firstHole: 40,
    spacing: 1000,
    partnerRailId: ry1.id,
  });
  const rxt = await rails.create(builder, r, {
    label: 'X upper',
    axis: 'X',
    lengthUnit: 'mm',
    length: 800,
    profileSize: 15,
    holePitch: 60,
    firstHole: 40,
    spacing: 120,
  });
  const rxb = await rails.create(builder, r, {
    label: 'X lower',
    axis: 'X',
    lengthUnit: 'mm',
    length: 800,
    profileSize: 15,
    holePitch: 60,
    firstHole: 40,
    spacing: 120,
    partnerRailId: rxt.id,
  });
  const bar = 'Ground datum bar on the base';
  const gantryBar = 'Ground datum bar on the gantry plate';
  const m4 = { boltSize: 'M4', torqueNm: 4.1 };
  await sweepRail(
    ctx,
    builder,
    ry1.id,
    1100,
    100,
    digital,
    [
      { daysAgo: 48, phase: 'as-found', bow: 28, tilt: 10, scatter: 2 },
      { daysAgo: 45, phase: 'as-left', bow: 5, tilt: 3, scatter: 1.5, datum: bar, ...m4 },
    ],
    5,
  );
  await sweepRail(
    ctx,
    builder,
    ry2.id,
    1100,
    100,
    digital,
    [
      { daysAgo: 48, phase: 'as-found', bow: -22, tilt: 6, scatter: 2 },
      { daysAgo: 45, phase: 'as-left', bow: 4, tilt: 2, offset: 18, scatter: 1.5, datum: bar, ...m4 },
    ],
    6,
  );
  await sweepRail(
    ctx,
    builder,
    rxt.id,
    800,
    100,
    digital,
    [{ daysAgo: 44, phase: 'as-left', bow: 4, tilt: 2, scatter: 1.5, datum: gantryBar, ...m4 }],
    7,
  );
  await sweepRail(
    ctx,
    builder,
    rxb.id,
    800,
    100,
    digital,
    [{ daysAgo: 44, phase: 'as-left', bow: 3, tilt: 1, offset: -9, scatter: 1.5, datum: gantryBar, ...m4 }],
    8,
  );
}
