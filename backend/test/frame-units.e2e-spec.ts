import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { eq } from 'drizzle-orm';
import lpSolverModule from 'javascript-lp-solver';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { MachinesService } from '../src/machines/machines.service.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { approvals } from '../src/database/schema/index.js';

interface LpSolver {
  Solve(model: unknown): Record<string, number | boolean | undefined>;
}
const solver: LpSolver = ((lpSolverModule as unknown as { default?: LpSolver }).default ?? lpSolverModule) as LpSolver;

/** Independent reference (javascript-lp-solver): the minimax plane's zone width, 2h, with a, b, c split into non-negative parts. */
function lpZoneWidthMm(points: { x: number; y: number; zMm: number }[]): number {
  const constraints: Record<string, { max?: number; min?: number }> = {};
  const vars: Record<string, Record<string, number>> = {
    h: { width: 1 },
    ap: {},
    an: {},
    bp: {},
    bn: {},
    cp: {},
    cn: {},
  };
  points.forEach((p, i) => {
    constraints[`up${i}`] = { max: -p.zMm };
    constraints[`dn${i}`] = { min: -p.zMm };
    const coef = { a: -p.x / 1000, b: -p.y / 1000, c: -1 };
    for (const k of ['a', 'b', 'c'] as const) {
      for (const row of [`up${i}`, `dn${i}`]) {
        vars[`${k}p`][row] = coef[k];
        vars[`${k}n`][row] = -coef[k];
      }
    }
    vars.h[`up${i}`] = -1;
    vars.h[`dn${i}`] = 1;
  });
  return 2 * Number(solver.Solve({ optimize: 'width', opType: 'min', constraints, variables: vars }).h ?? 0);
}

const IN = 25.4;
const THOU = 0.0254;

