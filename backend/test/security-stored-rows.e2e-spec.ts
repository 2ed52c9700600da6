import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { PG_POOL } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';

/**
 * Rows written before the engine refused non-finite results (or edited by hand) must not take a
 * whole page down: the one record shows as unreadable, everything else still loads.
 */
describe('a stored result that cannot be read', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let pool: pg.Pool;
  let machineId: string;
  let axisId: string;
  let goodAxisId: string;

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Bad rows');
    machineId = await newMachine(ws, 'router');
    axisId = await newAxis(ws, machineId, screwAxis('X'));
    goodAxisId = await newAxis(ws, machineId, screwAxis('Z'));
    const moves = [{ commanded: 100, measured: 99.8 }];
    for (const id of [axisId, goodAxisId]) {
      const t = await ws.as.technician
        .post(`/api/axes/${id}/travel-trials`)
        .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves });
      expect(t.status).toBe(201);
    }
  });
  afterAll(() => app.close());

  it('refuses a measured move of 1e308 with a 400 naming the move, and stores nothing', async () => {
    const before = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    const res = await ws.as.technician
      .post(`/api/axes/${axisId}/travel-trials`)
      .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 1e308 }] });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/measured/);
    const after = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    expect(after).toEqual(before);
  });

  const corruptions: [string, string][] = [
    ['a result with a number gone (as JSON stores NaN)', `jsonb_set(result, '{correctedStepsPerMm}', 'null')`],
    [
      'a result with numbers as text',
      `jsonb_set(jsonb_set(result, '{scale}', '"Infinity"'), '{errorPercent}', '"NaN"')`,
    ],
    ['an empty result', `'{}'::jsonb`],
  ];

  it.each(corruptions)('%s: lists still load, the record is flagged unreadable', async (_label, expr) => {
    await pool.query(`update travel_trials set result = ${expr} where axis_id = $1`, [axisId]);
    for (const path of [
      '/api/machines',
      `/api/machines/${machineId}`,
      `/api/machines/${machineId}/readiness`,
      `/api/machines/${machineId}/axes`,
      `/api/axes/${axisId}`,
      `/api/axes/${axisId}/travel-trials`,
      `/api/axes/${goodAxisId}/travel-trials`,
    ]) {
      const res = await ws.as.viewer.get(path);
      expect({ path, status: res.status }).toEqual({ path, status: 200 });
    }
    const trials = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    const list = Array.isArray(trials) ? trials : trials.items;
    expect(list.every((t: { unreadable?: string }) => typeof t.unreadable === 'string')).toBe(true);
    const good = (await ws.as.viewer.get(`/api/axes/${goodAxisId}/travel-trials`)).body;
    const goodList = Array.isArray(good) ? good : good.items;
    expect(goodList[0].unreadable).toBeUndefined();
    expect(goodList[0].result.correctedStepsPerMm).toBeCloseTo(641.2825651302605, 9);
    const board = (await ws.as.viewer.get(`/api/machines/${machineId}/readiness`)).body;
    expect(JSON.stringify(board)).toMatch(/unreadable/i);
  });
});

/**
 * The same for rails, frame checks and bolt-downs: each bad record is flagged, its neighbours read
 * as before, and the readiness board blocks approval naming the record that cannot be read.
 */
