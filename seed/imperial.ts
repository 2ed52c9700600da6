import { AxesService } from '../backend/src/drives/axes.service.js';
import { BacklashService } from '../backend/src/drives/backlash.service.js';
import { PositioningRunsService } from '../backend/src/drives/positioning-runs.service.js';
import { TravelTrialsService } from '../backend/src/drives/travel-trials.service.js';
import { BedGridsService } from '../backend/src/frame/bed-grids.service.js';
import { DiagonalChecksService } from '../backend/src/frame/diagonal-checks.service.js';
import { TestCutsService } from '../backend/src/frame/test-cuts.service.js';
import { MachinesService } from '../backend/src/machines/machines.service.js';
import { RailsService } from '../backend/src/rails/rails.service.js';
import { RailSweepsService } from '../backend/src/rails/rail-sweeps.service.js';
import { seededRandom } from '../backend/src/engine/seeded-random.js';
import type { SeedContext } from './context.js';

/*
 * Invented: a 24 × 36 in hobby router built and measured in inches throughout — rail lengths and
 * stations in inches, indicator readings in thou, 5-threads-per-inch lead screws (8000 steps/in),
 * moves and the test cut read with an inch rule and calipers. Being built: its rails and drives
 * are recorded, the frame checks are under way.
 */

const DAY_MS = 86_400_000;

