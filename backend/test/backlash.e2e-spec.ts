import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { sql } from 'drizzle-orm';
import pg from 'pg';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { BacklashReadinessService } from '../src/drives/backlash-readiness.service.js';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';
import { board, requestAndApprove, waiveAllBut } from './support/approval-flow.js';

// Hand-worked (see src/engine/backlash.spec.ts): backlash = |mean up − mean down| per position
// (ISO 230-2 reversal value for one target, formulas from memory); largest reported (TRADE.md,
// common practice). µm: 10 mm → 20, 460 mm → 17, 900 mm → 29; largest 29 µm at 900 mm.
const positionsUm = [
  { position: 10, up: [12, 10, 11], down: [-8, -10, -9] },
  { position: 460, up: [20, 22, 24], down: [5, 4, 6] },
  { position: 900, up: [0, 2, 1], down: [31, 29, 30] },
];
const check = { lengthUnit: 'mm', readingUnit: 'um', positions: positionsUm, resolution: 1 };
// The same check typed in inches and thou (1 in = 25.4 mm, 1 thou = 0.0254 mm exactly).
const inInches = {
  lengthUnit: 'in',
  readingUnit: 'thou',
  positions: positionsUm.map((p) => ({
    position: p.position / 25.4,
    up: p.up.map((v) => v / 25.4),
    down: p.down.map((v) => v / 25.4),
  })),
  resolution: 1 / 25.4,
};

