import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type Agent } from './helpers/test-app.js';

// Every calculator takes lengthUnit (positions, moves, lengths, lead, travel) and readingUnit
// (indicator readings, deviations, heights). The same data sent in mm and in inches/thou must
// give the same results, which come back in mm. Conversions: 1 in = 25.4 mm exactly and
// 1 thou = 0.001 in (international inch, 1959; NIST SP 811 Appendix B).

type Conv = (mm: number) => number;
const same: Conv = (v) => v;
const toIn: Conv = (v) => v / 25.4;
const toThou: Conv = (v) => v / 0.0254;

/** Each body written once in mm, with lengths passed through L and readings through R. */
const BODIES: Record<string, (L: Conv, R: Conv) => object> = {
  straightness: (L, R) => ({
    positions: [0, 100, 200, 300, 400, 500, 600].map(L),
    readings: [0, 0.003, 0.007, 0.008, 0.006, 0.009, 0.012].map(R),
  }),
  parallelism: (L, R) => ({
    positions: [0, 250, 500, 750, 1000].map(L),
    railA: [0, 0.01, 0.02, 0.01, 0].map(R),
    railB: [0.1, 0.12, 0.11, 0.1, 0.13].map(R),
  }),
  squareness: (L) => ({
    sideX: L(1000),
    sideY: L(600),
    diagonal1: L(1166.62),
    diagonal2: L(1165.76),
    gantrySpan: L(1650),
  }),
  flatness: (L, R) => ({
    points: [
      [0, 0, 0],
      [500, 0, 0.1],
      [1000, 0, 0.05],
      [0, 400, 0.2],
      [500, 400, 0.35],
      [1000, 400, 0.1],
    ].map(([x, y, z]) => ({ x: L(x), y: L(y), z: R(z) })),
  }),
  drive: (L) => ({ type: 'screw', motorStepsPerRev: 200, microsteps: 8, lead: L(5.08) }),
  'drive-belt': (L) => ({ type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitch: L(2.032), pulleyTeeth: 20 }),
  'travel-trial': (L) => ({
    stepsPerMmUsed: 80,
    moves: [
      { commanded: L(254), measured: L(253.6) },
      { commanded: L(508), measured: L(507.3) },
      { commanded: L(1016), measured: L(1014.5) },
    ],
  }),
  positioning: (L, R) => ({
    targets: [0, 250, 500, 750, 1000].map(L),
    runs: [
      { direction: 'up', deviations: [0.001, 0.004, 0.006, 0.003, 0.002].map(R) },
      { direction: 'up', deviations: [0.002, 0.005, 0.005, 0.004, 0.001].map(R) },
      { direction: 'down', deviations: [-0.01, -0.006, -0.004, -0.007, -0.009].map(R) },
      { direction: 'down', deviations: [-0.011, -0.005, -0.005, -0.008, -0.01].map(R) },
    ],
  }),
  'screw-speed': (L) => ({
    nominalDiameter: L(16),
    rootDiameter: L(12.9),
    unsupportedLength: L(1500),
    lead: L(5),
    mounting: 'fixed-supported',
    feedRate: L(6000),
  }),
  'bolt-down': (L, R) => ({
    length: L(480),
    pitch: L(60),
    firstHoleOffset: L(30),
    mode: 'line',
    readings: [
      { hole: 0, reading: R(0) },
      { hole: 7, reading: R(0.07) },
    ],
  }),
  'travel-envelope': (L) => ({
    axes: [
      { axis: 'X', measuredTravel: L(1562), workSize: L(1500) },
      { axis: 'Y', measuredTravel: L(3020), workSize: L(3000) },
    ],
    marginPerSide: L(25),
  }),
  'test-cut': (L) => ({
    x: { commanded: L(400), measured: L(399.2) },
    y: { commanded: L(400), measured: L(400.3) },
    stepsPerMmX: 80,
    stepsPerMmY: 80,
    diagonal1: L(565.1),
    diagonal2: L(564.2),
    gantrySpan: L(1650),
    circle: { commandedDiameter: L(100), measuredX: L(99.7), measuredY: L(100.1) },
    ovalityTolerance: L(0.1),
  }),
};
const routeOf = (name: string) => name.replace(/-belt$/, '');

