import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { lockAsApproved } from './support/stand-in-approval.js';

const plasma = { name: 'Rail test table', kind: 'plasma', workArea: { x: 3000, y: 1500 } };
const railBody = { label: 'Y1 (left)', axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
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
    expect(rail.holes[0]).toEqual({ index: 0, position: 20, at: 20 });
    expect(rail.holes[16]).toEqual({ index: 16, position: 980, at: 980 });
    expect(rail).toMatchObject({
      label: 'Y1 (left)',
      axis: 'Y1',
      lengthMm: 1000,
      profileSize: 20,
      partnerRailId: null,
      typicalBoltSize: 'M5',
    });
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
    expect(
      (
        await other.as.owner
          .post(`/api/rails/${rail.id}/sweeps`)
          .send({ readingUnit: 'mm', phase: 'as-found', stations: stations([0, 0, 0]) })
      ).status,
    ).toBe(404);
    expect((await other.as.owner.get(`/api/rails/${rail.id}/parallelism`)).status).toBe(404);
    expect((await ws.as.viewer.patch(`/api/rails/${rail.id}`).send({ label: 'x' })).status).toBe(403);
    expect((await ws.as.viewer.delete(`/api/rails/${rail.id}`)).status).toBe(403);
    expect(
      (
        await ws.as.viewer
          .post(`/api/rails/${rail.id}/sweeps`)
          .send({ readingUnit: 'mm', phase: 'as-found', stations: stations([0, 0, 0]) })
      ).status,
    ).toBe(403);
  });

  it.each([
    [{ length: 5 }, /length must be between 10 mm and 20000 mm \(5 mm given\)/],
    [{ length: 'long' }, /length must be a number in lengthUnit/],
    [{ holePitch: undefined }, /holePitch is required, in lengthUnit/],
    [{ firstHole: 2000 }, /firstHole must not be larger than length/],
    [{ lengthMm: 1000 }, /property lengthMm should not exist/],
    [{ unit: 'mm' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
    [{ lengthUnit: 'cm' }, /lengthUnit must be one of mm, um, in, thou/],
    // 800 mm rail, 60 mm pitch, first hole at 20 mm: 20 + 13 × 60 = 800, a hole on the far end (by hand).
    [
      { length: 800, holePitch: 60, firstHole: 20 },
      /length: the hole at 800 mm sits on the rail's far end; every hole centre needs at least 4.25 mm \(endDistance\)/,
    ],
    [{ firstHole: 2 }, /firstHole: the hole at 2 mm is 2 mm from the rail's start/],
    [{ firstHole: 0 }, /firstHole: the hole at 0 mm sits on the rail's start/],
    [{ axis: 'left rail!' }, /axis must be a short axis name/],
    [{ label: '' }, /label must not be empty/],
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

  // 1 in = 25.4 mm exactly (international inch of 1959): a rail typed in inches is the same rail
  // as one typed in mm, and keeps its inches for the form.
  it('an imperial rail works end to end: the same holes, spacing and end distance as in mm', async () => {
    const mm = await addRail({
      label: 'Metric',
      length: 1219.2,
      holePitch: 60.96,
      firstHole: 30.48,
      spacing: 609.6,
      endDistance: 6.35,
    });
    const inch = await addRail({
      label: 'Inch',
      lengthUnit: 'in',
      length: 48,
      holePitch: 2.4,
      firstHole: 1.2,
      spacing: 24,
      endDistance: 0.25,
    });
    expect(inch).toMatchObject({
      lengthUnit: 'in',
      length: 48,
      holePitch: 2.4,
      firstHole: 1.2,
      spacing: 24,
      endDistance: 0.25,
      endDistanceIsDefault: false,
    });
    expect(inch.lengthMm).toBeCloseTo(1219.2, 9);
    expect(inch.spacingMm).toBeCloseTo(609.6, 9);
    expect(inch.holes.length).toBe(mm.holes.length);
    inch.holes.forEach((h: { position: number; at: number }, i: number) => {
      expect(h.position).toBeCloseTo(mm.holes[i].position, 9);
      expect(h.at).toBeCloseTo(1.2 + 2.4 * i, 9);
    });
    // The end distance is judged in mm whatever the unit: 48 in, 2.4 in pitch, first hole 0 in sits on the start.
    const refused = await ws.as.builder
      .post(`/api/machines/${machineId}/rails`)
      .send({ ...railBody, lengthUnit: 'in', length: 48, holePitch: 2.4, firstHole: 0 });
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body.message)).toMatch(/firstHole: the hole at 0 in sits on the rail's start/);
  });

  it('a rail edit is kept in the history and changes the holes', async () => {
    const rail = await addRail({ label: 'Edit me' });
    const res = await ws.as.builder.patch(`/api/rails/${rail.id}`).send({ holePitch: 120, firstHole: 30 });
    expect(res.status).toBe(200);
    expect(res.body.holes.map((h: { position: number }) => h.position)).toEqual([
      30, 150, 270, 390, 510, 630, 750, 870, 990,
    ]);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({
      recordType: 'rail',
      action: 'updated',
      changes: { holePitchMm: { from: 60, to: 120 } },
    });
    const refused = await ws.as.builder.patch(`/api/rails/${rail.id}`).send({ length: 20 });
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.body.message)).toMatch(/firstHole must not be larger than length/);
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
    await ws.as.builder
      .post(`/api/rails/${a.id}/sweeps`)
      .send({ readingUnit: 'mm', phase: 'as-found', stations: stations([0, 0.01, 0]) });
    expect((await ws.as.builder.delete(`/api/rails/${a.id}`)).status).toBe(204);
    expect((await ws.as.viewer.get(`/api/rails/${a.id}`)).status).toBe(404);
    expect((await ws.as.viewer.get(`/api/rails/${b.id}`)).body.partnerRailId).toBeNull();
  });

  it('refuses to delete a rail or sweep an approval was based on (409), and keeps them', async () => {
    const rail = await addRail({ label: 'Approved' });
    const sweep = (
      await ws.as.builder
        .post(`/api/rails/${rail.id}/sweeps`)
        .send({ readingUnit: 'mm', phase: 'as-left', stations: stations([0, 0.005, 0]) })
    ).body;
    await lockAsApproved(app, [{ recordType: 'rail-sweep', recordId: sweep.id }]);
    const res = await ws.as.owner.delete(`/api/rails/${rail.id}`);
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.owner.delete(`/api/sweeps/${sweep.id}`)).status).toBe(409);
    const kept = await ws.as.viewer.get(`/api/rails/${rail.id}/sweeps`);
    expect(kept.body).toHaveLength(1);
    expect(kept.body[0].locked).toBe(true);
  });
});
