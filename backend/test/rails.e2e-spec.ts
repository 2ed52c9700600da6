import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { RecordsService } from '../src/records/records.service.js';

const plasma = { name: 'Rail test table', kind: 'plasma', workArea: { x: 3000, y: 1500 } };
const railBody = { label: 'Y1 (left)', axis: 'Y1', lengthMm: 1000, profileSize: 20, holePitchMm: 60, firstHoleMm: 20 };
const stations = (readings: number[], step = 100) => readings.map((reading, i) => ({ position: i * step, reading }));

describe('rails', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Rails');
    other = await createTestWorkshop(app, 'Other');
    machineId = (await ws.as.builder.post('/api/machines').send(plasma)).body.id;
  });
  afterAll(() => app.close());

  const addRail = async (body: Record<string, unknown> = {}) => {
    const res = await ws.as.builder.post(`/api/machines/${machineId}/rails`).send({ ...railBody, ...body });
    expect(res.status).toBe(201);
    return res.body;
  };

  it('a builder adds a rail; its holes follow from length, pitch and first hole', async () => {
    const rail = await addRail();
    // 1000 mm rail, first hole 20 mm, pitch 60 mm: holes at 20, 80, … 980 (17 holes), by hand.
    expect(rail.holes).toHaveLength(17);
    expect(rail.holes[0]).toEqual({ index: 0, position: 20 });
    expect(rail.holes[16]).toEqual({ index: 16, position: 980 });
    expect(rail).toMatchObject({ label: 'Y1 (left)', axis: 'Y1', lengthMm: 1000, profileSize: 20, partnerRailId: null, typicalBoltSize: 'M5' });
    const list = await ws.as.viewer.get(`/api/machines/${machineId}/rails`);
    expect(list.status).toBe(200);
    expect(list.body.map((r: { id: string }) => r.id)).toContain(rail.id);
    expect((await ws.as.viewer.get(`/api/rails/${rail.id}`)).body.holes).toHaveLength(17);
  });

  it('every recorder role may add a rail; viewers 403, anonymous 401, other workshops 404', async () => {
    for (const role of ['admin', 'owner', 'technician', 'builder'] as const) {
      expect((await ws.as[role].post(`/api/machines/${machineId}/rails`).send(railBody)).status).toBe(201);
    }
    expect((await ws.as.viewer.post(`/api/machines/${machineId}/rails`).send(railBody)).status).toBe(403);
    expect((await anonymous(app).post(`/api/machines/${machineId}/rails`).send(railBody)).status).toBe(401);
    expect((await anonymous(app).get(`/api/machines/${machineId}/rails`)).status).toBe(401);
    expect((await other.as.owner.post(`/api/machines/${machineId}/rails`).send(railBody)).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${machineId}/rails`)).status).toBe(404);
    const rail = await addRail();
    expect((await other.as.owner.get(`/api/rails/${rail.id}`)).status).toBe(404);
    expect((await other.as.owner.patch(`/api/rails/${rail.id}`).send({ label: 'x' })).status).toBe(404);
    expect((await other.as.owner.delete(`/api/rails/${rail.id}`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/rails/${rail.id}/sweeps`)).status).toBe(404);
    expect((await other.as.owner.post(`/api/rails/${rail.id}/sweeps`).send({ unit: 'mm', phase: 'as-found', stations: stations([0, 0, 0]) })).status).toBe(404);
    expect((await other.as.owner.get(`/api/rails/${rail.id}/parallelism`)).status).toBe(404);
    expect((await ws.as.viewer.patch(`/api/rails/${rail.id}`).send({ label: 'x' })).status).toBe(403);
    expect((await ws.as.viewer.delete(`/api/rails/${rail.id}`)).status).toBe(403);
    expect((await ws.as.viewer.post(`/api/rails/${rail.id}/sweeps`).send({ unit: 'mm', phase: 'as-found', stations: stations([0, 0, 0]) })).status).toBe(403);
  });

  it.each([
    [{ lengthMm: -1 }, /lengthMm must be at least 10/],
    [{ lengthMm: 'long' }, /lengthMm must be a number/],
    [{ holePitchMm: undefined }, /holePitchMm must be a number/],
    [{ firstHoleMm: 2000 }, /firstHoleMm must not be larger than lengthMm/],
    [{ axis: 'left rail!' }, /axis must be a short axis name/],
    [{ label: '' }, /label is required/],
    [{ profileSize: 20.5 }, /profileSize must be a whole number/],
    [{ partnerRailId: 'nope' }, /partnerRailId must be the id/],
    [{ partnerRailId: randomUUID() }, /partnerRailId must be the id of another rail of this machine/],
    [{ colour: 'blue' }, /colour should not exist/],
  ])('refuses a rail %j with 400 naming the field, and saves nothing', async (body, message) => {
    const before = (await ws.as.viewer.get(`/api/machines/${machineId}/rails`)).body.length;
    const res = await ws.as.builder.post(`/api/machines/${machineId}/rails`).send({ ...railBody, ...body });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
    expect((await ws.as.viewer.get(`/api/machines/${machineId}/rails`)).body.length).toBe(before);
  });

  it('partner pairing is symmetric and moves when re-paired or cleared', async () => {
    const a = await addRail({ label: 'A' });
    const b = await addRail({ label: 'B', partnerRailId: a.id });
    expect(b.partnerRailId).toBe(a.id);
    expect((await ws.as.viewer.get(`/api/rails/${a.id}`)).body.partnerRailId).toBe(b.id);
    const c = await addRail({ label: 'C' });
    const res = await ws.as.technician.patch(`/api/rails/${a.id}`).send({ partnerRailId: c.id });
    expect(res.status).toBe(200);
    expect(res.body.partnerRailId).toBe(c.id);
    expect((await ws.as.viewer.get(`/api/rails/${c.id}`)).body.partnerRailId).toBe(a.id);
    expect((await ws.as.viewer.get(`/api/rails/${b.id}`)).body.partnerRailId).toBeNull();
    expect((await ws.as.builder.patch(`/api/rails/${a.id}`).send({ partnerRailId: a.id })).status).toBe(400);
    await ws.as.builder.patch(`/api/rails/${c.id}`).send({ partnerRailId: null });
    expect((await ws.as.viewer.get(`/api/rails/${a.id}`)).body.partnerRailId).toBeNull();
    // A rail of another machine cannot be a partner.
    const m2 = (await ws.as.builder.post('/api/machines').send({ ...plasma, name: 'Second' })).body.id;
    const far = (await ws.as.builder.post(`/api/machines/${m2}/rails`).send(railBody)).body;
    const bad = await ws.as.builder.patch(`/api/rails/${a.id}`).send({ partnerRailId: far.id, label: 'renamed' });
    expect(bad.status).toBe(400);
    expect((await ws.as.viewer.get(`/api/rails/${a.id}`)).body.label).toBe('A');
  });

  it('a rail edit is kept in the history and changes the holes', async () => {
    const rail = await addRail({ label: 'Edit me' });
    const res = await ws.as.builder.patch(`/api/rails/${rail.id}`).send({ holePitchMm: 120, firstHoleMm: 40 });
    expect(res.status).toBe(200);
    expect(res.body.holes.map((h: { position: number }) => h.position)).toEqual([40, 160, 280, 400, 520, 640, 760, 880, 1000]);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({ recordType: 'rail', action: 'updated', changes: { holePitchMm: { from: 60, to: 120 } } });
    const refused = await ws.as.builder.patch(`/api/rails/${rail.id}`).send({ lengthMm: 30 });
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body.message)).toMatch(/firstHoleMm must not be larger than lengthMm/);
  });

  it('the usual bolt torque per bolt size comes from one table', async () => {
    const res = await ws.as.viewer.get('/api/rails/bolt-torques');
    expect(res.status).toBe(200);
    // A rail maker's table for rail bolts into steel (stated fact of the trade): M4 4.1, M5 8.8, M6 13.7, M8 30 N·m.
    expect(res.body.bolts).toEqual([
      { boltSize: 'M4', torqueNm: 4.1 },
      { boltSize: 'M5', torqueNm: 8.8 },
      { boltSize: 'M6', torqueNm: 13.7 },
      { boltSize: 'M8', torqueNm: 30 },
    ]);
    expect(res.body.typicalSource).toMatch(/from memory/);
    expect((await anonymous(app).get('/api/rails/bolt-torques')).status).toBe(401);
  });

  it('deleting a rail removes it with its sweeps and unpairs its partner', async () => {
    const a = await addRail({ label: 'Gone' });
    const b = await addRail({ label: 'Stays', partnerRailId: a.id });
    await ws.as.builder.post(`/api/rails/${a.id}/sweeps`).send({ unit: 'mm', phase: 'as-found', stations: stations([0, 0.01, 0]) });
    expect((await ws.as.builder.delete(`/api/rails/${a.id}`)).status).toBe(204);
    expect((await ws.as.viewer.get(`/api/rails/${a.id}`)).status).toBe(404);
    expect((await ws.as.viewer.get(`/api/rails/${b.id}`)).body.partnerRailId).toBeNull();
  });

  it('refuses to delete a rail or sweep an approval was based on (409), and keeps them', async () => {
    const rail = await addRail({ label: 'Approved' });
    const sweep = (await ws.as.builder.post(`/api/rails/${rail.id}/sweeps`).send({ unit: 'mm', phase: 'as-left', stations: stations([0, 0.005, 0]) })).body;
    await app.get(RecordsService).lock(randomUUID(), [{ recordType: 'rail-sweep', recordId: sweep.id }]);
    const res = await ws.as.owner.delete(`/api/rails/${rail.id}`);
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.owner.delete(`/api/sweeps/${sweep.id}`)).status).toBe(409);
    const kept = await ws.as.viewer.get(`/api/rails/${rail.id}/sweeps`);
    expect(kept.body).toHaveLength(1);
    expect(kept.body[0].locked).toBe(true);
  });
});