describe('backlash checks', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;
  let xId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Backlash');
    other = await createTestWorkshop(app, 'Other');
    machineId = await newMachine(ws, 'router');
    xId = await newAxis(ws, machineId, screwAxis('X')); // measured travel 920 mm
  });
  afterAll(() => app.close());

  it('records a check: the value at each position, the largest, its units, the definition and the router target of 0.03 mm', async () => {
    const res = await ws.as.technician
      .post(`/api/axes/${xId}/backlash-checks`)
      .send({ ...check, notes: 'dial indicator on the carriage' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      lengthUnit: 'mm',
      readingUnit: 'um',
      resolution: 1,
      status: 'within-target',
      locked: false,
      warnings: [],
    });
    expect(res.body.result.positions.map((p: { backlash: number }) => p.backlash)).toEqual([
      expect.closeTo(20, 9),
      expect.closeTo(17, 9),
      expect.closeTo(29, 9),
    ]);
    expect(res.body.result.backlash).toBeCloseTo(29, 9);
    expect(res.body.result.backlashMm).toBeCloseTo(0.029, 12);
    expect(res.body.result.worstPosition).toBe(900);
    expect(res.body.target).toMatchObject({ value: 0.03, unit: 'mm', valueMm: 0.03 });
    expect(res.body.definition).toMatch(
      /mean of the readings approached moving \+ − mean of the readings approached moving −/,
    );
    const got = await ws.as.viewer.get(`/api/axes/${xId}/backlash-checks/${res.body.id}`);
    expect(got.status).toBe(200);
    expect(got.body.positions).toEqual(positionsUm);
    const list = await ws.as.viewer.get(`/api/axes/${xId}/backlash-checks`);
    expect(list.body.map((c: { id: string }) => c.id)).toContain(res.body.id);
    expect((await other.as.owner.get(`/api/axes/${xId}/backlash-checks/${res.body.id}`)).status).toBe(404);
    expect((await ws.as.builder.post(`/api/axes/${xId}/backlash-checks`).send(check)).status).toBe(403);
  });

  it('inches and thou give the same result as mm and µm', async () => {
    const mm = await ws.as.technician.post(`/api/axes/${xId}/backlash-checks`).send(check);
    const inch = await ws.as.technician.post(`/api/axes/${xId}/backlash-checks`).send(inInches);
    expect(inch.status).toBe(201);
    expect(inch.body.result.backlashMm).toBeCloseTo(mm.body.result.backlashMm, 12);
    expect(inch.body.result.worstPositionMm).toBeCloseTo(900, 9);
    expect(inch.body.result.backlash).toBeCloseTo(29 / 25.4, 9); // in thou
    inch.body.result.positions.forEach((p: { backlashMm: number; positionMm: number }, i: number) => {
      expect(p.backlashMm).toBeCloseTo(mm.body.result.positions[i].backlashMm, 12);
      expect(p.positionMm).toBeCloseTo(positionsUm[i].position, 9);
    });
    expect(inch.body.status).toBe(mm.body.status);
  });

  it.each([
    [
      'two approaches a side',
      { ...check, positions: [{ ...positionsUm[0], up: [1, 2] }, positionsUm[1], positionsUm[2]] },
      /positions\.0\.up needs at least 3 approaches|positions\[\]\.up needs at least 3 approaches/,
    ],
    [
      'two approaches from above',
      { ...check, positions: [positionsUm[0], { ...positionsUm[1], down: [1] }, positionsUm[2]] },
      /down needs at least 3 approaches/,
    ],
    [
      'two positions',
      { ...check, positions: positionsUm.slice(0, 2) },
      /positions needs at least 3 entries: one near each end of the travel and one near its middle/,
    ],
    [
      'no middle',
      { ...check, positions: [positionsUm[0], { ...positionsUm[1], position: 150 }, positionsUm[2]] },
      /positions is missing a position near the middle of the travel \(between 368 mm and 552 mm of 920 mm\)/,
    ],
    [
      'no far end',
      { ...check, positions: [positionsUm[0], positionsUm[1], { ...positionsUm[2], position: 700 }] },
      /missing a position near the end/,
    ],
    [
      'beyond the travel',
      { ...check, positions: [positionsUm[0], positionsUm[1], { ...positionsUm[2], position: 925 }] },
      /positions\[2\]\.position is 925 mm, beyond the axis's measured travel of 920 mm/,
    ],
    [
      'beyond the travel in inches',
      {
        ...inInches,
        positions: [inInches.positions[0], inInches.positions[1], { ...inInches.positions[2], position: 37 }],
      },
      /positions\[2\]\.position is 37 in, beyond the axis's measured travel of 36\.22 in/,
    ],
    [
      'below zero',
      { ...check, positions: [{ ...positionsUm[0], position: -1 }, positionsUm[1], positionsUm[2]] },
      /positions\[0\]\.position is -1 mm, below 0/,
    ],
    [
      'a repeated position',
      { ...check, positions: [...positionsUm, positionsUm[1]] },
      /positions\[3\]\.position repeats positions\[1\]\.position/,
    ],
    [
      'a reading that is no number',
      { ...check, positions: [{ ...positionsUm[0], up: [1, 'x', 2] }, positionsUm[1], positionsUm[2]] },
      /every value in positions\[\]\.up must be a finite number/,
    ],
    ['an unknown unit', { ...check, readingUnit: 'cm' }, /readingUnit must be one of mm, um, in, thou/],
    [
      'the old unit field',
      { ...check, unit: 'um' },
      /unit is no longer accepted: send lengthUnit for the positions and readingUnit for the readings/,
    ],
    ['a resolution of zero', { ...check, resolution: 0 }, /resolution must be greater than zero/],
  ])('refuses %s with 400 naming the field, and stores nothing', async (_what, body, message) => {
    const before = (await ws.as.viewer.get(`/api/axes/${xId}/backlash-checks`)).body.length;
    const res = await ws.as.technician.post(`/api/axes/${xId}/backlash-checks`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
    expect((await ws.as.viewer.get(`/api/axes/${xId}/backlash-checks`)).body.length).toBe(before);
  });

  it('warns when the indicator is coarser than a quarter of the target; a check beyond the target is outside it', async () => {
    const coarse = await ws.as.technician.post(`/api/axes/${xId}/backlash-checks`).send({ ...check, resolution: 10 });
    expect(coarse.body.warnings.map((w: { code: string }) => w.code)).toEqual(['coarse-instrument']);
    expect(coarse.body.warnings[0].message).toMatch(
      /steps of 10\.0 µm, coarser than a quarter of the 30\.0 µm target \(7\.5 µm\)/,
    );
    const big = await ws.as.technician
      .post(`/api/axes/${xId}/backlash-checks`)
      .send({ ...check, positions: [positionsUm[0], positionsUm[1], { ...positionsUm[2], down: [41, 39, 40] }] });
    expect(big.body.result.backlash).toBeCloseTo(39, 9);
    expect(big.body.status).toBe('outside-target');
  });

  it('the board shows the latest check per axis with its warnings; the approval locks it and the change log keeps it', async () => {
    const m = await newMachine(ws, 'router');
    const axis = await newAxis(ws, m, screwAxis('X'));
    let b = await board(ws, m);
    expect(b.checks.find((c) => c.key === `backlash:${axis}`)).toMatchObject({ status: 'not-started', recordId: null });
    const made = await ws.as.technician.post(`/api/axes/${axis}/backlash-checks`).send({ ...check, resolution: 10 });
    b = await board(ws, m);
    const onBoard = b.checks.find((c) => c.key === `backlash:${axis}`) as unknown as Record<string, unknown>;
    expect(onBoard).toMatchObject({
      kind: 'backlash',
      status: 'within-target',
      recordType: 'backlash-check',
      recordId: made.body.id,
      target: { value: 0.03, unit: 'mm' },
    });
    expect(onBoard.result).toMatchObject({ value: expect.closeTo(29, 9), unit: 'um' });
    // What the contributor hands the board, the approval snapshot and the certificate: warnings and the series.
    const ref = { id: m, workshopId: ws.id, targetSetId: '', kind: 'router', workAreaXMm: 900, workAreaYMm: 600 };
    const set = await app
      .get<Database>(DRIZZLE)
      .execute<{ target_set_id: string }>(sql`select target_set_id from machines where id = ${m}`);
    ref.targetSetId = set.rows[0].target_set_id;
    const full = (await app.get(ReadinessRegistry).checksFor(ref)).find((c) => c.key === `backlash:${axis}`)!;
    expect(full.warnings!.map((w) => w.code)).toEqual(['coarse-instrument']);
    expect(full.series!.lines[0].points).toEqual([
      [10, expect.closeTo(20, 9)],
      [460, expect.closeTo(17, 9)],
      [900, expect.closeTo(29, 9)],
    ]);
    expect(full.series!.limits).toEqual([{ label: 'Target', value: expect.closeTo(30, 9) }]);
    expect(full.series!.y.unit).toBe('um');

    const db = app.get<Database>(DRIZZLE);
    const { rows } = await db.execute<{ operation: string }>(
      sql`select operation from change_log where table_name = 'backlash_checks' and record_id = ${made.body.id}`,
    );
    expect(rows.map((r) => r.operation)).toEqual(['insert']);

    await waiveAllBut(ws, m, (key) => key === `backlash:${axis}`);
    await requestAndApprove(ws, m, TEST_PASSWORD);
    expect((await board(ws, m)).state).toBe('ready-to-cut');
    const locked = await ws.as.technician.get(`/api/axes/${axis}/backlash-checks/${made.body.id}`);
    expect(locked.body.locked).toBe(true);
    const del = await ws.as.technician.delete(`/api/axes/${axis}/backlash-checks/${made.body.id}`);
    expect(del.status).toBe(409);
    expect(JSON.stringify(del.body)).toMatch(/approved as ready to cut/);
    const add = await ws.as.technician.post(`/api/axes/${axis}/backlash-checks`).send(check);
    expect(add.status).toBe(409);
    // The database's own guard refuses a write that skips the service.
    const direct = await db.execute(sql`delete from backlash_checks where id = ${made.body.id}`).then(
      () => null,
      (e: Error & { cause?: Error }) => e.cause?.message ?? e.message,
    );
    expect(direct).toMatch(/approved as ready to cut/);
    expect((await ws.as.viewer.get(`/api/axes/${axis}/backlash-checks`)).body).toHaveLength(1);
  }, 60_000);

  it('the board reads backlash in two statements whatever the number of checks and axes (one index step per axis)', async () => {
    const m = await newMachine(ws, 'router');
    const axes = [await newAxis(ws, m, screwAxis('X')), await newAxis(ws, m, screwAxis('Y'))];
    const ref = { id: m, workshopId: ws.id, targetSetId: '', kind: 'router', workAreaXMm: 900, workAreaYMm: 600 };
    const db = app.get<Database>(DRIZZLE);
    ref.targetSetId = (
      await db.execute<{ target_set_id: string }>(sql`select target_set_id from machines where id = ${m}`)
    ).rows[0].target_set_id;
    const set = (
      await db.execute<{ targets: Record<string, never> }>(
        sql`select targets from target_sets where id = ${ref.targetSetId}`,
      )
    ).rows[0].targets;
    const contributor = app.get(BacklashReadinessService);
    const original = pg.Client.prototype.query;
    const counted = async () => {
      let n = 0;
      pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
        n++;
        return (original as (...a: unknown[]) => unknown).apply(this, args);
      } as typeof pg.Client.prototype.query;
      try {
        const checks = await contributor.checksFor(ref, { targets: set, series: true });
        return { n, checks };
      } finally {
        pg.Client.prototype.query = original;
      }
    };
    const before = await counted();
    for (const a of axes)
      for (let i = 0; i < 5; i++)
        expect((await ws.as.technician.post(`/api/axes/${a}/backlash-checks`).send(check)).status).toBe(201);
    const after = await counted();
    expect(before.checks.map((c) => c.status)).toEqual(['not-started', 'not-started']);
    expect(after.checks.map((c) => c.status)).toEqual(['within-target', 'within-target']);
    expect([before.n, after.n]).toEqual([2, 2]);
  });

  it('deletes a check that no approval stands on, with its history', async () => {
    const made = await ws.as.technician.post(`/api/axes/${xId}/backlash-checks`).send(check);
    expect((await ws.as.viewer.delete(`/api/axes/${xId}/backlash-checks/${made.body.id}`)).status).toBe(403);
    expect((await ws.as.technician.delete(`/api/axes/${xId}/backlash-checks/${made.body.id}`)).status).toBe(204);
    expect((await ws.as.viewer.get(`/api/axes/${xId}/backlash-checks/${made.body.id}`)).status).toBe(404);
  });
});