/** Deep comparison of two responses: numbers to 1e-9 relative, the echoed units and warning wording left out. */
function expectSameResults(a: unknown, b: unknown, path = ''): void {
  if (typeof a === 'number' && typeof b === 'number') {
    // Relative 1e-9, or 1e-12 mm where the value is a zero that came out as rounding noise.
    if (Math.abs(a - b) > 1e-9 * Math.max(Math.abs(a), Math.abs(b)) + 1e-12)
      throw new Error(`${path}: ${a} (mm) against ${b} (inch)`);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    expect([path, b.length]).toEqual([path, a.length]);
    a.forEach((v, i) => expectSameResults(v, b[i], `${path}[${i}]`));
    return;
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const skip = new Set(['lengthUnit', 'readingUnit', 'message']);
    const keys = Object.keys(a).filter((k) => !skip.has(k));
    expect([path, keys.sort()]).toEqual([
      path,
      Object.keys(b)
        .filter((k) => !skip.has(k))
        .sort(),
    ]);
    for (const k of keys)
      expectSameResults((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`);
    return;
  }
  expect([path, b]).toEqual([path, a]);
}

describe('calculators: one unit rule', () => {
  let app: NestFastifyApplication;
  let tech: Agent;
  const post = (route: string, body: object) => tech.post(`/api/calc/${route}`).send(body);

  beforeAll(async () => {
    app = await createTestApp();
    tech = (await createTestWorkshop(app, 'Calculator units')).as.technician;
  });
  afterAll(() => app.close());

  it.each(Object.keys(BODIES))(
    '%s: the same data in mm and in inches (readings in thou) gives the same results',
    async (name) => {
      const mm = await post(routeOf(name), BODIES[name](same, same));
      const imperial = await post(routeOf(name), {
        ...BODIES[name](toIn, toThou),
        lengthUnit: 'in',
        readingUnit: 'thou',
      });
      expect([mm.status, imperial.status]).toEqual([200, 200]);
      expect(mm.body).toMatchObject({ lengthUnit: 'mm', readingUnit: 'mm' });
      expect(imperial.body).toMatchObject({ lengthUnit: 'in', readingUnit: 'thou' });
      expect(Array.isArray(imperial.body.warnings)).toBe(true);
      expect(typeof imperial.body.units).toBe('object');
      expectSameResults(mm.body, imperial.body);
    },
  );

  it.each(Object.keys(BODIES))('%s: micrometres for readings and lengths agree with mm too', async (name) => {
    const mm = await post(routeOf(name), BODIES[name](same, same));
    const um = await post(routeOf(name), {
      ...BODIES[name](
        (v) => v * 1000,
        (v) => v * 1000,
      ),
      lengthUnit: 'um',
      readingUnit: 'um',
    });
    expect(um.status).toBe(200);
    expectSameResults(mm.body, um.body);
  });

  it('travel trial of 20 in commanded, 19.95 in measured at 80 steps/mm gives 80.2 steps/mm', async () => {
    const res = await post('travel-trial', {
      stepsPerMmUsed: 80,
      moves: [{ commanded: 20, measured: 19.95 }],
      lengthUnit: 'in',
    });
    expect(res.status).toBe(200);
    // TRADE.md, Drives (common practice): new = old × commanded ÷ measured.
    expect(res.body.correctedStepsPerMm).toBeCloseTo((80 * 20) / 19.95, 10);
    expect(Number(res.body.correctedStepsPerMm.toFixed(1))).toBe(80.2);
    expect(res.body.correctedStepsPerIn).toBeCloseTo(((80 * 20) / 19.95) * 25.4, 8);
    expect(res.body.moves[0]).toMatchObject({ commanded: 508, measured: 506.73 });
    expect(res.body.units).toMatchObject({
      correctedStepsPerMm: 'steps/mm',
      correctedStepsPerIn: 'steps/in',
      residualMax: 'mm',
    });
    // One move only: the engine says so; nothing about the size of the correction (0.25 %).
    expect(res.body.warnings.filter((w: { code: string }) => w.code.startsWith('correction-'))).toEqual([]);
  });

  it('a correction more than 5 % from the value in use, or from the drive, is flagged with its usual causes', async () => {
    // Commanded in mm, the tape read in inches and typed as mm: 25.4 times off.
    const wild = await post('travel-trial', { stepsPerMmUsed: 320, moves: [{ commanded: 500, measured: 19.69 }] });
    expect(wild.status).toBe(200);
    const about = wild.body.warnings.filter((w: { code: string }) => w.code.startsWith('correction-'));
    expect(about).toHaveLength(1);
    expect(about[0].message).toMatch(/lead.*pulley teeth.*microstep/);
    const far = await post('travel-trial', {
      stepsPerMmUsed: 320,
      moves: [
        { commanded: 500, measured: 450 },
        { commanded: 1000, measured: 900 },
      ],
    });
    expect(far.body.warnings.map((w: { code: string }) => w.code)).toEqual(['correction-far-from-theory']);
    expect(far.body.warnings[0].message).toMatch(
      /the corrected 355.6 steps\/mm is 11.1 % above the 320 steps\/mm in use/,
    );
    const drive = await post('travel-trial', {
      stepsPerMmUsed: 80,
      theoreticalStepsPerMm: 160,
      moves: [{ commanded: 500, measured: 499 }],
    });
    const fromDrive = drive.body.warnings.find((w: { code: string }) => w.code === 'correction-far-from-theory');
    expect(fromDrive.message).toMatch(/below the 160 steps\/mm worked out from the drive/);
    // 4.9 % off: within the 5 % that tuning can account for.
    const close = await post('travel-trial', {
      stepsPerMmUsed: 80,
      moves: [
        { commanded: 500, measured: 476.7 },
        { commanded: 1000, measured: 953.3 },
      ],
    });
    expect(close.body.correctedStepsPerMm / 80 - 1).toBeLessThan(0.05);
    expect(close.body.warnings).toEqual([]);
    const cut = await post('test-cut', {
      x: { commanded: 400, measured: 200 },
      y: { commanded: 400, measured: 400.2 },
      stepsPerMmX: 160,
      stepsPerMmY: 80,
    });
    expect(
      cut.body.warnings.map((w: { code: string; message: string }) => [w.code, /^Axis X/.test(w.message)]),
    ).toEqual([['correction-far-from-theory', true]]);
  });

  it('positioning, squareness, speed and travel carry their warnings as {code, message}', async () => {
    const iso = await post('positioning', BODIES.positioning(same, same));
    expect(iso.body.warnings.map((w: { code: string }) => w.code)).toEqual(['few-runs']);
    expect(iso.body.warnings[0].message).toMatch(/5 runs/);
    const sq = await post('squareness', { ...BODIES.squareness(same, same), gantrySpan: undefined });
    expect(sq.body.warnings.map((w: { code: string }) => w.code)).toEqual(['gantry-span-assumed']);
    expect(sq.body.warnings[0].message).toMatch(/over side X \(1000 mm\)/);
    const sqIn = await post('squareness', {
      ...BODIES.squareness(toIn, toThou),
      gantrySpan: undefined,
      lengthUnit: 'in',
    });
    expect(sqIn.body.warnings[0].message).toMatch(/over side X \(39\.37 in\)/);
    const fast = await post('screw-speed', { ...BODIES['screw-speed'](same, same), feedRate: 20000 });
    expect(fast.body.withinLimits).toBe(false);
    expect(fast.body.warnings[0].code).toBe('over-speed-limit');
    const short = await post('travel-envelope', {
      axes: [{ axis: 'Y', measuredTravel: 59, workSize: 60 }],
      marginPerSide: 1,
      lengthUnit: 'in',
    });
    expect(short.body.warnings[0]).toEqual({
      code: 'travel-short',
      message: 'Axis Y travels 59 in but needs 62 in to cover the work with its margins (3 in short).',
    });
  });

  it('leads in inches or threads per inch, and steps per inch beside steps per mm', async () => {
    // A 5 TPI single-start screw advances 1/5 in = 5.08 mm a turn; 200 × 8 steps a turn → 8000 steps/in (definition of TPI).
    const tpi = await post('drive', { type: 'screw', motorStepsPerRev: 200, microsteps: 8, threadsPerInch: 5 });
    expect(tpi.status).toBe(200);
    expect(tpi.body.travelPerRev).toBeCloseTo(5.08, 12);
    expect(tpi.body.stepsPerIn).toBeCloseTo(8000, 9);
    const lead = await post('drive', {
      type: 'screw',
      motorStepsPerRev: 200,
      microsteps: 8,
      lead: 0.2,
      lengthUnit: 'in',
    });
    expect(lead.body.stepsPerMm).toBeCloseTo(tpi.body.stepsPerMm, 10);
    // TRADE.md example (common practice): 200-step motor, 8 microsteps, 5 mm lead → 320 steps/mm.
    const metric = await post('drive', { type: 'screw', motorStepsPerRev: 200, microsteps: 8, lead: 5 });
    expect(metric.body.stepsPerMm).toBe(320);
    const both = await post('drive', {
      type: 'screw',
      motorStepsPerRev: 200,
      microsteps: 8,
      lead: 5,
      threadsPerInch: 5,
    });
    expect(both.status).toBe(400);
    expect(both.body.message.join(' ')).toMatch(/lead or threadsPerInch, not both/);
    // The module is in mm by definition (ISO 54), whatever lengthUnit says.
    const rackMm = await post('drive', {
      type: 'rack',
      motorStepsPerRev: 200,
      microsteps: 8,
      pinionModule: 1.5,
      pinionTeeth: 20,
    });
    const rackIn = await post('drive', {
      type: 'rack',
      motorStepsPerRev: 200,
      microsteps: 8,
      pinionModule: 1.5,
      pinionTeeth: 20,
      lengthUnit: 'in',
    });
    expect(rackIn.body.stepsPerMm).toBe(rackMm.body.stepsPerMm);
  });

  it.each(Object.keys(BODIES).filter((n) => !n.endsWith('-belt')))(
    '%s: the old single unit field is refused, naming lengthUnit and readingUnit',
    async (name) => {
      const res = await post(routeOf(name), { ...BODIES[name](same, same), unit: 'mm' });
      expect(res.status).toBe(400);
      expect(res.body.message.join(' ')).toMatch(/unit is no longer accepted: send lengthUnit and readingUnit instead/);
    },
  );
});