export async function seedImperialRouter(ctx: SeedContext): Promise<string> {
  const { builder, technician } = ctx.demo.people;
  const machine = await ctx.app.get(MachinesService).create(builder, {
    name: 'Garage router (inch)',
    kind: 'router',
    // 36 × 24 in of work area, shown in inches; the machine file keeps it in mm (914.4 × 609.6).
    lengthUnit: 'in',
    workArea: { x: 36, y: 24 },
    notes: 'Steel-tube frame, 20 mm profile rails, 5 TPI lead screws on every axis; set up and measured in inches.',
  });
  const m = machine.id;

  // Gantry on Y1/Y2 over 25.5 in of travel: 30 in rails (travel + a 2.6 in carriage + stops), 40 in apart.
  const rails = ctx.app.get(RailsService);
  const y1 = await rails.create(builder, m, {
    label: 'Y1 (left)',
    axis: 'Y1',
    lengthUnit: 'in',
    length: 30,
    profileSize: 20,
    holePitch: 2.5,
    firstHole: 1.25,
    spacing: 40,
  });
  const y2 = await rails.create(builder, m, {
    label: 'Y2 (right)',
    axis: 'Y2',
    lengthUnit: 'in',
    length: 30,
    profileSize: 20,
    holePitch: 2.5,
    firstHole: 1.25,
    spacing: 40,
    partnerRailId: y1.id,
  });
  const sweeps = ctx.app.get(RailSweepsService);
  const stations = Array.from({ length: 11 }, (_, i) => i * 3);
  for (const [k, rail] of [y1, y2].entries()) {
    const rand = seededRandom(101 + k);
    const bow = k === 0 ? 0.6 : -0.8;
    await sweeps.record(builder, rail.id, {
      lengthUnit: 'in',
      readingUnit: 'thou',
      face: 'side',
      phase: 'as-left',
      stations: stations.map((position) => ({
        position,
        reading: Math.round((bow * Math.sin((Math.PI * position) / 30) + (rand() - 0.5) * 0.4) * 10) / 10,
      })),
      instrument: 'Test indicator, 0.0001 in, on a carriage',
      resolution: 0.1,
      temperatureC: 19,
      datum: 'Precision straightedge clamped beside the rails',
      takenBy: builder.name,
      takenAt: new Date(Date.now() - 3 * DAY_MS).toISOString(),
    });
  }

  // 5 TPI lead screws: 0.2 in a turn, 200 × 8 steps a turn → 8000 steps/in = 314.9606 steps/mm.
  const axes = ctx.app.get(AxesService);
  const screw = (name: string, travel: number, length: number) => ({
    name,
    lengthUnit: 'in' as const,
    drive: {
      type: 'screw' as const,
      threadsPerInch: 5,
      nominalDiameter: 0.625,
      rootDiameter: 0.5,
      unsupportedLength: length,
      mounting: 'fixed-supported' as const,
    },
    motorStepsPerRev: 200,
    microsteps: 8,
    stepsPerMm: 314.9606,
    maxFeedRate: 100,
    measuredTravel: travel,
  });
  const x = await axes.create(technician, m, { ...screw('X', 37.5, 42), notes: 'Travel read on a 48 in rule.' });
  const y = await axes.create(technician, m, {
    ...screw('Y', 25.5, 30),
    notes: 'One screw under the table drives both gantry sides through a belt.',
  });

  const trials = ctx.app.get(TravelTrialsService);
  await trials.create(technician, x.id, {
    lengthUnit: 'in',
    moves: [
      { commanded: 10, measured: 9.996 },
      { commanded: 20, measured: 19.991 },
      { commanded: 30, measured: 29.987 },
    ],
    notes: '48 in steel rule and a magnifier.',
  });
  await trials.create(technician, y.id, {
    lengthUnit: 'in',
    moves: [
      { commanded: 8, measured: 8.002 },
      { commanded: 16, measured: 16.003 },
      { commanded: 24, measured: 24.005 },
    ],
  });

  const runs = ctx.app.get(PositioningRunsService);
  const targets = [0.5, 9.5, 18.5, 27.5, 36.5];
  const noise = seededRandom(107);
  const dev = (t: number, sign: number) => Math.round((0.04 * t - 0.5 + sign * 0.6 + (noise() - 0.5) * 0.4) * 10) / 10;
  await runs.create(technician, x.id, {
    lengthUnit: 'in',
    readingUnit: 'thou',
    targets,
    runs: Array.from({ length: 10 }, (_, r) => ({
      direction: r % 2 ? ('down' as const) : ('up' as const),
      deviations: targets.map((t) => dev(t, r % 2 ? -1 : 1)),
    })),
    notes: 'Test indicator 0.0001 in against a stop block at each target.',
  });

  const backlash = ctx.app.get(BacklashService);
  await backlash.create(technician, x.id, {
    lengthUnit: 'in',
    readingUnit: 'thou',
    resolution: 0.1,
    positions: [
      { position: 1, up: [0.6, 0.7, 0.6], down: [-0.6, -0.5, -0.6] },
      { position: 18, up: [0.8, 0.8, 0.9], down: [-0.7, -0.8, -0.7] },
      { position: 36, up: [0.6, 0.6, 0.7], down: [-0.6, -0.6, -0.5] },
    ],
    notes: 'Anti-backlash nuts on the X screw.',
  });

  // A 30 × 20 in rectangle marked with a pen, read with a tape to 1/32 in over a 40 in gantry span.
  const gamma = Math.atan(0.15 / 1000);
  const diag = (a: number, b: number, sign: number) =>
    Math.round(Math.sqrt(a * a + b * b + sign * 2 * a * b * Math.sin(gamma)) * 32) / 32;
  await ctx.app.get(DiagonalChecksService).create(technician, m, {
    lengthUnit: 'in',
    sideX: 30,
    sideY: 20,
    diagonal1: diag(30, 20, 1),
    diagonal2: diag(30, 20, -1),
    gantrySpan: 40,
    resolution: 1 / 32,
    note: 'Pen on a sheet of hardboard; tape read to 1/32 in.',
  });

  const heights = [
    [0.0, 1.5, 2.0, 1.0],
    [1.0, 2.5, 3.5, 2.0],
    [0.5, 1.5, 2.5, 1.0],
  ];
  await ctx.app.get(BedGridsService).create(builder, m, {
    lengthUnit: 'in',
    readingUnit: 'thou',
    rows: 3,
    columns: 4,
    resolution: 0.5,
    points: [0, 12, 24].flatMap((py, r) => [0, 12, 24, 36].map((px, c) => ({ x: px, y: py, z: heights[r][c] }))),
    note: 'Dial indicator in the spindle over the MDF spoilboard, before surfacing.',
  });

  await ctx.app.get(TestCutsService).create(technician, m, {
    lengthUnit: 'in',
    nominal: { x: 10, y: 10, circle: 3 },
    measured: { x: 9.996, y: 10.002, diagonal1: 14.1432, diagonal2: 14.14, circleX: 2.998, circleY: 3.001 },
    circleKind: 'hole',
    stepsPerMm: { x: 314.9606, y: 314.9606 },
    resolution: 0.001,
    note: '1/4 in end mill in 1/2 in MDF, cutter compensation on; calipers to 0.001 in.',
  });
  return m;
}
