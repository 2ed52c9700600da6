import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

const plasma = { name: 'Test plasma', kind: 'plasma', workArea: { x: 3000, y: 1500 } };

describe('machine files and target sets', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Machines');
    other = await createTestWorkshop(app, 'Other');
  });
  afterAll(() => app.close());

  it('a builder opens a machine file; it starts being built with the plasma default targets', async () => {
    const res = await ws.as.builder.post('/api/machines').send({ ...plasma, notes: 'frame welded' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Test plasma',
      kind: 'plasma',
      state: 'being-built',
      workArea: { x: 3000, y: 1500 },
      notes: 'frame welded',
    });
    expect(res.body.targetSet.name).toMatch(/Plasma/);
    const list = await ws.as.viewer.get('/api/machines');
    expect(list.status).toBe(200);
    expect(list.body.map((m: { id: string }) => m.id)).toContain(res.body.id);
    expect(list.body[0].checks).toEqual(
      expect.objectContaining({ total: expect.any(Number), within: expect.any(Number) }),
    );
  });

  it('a router gets the router default set', async () => {
    const res = await ws.as.technician
      .post('/api/machines')
      .send({ name: 'R', kind: 'router', workArea: { x: 900, y: 600 } });
    expect(res.status).toBe(201);
    expect(res.body.targetSet.name).toMatch(/Router/);
  });

  it('viewers read but cannot open or change a machine file; anonymous is 401', async () => {
    expect((await ws.as.viewer.post('/api/machines').send(plasma)).status).toBe(403);
    expect((await anonymous(app).get('/api/machines')).status).toBe(401);
    const made = await ws.as.owner.post('/api/machines').send(plasma);
    expect((await ws.as.viewer.patch(`/api/machines/${made.body.id}`).send({ name: 'x' })).status).toBe(403);
    expect((await ws.as.viewer.get(`/api/machines/${made.body.id}`)).status).toBe(200);
  });

  it("another workshop's machine is 404 for reading, changing and history", async () => {
    const made = await ws.as.owner.post('/api/machines').send(plasma);
    expect((await other.as.owner.get(`/api/machines/${made.body.id}`)).status).toBe(404);
    expect((await other.as.owner.patch(`/api/machines/${made.body.id}`).send({ name: 'mine now' })).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${made.body.id}/history?limit=200`)).status).toBe(404);
    expect((await other.as.owner.get('/api/machines')).body.map((m: { id: string }) => m.id)).not.toContain(
      made.body.id,
    );
  });

  it('changes are kept in the history with who and what', async () => {
    const made = await ws.as.builder.post('/api/machines').send(plasma);
    const res = await ws.as.technician.patch(`/api/machines/${made.body.id}`).send({ workArea: { x: 3050, y: 1520 } });
    expect(res.status).toBe(200);
    expect(res.body.workArea).toEqual({ x: 3050, y: 1520 });
    const history = await ws.as.viewer.get(`/api/machines/${made.body.id}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({
      action: 'updated',
      actor: expect.stringContaining('technician'),
      changes: { workArea: { from: { x: 3000, y: 1500 }, to: { x: 3050, y: 1520 } } },
    });
    expect(history.body.entries[1]).toMatchObject({ action: 'created' });
  });

  it('takes the work area in inches and keeps it in mm: 60 × 120 in is 1524 × 3048 mm (1 in = 25.4 mm exactly)', async () => {
    const inch = await ws.as.owner
      .post('/api/machines')
      .send({ ...plasma, name: 'Inch table', lengthUnit: 'in', workArea: { x: 60, y: 120 } });
    expect(inch.status).toBe(201);
    expect(inch.body).toMatchObject({
      lengthUnit: 'in',
      workArea: { x: 1524, y: 3048 },
      workAreaInLengthUnit: { x: 60, y: 120 },
    });
    const mm = await ws.as.owner
      .post('/api/machines')
      .send({ ...plasma, name: 'Metric table', workArea: { x: 1524, y: 3048 } });
    expect(mm.body).toMatchObject({
      lengthUnit: 'mm',
      workArea: inch.body.workArea,
      workAreaInLengthUnit: { x: 1524, y: 3048 },
    });
    // A new work area without a unit is in the machine's own unit; a unit alone only changes how it is shown.
    const wider = await ws.as.owner.patch(`/api/machines/${inch.body.id}`).send({ workArea: { x: 61, y: 120 } });
    expect(wider.body.workArea.x).toBeCloseTo(1549.4, 9);
    const shown = await ws.as.owner.patch(`/api/machines/${inch.body.id}`).send({ lengthUnit: 'mm' });
    expect(shown.body).toMatchObject({ lengthUnit: 'mm', workAreaInLengthUnit: { x: 1549.4, y: 3048 } });
  });

  it.each([
    [{ ...plasma, kind: 'laser' }, /kind must be one of/],
    [{ ...plasma, workArea: { x: -5, y: 10 } }, /workArea.x must be greater than zero/],
    [{ ...plasma, workArea: { x: 0.5, y: 10 } }, /workArea.x must be between 1 mm and 100 m/],
    [
      { ...plasma, lengthUnit: 'in', workArea: { x: 5000, y: 30 } },
      /workArea.x must be between 1 mm and 100 m \(0.0394 to 3937.01 in\)/,
    ],
    [{ ...plasma, lengthUnit: 'furlong' }, /lengthUnit must be one of mm, um, in, thou/],
    [{ ...plasma, workArea: { x: 'wide', y: 10 } }, /workArea.x must be a number/],
    [{ kind: 'plasma', workArea: { x: 1, y: 1 } }, /name/],
    [{ ...plasma, workArea: undefined }, /workArea/],
    [{ ...plasma, colour: 'red' }, /colour should not exist/],
    [{ ...plasma, targetSetId: 'abc' }, /targetSetId must be the id/],
  ])('refuses %j with 400 naming the field', async (body, message) => {
    const res = await ws.as.builder.post('/api/machines').send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it("refuses another workshop's target set as 404", async () => {
    const theirs = await other.as.owner.get('/api/target-sets');
    const res = await ws.as.builder.post('/api/machines').send({ ...plasma, targetSetId: theirs.body[0].id });
    expect(res.status).toBe(404);
  });

  describe('target sets', () => {
    it('every workshop starts with a plasma and a router set, each target with unit and source', async () => {
      const res = await ws.as.viewer.get('/api/target-sets');
      expect(res.status).toBe(200);
      expect(res.body.map((s: { name: string }) => s.name)).toEqual(['Plasma table (default)', 'Router (default)']);
      const rail = res.body[0].targets.railStraightness;
      // common practice: one to two thou over a rail's length for a carefully built plasma table
      expect(rail).toMatchObject({ value: 2, unit: 'thou' });
      expect(rail.source).toMatch(/common practice/);
      expect(res.body[1].targets.railStraightness.value * 0.001).toBeLessThan(2 * 0.0254); // router finer
    });

    it('owners and admins edit; technicians, builders and viewers get 403', async () => {
      const [set] = (await ws.as.owner.get('/api/target-sets')).body;
      for (const role of ['technician', 'builder', 'viewer'] as const) {
        expect((await ws.as[role].patch(`/api/target-sets/${set.id}`).send({ name: 'x' })).status).toBe(403);
      }
      const res = await ws.as.owner
        .patch(`/api/target-sets/${set.id}`)
        .send({ targets: { railStraightness: { value: 1.5, unit: 'thou' } } });
      expect(res.status).toBe(200);
      expect(res.body.targets.railStraightness).toMatchObject({ value: 1.5, unit: 'thou' });
      expect(res.body.targets.squareness.unit).toBe('mm/m'); // others untouched
      expect((await ws.as.admin.patch(`/api/target-sets/${set.id}`).send({ name: 'Plasma, tight' })).status).toBe(200);
      expect((await other.as.owner.patch(`/api/target-sets/${set.id}`).send({ name: 'x' })).status).toBe(404);
    });

    it.each([
      [
        { targets: { railStraightness: { value: -1, unit: 'mm' } } },
        /railStraightness.value must be a number of 0 or more/,
      ],
      [
        { targets: { railStraightness: { value: 1, unit: 'furlong' } } },
        /railStraightness.unit must be one of mm, um, in, thou/,
      ],
      [{ targets: { squareness: { value: 1, unit: 'mm' } } }, /squareness.unit must be one of mm\/m/],
      [{ targets: { wobble: { value: 1, unit: 'mm' } } }, /wobble is not a known target/],
      [{ targets: 'tight' }, /targets must be an object/],
    ])('refuses %j with 400 and keeps the set as it was', async (body, message) => {
      const [set] = (await ws.as.owner.get('/api/target-sets')).body;
      const res = await ws.as.owner.patch(`/api/target-sets/${set.id}`).send(body);
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body.message)).toMatch(message);
      const after = await ws.as.owner.get(`/api/target-sets/${set.id}`);
      expect(after.body.targets).toEqual(set.targets);
    });

    it('creates a new set only when every target is given', async () => {
      const [set] = (await ws.as.owner.get('/api/target-sets')).body;
      const partial = await ws.as.owner
        .post('/api/target-sets')
        .send({ name: 'Half', targets: { railStraightness: { value: 1, unit: 'thou' } } });
      expect(partial.status).toBe(400);
      expect(JSON.stringify(partial.body.message)).toMatch(/targets.squareness is required/);
      const full = await ws.as.owner.post('/api/target-sets').send({ name: 'Copy', targets: set.targets });
      expect(full.status).toBe(201);
      expect(full.body.targets.bedFlatness.value).toBe(set.targets.bedFlatness.value);
    });
  });
});