describe('stored rail, frame and bolt-down rows that cannot be read', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let pool: pg.Pool;
  let machineId: string;
  const rail = { axis: 'Y', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
  const stations = (readings: number[]) => readings.map((reading, i) => ({ position: i * 100, reading }));
  let a: string; // partner of b; its sweep result is damaged
  let b: string; // partner of a; a reading of its sweep is damaged
  let good: string; // a rail nobody touches
  let bent: string; // its length is stored as NaN
  let sweepA: string;
  let sweepB: string;

  const newRail = async (label: string, extra: object = {}) => {
    const res = await ws.as.builder.post(`/api/machines/${machineId}/rails`).send({ ...rail, label, ...extra });
    expect(res.status).toBe(201);
    return res.body.id as string;
  };
  const newSweep = async (railId: string, readings: number[]) => {
    const res = await ws.as.builder
      .post(`/api/rails/${railId}/sweeps`)
      .send({ readingUnit: 'mm', phase: 'as-left', datum: 'granite straightedge', stations: stations(readings) });
    expect(res.status).toBe(201);
    return res.body.id as string;
  };
  const ok = async (path: string) => {
    const res = await ws.as.viewer.get(path);
    expect({ path, status: res.status }).toEqual({ path, status: 200 });
    return res.body;
  };

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Bad frame rows');
    machineId = await newMachine(ws, 'router');
    a = await newRail('A');
    b = await newRail('B', { partnerRailId: a });
    good = await newRail('C');
    bent = await newRail('D');
    sweepA = await newSweep(a, [0, 0.01, 0.02, 0.01, 0]);
    sweepB = await newSweep(b, [0, 0.02, 0.01, 0.02, 0]);
    await newSweep(good, [0, 0.01, 0.01, 0.01, 0]);
    const body = { sideX: 1000, sideY: 600, diagonal1: 1166.2, diagonal2: 1166 };
    expect((await ws.as.builder.post(`/api/machines/${machineId}/diagonal-checks`).send(body)).status).toBe(201);
    const points = [0, 400].flatMap((y) => [0, 500].map((x) => ({ x, y, z: 0.01 })));
    expect(
      (
        await ws.as.builder
          .post(`/api/machines/${machineId}/bed-grids`)
          .send({ lengthUnit: 'mm', readingUnit: 'mm', rows: 2, columns: 2, points })
      ).status,
    ).toBe(201);
    const cut = {
      nominal: { x: 300, y: 300, circle: 100 },
      measured: {
        x: 300,
        y: 300,
        diagonal1: Math.hypot(300, 300),
        diagonal2: Math.hypot(300, 300),
        circleX: 100,
        circleY: 100,
      },
    };
    expect((await ws.as.technician.post(`/api/machines/${machineId}/test-cuts`).send(cut)).status).toBe(201);
    expect(
      (await ws.as.builder.post(`/api/rails/${good}/bolt-downs`).send({ mode: 'line', readingUnit: 'mm' })).status,
    ).toBe(201);
    expect(
      (await ws.as.builder.post(`/api/rails/${good}/bolt-downs`).send({ mode: 'line', readingUnit: 'mm' })).status,
    ).toBe(201);

    // Written straight into the database, as an old row or a hand edit would have left them.
    // JSON has no NaN: a writer that kept it wrote text where the number was.
    await pool.query(
      `update rail_sweeps set result = jsonb_set(result, '{leastSquares,straightness}', '"NaN"') where id = $1`,
      [sweepA],
    );
    await pool.query(`update rail_sweeps set readings_mm = jsonb_set(readings_mm, '{2}', 'null') where id = $1`, [
      sweepB,
    ]);
    await pool.query(`update rails set length_mm = 'NaN' where id = $1`, [bent]);
    await pool.query(`update diagonal_checks set side_x_mm = 'NaN' where machine_id = $1`, [machineId]);
    await pool.query(`update bed_grids set points = jsonb_set(points, '{0,zMm}', 'null') where machine_id = $1`, [
      machineId,
    ]);
    await pool.query(`update test_cuts set sizes = jsonb_set(sizes, '{measured,xMm}', '"NaN"') where machine_id = $1`, [
      machineId,
    ]);
    await pool.query(
      `update bolt_downs set hole_positions_mm = jsonb_set(hole_positions_mm, '{0}', 'null') where id = (select id from bolt_downs where rail_id = $1 order by created_at limit 1)`,
      [good],
    );
  });
  afterAll(() => app.close());

  it('the machine, its lists and the board still load', async () => {
    for (const path of [
      '/api/machines',
      `/api/machines/${machineId}`,
      `/api/machines/${machineId}/readiness`,
      `/api/machines/${machineId}/drift`,
    ])
      await ok(path);
  });

  it('the rail list flags the rail whose length cannot be read and the rail whose latest sweep cannot be read', async () => {
    const rails = (await ok(`/api/machines/${machineId}/rails`)) as {
      id: string;
      unreadable?: string;
      holes: unknown[];
      latestSweep: { unreadable?: string; leastSquaresStraightness: number | null } | null;
    }[];
    const byId = new Map(rails.map((r) => [r.id, r]));
    expect(byId.get(bent)!.unreadable).toMatch(/cannot be read/);
    expect(byId.get(bent)!.holes).toEqual([]);
    expect(byId.get(a)!.latestSweep!.unreadable).toMatch(/cannot be read/);
    expect(byId.get(a)!.latestSweep!.leastSquaresStraightness).toBeNull();
    expect(byId.get(good)!.unreadable).toBeUndefined();
    expect(byId.get(good)!.latestSweep!.unreadable).toBeUndefined();
    // 1000 mm rail, pitch 60 from 20: holes at 20, 80, …, 980 (17 holes).
    expect(byId.get(good)!.holes).toHaveLength(17);
    expect((await ok(`/api/rails/${bent}`)).unreadable).toMatch(/cannot be read/);
  });

  it('a sweep list and a sweep flag the bad sweep; the neighbours read as before', async () => {
    const page = (path: string) => ok(path).then((body) => (Array.isArray(body) ? body : body.items));
    const listA = await page(`/api/rails/${a}/sweeps`);
    expect(listA[0]).toMatchObject({ id: sweepA, leastSquaresStraightness: null, status: 'outside-target' });
    expect(listA[0].unreadable).toMatch(/cannot be read/);
    const one = await ok(`/api/sweeps/${sweepA}`);
    expect(one.result).toBeNull();
    expect(one.unreadable).toMatch(/cannot be read/);
    const withNull = await ok(`/api/sweeps/${sweepB}`);
    expect(withNull.stations).toBeNull();
    expect(withNull.unreadable).toMatch(/measurements .* cannot be read/);
    const goodList = await page(`/api/rails/${good}/sweeps`);
    expect(goodList[0].unreadable).toBeUndefined();
    // Readings 0, 0.01, 0.01, 0.01, 0 at 0…400 mm: the end-point line is y = 0, so its straightness is 0.01 mm.
    const goodSweep = await ok(`/api/sweeps/${goodList[0].id}`);
    expect(goodSweep.result.endPoint.straightness).toBeCloseTo(0.01, 12);
  });

  it('the partner comparison answers 200 and says which sweep cannot be read', async () => {
    const out = await ok(`/api/rails/${a}/parallelism`);
    expect(out.status).toBe('not-comparable');
    expect(out.unreadable).toMatch(/cannot be read/);
    expect(out.reason).toMatch(/rail B/);
  });

  it('the frame tab lists flag each bad record', async () => {
    for (const kind of ['diagonal-checks', 'bed-grids', 'test-cuts']) {
      const list = (await ok(`/api/machines/${machineId}/${kind}`)) as {
        result: unknown;
        unreadable?: string;
        status: string;
      }[];
      expect({ kind, n: list.length, result: list[0].result, status: list[0].status }).toEqual({
        kind,
        n: 1,
        result: null,
        status: 'outside-target',
      });
      expect(list[0].unreadable).toMatch(/cannot be read/);
    }
  });

  it('the bolt-down list flags the bad bolt-down and shows the good one in full', async () => {
    const list = (await ok(`/api/rails/${good}/bolt-downs`)) as { id: string; unreadable?: string; holes: unknown[] }[];
    const bad = list.filter((x) => x.unreadable);
    const fine = list.filter((x) => !x.unreadable);
    expect(bad).toHaveLength(1);
    expect(bad[0].holes).toEqual([]);
    expect(fine).toHaveLength(1);
    expect(fine[0].holes).toHaveLength(17);
    expect((await ok(`/api/bolt-downs/${bad[0].id}`)).unreadable).toMatch(/cannot be read/);
  });

  it('the board blocks approval and names each record that cannot be read', async () => {
    const board = (await ok(`/api/machines/${machineId}/readiness`)) as {
      blocking: { subject: string; status: string }[];
    };
    const subjects = board.blocking.filter((c) => c.status === 'outside-target').map((c) => c.subject);
    for (const want of [
      /Rail A.*latest sweep unreadable/,
      /Rails (A and B|B and A).*latest sweep unreadable/,
      /latest diagonal check unreadable/,
      /latest bed grid unreadable/,
      /latest test cut unreadable/,
    ]) {
      expect(subjects.some((s) => want.test(s))).toBe(true);
    }
    const req = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
    expect(req.status).toBeLessThan(500);
    const res = await ws.as.owner.post(`/api/machines/${machineId}/approvals`).send({
      password: 'correct horse battery staple',
      statement: 'I have reviewed every check of this machine and approve it as ready to cut.',
    });
    expect(res.status).toBe(409);
  });
});
