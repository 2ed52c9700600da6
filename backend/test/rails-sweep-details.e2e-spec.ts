import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { board, requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { lockAsApproved } from './support/stand-in-approval.js';

const RAIL = { label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 };
const stations = [0, 200, 400, 600, 800].map((position, i) => ({ position, reading: [0, 2, 1, 3, 2][i] }));
const SWEEP = {
  readingUnit: 'um',
  phase: 'as-left',
  face: 'top',
  stations,
  instrument: 'Dial 0.01',
  boltSize: 'M5',
  torqueNm: 8,
  notes: 'first pass',
};

describe("correcting a sweep's details", () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;
  let railId: string;

  const record = async (body: Record<string, unknown> = {}) => {
    const res = await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send({ ...SWEEP, ...body });
    expect(res.status).toBe(201);
    return res.body as Record<string, unknown> & { id: string };
  };
  const history = async () => {
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    return res.body.entries as {
      recordType: string;
      recordId: string;
      action: string;
      summary: string;
      changes: Record<string, unknown> | null;
    }[];
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Sweep details');
    other = await createTestWorkshop(app, 'Sweep details other');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Plasma S', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
    railId = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(RAIL)).body.id;
  });
  afterAll(() => app.close());

  it('changes only the fields sent, keeps the readings and result, and audits the old and new values', async () => {
    const sweep = await record();
    const res = await ws.as.builder
      .patch(`/api/sweeps/${sweep.id}`)
      .send({ datum: '  Granite bar across both rails ', notes: 'second pass after re-torque', torqueNm: null });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: sweep.id,
      datum: 'Granite bar across both rails',
      notes: 'second pass after re-torque',
      torqueNm: null,
      instrument: 'Dial 0.01',
      boltSize: 'M5',
    });
    expect(res.body.stations).toEqual(sweep.stations);
    expect(res.body.result).toEqual(sweep.result);
    expect(res.body.status).toBe(sweep.status);

    const read = await ws.as.viewer.get(`/api/sweeps/${sweep.id}`);
    expect(read.body).toMatchObject({ datum: 'Granite bar across both rails', torqueNm: null });
    const list = (await ws.as.viewer.get(`/api/rails/${railId}/sweeps`)).body as { id: string; datum: string | null }[];
    expect(list.find((s) => s.id === sweep.id)?.datum).toBe('Granite bar across both rails');

    const entry = (await history()).find(
      (e) => e.recordType === 'rail-sweep' && e.recordId === sweep.id && e.action === 'updated',
    );
    expect(entry?.changes).toEqual({
      before: { datum: null, notes: 'first pass', torqueNm: 8 },
      after: { datum: 'Granite bar across both rails', notes: 'second pass after re-torque', torqueNm: null },
    });
    expect(entry?.summary).toContain('details corrected');
    expect(entry?.summary).toContain('datum');
  });

  it('sending the same values changes nothing and writes no audit row', async () => {
    const sweep = await record();
    const before = (await history()).length;
    const res = await ws.as.builder.patch(`/api/sweeps/${sweep.id}`).send({ instrument: 'Dial 0.01', boltSize: 'M5' });
    expect(res.status).toBe(200);
    expect((await history()).length).toBe(before);
  });

  it('refuses bad input with a 400 naming the field, and changes nothing', async () => {
    const sweep = await record();
    const cases: [Record<string, unknown>, RegExp][] = [
      [{ datum: 42 }, /datum/],
      [{ datum: 'x'.repeat(121) }, /datum/],
      [{ torqueNm: -1 }, /torqueNm/],
      [{ torqueNm: 'tight' }, /torqueNm/],
      [{ boltSize: '5mm' }, /boltSize/],
      [{ temperatureC: 400 }, /temperatureC/],
      [{ takenBy: '   ' }, /takenBy/],
      [{ notes: null }, /notes/],
      [{ instrument: null }, /instrument/],
      [{ stations: [] }, /stations/],
      [{ phase: 'as-found' }, /phase/],
    ];
    for (const [body, field] of cases) {
      const res = await ws.as.builder.patch(`/api/sweeps/${sweep.id}`).send(body);
      expect([JSON.stringify(body).slice(0, 40), res.status]).toEqual([JSON.stringify(body).slice(0, 40), 400]);
      expect(JSON.stringify(res.body.message)).toMatch(field);
    }
    const read = await ws.as.viewer.get(`/api/sweeps/${sweep.id}`);
    expect(read.body).toMatchObject({
      instrument: 'Dial 0.01',
      boltSize: 'M5',
      torqueNm: 8,
      notes: 'first pass',
      phase: 'as-left',
    });
  });

  it('a viewer is refused (403); another workshop gets 404', async () => {
    const sweep = await record();
    expect((await ws.as.viewer.patch(`/api/sweeps/${sweep.id}`).send({ datum: 'Bar' })).status).toBe(403);
    expect((await other.as.builder.patch(`/api/sweeps/${sweep.id}`).send({ datum: 'Bar' })).status).toBe(404);
    expect((await ws.as.viewer.get(`/api/sweeps/${sweep.id}`)).body.datum).toBeNull();
  });

  it('is refused (409) once an approval was based on the sweep', async () => {
    const sweep = await record();
    await lockAsApproved(app, [{ recordType: 'rail-sweep', recordId: sweep.id }]);
    const res = await ws.as.builder.patch(`/api/sweeps/${sweep.id}`).send({ datum: 'Bar' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.viewer.get(`/api/sweeps/${sweep.id}`)).body.datum).toBeNull();
  });

  it('is refused (409) while the machine is approved as ready to cut', async () => {
    const approved = (
      await ws.as.owner
        .post('/api/machines')
        .send({ name: 'Approved router S', kind: 'router', workArea: { x: 900, y: 600 } })
    ).body.id as string;
    const rail = (await ws.as.builder.post(`/api/machines/${approved}/rails`).send(RAIL)).body.id as string;
    const sweep = (await ws.as.builder.post(`/api/rails/${rail}/sweeps`).send(SWEEP)).body as { id: string };
    await waiveAllBut(ws, approved, () => false);
    await requestAndApprove(ws, approved, TEST_PASSWORD);
    expect((await board(ws, approved)).state).toBe('ready-to-cut');
    const res = await ws.as.builder.patch(`/api/sweeps/${sweep.id}`).send({ datum: 'Bar', notes: 'after approval' });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved as ready to cut/);
    expect((await ws.as.viewer.get(`/api/sweeps/${sweep.id}`)).body).toMatchObject({
      datum: null,
      notes: 'first pass',
    });
  }, 60_000);

  it('a correction sent twice with one Idempotency-Key is recorded once', async () => {
    const sweep = await record();
    const key = randomUUID();
    const send = () =>
      ws.as.builder
        .patch(`/api/sweeps/${sweep.id}`)
        .set('Idempotency-Key', key)
        .send({ notes: 'typed at the machine' });
    const [a, b] = [await send(), await send()];
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(b.body.notes).toBe('typed at the machine');
    expect((await history()).filter((e) => e.recordId === sweep.id && e.action === 'updated')).toHaveLength(1);
  });
});
