import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, screwAxis } from './helpers/drives.js';
import { PG_POOL } from '../src/database/database.tokens.js';

const rail = { axis: 'Y', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
const positions = [0, 100, 200, 300, 400, 500, 600, 700, 800, 900];
const sweep = (readings: number[], datum = 'Frame face') => ({
  readingUnit: 'mm',
  phase: 'as-left',
  datum,
  stations: readings.map((reading, i) => ({ position: positions[i], reading })),
});
// Within any rail target of the default sets (a few µm of bow) and well outside them (0.5 mm bow).
const straight = [0, 0.001, 0.002, 0.002, 0.001, 0, 0.001, 0.002, 0.001, 0];
const bowed = [0, 0.2, 0.35, 0.45, 0.5, 0.5, 0.45, 0.35, 0.2, 0];

interface ListItem {
  id: string;
  checks: {
    total: number;
    within: number;
    outside: number;
    waived: number;
    notStarted: number;
    blocking: { key: string; status: string } | null;
  };
}

/**
 * The machines list is served from a per-machine summary kept in each command's transaction;
 * whatever mix of writes happens, it must count what the readiness board counts.
 */
describe('reads: the machines list agrees with the readiness board', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let pool: pg.Pool;
  const machines: string[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Summary');
    for (const [name, kind] of [
      ['Summary plasma', 'plasma'],
      ['Summary router', 'router'],
      ['Summary spare', 'plasma'],
    ] as const) {
      machines.push(
        (await ws.as.builder.post('/api/machines').send({ name, kind, workArea: { x: 900, y: 600 } })).body.id,
      );
    }
  });
  afterAll(() => app.close());

  async function expectAgreement(step: string) {
    const list = (await ws.as.viewer.get('/api/machines')).body as ListItem[];
    for (const id of machines) {
      const board = (await ws.as.viewer.get(`/api/machines/${id}/readiness`)).body;
      const item = list.find((m) => m.id === id)!;
      const { blocking, ...counts } = item.checks;
      expect({ step, id, counts }).toEqual({ step, id, counts: board.counts });
      expect({ step, id, blocking: blocking?.key ?? null }).toEqual({
        step,
        id,
        blocking: board.blocking[0]?.key ?? null,
      });
    }
  }

  it('agrees after sweeps, partners, axes, frame checks, waivers, deletes, target edits and new safety items', async () => {
    const [plasma, router] = machines;
    await expectAgreement('machines opened');

    const a = (await ws.as.builder.post(`/api/machines/${plasma}/rails`).send({ ...rail, label: 'Y1 (left)' })).body.id;
    const b = (
      await ws.as.builder.post(`/api/machines/${plasma}/rails`).send({ ...rail, label: 'Y2 (right)', partnerRailId: a })
    ).body.id;
    await expectAgreement('rails added');

    await ws.as.builder.post(`/api/rails/${a}/sweeps`).send(sweep(straight));
    const outsideSweep = (await ws.as.builder.post(`/api/rails/${b}/sweeps`).send(sweep(bowed))).body.id;
    await expectAgreement('sweeps recorded');
    const plasmaList = ((await ws.as.viewer.get('/api/machines')).body as ListItem[]).find((m) => m.id === plasma)!;
    expect(plasmaList.checks.outside).toBeGreaterThan(0);

    const axis = await newAxis(ws, router, screwAxis('X'));
    await ws.as.technician.post(`/api/axes/${axis}/travel-trials`).send({
      lengthUnit: 'mm',
      stepsPerMmUsed: 640,
      moves: [
        { commanded: 100, measured: 100.5 },
        { commanded: 200, measured: 201 },
      ],
    });
    await ws.as.technician
      .post(`/api/machines/${router}/diagonal-checks`)
      .send({ sideX: 1000, sideY: 600, diagonal1: Math.hypot(1000, 600), diagonal2: Math.hypot(1000, 600) });
    await expectAgreement('axis, trial and diagonal check recorded');

    // The owner waives the outside straightness of Y2: the board says waived, so must the list.
    const waiver = await ws.as.owner
      .post(`/api/machines/${plasma}/checks/${encodeURIComponent(`straightness:${b}`)}/waiver`)
      .send({ reason: 'Rail to be replaced next week, waived for the trial cut' });
    expect(waiver.status).toBe(201);
    await expectAgreement('straightness waived');

    // A newer sweep ends the waiver (it belonged to the old record); deleting it brings the waiver back.
    const newer = (await ws.as.builder.post(`/api/rails/${b}/sweeps`).send(sweep(bowed))).body.id;
    await expectAgreement('newer outside sweep');
    expect((await ws.as.builder.delete(`/api/sweeps/${newer}`)).status).toBe(204);
    await expectAgreement('newer sweep deleted');
    expect((await ws.as.builder.delete(`/api/sweeps/${outsideSweep}`)).status).toBe(204);
    await expectAgreement('waived sweep deleted');

    // Loosening the machine's target set moves statuses of every machine judged against it.
    const plasmaSet = (await ws.as.viewer.get(`/api/machines/${plasma}`)).body.targetSet.id;
    const edit = await ws.as.owner
      .patch(`/api/target-sets/${plasmaSet}`)
      .send({ targets: { railStraightness: { value: 1, unit: 'mm' } } });
    expect(edit.status).toBe(200);
    await expectAgreement('target set edited');

    // A workshop safety item joins every machine's walk.
    expect(
      (
        await ws.as.owner
          .post('/api/safety-items')
          .send({ section: 'electrical', text: 'Plasma torch lead inspected for cuts' })
      ).status,
    ).toBe(201);
    await expectAgreement('safety item added');

    // A rail removed with its sweeps.
    expect((await ws.as.builder.delete(`/api/rails/${a}`)).status).toBe(204);
    await expectAgreement('rail removed');
  });

  it('is rolled back with the command that failed: a refused write leaves the summary as it was', async () => {
    const [, , spare] = machines;
    const before = (
      await pool.query(
        'select total, within, outside, waived, not_started from machine_readiness where machine_id = $1',
        [spare],
      )
    ).rows[0];
    expect(before).toBeDefined();
    const r = await ws.as.builder
      .post(`/api/machines/${spare}/rails`)
      .send({ ...rail, label: 'Y1', length: 10, firstHole: 20 });
    expect(r.status).toBe(400);
    const after = (
      await pool.query(
        'select total, within, outside, waived, not_started from machine_readiness where machine_id = $1',
        [spare],
      )
    ).rows[0];
    expect(after).toEqual(before);
    await expectAgreement('refused write');
  });
});
