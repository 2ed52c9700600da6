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
      const t = await ws.as.technician.post(`/api/axes/${id}/travel-trials`).send({ unit: 'mm', stepsPerMmUsed: 640, moves });
      expect(t.status).toBe(201);
    }
  });
  afterAll(() => app.close());

  it('refuses a measured move of 1e308 with a 400 naming the move, and stores nothing', async () => {
    const before = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    const res = await ws.as.technician
      .post(`/api/axes/${axisId}/travel-trials`)
      .send({ unit: 'mm', stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 1e308 }] });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/measured/);
    const after = (await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials`)).body;
    expect(after).toEqual(before);
  });

  const corruptions: [string, string][] = [
    ['a result with a number gone (as JSON stores NaN)', `jsonb_set(result, '{correctedStepsPerMm}', 'null')`],
    ['a result with numbers as text', `jsonb_set(jsonb_set(result, '{scale}', '"Infinity"'), '{errorPercent}', '"NaN"')`],
    ['an empty result', `'{}'::jsonb`],
  ];

  it.each(corruptions)('%s: lists still load, the record is flagged unreadable', async (_label, expr) => {
    await pool.query(`update travel_trials set result = ${expr} where axis_id = $1`, [axisId]);
    for (const path of ['/api/machines', `/api/machines/${machineId}`, `/api/machines/${machineId}/readiness`, `/api/machines/${machineId}/axes`, `/api/axes/${axisId}`, `/api/axes/${axisId}/travel-trials`, `/api/axes/${goodAxisId}/travel-trials`]) {
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
