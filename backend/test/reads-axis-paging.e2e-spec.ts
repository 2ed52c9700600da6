import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

// Five trials a little apart in scale error, so each record is told from the others.
const trial = (i: number) => ({
  lengthUnit: 'mm',
  stepsPerMmUsed: 640,
  moves: [
    { commanded: 100, measured: 99.8 + i * 0.01 },
    { commanded: 300, measured: 299.5 + i * 0.02 },
  ],
});
const run = (i: number) => ({
  readingUnit: 'um',
  targets: [10, 20, 30],
  runs: [
    { direction: 'up', deviations: [1 + i, 2, 3] },
    { direction: 'up', deviations: [2, 2 + i, 3] },
    { direction: 'down', deviations: [0, 1, 2 + i] },
    { direction: 'down', deviations: [-1, 0, 1] },
  ],
});

/** An axis's travel trials and repeat-and-reverse runs: newest first, a page at a time, without their arrays. */
describe('reads: paged trial and run lists', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let axisId: string;
  let otherAxisId: string;
  const trialIds: string[] = [];
  const runIds: string[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Axis paging');
    const machineId = await newMachine(ws, 'router');
    axisId = await newAxis(ws, machineId, screwAxis('X'));
    otherAxisId = await newAxis(ws, machineId, screwAxis('Y'));
    // One at a time, so each is newer than the one before.
    for (let i = 0; i < 5; i++) {
      const t = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(trial(i));
      expect(t.status).toBe(201);
      trialIds.unshift(t.body.id);
      const r = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(run(i));
      expect(r.status).toBe(201);
      runIds.unshift(r.body.id);
    }
    expect((await ws.as.technician.post(`/api/axes/${otherAxisId}/travel-trials`).send(trial(0))).status).toBe(201);
  });
  afterAll(() => app.close());

  const lists = [
    ['travel-trials', () => trialIds],
    ['positioning-runs', () => runIds],
  ] as const;

  it.each(lists)('walks %s two at a time through X-Next-Cursor, newest first, each record once', async (list, ids) => {
    const seen: string[] = [];
    let cursor: string | undefined;
    let pages = 0;
    do {
      const res = await ws.as.viewer.get(`/api/axes/${axisId}/${list}?limit=2${cursor ? `&cursor=${cursor}` : ''}`);
      expect(res.status).toBe(200);
      expect(res.body.length).toBeLessThanOrEqual(2);
      seen.push(...res.body.map((s: { id: string }) => s.id));
      cursor = res.headers['x-next-cursor'];
      pages++;
    } while (cursor && pages < 10);
    expect(pages).toBe(3);
    expect(seen).toEqual(ids());
  });

  it.each(lists)('%s: the whole list fits the default page and has no next cursor', async (list, ids) => {
    const res = await ws.as.viewer.get(`/api/axes/${axisId}/${list}`);
    expect(res.status).toBe(200);
    expect(res.headers['x-next-cursor']).toBeUndefined();
    expect(res.body.map((s: { id: string }) => s.id)).toEqual(ids());
  });

  it('lists trials without their moves; the single trial keeps them and agrees on the figures', async () => {
    const [first] = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    expect(first).toMatchObject({
      id: trialIds[0],
      axisId,
      lengthUnit: 'mm',
      readingUnit: 'mm',
      stepsPerMmUsed: 640,
      moveCount: 2,
      locked: false,
      appliedAt: null,
    });
    expect(first.moves).toBeUndefined();
    expect(first.result.moves).toBeUndefined();
    expect(first.result.residuals).toBeUndefined();
    const one = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials/${trialIds[0]}`)).body;
    expect(one.moves).toHaveLength(2);
    expect(one.result.moves).toHaveLength(2);
    expect(one.result.residuals).toHaveLength(2);
    for (const key of ['correctedStepsPerMm', 'errorPercent', 'scale', 'offset', 'residualMax'])
      expect(first.result[key]).toBeCloseTo(one.result[key], 12);
    expect([first.status, first.target, first.recordedBy, first.recordedAt]).toEqual([
      one.status,
      one.target,
      one.recordedBy,
      one.recordedAt,
    ]);
  });

  it('lists runs without their deviations; the single run keeps them and agrees on the verdicts', async () => {
    const [first] = (await ws.as.viewer.get(`/api/axes/${axisId}/positioning-runs`)).body;
    expect(first).toMatchObject({
      id: runIds[0],
      axisId,
      lengthUnit: 'mm',
      readingUnit: 'um',
      targetCount: 3,
      runCount: 4,
      locked: false,
    });
    expect(first.runs).toBeUndefined();
    expect(first.targets).toBeUndefined();
    expect(first.result.targets).toBeUndefined();
    const one = (await ws.as.viewer.get(`/api/axes/${axisId}/positioning-runs/${runIds[0]}`)).body;
    expect(one.runs).toHaveLength(4);
    expect(one.targets).toEqual([10, 20, 30]);
    expect(one.result.targets).toHaveLength(3);
    for (const key of ['accuracy', 'repeatability', 'reversal'])
      expect(first.result[key]).toBeCloseTo(one.result[key], 12);
    expect(first.checks).toEqual(one.checks);
    expect(first.status).toBe(one.status);
  });

  it("a cursor from another axis's list gives an empty page, not another axis's records", async () => {
    const foreign = (await ws.as.viewer.get(`/api/axes/${otherAxisId}/travel-trials`)).body[0].id;
    const res = await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials?cursor=${foreign}`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual([]);
  });

  it.each(
    lists.flatMap(
      ([list]) =>
        [
          [list, 'limit=0', /limit must be at least 1/],
          [list, 'limit=201', /limit must be at most 200/],
          [list, 'limit=many', /limit must be a whole number/],
          [list, 'cursor=yesterday', /cursor must be the X-Next-Cursor/],
        ] as const,
    ),
  )('%s refuses ?%s with a 400 naming the field', async (list, query, message) => {
    const res = await ws.as.viewer.get(`/api/axes/${axisId}/${list}?${query}`);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });
});
