import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { ROLES } from '../src/database/schema/users.js';
import { anonymous, createTestApp, createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';

// Bodies that each route accepts; the values are worked checks from the engine specs.
const VALID: Record<string, object> = {
  // Constructed straightness set S1 (stations mm, readings µm): LS 81/11 µm, MZ 27/4 µm, end-point 73/10 µm.
  straightness: {
    positions: [0, 100, 200, 300, 400, 500, 600, 700, 800, 900, 1000],
    readings: [0, 3, 7, 8, 6, 9, 12, 10, 7, 8, 11],
    readingUnit: 'um',
  },
  parallelism: {
    positions: [0, 250, 500, 750, 1000],
    railA: [0, 0.01, 0.02, 0.01, 0],
    railB: [0.1, 0.12, 0.11, 0.1, 0.13],
  },
  squareness: {
    sideX: 1000,
    sideY: 600.000208333,
    diagonal1: 1166.6191537944164,
    diagonal2: 1165.7616608895662,
    gantrySpan: 600,
  },
  flatness: {
    points: [
      { x: 0, y: 0, z: 0 },
      { x: 100, y: 0, z: 0 },
      { x: 200, y: 0, z: 0 },
      { x: 0, y: 100, z: 0 },
      { x: 100, y: 100, z: 90 },
      { x: 200, y: 100, z: 0 },
      { x: 0, y: 200, z: 0 },
      { x: 100, y: 200, z: 0 },
      { x: 200, y: 200, z: 0 },
    ],
    readingUnit: 'um',
  },
  drive: { type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitch: 2, pulleyTeeth: 20 },
  'travel-trial': { stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 99.8 }] },
  positioning: {
    targets: [0, 100],
    runs: [
      { direction: 'up', deviations: [1, 0] },
      { direction: 'up', deviations: [3, 0] },
      { direction: 'down', deviations: [-1, 2] },
      { direction: 'down', deviations: [-1, 4] },
    ],
    readingUnit: 'um',
  },
  'screw-speed': {
    nominalDiameter: 15,
    rootDiameter: 12.5,
    unsupportedLength: 790,
    lead: 5,
    mounting: 'fixed-supported',
    feedRate: 10000,
  },
  'bolt-down': {
    length: 480,
    pitch: 60,
    firstHoleOffset: 0,
    mode: 'line',
    readings: [
      { hole: 0, reading: 0 },
      { hole: 8, reading: 80 },
    ],
    readingUnit: 'um',
  },
  'travel-envelope': { axes: [{ axis: 'X', measuredTravel: 1562, workSize: 1500 }], marginPerSide: 25 },
  'test-cut': { x: { commanded: 300, measured: 299.4 }, y: { commanded: 300, measured: 300 }, stepsPerMmX: 80 },
};

