import type { SessionUser } from '../backend/src/auth/session-user.js';
import { BedGridsService } from '../backend/src/frame/bed-grids.service.js';
import { DiagonalChecksService } from '../backend/src/frame/diagonal-checks.service.js';
import { TestCutsService } from '../backend/src/frame/test-cuts.service.js';
import { PLASMA, type SeedContext } from './context.js';

/*
 * Invented frame checks. The plasma table was squared over five diagonal checks on a 1200 × 2000 mm
 * rectangle it marked (the correction worked over the gantry's 1750 mm span), converging from well outside the 0.5 mm/m target to inside it; its slat bed
 * has one low slat (outside 0.03 in); its first test cut is within ISO 9013 class 2 sizes but shows
 * a little X scale error and lost motion on Y. The router's checks are all within its targets.
 */

/** Diagonals of a parallelogram with sides a, b and out-of-square angle γ (law of cosines), rounded to `step`. */
function diagonals(a: number, b: number, mmPerMetre: number, step: number) {
  const sinGamma = Math.sin(Math.atan(mmPerMetre / 1000));
  const round = (v: number) => Math.round(v / step) * step;
  return {
    diagonal1: round(Math.sqrt(a * a + b * b + 2 * a * b * sinGamma)),
    diagonal2: round(Math.sqrt(a * a + b * b - 2 * a * b * sinGamma)),
  };
}

const PLASMA_SQUARING: { mmPerMetre: number; note: string }[] = [
  { mmPerMetre: 2.2, note: 'First rectangle marked after the gantry went on; Y2 side ahead.' },
  { mmPerMetre: 1.1, note: 'Y2 home switch moved back 3.5 mm; re-homed.' },
  { mmPerMetre: -0.7, note: 'Went past square; Y2 switch brought forward 1.2 mm.' },
  { mmPerMetre: 0.3, note: 'Re-homed three times, same marks each time.' },
  { mmPerMetre: 0.12, note: 'Final marks scribed on a fresh sheet; trammel points.' },
];

export async function seedFrame(ctx: SeedContext): Promise<void> {
  const { technician, builder } = ctx.demo.people;
  const { plasma, router } = ctx.machines!;
  const diag = ctx.app.get(DiagonalChecksService);
  const grids = ctx.app.get(BedGridsService);
  const cuts = ctx.app.get(TestCutsService);

  for (const [i, step] of PLASMA_SQUARING.entries()) {
    // A negative lean swaps which diagonal is long.
    const d = diagonals(1200, 2000, Math.abs(step.mmPerMetre), 0.05);
    const [diagonal1, diagonal2] = step.mmPerMetre >= 0 ? [d.diagonal1, d.diagonal2] : [d.diagonal2, d.diagonal1];
    const who: SessionUser = i === 0 ? builder : technician;
    await diag.create(who, plasma, {
      sideX: 1200,
      sideY: 2000,
      diagonal1,
      diagonal2,
      gantrySpan: PLASMA.gantrySpanMm,
      lengthUnit: 'mm',
      note: step.note,
    });
  }
  // Five rows along the 3000 mm of Y, three columns across the 1500 mm of X.
  await grids.create(builder, plasma, {
    lengthUnit: 'mm',
    readingUnit: 'mm',
    rows: 5,
    columns: 3,
    points: gridPoints(
      [0, 750, 1500],
      [0, 750, 1500, 2250, 3000],
      [
        [0.1, 0.2, 0.05],
        [0.25, 0.35, 0.2],
        [0.3, -0.55, 0.25],
        [0.2, 0.3, 0.1],
        [0.05, 0.15, -0.05],
      ],
    ),
    note: 'Torch-height gauge block at each point, slats as delivered; the middle slat sags at the centre.',
  });
  await cuts.create(technician, plasma, {
    lengthUnit: 'mm',
    plateThickness: 6,
    nominal: { x: 400, y: 400, circle: 100 },
    // Without kerf compensation the square comes out a kerf small (diagonals √2 kerf short) and the hole a kerf large.
    measured: {
      ...shortenBy(diagonals(399.4, 400.05, 0.15, 0.05), Math.SQRT2 * 1.6),
      x: 399.4 - 1.6,
      y: 400.05 - 1.6,
      circleX: 100 + 1.6,
      circleY: 99.75 + 1.6,
      kerf: 1.6,
    },
    circleKind: 'hole',
    // The axes' own steps per mm (seed/drives.ts): the cut is judged at the values the controller used.
    stepsPerMm: { x: PLASMA.stepsPerMm, y: PLASMA.stepsPerMm },
    note: '6 mm mild steel, 45 A, cut on the path without kerf compensation; kerf measured on the scrap strip.',
  });

  const r = diagonals(800, 500, 0.08, 0.01);
  await diag.create(technician, router, {
    sideX: 800,
    sideY: 500,
    ...r,
    gantrySpan: 720,
    lengthUnit: 'mm',
    note: 'Pen plotted on MDF, read with a steel rule and a loupe.',
  });
  await grids.create(builder, router, {
    lengthUnit: 'mm',
    readingUnit: 'mm',
    rows: 3,
    columns: 4,
    points: gridPoints(
      [0, 300, 600, 900],
      [0, 300, 600],
      [
        [0.02, 0.01, 0.0, -0.01],
        [0.01, 0.03, 0.02, 0.0],
        [0.0, 0.01, -0.02, -0.03],
      ],
    ),
    note: 'Spoilboard after surfacing with a 40 mm fly cutter; dial indicator in the spindle.',
  });
  await cuts.create(technician, router, {
    lengthUnit: 'mm',
    nominal: { x: 300, y: 300, circle: 80 },
    measured: { ...diagonals(300.02, 299.97, 0.05, 0.01), x: 300.02, y: 299.97, circleX: 80.03, circleY: 79.99 },
    circleKind: 'hole',
    stepsPerMm: { x: 320, y: 320 },
    note: '6 mm end mill in 12 mm birch ply, cutter compensation on.',
  });
}

function shortenBy(d: { diagonal1: number; diagonal2: number }, mm: number) {
  const round = (v: number) => Math.round(v * 100) / 100;
  return { diagonal1: round(d.diagonal1 - mm), diagonal2: round(d.diagonal2 - mm) };
}

function gridPoints(xs: number[], ys: number[], heights: number[][]) {
  return ys.flatMap((y, r) => xs.map((x, c) => ({ x, y, z: heights[r][c] })));
}