describe('frame checks in mm and in inches give the same results', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let plasma: string;
  let router: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Frame units');
    plasma = (
      await ws.as.owner.post('/api/machines').send({ name: 'P', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
    router = (await ws.as.owner.post('/api/machines').send({ name: 'R', kind: 'router', workArea: { x: 900, y: 600 } }))
      .body.id;
  });
  afterAll(() => app.close());

  // 1 in = 25.4 mm exactly (international inch, unit_facts.json).
  it('diagonal check: the same rectangle in mm and in inches', async () => {
    const mm = {
      sideX: 1219.2,
      sideY: 609.6,
      diagonal1: 1363.42,
      diagonal2: 1362.71,
      gantrySpan: 1524,
      resolution: 0.5,
    };
    const inch = Object.fromEntries(Object.entries(mm).map(([k, v]) => [k, v / IN]));
    const a = await ws.as.technician.post(`/api/machines/${plasma}/diagonal-checks`).send({ ...mm, lengthUnit: 'mm' });
    const b = await ws.as.technician
      .post(`/api/machines/${plasma}/diagonal-checks`)
      .send({ ...inch, lengthUnit: 'in' });
    expect([a.status, b.status]).toEqual([201, 201]);
    for (const key of ['outOfSquareArcsec', 'mmPerMetre', 'diagonalDifferenceMm'] as const)
      expect(b.body.result[key]).toBeCloseTo(a.body.result[key], 9);
    expect(b.body.result.correction.moveMm).toBeCloseTo(a.body.result.correction.moveMm, 9);
    expect(b.body.status).toBe(a.body.status);
    expect(b.body).toMatchObject({ lengthUnit: 'in', input: { sideX: 48, sideY: 24 } });
    expect(b.body.resolution).toBeCloseTo(0.5 / IN, 12);
    expect(b.body.warnings.map((w: { code: string }) => w.code)).toEqual(
      a.body.warnings.map((w: { code: string }) => w.code),
    );
  });

  it('bed grid: positions in inches and heights in thou give the mm grid’s results', async () => {
    const pts = [0, 1, 2].flatMap((r) =>
      [0, 1, 2, 3].map((c) => ({ x: c * 1000, y: r * 700, z: 0.05 * Math.sin(c + 2 * r) + 0.0001 * c * 1000 })),
    );
    const a = await ws.as.builder
      .post(`/api/machines/${plasma}/bed-grids`)
      .send({ lengthUnit: 'mm', readingUnit: 'mm', rows: 3, columns: 4, points: pts, resolution: 0.01 });
    const b = await ws.as.builder.post(`/api/machines/${plasma}/bed-grids`).send({
      lengthUnit: 'in',
      readingUnit: 'thou',
      rows: 3,
      columns: 4,
      points: pts.map((p) => ({ x: p.x / IN, y: p.y / IN, z: p.z / THOU })),
      resolution: 0.01 / THOU,
    });
    expect([a.status, b.status]).toEqual([201, 201]);
    for (const path of [
      ['judged', 'valueMm'],
      ['minimumZone', 'flatnessMm'],
      ['leastSquares', 'flatnessMm'],
      ['tilt', 'mmPerMetre'],
      ['heightRange', 'rangeMm'],
    ]) {
      expect(b.body.result[path[0]][path[1]]).toBeCloseTo(a.body.result[path[0]][path[1]], 9);
    }
    expect(b.body).toMatchObject({ lengthUnit: 'in', readingUnit: 'thou', status: a.body.status });
    expect(b.body.points[1].x).toBeCloseTo(1000 / IN, 9);
    expect(b.body.points[1].z).toBeCloseTo(pts[1].z / THOU, 9);
  });

  it('test cut: the same cut in mm and in inches, plate thickness included', async () => {
    const mm = {
      nominal: { x: 400, y: 400, circle: 100 },
      measured: { x: 399.2, y: 400.4, diagonal1: 565.6, diagonal2: 565.9, circleX: 99.8, circleY: 100.1, kerf: 1.5 },
    };
    const scale = (o: Record<string, number>) => Object.fromEntries(Object.entries(o).map(([k, v]) => [k, v / IN]));
    const a = await ws.as.technician
      .post(`/api/machines/${plasma}/test-cuts`)
      .send({ ...mm, plateThickness: 6, resolution: 0.02, stepsPerMm: { x: 80, y: 80 } });
    const b = await ws.as.technician.post(`/api/machines/${plasma}/test-cuts`).send({
      lengthUnit: 'in',
      nominal: scale(mm.nominal),
      measured: scale(mm.measured),
      plateThickness: 6 / IN,
      resolution: 0.02 / IN,
      stepsPerMm: { x: 80, y: 80 },
    });
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(b.body.result.parts.map((p: { deviationMm: number }) => p.deviationMm)).toEqual(
      a.body.result.parts.map((p: { deviationMm: number }) => expect.closeTo(p.deviationMm, 9)),
    );
    expect(b.body.result.parts.map((p: { toleranceMm: number }) => p.toleranceMm)).toEqual(
      a.body.result.parts.map((p: { toleranceMm: number }) => p.toleranceMm),
    );
    expect(b.body.result.x.suggestedStepsPerMm).toBeCloseTo(a.body.result.x.suggestedStepsPerMm, 9);
    expect(b.body.result.squareness.mmPerMetre).toBeCloseTo(a.body.result.squareness.mmPerMetre, 9);
    expect(b.body.status).toBe(a.body.status);
    expect(b.body.plateThickness).toBeCloseTo(6 / IN, 12);
    expect(b.body.plateThicknessMm).toBeCloseTo(6, 12);
    expect(a.body.stepsPerMm).toEqual({ x: 80, y: 80 });
  });

  describe('bed: which value is judged', () => {
    // A bed flat to 0.01 mm but tilted 0.5 mm/m against the gantry's plane of travel over 3000 mm.
    const tilted = [0, 1, 2, 3].flatMap((r) =>
      [0, 1, 2, 3, 4].map((c) => ({ x: c * 750, y: r * 500, z: 0.0005 * c * 750 + (c === 2 && r === 1 ? 0.01 : 0) })),
    );

    it('plasma: the range of heights as read (tilt left in) against the torch-height target', async () => {
      const res = await ws.as.builder.post(`/api/machines/${plasma}/bed-grids`).send({ points: tilted });
      expect(res.status).toBe(201);
      // TRADE.md: what matters is the bed parallel to the torch plane: 1.5 mm of tilt over the bed
      // is 1.5 mm of torch height, outside 0.03 in although the bed itself is flat.
      expect(res.body.result.judged.basis).toBe('height-range');
      expect(res.body.result.judged.valueMm).toBeCloseTo(1.5, 12);
      expect(res.body.result.minimumZone.flatnessMm).toBeLessThan(0.011);
      expect(res.body.status).toBe('outside-target');
      expect(res.body.warnings).toEqual(
        expect.arrayContaining([expect.objectContaining({ code: 'bed-tilted-to-gantry' })]),
      );
    });

    it('router: minimum-zone flatness (ISO 1101), equal to the LP minimax plane of javascript-lp-solver', async () => {
      const pts = [0, 1, 2].flatMap((r) =>
        [0, 1, 2, 3].map((c) => ({
          x: c * 300,
          y: r * 300,
          z: 0.0005 * c * 300 + [0.02, -0.01, 0.03, 0, 0.015, -0.02][(r * 4 + c) % 6],
        })),
      );
      const res = await ws.as.builder
        .post(`/api/machines/${router}/bed-grids`)
        .send({ readingUnit: 'mm', points: pts });
      expect(res.status).toBe(201);
      expect(res.body.result.judged.basis).toBe('minimum-zone');
      const lp = lpZoneWidthMm(pts.map((p) => ({ x: p.x, y: p.y, zMm: p.z })));
      expect(res.body.result.minimumZone.flatnessMm).toBeCloseTo(lp, 7);
      expect(res.body.result.judged.valueMm).toBeCloseTo(lp, 7);
      // Never more than least squares: the minimum zone is the smallest zone.
      expect(res.body.result.minimumZone.flatnessMm).toBeLessThanOrEqual(
        res.body.result.leastSquares.flatnessMm + 1e-12,
      );
      expect(res.body.status).toBe('within-target');
    });
  });

  describe('test cut: ISO 9013 bands on a plasma table', () => {
    const cut = (side: number, dev: number, extra: object = {}) => ({
      nominal: { x: side, y: side, circle: 100 },
      measured: {
        x: side + dev,
        y: side,
        diagonal1: Math.hypot(side + dev, side),
        diagonal2: Math.hypot(side + dev, side),
        circleX: 100,
        circleY: 100,
      },
      ...extra,
    });

    // A 400 mm square falls in the 315–1000 mm band (±1.2 mm in 3.15–6.3 mm plate, from memory), not
    // in the 35–125 mm band whose ±0.9 mm (TRADE.md) the old single tolerance applied to every part.
    it('judges a 400 mm square in its own band and records the plate thickness', async () => {
      const res = await ws.as.technician
        .post(`/api/machines/${plasma}/test-cuts`)
        .send(cut(400, 1.0, { plateThickness: 6 }));
      expect(res.status).toBe(201);
      const x = res.body.result.parts.find((p: { part: string }) => p.part === 'outside-x');
      expect(x).toMatchObject({
        sizeBandMm: [315, 1000],
        thicknessBandMm: [3.15, 6.3],
        toleranceMm: 1.2,
        within: true,
      });
      expect(x.toleranceBasis).toMatch(/ISO 9013 class 2, 315–1000 mm parts in 3.15–6.3 mm plate/);
      expect(res.body.result.parts.find((p: { part: string }) => p.part === 'circle-x')).toMatchObject({
        sizeBandMm: [35, 125],
        toleranceMm: 0.9,
      });
      expect(res.body.plateThicknessMm).toBe(6);
      expect(res.body.warnings).toEqual([]);
    });

    it('thicker plate widens the band; no thickness is judged at the target’s own band with a warning', async () => {
      const thick = await ws.as.technician
        .post(`/api/machines/${plasma}/test-cuts`)
        .send(cut(400, 1.4, { plateThickness: 8 }));
      expect(thick.body.result.parts[0]).toMatchObject({ thicknessBandMm: [6.3, 10], toleranceMm: 1.5, within: true });
      const none = await ws.as.technician.post(`/api/machines/${plasma}/test-cuts`).send(cut(400, 1.0));
      expect(none.body.result.parts[0]).toMatchObject({ thicknessBandMm: [3.15, 6.3], toleranceMm: 1.2 });
      expect(none.body.warnings).toEqual(
        expect.arrayContaining([
          expect.objectContaining({
            code: 'plate-thickness-missing',
            message: expect.stringMatching(/3.15–6.3 mm plate/),
          }),
        ]),
      );
    });

    it('warns on a coarse rule and on a part beyond the table; the board carries the warnings', async () => {
      const res = await ws.as.technician.post(`/api/machines/${plasma}/test-cuts`).send({
        ...cut(4200, 0.5, { plateThickness: 5, resolution: 1 }),
        measured: {
          ...cut(4200, 0.5).measured,
          diagonal1: Math.hypot(4200.5, 4200),
          diagonal2: Math.hypot(4200.5, 4200),
        },
      });
      expect(res.status).toBe(201);
      const codes = res.body.warnings.map((w: { code: string }) => w.code);
      expect(codes).toEqual(expect.arrayContaining(['outside-iso9013-band', 'coarse-instrument']));
      expect(res.body.warnings.find((w: { code: string }) => w.code === 'coarse-instrument').message).toMatch(
        /read to 1 mm, coarser than a quarter of the tightest part tolerance \(±0.9 mm\)/,
      );
      const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, plasma);
      const check = (await app.get(ReadinessRegistry).checksFor(ref)).find((c) => c.kind === 'test-cut')!;
      expect(check.warnings!.map((w) => w.code)).toEqual(codes);
    });

    // A router keeps its flat tenths-of-a-millimetre tolerance (common practice), whatever the size.
    it('a router keeps its flat tolerance', async () => {
      const res = await ws.as.technician
        .post(`/api/machines/${router}/test-cuts`)
        .send(cut(500, 0.15, { plateThickness: 12 }));
      expect(
        res.body.result.parts.every(
          (p: { toleranceMm: number; sizeBandMm: unknown }) => p.toleranceMm === 0.2 && p.sizeBandMm === null,
        ),
      ).toBe(true);
    });
  });

  describe('warnings on the diagonal check and the bed grid reach the board', () => {
    // TRADE.md: a tape reads to about 1/32 in (0.79 mm). On 1000 × 600 mm the plasma target of
    // 0.23 mm/m allows a diagonal difference of 2ab·sin γ/√(a² + b²) = 0.237 mm: a tape is too coarse.
    it('a tape is too coarse for the diagonals of a small rectangle', async () => {
      const ws2 = await createTestWorkshop(app, 'Tape');
      const m = (
        await ws2.as.owner.post('/api/machines').send({ name: 'P2', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
      ).body.id;
      const res = await ws2.as.technician
        .post(`/api/machines/${m}/diagonal-checks`)
        .send({ sideX: 1000, sideY: 600, diagonal1: 1166.1, diagonal2: 1166.1 });
      expect(res.body.warnings).toEqual([
        expect.objectContaining({
          code: 'tape-resolution',
          message: expect.stringMatching(/1\/32 in \(0.794 mm\).*0.237 mm diagonal difference/),
        }),
      ]);
      const fine = await ws2.as.technician
        .post(`/api/machines/${m}/diagonal-checks`)
        .send({ sideX: 1000, sideY: 600, diagonal1: 1166.1, diagonal2: 1166.1, resolution: 0.05 });
      expect(fine.body.warnings).toEqual([]);
      const coarse = await ws2.as.technician
        .post(`/api/machines/${m}/diagonal-checks`)
        .send({ sideX: 1000, sideY: 600, diagonal1: 1166.1, diagonal2: 1166.1, resolution: 0.5 });
      expect(coarse.body.warnings[0].code).toBe('coarse-instrument');
      const grid = await ws2.as.builder.post(`/api/machines/${m}/bed-grids`).send({
        points: [
          { x: 0, y: 0, z: 0 },
          { x: 1000, y: 0, z: 0.1 },
          { x: 0, y: 500, z: 0 },
          { x: 1000, y: 500, z: 0.05 },
        ],
        readingUnit: 'mm',
        resolution: 0.5,
      });
      expect(grid.body.warnings.map((w: { code: string }) => w.code)).toEqual([
        'few-grid-points',
        'grid-coverage',
        'grid-coverage',
        'coarse-instrument',
      ]);
      expect(grid.body.warnings[1].message).toMatch(/spans 1000 mm of the 3000 mm work area in X/);
      const ref = await app.get(MachinesService).getRef({ workshopId: ws2.id }, m);
      const checks = await app.get(ReadinessRegistry).checksFor(ref);
      expect(checks.find((c) => c.kind === 'diagonal-check')!.warnings![0].code).toBe('coarse-instrument');
      expect(checks.find((c) => c.kind === 'bed-grid')!.warnings!.length).toBe(4);
    });
  });

  it.each([
    ['diagonal-checks', { sideX: 1000, sideY: 600, diagonal1: 1166, diagonal2: 1166, lengthUnit: null }],
    [
      'diagonal-checks',
      { sideX: 1e6, sideY: 1e6, diagonal1: 1414213, diagonal2: 1414214, lengthUnit: 'um', resolution: 1e6 },
    ],
    ['diagonal-checks', { sideX: 1000, sideY: 600, diagonal1: 1166, diagonal2: 1166, resolution: 'fine' }],
    [
      'bed-grids',
      {
        lengthUnit: 'in',
        readingUnit: 'um',
        points: [
          { x: 1e6, y: 0, z: 1e6 },
          { x: 0, y: 1e6, z: -1e6 },
          { x: 0, y: 0, z: 0 },
        ],
        resolution: 1e6,
      },
    ],
    [
      'bed-grids',
      {
        points: [
          { x: 0, y: 0, z: 0 },
          { x: 0, y: 10, z: 0 },
          { x: 0, y: 20, z: 1 },
        ],
      },
    ],
    [
      'bed-grids',
      {
        points: [
          { x: 0, y: 0, z: 0 },
          { x: 1, y: 0, z: 0 },
          { x: 0, y: 1, z: 0 },
        ],
        resolution: [1],
      },
    ],
    [
      'test-cuts',
      {
        lengthUnit: 'thou',
        plateThickness: 1e6,
        resolution: 1e6,
        nominal: { x: 1e6, y: 1e6, circle: 1 },
        measured: { x: 1e6, y: 1e6, diagonal1: 1414213, diagonal2: 1414214, circleX: 1, circleY: 1 },
      },
    ],
    [
      'test-cuts',
      {
        plateThickness: { mm: 5 },
        nominal: { x: 300, y: 300, circle: 100 },
        measured: { x: 300, y: 300, diagonal1: 424, diagonal2: 424, circleX: 100, circleY: 100 },
      },
    ],
  ])('%s: odd input %j is answered without a server error', async (route, body) => {
    const res = await ws.as.technician.post(`/api/machines/${plasma}/${route}`).send(body);
    expect(res.status).toBeLessThan(500);
    if (res.status === 400)
      expect(JSON.stringify(res.body.message)).toMatch(
        /lengthUnit|readingUnit|resolution|plateThickness|points|diagonal|sideX/,
      );
  });

  // The certificate is drawn from the approval's snapshot: the bed map and the test cut's table go in it.
  it('an approval snapshot holds the bed map and the test-cut table', async () => {
    const ws3 = await createTestWorkshop(app, 'Snapshot');
    const m = (
      await ws3.as.owner
        .post('/api/machines')
        .send({ name: 'Router for approval', kind: 'router', workArea: { x: 900, y: 600 } })
    ).body.id;
    const grid = [0, 1, 2].flatMap((r) =>
      [0, 1, 2, 3].map((c) => ({ x: c * 300, y: r * 300, z: [0.02, 0.01, 0, -0.01][c] + 0.01 * r })),
    );
    expect(
      (await ws3.as.builder.post(`/api/machines/${m}/bed-grids`).send({ rows: 3, columns: 4, points: grid })).status,
    ).toBe(201);
    const cutRes = await ws3.as.technician.post(`/api/machines/${m}/test-cuts`).send({
      nominal: { x: 300, y: 300, circle: 80 },
      measured: { x: 300.05, y: 299.98, diagonal1: 424.28, diagonal2: 424.28, circleX: 80.02, circleY: 79.99 },
    });
    expect(cutRes.body.status).toBe('within-target');
    await waiveAllBut(ws3, m, (key) => key.startsWith('bed-grid') || key.startsWith('test-cut'));
    const approval = await requestAndApprove(ws3, m, TEST_PASSWORD);
    const [row] = await app.get<Database>(DRIZZLE).select().from(approvals).where(eq(approvals.id, approval.id));
    const bed = row.snapshot.checks.find((c) => c.kind === 'bed-grid')!;
    expect(bed.series!.lines).toHaveLength(3);
    expect(bed.series!.lines[0].label).toBe('Row 1 · Y = 0 mm');
    expect(bed.series!.lines[0].points.map(([x]) => x)).toEqual([0, 300, 600, 900]);
    // Heights above the lower bound of the minimum zone: all within 0 … judged value, the target the limit.
    const judged = bed.result!.value;
    for (const [, h] of bed.series!.lines.flatMap((l) => l.points)) {
      expect(h).toBeGreaterThanOrEqual(-1e-12);
      expect(h).toBeLessThanOrEqual(judged + 1e-12);
    }
    expect(Math.max(...bed.series!.lines.flatMap((l) => l.points.map(([, h]) => h)))).toBeCloseTo(judged, 12);
    expect(bed.series!.limits).toEqual([{ label: 'Target 0.1 mm', value: 0.1 }]);
    const cut = row.snapshot.checks.find((c) => c.kind === 'test-cut')!;
    expect(cut.series!.lines.map((l) => l.label)).toEqual([
      'Outside size in X',
      expect.stringMatching(/^±0.2 mm: target/),
      'Outside size in Y',
      expect.stringMatching(/^±0.2 mm/),
      'Circle diameter in X',
      expect.stringMatching(/^±0.2 mm/),
      'Circle diameter in Y',
      expect.stringMatching(/^±0.2 mm/),
    ]);
    expect(cut.series!.lines[0].points[0][0]).toBe(300);
    expect(cut.series!.lines[0].points[0][1]).toBeCloseTo(0.05, 9);
    expect(cut.series!.lines[1].points).toEqual([
      [300, -0.2],
      [300, 0.2],
    ]);
  });
});