describe('calculators API', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let tech: Agent;
  const post = (route: string, body: unknown) => tech.post(`/api/calc/${route}`).send(body as object);

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Calculators');
    tech = ws.as.technician;
  });
  afterAll(() => app.close());

  describe('access', () => {
    it.each(Object.keys(VALID))('anonymous callers get 401 on /api/calc/%s', async (route) => {
      const res = await anonymous(app).post(`/api/calc/${route}`).send(VALID[route]);
      expect(res.status).toBe(401);
    });

    it.each(ROLES)('%s may use every calculator', async (role) => {
      for (const route of Object.keys(VALID)) {
        const res = await ws.as[role].post(`/api/calc/${route}`).send(VALID[route]);
        expect([route, res.status]).toEqual([route, 200]);
      }
    });
  });

  describe('results', () => {
    it('straightness: least squares, minimum zone and end point, in mm', async () => {
      const res = await post('straightness', VALID.straightness);
      expect(res.status).toBe(200);
      expect(res.body.leastSquares.straightness).toBeCloseTo(81 / 11 / 1000, 12);
      expect(res.body.leastSquares.slope).toBeCloseTo(17 / 2200 / 1000, 14);
      expect(res.body.leastSquares.intercept).toBeCloseTo(0.0035, 12);
      expect(res.body.leastSquares.residuals).toHaveLength(11);
      expect(res.body.minimumZone.straightness).toBeCloseTo(27 / 4 / 1000, 12);
      expect(res.body.endPoint.straightness).toBeCloseTo(73 / 10 / 1000, 12);
    });

    it('straightness readings in thou and inches convert at 25.4 mm per inch', async () => {
      const thou = await post('straightness', {
        positions: [0, 1, 2, 3, 4],
        readings: [0, 0, 0, 0, 4],
        readingUnit: 'thou',
      });
      expect(thou.body.leastSquares.straightness).toBeCloseTo(3.2 * 0.0254, 12);
      const inch = await post('straightness', {
        positions: [0, 1, 2, 3, 4],
        readings: [0, 0, 0, 0, 0.004],
        readingUnit: 'in',
      });
      expect(inch.body.minimumZone.straightness).toBeCloseTo(3 * 0.0254, 12);
    });

    it('parallelism: B − A per station, spread and mean', async () => {
      const res = await post('parallelism', VALID.parallelism);
      expect(res.body.parallelism).toBeCloseTo(0.04, 12);
      expect(res.body.meanOffset).toBeCloseTo(0.104, 12);
      expect(res.body.differences).toHaveLength(5);
    });

    it('squareness: angle, mm per metre, long diagonal and correction', async () => {
      const res = await post('squareness', VALID.squareness);
      expect(res.body.outOfSquareArcsec).toBeCloseTo(171.887, 2);
      expect(res.body.outOfSquareDeg).toBeCloseTo(171.887 / 3600, 6);
      expect(res.body.mmPerMetre).toBeCloseTo(0.8333, 3);
      expect(res.body.longDiagonal).toBe(1);
      expect(res.body.correction).toBeCloseTo(0.5, 4);
      const swapped = await post('squareness', {
        ...VALID.squareness,
        diagonal1: 1165.7616608895662,
        diagonal2: 1166.6191537944164,
        gantrySpan: undefined,
      });
      expect(swapped.body.longDiagonal).toBe(2);
      expect(swapped.body.correction).toBeCloseTo((1000 * 0.5) / 600, 3);
    });

    it('flatness: least-squares plane and flatness', async () => {
      const res = await post('flatness', VALID.flatness);
      expect(res.body.leastSquares.c).toBeCloseTo(0.01, 12);
      expect(res.body.leastSquares.a).toBeCloseTo(0, 12);
      expect(res.body.leastSquares.flatness).toBeCloseTo(0.09, 12);
    });

    it('drive: travel per rev, steps per mm, resolution', async () => {
      const res = await post('drive', VALID.drive);
      expect(res.body).toMatchObject({ travelPerRev: 40, stepsPerMm: 80, resolution: 0.0125 });
      const rack = await post('drive', {
        type: 'rack',
        motorStepsPerRev: 200,
        microsteps: 8,
        pinionModule: 1.5,
        pinionTeeth: 20,
      });
      expect(rack.body.stepsPerMm).toBeCloseTo(16.976527263135505, 10);
    });

    it('travel trial: scale, offset and corrected steps per mm', async () => {
      const res = await post('travel-trial', VALID['travel-trial']);
      expect(res.body.scale).toBeCloseTo(0.998, 12);
      expect(res.body.offset).toBe(0);
      expect(res.body.correctedStepsPerMm).toBeCloseTo(641.2825651302605, 9);
      expect(res.body.errorPercent).toBeCloseTo(-0.2, 10);
      expect(res.body.residualMax).toBeCloseTo(0, 10);
      const um = await post('travel-trial', {
        stepsPerMmUsed: 80,
        moves: [
          { commanded: 10000, measured: 10010 },
          { commanded: 20000, measured: 20020 },
        ],
        lengthUnit: 'um',
      });
      expect(um.body.scale).toBeCloseTo(1.001, 10);
    });

    it('positioning: ISO 230-2 values per target and for the axis, with a warning below 5 runs', async () => {
      const res = await post('positioning', VALID.positioning);
      expect(res.body.targets).toHaveLength(2);
      expect(res.body.targets[0]).toMatchObject({ target: 0 });
      expect(res.body.targets[0].reversal).toBeCloseTo(0.003, 12);
      expect(res.body.reversal).toBeCloseTo(0.003, 12);
      expect(res.body.reversalMean).toBeCloseTo(0, 12);
      expect(res.body.repeatability).toBeCloseTo((3 + 2 * Math.SQRT2) / 1000, 12);
      expect(res.body.systematic).toBeCloseTo(0.004, 12);
      expect(res.body.meanRange).toBeCloseTo(0.001, 12);
      expect(res.body.accuracy).toBeCloseTo((4 + 2 * Math.SQRT2) / 1000, 12);
      for (const key of [
        'repeatabilityUp',
        'repeatabilityDown',
        'systematicUp',
        'systematicDown',
        'accuracyUp',
        'accuracyDown',
      ]) {
        expect(typeof res.body[key]).toBe('number');
      }
      expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(['few-runs', 'few-targets']);
      expect(res.body.warnings[0].message).toMatch(/ISO 230-2 asks for 5 runs in each direction.*2 up.*2 down/);
    });

    it('screw speed: the MISUMI example (3024 rpm allowable) with its catalogue named', async () => {
      const res = await post('screw-speed', VALID['screw-speed']);
      expect(Math.floor(res.body.permissibleSpeed)).toBe(3024);
      expect(res.body.criticalSpeed).toBeCloseTo(res.body.permissibleSpeed / 0.8, 8);
      expect(res.body.rpm).toBe(2000);
      expect(res.body.dnLimitSpeed).toBeCloseTo(70000 / 15, 8);
      expect(res.body.maxFeedRate).toBeCloseTo(5 * res.body.permissibleSpeed, 6);
      expect(res.body.withinLimits).toBe(true);
      expect(res.body.source).toMatch(/THK/);
      const fast = await post('screw-speed', { ...VALID['screw-speed'], feedRate: 20000, dnLimit: 40000 });
      expect(fast.body.dnLimitSpeed).toBeCloseTo(40000 / 15, 8);
      expect(fast.body.withinLimits).toBe(false);
    });

    it('bolt-down: holes, fixing order and the next target', async () => {
      const res = await post('bolt-down', VALID['bolt-down']);
      expect(res.body.holes).toHaveLength(9);
      expect(res.body.steps.map((s: { hole: number }) => s.hole)).toEqual([0, 8, 4, 2, 6, 1, 3, 5, 7]);
      expect(res.body.nextHole).toBe(4);
      expect(res.body.steps[2].target).toBeCloseTo(0.04, 12);
    });

    it('travel envelope and test cut', async () => {
      const env = await post('travel-envelope', VALID['travel-envelope']);
      expect(env.body.axes[0]).toMatchObject({ requiredTravel: 1550, spare: 12, covers: true });
      const cut = await post('test-cut', VALID['test-cut']);
      expect(cut.body.x.correctedStepsPerMm).toBeCloseTo((80 * 300) / 299.4, 10);
      expect(cut.body.squareness).toBeNull();
    });
  });

  describe('bad input answers 400 naming the problem', () => {
    const expect400 = async (route: string, body: unknown, pattern: RegExp) => {
      const res = await post(route, body);
      expect(res.status).toBe(400);
      expect((res.body.message as string[]).join(' | ')).toMatch(pattern);
    };

    it('too few points', async () => {
      await expect400(
        'straightness',
        { positions: [0, 1], readings: [0, 1] },
        /positions needs at least 3 values \(got 2\)/,
      );
      await expect400(
        'positioning',
        {
          targets: [0, 1],
          runs: [
            { direction: 'up', deviations: [0, 0] },
            { direction: 'down', deviations: [0, 0] },
            { direction: 'down', deviations: [0, 0] },
          ],
        },
        /at least 2 runs in the up direction \(got 1\)/,
      );
    });

    it('mismatched lengths', async () => {
      await expect400(
        'straightness',
        { positions: [0, 1, 2], readings: [0, 1] },
        /positions and readings must have the same length/,
      );
      await expect400(
        'parallelism',
        { positions: [0, 1, 2], railA: [0, 1, 2], railB: [0, 1] },
        /positions and railB must have the same length/,
      );
      await expect400(
        'positioning',
        { targets: [0, 1, 2], runs: [{ direction: 'up', deviations: [0, 0] }] },
        /one value per target/,
      );
    });

    it('non-finite and non-numeric values', async () => {
      await expect400(
        'straightness',
        { positions: [0, 1, 2], readings: [0, 'x', 1] },
        /every value in readings must be a finite number/,
      );
      await expect400(
        'straightness',
        { positions: [0, 1, 2], readings: [0, null, 1] },
        /every value in readings must be a finite number/,
      );
      // JSON numbers beyond double range parse as Infinity.
      const res = await tech
        .post('/api/calc/straightness')
        .set('Content-Type', 'application/json')
        .send('{"positions":[0,1,2],"readings":[0,1e999,1]}');
      expect(res.status).toBe(400);
      expect(res.body.message.join(' ')).toMatch(/readings must be a finite number/);
      await expect400(
        'squareness',
        { sideX: 'wide', sideY: 600, diagonal1: 1, diagonal2: 1 },
        /sideX must be a finite number/,
      );
      await expect400(
        'flatness',
        {
          points: [
            { x: 0, y: 0, z: 0 },
            { x: 1, y: 0 },
            { x: 0, y: 1, z: 0 },
          ],
        },
        /points\.1\.z must be a finite number/,
      );
      await expect400(
        'travel-trial',
        { stepsPerMmUsed: 80, moves: [{ commanded: 10 }] },
        /moves\.0\.measured must be a finite number/,
      );
    });

    it('repeated positions', async () => {
      await expect400(
        'straightness',
        { positions: [0, 100, 100], readings: [0, 1, 2] },
        /positions repeats the value 100/,
      );
      await expect400('positioning', { targets: [5, 5], runs: [] }, /targets repeats the value 5/);
      await expect400(
        'flatness',
        {
          points: [
            { x: 0, y: 0, z: 0 },
            { x: 1, y: 0, z: 0 },
            { x: 0, y: 0, z: 1 },
          ],
        },
        /same position/,
      );
    });

    it('unknown mounting, unit, drive type or direction', async () => {
      await expect400(
        'screw-speed',
        { ...VALID['screw-speed'], mounting: 'clamped' },
        /mounting must be one of fixed-free, supported-supported, fixed-supported, fixed-fixed/,
      );
      await expect400(
        'straightness',
        { ...VALID.straightness, readingUnit: 'cm' },
        /readingUnit must be one of mm, um, in, thou/,
      );
      await expect400(
        'straightness',
        { ...VALID.straightness, lengthUnit: 'ft' },
        /lengthUnit must be one of mm, um, in, thou/,
      );
      await expect400('drive', { ...VALID.drive, type: 'chain' }, /type must be one of screw, belt, rack/);
      await expect400(
        'positioning',
        { targets: [0], runs: [{ direction: 'left', deviations: [0] }] },
        /runs\.0\.direction must be up or down/,
      );
    });

    it('values the engine refuses, and fields nobody asked for', async () => {
      await expect400(
        'drive',
        { type: 'screw', motorStepsPerRev: 200, microsteps: 16 },
        /lead is required for a screw drive/,
      );
      await expect400(
        'screw-speed',
        { ...VALID['screw-speed'], rootDiameter: 20 },
        /rootDiameter must not be larger than nominalDiameter/,
      );
      await expect400(
        'squareness',
        { sideX: 10, sideY: 10, diagonal1: 1000, diagonal2: 1 },
        /diagonals differ by more than/,
      );
      await expect400('travel-trial', { stepsPerMmUsed: 80, moves: [] }, /moves needs at least 1 value/);
      await expect400('straightness', { ...VALID.straightness, colour: 'red' }, /property colour should not exist/);
      await expect400(
        'bolt-down',
        { ...VALID['bolt-down'], readings: [{ hole: 99, reading: 0 }] },
        /readings names hole 99/,
      );
    });

    it('refuses more than 200 000 points, and accepts 200 000', async () => {
      const many = Array.from({ length: 200_001 }, (_, i) => i);
      await expect400(
        'straightness',
        { positions: many, readings: many },
        /positions has more than 200000 values; at most 200000 are accepted/,
      );
      const most = many.slice(1);
      const ok = await post('straightness', { positions: most, readings: most.map((v) => (v % 7) * 0.001) });
      expect(ok.status).toBe(200);
      expect(ok.body.minimumZone.straightness).toBeLessThanOrEqual(ok.body.leastSquares.straightness + 1e-12);
    });
  });
});
