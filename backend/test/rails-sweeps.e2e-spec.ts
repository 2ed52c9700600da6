import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { Matrix, solve } from 'ml-matrix';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { evaluateStraightness } from '../src/engine/straightness.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { MachinesService } from '../src/machines/machines.service.js';

const rail = { label: 'Y1', axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
const positions = [0, 100, 200, 300, 400, 500, 600, 700, 800, 900];
// Invented dial-indicator readings in thou, + meaning further from the reference.
const thou = [0, 0.5, 1.5, 2, 2.5, 2, 1.5, 1, 0.5, 0];
const stations = (readings: number[], at = positions) => readings.map((reading, i) => ({ position: at[i], reading }));
const sweep = (readings = thou, extra: Record<string, unknown> = {}) => ({
  readingUnit: 'thou',
  phase: 'as-found',
  stations: stations(readings),
  ...extra,
});

describe('rail sweeps, parallelism and readiness', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Sweeps');
    other = await createTestWorkshop(app, 'Other');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Sweep table', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
  });
  afterAll(() => app.close());

  const addRail = async (body: Record<string, unknown> = {}, m = machineId) =>
    (await ws.as.builder.post(`/api/machines/${m}/rails`).send({ ...rail, ...body })).body as {
      id: string;
      label: string;
    };

  it('saves a sweep with the engine result, the entered unit and raw readings kept', async () => {
    const r = await addRail();
    const res = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(
      sweep(thou, {
        instrument: 'Dial indicator 0.0005 in',
        resolution: 0.5,
        temperatureC: 19.5,
        takenBy: 'A. Builder',
        boltSize: 'M5',
        torqueNm: 8.8,
        datum: 'Frame face',
        notes: 'first look',
      }),
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      readingUnit: 'thou',
      phase: 'as-found',
      instrument: 'Dial indicator 0.0005 in',
      resolution: 0.5,
      temperatureC: 19.5,
      takenBy: 'A. Builder',
      boltSize: 'M5',
      torqueNm: 8.8,
      datum: 'Frame face',
    });
    expect(res.body.stations[3]).toEqual({ position: 300, positionMm: 300, reading: 2, readingMm: 2 * 0.0254 });
    expect(res.body).toMatchObject({ lengthUnit: 'mm', face: 'side' });
    // Same data straight through the engine (readings in mm: 1 thou = 0.0254 mm exactly).
    const engine = evaluateStraightness({ positionsMm: positions, readingsMm: thou.map((t) => (t * 254) / 10000) });
    expect(res.body.result.leastSquares.straightness).toBeCloseTo(engine.leastSquares.straightnessMm, 12);
    expect(res.body.result.minimumZone.straightness).toBeCloseTo(engine.minimumZone.straightnessMm, 12);
    expect(res.body.result.endPoint.straightness).toBeCloseTo(engine.endPoint.straightnessMm, 12);
    expect(res.body.result.leastSquares.residuals).toEqual(engine.leastSquares.residualsMm);
    // Independently: the least-squares line from the normal equations solved by ml-matrix (npm).
    const X = new Matrix(positions.map((p) => [1, p]));
    const y = Matrix.columnVector(thou.map((t) => t * 0.0254));
    const [c, m] = solve(X.transpose().mmul(X), X.transpose().mmul(y)).to1DArray();
    const residuals = positions.map((p, i) => thou[i] * 0.0254 - (c + m * p));
    expect(res.body.result.leastSquares.slope).toBeCloseTo(m, 12);
    expect(res.body.result.leastSquares.straightness).toBeCloseTo(Math.max(...residuals) - Math.min(...residuals), 10);
    expect(res.body.result.minimumZone.straightness).toBeLessThanOrEqual(
      res.body.result.leastSquares.straightness + 1e-12,
    );
    // Plasma default target 2 thou (common practice), judged on the minimum zone (ISO 1101's definition): outside.
    expect(res.body.target).toEqual({ value: 2, unit: 'thou', reference: 'minimum-zone' });
    expect(res.body.result.minimumZone.straightness).toBeGreaterThan(2 * 0.0254);
    expect(res.body.status).toBe('outside-target');

    const good = await ws.as.technician
      .post(`/api/rails/${r.id}/sweeps`)
      .send(sweep([0, 0.5, 0.5, 1, 0.5, 0.5, 0, 0.5, 0, 0], { phase: 'as-left' }));
    expect(good.body.status).toBe('within-target');
    const list = await ws.as.viewer.get(`/api/rails/${r.id}/sweeps`);
    expect(list.status).toBe(200);
    expect(list.body.map((s: { id: string }) => s.id)).toEqual([good.body.id, res.body.id]); // newest first
    expect((await ws.as.viewer.get(`/api/sweeps/${res.body.id}`)).body.id).toBe(res.body.id);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({
      recordType: 'rail-sweep',
      action: 'recorded',
      recordId: good.body.id,
    });
  });

  // 1 in = 25.4 mm exactly: the same sweep sent with positions in mm and readings in mm, then with
  // positions in inches and readings in thou, gives the same straightness, slope and warnings.
  it('mm and inch/thou give the same sweep result', async () => {
    const r = await addRail({ label: 'Parity' });
    const readingsMm = thou.map((t) => (t * 254) / 10000);
    const metric = (
      await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send({
        readingUnit: 'mm',
        lengthUnit: 'mm',
        phase: 'as-found',
        resolution: 0.0127,
        stations: stations(readingsMm),
      })
    ).body;
    const inch = (
      await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send({
        readingUnit: 'thou',
        lengthUnit: 'in',
        phase: 'as-found',
        resolution: 0.5,
        stations: stations(
          thou,
          positions.map((p) => p / 25.4),
        ),
      })
    ).body;
    expect(inch).toMatchObject({ readingUnit: 'thou', lengthUnit: 'in', status: metric.status });
    expect(inch.stations[9].position).toBeCloseTo(900 / 25.4, 12);
    expect(inch.stations[9].positionMm).toBeCloseTo(900, 9);
    for (const k of ['leastSquares', 'minimumZone', 'endPoint'] as const)
      expect(inch.result[k].straightness).toBeCloseTo(metric.result[k].straightness, 12);
    expect(inch.localSlope.mmPerM).toBeCloseTo(metric.localSlope.mmPerM, 9);
    expect(inch.warnings.map((w: { code: string }) => w.code)).toEqual(
      metric.warnings.map((w: { code: string }) => w.code),
    );
  });

  // The 4:1 rule (common practice): a 0.001 in dial for a 2 thou target is too coarse; five or
  // fewer stations over a third of the rail is too few and too short.
  it('warns of a coarse instrument, too few stations and a short sweep', async () => {
    const r = await addRail({ label: 'Warned' });
    const res = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send({
      readingUnit: 'thou',
      phase: 'as-found',
      resolution: 1,
      stations: stations([0, 1, 0, 1], [0, 100, 200, 300]),
    });
    expect(res.status).toBe(201);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual([
      'coarse-instrument',
      'few-stations',
      'short-sweep',
    ]);
    expect(res.body.warnings[0].message).toMatch(
      /resolves 1 thou, coarser than a quarter of the 2 thou tolerance \(0.5 thou\)/,
    );
  });

  it('each reading unit is converted to mm: 1 in = 25.4 mm, 1 µm = 0.001 mm', async () => {
    const r = await addRail({ label: 'Units' });
    const mm = [0, 0.01, 0.03, 0.02, 0.0];
    const at = [0, 200, 400, 600, 800];
    const results: number[] = [];
    for (const [unit, k] of [
      ['mm', 1],
      ['um', 1000],
      ['in', 1 / 25.4],
      ['thou', 1000 / 25.4],
    ] as const) {
      const res = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send({
        readingUnit: unit,
        phase: 'as-found',
        stations: stations(
          mm.map((v) => v * k),
          at,
        ),
      });
      expect(res.status).toBe(201);
      results.push(res.body.result.leastSquares.straightness);
    }
    for (const v of results) expect(v).toBeCloseTo(results[0], 10);
  });

  it('a repeat of the same client id returns the same sweep with 200 and never a duplicate', async () => {
    const r = await addRail({ label: 'Retry' });
    const id = randomUUID();
    const first = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep(thou, { id }));
    expect(first.status).toBe(201);
    expect(first.body.id).toBe(id);
    const again = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep(thou, { id }));
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    const both = await Promise.all(
      [0, 1].map(() => ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep(thou, { id }))),
    );
    expect(both.map((x) => x.status)).toEqual([200, 200]);
    expect((await ws.as.viewer.get(`/api/rails/${r.id}/sweeps`)).body).toHaveLength(1);
    // The id of a sweep on another rail is not a repeat: refused.
    const r2 = await addRail({ label: 'Retry 2' });
    expect((await ws.as.builder.post(`/api/rails/${r2.id}/sweeps`).send(sweep(thou, { id }))).status).toBe(409);
    // Two new sweeps raced with the same fresh id: one sweep.
    const fresh = randomUUID();
    const raced = await Promise.all(
      [0, 1].map(() => ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep(thou, { id: fresh }))),
    );
    expect(raced.map((x) => x.status).sort()).toEqual([200, 201]);
    expect((await ws.as.viewer.get(`/api/rails/${r.id}/sweeps`)).body).toHaveLength(2);
  });

  it.each([
    [{ readingUnit: 'furlong' }, /readingUnit must be one of mm, um, in, thou/],
    [{ lengthUnit: 'furlong' }, /lengthUnit must be one of mm, um, in, thou/],
    [{ readingUnit: undefined, unit: 'thou' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
    [{ face: 'bottom' }, /face must be one of side, top/],
    [
      { lengthUnit: 'in', stations: stations([0, 0, 0], [0, 500, 1000]) },
      /stations.2.position must be within ±20 000 mm along the rail \(in in\)/,
    ],
    [{ phase: 'halfway' }, /phase must be one of as-found, as-left/],
    [{ phase: undefined }, /phase must be one of/],
    [{ stations: undefined }, /stations is required/],
    [{ stations: 'many' }, /stations must be a list/],
    [{ stations: stations([1, 2]) }, /stations needs at least 3 readings/],
    [
      {
        stations: [
          { position: 0, reading: 1 },
          { position: 100, reading: 'x' },
          { position: 200, reading: 0 },
        ],
      },
      /stations\.1\.reading must be a number/,
    ],
    [
      { stations: [{ position: 0, reading: 1 }, { position: 100 }, { position: 200, reading: 0 }] },
      /stations\.1\.reading must be a number/,
    ],
    [
      {
        stations: [
          { position: 0, reading: 1 },
          { position: 100, reading: 1 },
          { position: 100, reading: 0 },
        ],
      },
      /stations\.2\.position repeats 100 mm/,
    ],
    [{ temperatureC: 500 }, /temperatureC must be at most 80/],
    [{ torqueNm: -2 }, /torqueNm must not be negative/],
    [{ boltSize: 'big' }, /boltSize must be a metric bolt size/],
    [{ id: 'not-a-uuid' }, /id must be a uuid/],
    [{ takenAt: 'yesterday' }, /takenAt must be a date/],
    [{ takenAt: '2999-01-01T00:00:00Z' }, /takenAt must not be in the future/],
    [{ extra: 1 }, /extra should not exist/],
  ])('refuses a sweep with %j as 400 naming the field; nothing already saved is lost', async (body, message) => {
    const r = await addRail({ label: 'Bad input' });
    await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep());
    const res = await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send({ ...sweep(), ...body });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
    const kept = await ws.as.viewer.get(`/api/rails/${r.id}/sweeps`);
    expect(kept.body).toHaveLength(1);
  });

  it('deletes a sweep (recorders only; other workshops 404)', async () => {
    const r = await addRail({ label: 'Delete sweep' });
    const s = (await ws.as.builder.post(`/api/rails/${r.id}/sweeps`).send(sweep())).body;
    expect((await ws.as.viewer.delete(`/api/sweeps/${s.id}`)).status).toBe(403);
    expect((await anonymous(app).delete(`/api/sweeps/${s.id}`)).status).toBe(401);
    expect((await other.as.owner.delete(`/api/sweeps/${s.id}`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/sweeps/${s.id}`)).status).toBe(404);
    expect((await ws.as.technician.delete(`/api/sweeps/${s.id}`)).status).toBe(204);
    expect((await ws.as.viewer.get(`/api/rails/${r.id}/sweeps`)).body).toHaveLength(0);
  });

  describe('parallelism of partner rails', () => {
    it('comes from the latest sweeps against the same datum: B − A at each station, mean = height difference', async () => {
      const a = await addRail({ label: 'PA' });
      const b = await addRail({ label: 'PB', partnerRailId: a.id });
      const ra = [0, 0.5, 1, 0.5, 0, 0.5, 1, 0.5, 0, 0];
      const rb = [1, 1.5, 1.5, 1, 1, 1.5, 2, 1.5, 1, 1];
      await ws.as.builder
        .post(`/api/rails/${a.id}/sweeps`)
        .send(sweep(ra, { datum: 'Straightedge S1', phase: 'as-left' }));
      await ws.as.builder
        .post(`/api/rails/${b.id}/sweeps`)
        .send(sweep(rb, { datum: 'straightedge s1 ', phase: 'as-left' }));
      // A later sweep of A without a datum does not replace the pair.
      await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(thou));
      const res = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(res.status).toBe(200);
      // By hand: differences in thou 1,1,0.5,0.5,1,1,1,1,1,1 → spread 0.5 thou, mean 0.9 thou.
      const d = rb.map((v, i) => (v - ra[i]) * 0.0254);
      res.body.differences.forEach((x: number, i: number) => expect(x).toBeCloseTo(d[i], 12));
      expect(res.body.parallelism).toBeCloseTo(0.5 * 0.0254, 12);
      expect(res.body.meanOffset).toBeCloseTo(0.9 * 0.0254, 12);
      expect(res.body).toMatchObject({
        partnerRailId: b.id,
        status: 'within-target',
        face: 'side',
        targets: { parallelism: { value: 2, unit: 'thou' }, heightDifference: { value: 0.5, unit: 'um/mm' } },
      });
      // Side-face sweeps give no height.
      expect(res.body.height).toMatchObject({ measured: false, worst: null });
      expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('height-not-measured');
      const fromB = await ws.as.viewer.get(`/api/rails/${b.id}/parallelism`);
      expect(fromB.body.meanOffset).toBeCloseTo(-0.9 * 0.0254, 12);
    });

    // Two sweeps of the same shape zeroed 12 thou apart are not a height: only top-face sweeps
    // against one datum give one.
    it('two side sweeps zeroed 12 thou apart are within target: a side sweep never yields a height', async () => {
      const a = await addRail({ label: 'QA', spacing: 500 });
      const b = await addRail({ label: 'QB', partnerRailId: a.id, spacing: 500 });
      const flat = positions.map(() => 0);
      await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(flat, { datum: 'D' }));
      await ws.as.builder.post(`/api/rails/${b.id}/sweeps`).send(
        sweep(
          positions.map(() => 12),
          { datum: 'D' },
        ),
      );
      const res = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(res.body.parallelism).toBeCloseTo(0, 12);
      expect(res.body.status).toBe('within-target');
      expect(res.body.height.measured).toBe(false);
      expect(res.body.heightDifferenceWithin).toBeNull();
    });

    // S = a × K: K = 0.5 µm/mm (plasma default, twice one maker's catalogue figure of about
    // 130 µm at 500 mm spacing for light preload); at a = 500 mm, S = 0.25 mm. Worst station by
    // hand: B − A = 0, 0, …, 12 thou (0.3048 mm) at 900 mm; the mean (1.2 thou) would pass.
    it('height comes from top-face sweeps against one datum, at the worst station, against S = a × K', async () => {
      const a = await addRail({ label: 'TA', spacing: 500 });
      const b = await addRail({ label: 'TB', partnerRailId: a.id, spacing: 500 });
      const flat = positions.map(() => 0);
      const bump = positions.map((p) => (p === 900 ? 12 : 0));
      await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(flat, { datum: 'Level bar', face: 'top' }));
      await ws.as.builder.post(`/api/rails/${b.id}/sweeps`).send(sweep(bump, { datum: 'level bar', face: 'top' }));
      const res = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(res.body.height).toMatchObject({ measured: true, at: 900, spacing: 500, kUmPerMm: 0.5, within: false });
      expect(res.body.height.worst).toBeCloseTo(12 * 0.0254, 12);
      expect(res.body.height.permissible).toBeCloseTo(0.25, 12);
      expect(res.body.height.targetText).toBe('S = a × K = 0.25 mm for a = 500 mm, K = 0.5 µm/mm');
      expect(res.body.status).toBe('outside-target');
      expect(res.body.heightDifferenceWithin).toBe(false);
      // Wider spacing, wider S: at a = 1000 mm, S = 0.5 mm and the same 0.3048 mm is within.
      await ws.as.builder.patch(`/api/rails/${a.id}`).send({ spacing: 1000 });
      await ws.as.builder.patch(`/api/rails/${b.id}`).send({ spacing: 1000 });
      const wide = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(wide.body.height.within).toBe(true);
      expect(wide.body.status).toBe('within-target');
    });

    it('asks for the rail spacing when the height target scales with it', async () => {
      const a = await addRail({ label: 'SA' });
      const b = await addRail({ label: 'SB', partnerRailId: a.id });
      await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(thou, { datum: 'D', face: 'top' }));
      await ws.as.builder.post(`/api/rails/${b.id}/sweeps`).send(sweep(thou, { datum: 'D', face: 'top' }));
      const res = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(res.body.height.permissible).toBeNull();
      expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('spacing-missing');
      expect(res.body.status).toBe('outside-target');
    });

    it('says clearly when the pair cannot be compared', async () => {
      const lone = await addRail({ label: 'Lone' });
      expect((await ws.as.viewer.get(`/api/rails/${lone.id}/parallelism`)).body).toMatchObject({
        status: 'not-comparable',
        reason: expect.stringMatching(/no partner/),
      });
      const a = await addRail({ label: 'NA' });
      const b = await addRail({ label: 'NB', partnerRailId: a.id });
      expect((await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`)).body.reason).toMatch(
        /No sweep of rail NA and NB/,
      );
      await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(thou, { datum: 'D1' }));
      await ws.as.builder.post(`/api/rails/${b.id}/sweeps`).send(sweep(thou, { datum: 'D2' }));
      expect((await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`)).body.reason).toMatch(/same datum/);
      await ws.as.builder.post(`/api/rails/${b.id}/sweeps`).send({
        ...sweep(thou.slice(0, 5), { datum: 'D1' }),
        stations: stations(thou.slice(0, 5), [0, 50, 100, 150, 200]),
      });
      const res = await ws.as.viewer.get(`/api/rails/${a.id}/parallelism`);
      expect(res.body.status).toBe('not-comparable');
      expect(res.body.reason).toMatch(/stations differ/);
    });
  });

  it('reports readiness checks: straightness per rail and parallelism per pair, against the current targets', async () => {
    const m = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Readiness', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
    const a = await addRail({ label: 'Y1' }, m);
    const b = await addRail({ label: 'Y2', partnerRailId: a.id }, m);
    const empty = await addRail({ label: 'X1' }, m);
    const registry = app.get(ReadinessRegistry);
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, m);
    // Other modules add their own checks; these are the rails'.
    const railChecks = async () =>
      (await registry.checksFor(ref)).filter((c) => c.kind === 'rail-straightness' || c.kind === 'rail-parallelism');
    let checks = await railChecks();
    expect(checks.map((c) => `${c.kind}:${c.status}`).sort()).toEqual([
      'rail-parallelism:not-started',
      'rail-straightness:not-started',
      'rail-straightness:not-started',
      'rail-straightness:not-started',
    ]);
    const waiting = checks.find((c) => c.kind === 'rail-parallelism')!;
    expect(waiting.result).toBeNull();
    expect(waiting.subject).toMatch(/Rails Y[12] and Y[12] \(No sweep of rail/);

    const sa = (await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send(sweep(thou, { datum: 'Frame' }))).body;
    const sb = (
      await ws.as.builder
        .post(`/api/rails/${b.id}/sweeps`)
        .send(sweep([0, 0.5, 0.5, 1, 0.5, 0.5, 0, 0.5, 0, 0], { datum: 'Frame' }))
    ).body;
    checks = await railChecks();
    const byKey = new Map(checks.map((c) => [c.key, c]));
    const sa1 = byKey.get(`straightness:${a.id}`)!;
    expect(sa1).toMatchObject({
      kind: 'rail-straightness',
      status: 'outside-target',
      recordType: 'rail-sweep',
      recordId: sa.id,
      target: { value: 2, unit: 'thou', reference: 'minimum-zone' },
      place: { machineId: m, railId: a.id },
    });
    expect(sa1.result!.value).toBeCloseTo(sa.result.minimumZone.straightness / 0.0254, 10);
    expect(sa1.result!.summary).toMatch(
      /^Minimum zone \(ISO 1101\) .* thou against 2 thou \(least squares .* thou\); largest local slope .* mm\/m/,
    );
    expect(sa1.target!.label).toMatch(/judged on the minimum zone \(ISO 1101\)/);
    // The certificate's chart: residuals per station in the reading unit, the band at ±t/2.
    expect(sa1.series!.y.unit).toBe('thou');
    expect(sa1.series!.lines[0].points).toHaveLength(positions.length);
    expect(sa1.series!.limits).toEqual([expect.objectContaining({ value: 1 }), expect.objectContaining({ value: -1 })]);
    const ys = sa1.series!.lines[0].points.map((p) => p[1]);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(sa.result.minimumZone.straightness / 0.0254, 9);
    expect(byKey.get(`straightness:${b.id}`)!.status).toBe('within-target');
    expect(byKey.get(`straightness:${empty.id}`)!.status).toBe('not-started');
    const [lo, hi] = [a.id, b.id].sort();
    const par = byKey.get(`parallelism:${lo}:${hi}`)!;
    expect(par.kind).toBe('rail-parallelism');
    expect(par.result!.summary).toMatch(/height difference/);
    expect(['within-target', 'outside-target']).toContain(par.status);
    expect(par.recordId).toBe(sb.id);

    // The owner tightens the target set: the same sweep is now outside; the list counts it.
    const setId = (await ws.as.viewer.get(`/api/machines/${m}`)).body.targetSet.id;
    await ws.as.owner
      .patch(`/api/target-sets/${setId}`)
      .send({ targets: { railStraightness: { value: 0.5, unit: 'thou' } } });
    checks = await railChecks();
    expect(checks.find((c) => c.key === `straightness:${b.id}`)!.status).toBe('outside-target');
    const listed = (await ws.as.viewer.get('/api/machines')).body.find((x: { id: string }) => x.id === m);
    expect(listed.checks.total).toBe((await registry.checksFor(ref)).length);
    expect(listed.checks.outside).toBeGreaterThanOrEqual(checks.filter((c) => c.status === 'outside-target').length);
    // Least squares is selectable per target set: the same sweep is then judged on its least-squares figure.
    await ws.as.owner
      .patch(`/api/target-sets/${setId}`)
      .send({ targets: { railStraightness: { value: 2, unit: 'thou', reference: 'least-squares' } } });
    const ls = (await railChecks()).find((c) => c.key === `straightness:${a.id}`)!;
    expect(ls.result!.value).toBeCloseTo(sa.result.leastSquares.straightness / 0.0254, 10);
    expect(ls.result!.summary).toMatch(/^Least squares line .* \(minimum zone .* thou\)/);
    expect(
      (
        await ws.as.owner
          .patch(`/api/target-sets/${setId}`)
          .send({ targets: { railStraightness: { value: 2, unit: 'thou', reference: 'best-fit' } } })
      ).body.message,
    ).toEqual(['targets.railStraightness.reference must be one of minimum-zone, least-squares']);
    await ws.as.owner
      .patch(`/api/target-sets/${setId}`)
      .send({ targets: { railStraightness: { value: 2, unit: 'thou' } } });
  });
});
