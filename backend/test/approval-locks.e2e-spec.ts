import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { ROLES, type Role } from '../src/database/schema/users.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, screwAxis } from './helpers/drives.js';
import { board, requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { CSV, upload } from './evidence-fixtures.js';

const RECORDERS: Role[] = ['admin', 'owner', 'technician', 'builder'];
const CALIBRATORS: Role[] = ['admin', 'owner', 'technician'];
const stations = [0, 200, 400, 600, 800].map((position, i) => ({ position, reading: [0, 2, 1, 3, 2][i] }));
const sweep = { readingUnit: 'um', phase: 'as-left', stations };
const trial = {
  lengthUnit: 'mm',
  stepsPerMmUsed: 640,
  moves: [
    { commanded: 100, measured: 99.8 },
    { commanded: 200, measured: 199.6 },
  ],
};
const targets = [0, 100, 200, 300, 400];
const run = (direction: 'up' | 'down', k: number) => ({ direction, deviations: targets.map((_, i) => (i + k) % 3) });
const positioning = {
  readingUnit: 'um',
  targets,
  runs: [1, 2, 3, 4, 5].flatMap((k) => [run('up', k), run('down', k)]),
};
const diagonal = { sideX: 600, sideY: 400, diagonal1: Math.hypot(600, 400), diagonal2: Math.hypot(600, 400) };
const bedGrid = {
  lengthUnit: 'mm',
  readingUnit: 'mm',
  points: [0, 300, 600].flatMap((x) => [0, 200, 400].map((y) => ({ x, y, z: 0 }))),
};
const testCut = {
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

interface Route {
  what: string;
  method: 'post' | 'put' | 'patch' | 'delete';
  path: string;
  body?: object;
  roles: Role[];
}

/**
 * What an approval stands on is read-only while it stands: every route that writes a record of
 * the machine answers 409 with the same plain message, for every role allowed to call it, and
 * nothing changes (no row of the change log either).
 */
describe('an approved machine is read-only while its approval stands', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;
  const ids: Record<string, string> = {};
  let routes: Route[];

  const changes = async () => {
    const { rows } = await app
      .get<Database>(DRIZZLE)
      .execute<{ n: number }>(sql`select count(*)::int as n from change_log where machine_id = ${machineId}`);
    return rows[0].n;
  };
  const ok = (res: { status: number; body: unknown }, status = 201) => {
    expect([res.status, res.body]).toEqual([status, expect.anything()]);
    return res.body as { id: string };
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Locks');
    machineId = ok(
      await ws.as.owner
        .post('/api/machines')
        .send({ name: 'Locked router', kind: 'router', workArea: { x: 900, y: 600 } }),
    ).id;
    ids.rail = ok(
      await ws.as.builder
        .post(`/api/machines/${machineId}/rails`)
        .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 }),
    ).id;
    ids.sweep = ok(await ws.as.builder.post(`/api/rails/${ids.rail}/sweeps`).send(sweep)).id;
    ids.boltDown = ok(
      await ws.as.builder.post(`/api/rails/${ids.rail}/bolt-downs`).send({ mode: 'line', readingUnit: 'um' }),
    ).id;
    ok(
      await ws.as.builder
        .put(`/api/bolt-downs/${ids.boltDown}/holes/0`)
        .send({ reading: 0, fixed: true, writeId: randomUUID() }),
      200,
    );
    ids.axis = await newAxis(ws, machineId, screwAxis('X'));
    ids.trial = ok(await ws.as.technician.post(`/api/axes/${ids.axis}/travel-trials`).send(trial)).id;
    ids.run = ok(await ws.as.technician.post(`/api/axes/${ids.axis}/positioning-runs`).send(positioning)).id;
    ids.diagonal = ok(await ws.as.technician.post(`/api/machines/${machineId}/diagonal-checks`).send(diagonal)).id;
    ids.bedGrid = ok(await ws.as.technician.post(`/api/machines/${machineId}/bed-grids`).send(bedGrid)).id;
    ids.testCut = ok(await ws.as.technician.post(`/api/machines/${machineId}/test-cuts`).send(testCut)).id;
    await waiveAllBut(ws, machineId, () => false);
    const walk = await ws.as.technician.get(`/api/machines/${machineId}/safety-walk`);
    ids.item = walk.body.sections[0].items[0].id;
    const b = await board(ws, machineId);
    ids.checkKey = b.checks.find((c) => c.status === 'within-target')?.key ?? b.checks[0].key;
    await requestAndApprove(ws, machineId, TEST_PASSWORD);
    expect((await board(ws, machineId)).state).toBe('ready-to-cut');

    routes = [
      {
        what: 'machine specification',
        method: 'patch',
        path: `/api/machines/${machineId}`,
        body: { workArea: { x: 1000, y: 600 } },
        roles: RECORDERS,
      },
      {
        what: 'machine notes',
        method: 'patch',
        path: `/api/machines/${machineId}`,
        body: { notes: 'changed after approval' },
        roles: RECORDERS,
      },
      {
        what: 'new rail',
        method: 'post',
        path: `/api/machines/${machineId}/rails`,
        body: { label: 'Y2', axis: 'Y2', length: 800, holePitch: 60, firstHole: 40 },
        roles: RECORDERS,
      },
      {
        what: 'rail hole pitch',
        method: 'patch',
        path: `/api/rails/${ids.rail}`,
        body: { holePitch: 90 },
        roles: RECORDERS,
      },
      { what: 'rail delete', method: 'delete', path: `/api/rails/${ids.rail}`, roles: RECORDERS },
      { what: 'new sweep', method: 'post', path: `/api/rails/${ids.rail}/sweeps`, body: sweep, roles: RECORDERS },
      { what: 'sweep delete', method: 'delete', path: `/api/sweeps/${ids.sweep}`, roles: RECORDERS },
      {
        what: 'new bolt-down',
        method: 'post',
        path: `/api/rails/${ids.rail}/bolt-downs`,
        body: { mode: 'line', readingUnit: 'um' },
        roles: RECORDERS,
      },
      {
        what: 'bolt-down hole',
        method: 'put',
        path: `/api/bolt-downs/${ids.boltDown}/holes/1`,
        body: { reading: 1, fixed: true, writeId: randomUUID() },
        roles: RECORDERS,
      },
      {
        what: 'bolt-down final sweep',
        method: 'post',
        path: `/api/bolt-downs/${ids.boltDown}/final-sweep`,
        body: sweep,
        roles: RECORDERS,
      },
      {
        what: 'new axis',
        method: 'post',
        path: `/api/machines/${machineId}/axes`,
        body: screwAxis('Z'),
        roles: CALIBRATORS,
      },
      {
        what: 'axis steps per mm',
        method: 'patch',
        path: `/api/axes/${ids.axis}`,
        body: { stepsPerMm: 641 },
        roles: CALIBRATORS,
      },
      { what: 'axis delete', method: 'delete', path: `/api/axes/${ids.axis}`, roles: CALIBRATORS },
      {
        what: 'new travel trial',
        method: 'post',
        path: `/api/axes/${ids.axis}/travel-trials`,
        body: trial,
        roles: CALIBRATORS,
      },
      {
        what: 'apply a correction',
        method: 'post',
        path: `/api/axes/${ids.axis}/travel-trials/${ids.trial}/apply`,
        body: {},
        roles: CALIBRATORS,
      },
      {
        what: 'travel trial delete',
        method: 'delete',
        path: `/api/axes/${ids.axis}/travel-trials/${ids.trial}`,
        roles: CALIBRATORS,
      },
      {
        what: 'new positioning run',
        method: 'post',
        path: `/api/axes/${ids.axis}/positioning-runs`,
        body: positioning,
        roles: CALIBRATORS,
      },
      {
        what: 'positioning run delete',
        method: 'delete',
        path: `/api/axes/${ids.axis}/positioning-runs/${ids.run}`,
        roles: CALIBRATORS,
      },
      {
        what: 'new diagonal check',
        method: 'post',
        path: `/api/machines/${machineId}/diagonal-checks`,
        body: diagonal,
        roles: RECORDERS,
      },
      {
        what: 'diagonal check delete',
        method: 'delete',
        path: `/api/machines/${machineId}/diagonal-checks/${ids.diagonal}`,
        roles: RECORDERS,
      },
      {
        what: 'new bed grid',
        method: 'post',
        path: `/api/machines/${machineId}/bed-grids`,
        body: bedGrid,
        roles: RECORDERS,
      },
      {
        what: 'bed grid delete',
        method: 'delete',
        path: `/api/machines/${machineId}/bed-grids/${ids.bedGrid}`,
        roles: RECORDERS,
      },
      {
        what: 'new test cut',
        method: 'post',
        path: `/api/machines/${machineId}/test-cuts`,
        body: testCut,
        roles: CALIBRATORS,
      },
      {
        what: 'test cut delete',
        method: 'delete',
        path: `/api/machines/${machineId}/test-cuts/${ids.testCut}`,
        roles: CALIBRATORS,
      },
      {
        what: 'safety answer',
        method: 'put',
        path: `/api/machines/${machineId}/safety-walk/items/${ids.item}`,
        body: { answer: 'no', note: 'changed after approval' },
        roles: CALIBRATORS,
      },
      {
        what: 'new safety round',
        method: 'post',
        path: `/api/machines/${machineId}/safety-walk/rounds`,
        roles: CALIBRATORS,
      },
      {
        what: 'waiver',
        method: 'post',
        path: `/api/machines/${machineId}/checks/${encodeURIComponent(ids.checkKey)}/waiver`,
        body: { reason: 'Waived after the approval was signed' },
        roles: ['owner'],
      },
      {
        what: 'approval request',
        method: 'post',
        path: `/api/machines/${machineId}/approval-requests`,
        body: {},
        roles: ['admin', 'owner', 'technician'],
      },
    ];
  }, 120_000);
  afterAll(() => app.close());

  it('refuses every write route with 409 and a plain message, for every role allowed to call it; the rest get 403', async () => {
    const before = await changes();
    const answers: string[] = [];
    for (const route of routes) {
      for (const role of ROLES) {
        const req = ws.as[role][route.method](route.path);
        const res = route.body ? await req.send(route.body) : await req.send();
        const allowed = route.roles.includes(role);
        answers.push(`${route.what} as ${role}: ${res.status}`);
        if (!allowed) {
          expect([route.what, role, res.status]).toEqual([route.what, role, 403]);
          continue;
        }
        expect([route.what, role, res.status]).toEqual([route.what, role, 409]);
        const message = Array.isArray(res.body.message) ? res.body.message.join(' ') : res.body.message;
        expect(message).toMatch(
          /approved as ready to cut|approved and due|part of an approved commissioning record|The owner reopens it|owner can reopen/,
        );
      }
    }
    expect(answers.length).toBe(routes.length * ROLES.length);
    expect(await changes()).toBe(before);
    expect((await board(ws, machineId)).state).toBe('ready-to-cut');
  });

  it('a safety-walk answer, a rail and the travel trial are as they were signed', async () => {
    const rail = await ws.as.viewer.get(`/api/rails/${ids.rail}`);
    expect(rail.body).toMatchObject({ holePitchMm: 60 });
    const axis = await ws.as.viewer.get(`/api/axes/${ids.axis}`);
    expect(axis.body.stepsPerMm).toBe(640);
  });

  it('editing the target set it was judged against names the approved machine and leaves the signed approval as it was', async () => {
    const machine = await ws.as.viewer.get(`/api/machines/${machineId}`);
    const setId = machine.body.targetSet.id;
    const approval = (await board(ws, machineId)).approval!;
    const before = await ws.as.viewer.get(`/api/machines/${machineId}/approvals/${approval.id}/verification`);
    expect(before.body.valid).toBe(true);
    const sets = await ws.as.owner.get('/api/target-sets');
    const set = sets.body.find((s: { id: string }) => s.id === setId);
    expect(set.usedBy).toEqual([
      expect.objectContaining({ id: machineId, name: 'Locked router', state: 'ready-to-cut', approved: true }),
    ]);
    const key = Object.keys(set.targets)[0];
    const edited = await ws.as.owner
      .patch(`/api/target-sets/${setId}`)
      .send({ targets: { [key]: { ...set.targets[key], label: undefined, value: set.targets[key].value / 2 } } });
    expect(edited.status).toBe(200);
    expect(edited.body.usedBy).toEqual([expect.objectContaining({ id: machineId, approved: true })]);
    const after = await ws.as.viewer.get(`/api/machines/${machineId}/approvals/${approval.id}/verification`);
    expect([after.body.valid, after.body.unchanged]).toEqual([true, true]);
    expect((await board(ws, machineId)).state).toBe('ready-to-cut');
  });

  it('evidence may still be attached while approved, marked as added after approval; before approval it is not', async () => {
    const res = await upload(
      ws.as.builder,
      { subjectType: 'machine', subjectId: machineId },
      { body: CSV, name: 'after.csv', type: 'text/csv' },
    );
    expect([res.status, res.body.addedAfterApproval]).toEqual([201, true]);
    const list = await ws.as.viewer.get(`/api/evidence?machineId=${machineId}`);
    expect(JSON.stringify(list.body)).toContain('"addedAfterApproval":true');
  });

  it('after the owner reopens the machine with a reason, the same routes write again', async () => {
    expect(
      (await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'Rail Y1 re-bedded after a crash' }))
        .status,
    ).toBe(201);
    const res = await ws.as.builder.patch(`/api/rails/${ids.rail}`).send({ holePitch: 90 });
    expect(res.status).toBe(200);
    expect((await ws.as.builder.post(`/api/rails/${ids.rail}/sweeps`).send(sweep)).status).toBe(201);
    expect((await board(ws, machineId)).state).toBe('reopened');
    const attached = await upload(
      ws.as.builder,
      { subjectType: 'machine', subjectId: machineId },
      { body: CSV, name: 'reopened.csv', type: 'text/csv' },
    );
    expect([attached.status, attached.body.addedAfterApproval]).toEqual([201, false]);
  });
});
