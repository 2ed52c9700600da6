import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, rackAxis, screwAxis } from './helpers/drives.js';
import { SubjectsRegistry } from '../src/records/subjects.registry.js';

describe('axes and their drive records', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Drives');
    other = await createTestWorkshop(app, 'Other');
    machineId = await newMachine(ws);
  });
  afterAll(() => app.close());

  it('a technician adds a screw axis; the theoretical steps per mm comes from the drive', async () => {
    const res = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(screwAxis('X'));
    expect(res.status).toBe(201);
    // 200 steps × 16 microsteps ÷ 5 mm lead = 640 steps/mm (stepper_steps_per_mm.json, Klipper rotation distance)
    expect(res.body).toMatchObject({
      id: expect.any(String),
      name: 'X',
      letter: 'X',
      stepsPerMm: 640,
      theoreticalStepsPerMm: 640,
      travelPerRevMm: 5,
      maxFeedRate: 5000,
      measuredTravelMm: 920,
    });
    expect(res.body.driveSummary).toMatch(/lead 5 mm/);
    const list = await ws.as.viewer.get(`/api/machines/${machineId}/axes`);
    expect(list.status).toBe(200);
    const x = list.body.find((a: { id: string }) => a.id === res.body.id);
    expect(x.checks.travelTrial.status).toBe('not-started');
    expect(x.checks.positioning.status).toBe('not-started');
    expect(x.checks.speedCheck.status).toBe('within-target');
  });

  it('a rack axis: π·m·z per pinion turn, through the gear ratio', async () => {
    const res = await ws.as.owner.post(`/api/machines/${machineId}/axes`).send(rackAxis('Y1'));
    expect(res.status).toBe(201);
    // rack m = 1.5, z = 20 → 94.2478 mm/rev; 200 × 8 ÷ 94.2478 = 16.9765 steps/mm (stepper_steps_per_mm.json), × 3 gear ratio
    expect(res.body.travelPerRevMm).toBeCloseTo(94.24777960769379, 10);
    expect(res.body.theoreticalStepsPerMm).toBeCloseTo(16.976527263135505 * 3, 9);
    expect(res.body.stepsPerMmDifferencePercent).toBeCloseTo(
      ((50.93 - 50.92958178940651) / 50.92958178940651) * 100,
      6,
    );
  });

  it('a belt axis: belt pitch × pulley teeth per turn', async () => {
    const res = await ws.as.admin.post(`/api/machines/${machineId}/axes`).send({
      name: 'A belt',
      drive: { type: 'belt', beltPitch: 2, pulleyTeeth: 20 },
      motorStepsPerRev: 200,
      microsteps: 16,
      stepsPerMm: 80,
    });
    expect(res.status).toBe(201);
    // GT2 2 mm × 20 teeth = 40 mm/rev, 200 × 16 ÷ 40 = 80 steps/mm (Klipper rotation distance)
    expect(res.body.theoreticalStepsPerMm).toBe(80);
    expect(res.body.letter).toBe('A');
  });

  it('the theoretical value on the axis equals the calculators API for the same drive', async () => {
    const body = {
      ...rackAxis('R'),
      drive: { type: 'rack', pinionModule: 2, pinionTeeth: 18 },
      microsteps: 10,
      gearRatio: 4.5,
    };
    const axis = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(body);
    const calc = await ws.as.viewer
      .post('/api/calc/drive')
      .send({ type: 'rack', pinionModule: 2, pinionTeeth: 18, motorStepsPerRev: 200, microsteps: 10, gearRatio: 4.5 });
    expect(calc.status).toBe(200);
    expect(axis.body.theoreticalStepsPerMm).toBe(calc.body.stepsPerMm);
    expect(axis.body.travelPerRevMm).toBe(calc.body.travelPerRev);
    expect(axis.body.resolutionMm).toBe(calc.body.resolution);
  });

  it('axes, travel trials and runs are subjects evidence can be attached to; another workshop resolves none', async () => {
    const id = await newAxis(ws, machineId, screwAxis('S'));
    const trial = await ws.as.technician
      .post(`/api/axes/${id}/travel-trials`)
      .send({ lengthUnit: 'mm', moves: [{ commanded: 100, measured: 100.01 }] });
    const run = await ws.as.technician.post(`/api/axes/${id}/positioning-runs`).send({
      readingUnit: 'um',
      targets: [10, 20],
      runs: [
        { direction: 'up', deviations: [1, 2] },
        { direction: 'up', deviations: [2, 2] },
        { direction: 'down', deviations: [0, 1] },
        { direction: 'down', deviations: [-1, 0] },
      ],
    });
    const subjects = app.get(SubjectsRegistry);
    expect(subjects.types()).toEqual(expect.arrayContaining(['axis', 'travel-trial', 'positioning-run']));
    expect(await subjects.resolve(ws.id, 'axis', id)).toEqual({
      machineId,
      recordType: 'axis',
      recordId: id,
      label: 'Axis S',
    });
    expect(await subjects.resolve(ws.id, 'travel-trial', trial.body.id)).toMatchObject({
      machineId,
      recordType: 'travel-trial',
      label: 'Travel trial of S',
    });
    expect(await subjects.resolve(ws.id, 'positioning-run', run.body.id)).toMatchObject({
      machineId,
      recordType: 'positioning-run',
      label: 'Repeat-and-reverse run of S',
    });
    expect(await subjects.resolve(other.id, 'axis', id)).toBeNull();
    expect(await subjects.resolve(other.id, 'travel-trial', trial.body.id)).toBeNull();
  });

  it('builders and viewers read; they cannot add or change axes; anonymous is 401', async () => {
    const id = await newAxis(ws, machineId, screwAxis('Z'));
    for (const role of ['builder', 'viewer'] as const) {
      expect((await ws.as[role].post(`/api/machines/${machineId}/axes`).send(screwAxis('Z9'))).status).toBe(403);
      expect((await ws.as[role].patch(`/api/axes/${id}`).send({ stepsPerMm: 641 })).status).toBe(403);
      expect((await ws.as[role].delete(`/api/axes/${id}`)).status).toBe(403);
      expect((await ws.as[role].get(`/api/axes/${id}`)).status).toBe(200);
    }
    expect((await anonymous(app).get(`/api/axes/${id}`)).status).toBe(401);
  });

  it("another workshop's axes and machines are 404", async () => {
    const id = await newAxis(ws, machineId, screwAxis('Z2'));
    expect((await other.as.owner.get(`/api/axes/${id}`)).status).toBe(404);
    expect((await other.as.owner.patch(`/api/axes/${id}`).send({ stepsPerMm: 1 })).status).toBe(404);
    expect((await other.as.owner.delete(`/api/axes/${id}`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${machineId}/axes`)).status).toBe(404);
    expect((await other.as.owner.post(`/api/machines/${machineId}/axes`).send(screwAxis('Q'))).status).toBe(404);
    expect((await other.as.owner.get(`/api/axes/${id}/speed-check`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${machineId}/travel-envelope`)).status).toBe(404);
  });

  it('changing the steps per mm keeps the old value in the history and the audit', async () => {
    const id = await newAxis(ws, machineId, screwAxis('U'));
    const res = await ws.as.technician
      .patch(`/api/axes/${id}`)
      .send({ stepsPerMm: 641.5, notes: 'coupler re-tightened' });
    expect(res.status).toBe(200);
    expect(res.body.stepsPerMm).toBe(641.5);
    expect(res.body.stepsHistory).toEqual([
      expect.objectContaining({ from: 640, to: 641.5, reason: 'edited', by: expect.stringContaining('technician') }),
    ]);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({
      recordType: 'axis',
      recordId: id,
      action: 'updated',
      changes: { stepsPerMm: { from: 640, to: 641.5 } },
    });
  });

  it('a saved screw drive counts as a recorded speed check; a measured X or Y travel as a recorded travel envelope', async () => {
    const m = await newMachine(ws, 'router', { x: 900, y: 600 });
    const id = await newAxis(ws, m, screwAxis('X'));
    let history = (await ws.as.viewer.get(`/api/machines/${m}/history?limit=200`)).body.entries as {
      action: string;
      summary: string;
      recordId: string;
      changes: { status?: string } | null;
    }[];
    expect(history.find((h) => h.action === 'recorded' && /Speed check of axis X/.test(h.summary))).toMatchObject({
      recordId: id,
      changes: { status: 'within-target' },
    });
    // A Y axis completes the envelope: X 920 ≥ 910 mm, Y 605 < 610 mm.
    const y = await newAxis(ws, m, { ...screwAxis('Y'), measuredTravelMm: 605 });
    history = (await ws.as.viewer.get(`/api/machines/${m}/history?limit=200`)).body.entries;
    expect(
      history.find((h) => h.action === 'recorded' && h.recordId === y && /Travel envelope/.test(h.summary)),
    ).toMatchObject({ changes: { status: 'outside-target' } });
    // A faster feed than the screw allows is recorded outside target.
    await ws.as.technician.patch(`/api/axes/${id}`).send({ maxFeedRate: 12000 });
    history = (await ws.as.viewer.get(`/api/machines/${m}/history?limit=200`)).body.entries;
    expect(
      history.find((h) => h.action === 'recorded' && /Speed check of axis X: 2400 rpm/.test(h.summary)),
    ).toMatchObject({ changes: { status: 'outside-target' } });
  });

  it('a drive given on PATCH replaces the drive; null clears the fastest feed', async () => {
    const id = await newAxis(ws, machineId, screwAxis('V'));
    const res = await ws.as.technician
      .patch(`/api/axes/${id}`)
      .send({ drive: { type: 'belt', beltPitch: 3, pulleyTeeth: 20 }, maxFeedRate: null });
    expect(res.status).toBe(200);
    expect(res.body.drive).toEqual({ type: 'belt', beltPitch: 3, pulleyTeeth: 20 });
    expect(res.body.maxFeedRate).toBeNull();
    // 200 × 16 ÷ (3 × 20) steps/mm
    expect(res.body.theoreticalStepsPerMm).toBeCloseTo(3200 / 60, 12);
  });

  it('the same axis name twice on one machine is a 409', async () => {
    await newAxis(ws, machineId, screwAxis('W'));
    const res = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(screwAxis('w'));
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/already has an axis named w/);
  });

  it('deleting an axis removes it and says so in the history', async () => {
    const id = await newAxis(ws, machineId, screwAxis('B'));
    expect((await ws.as.technician.delete(`/api/axes/${id}`)).status).toBe(204);
    expect((await ws.as.technician.get(`/api/axes/${id}`)).status).toBe(404);
  });

  const base = screwAxis('C');
  it.each([
    [{ ...base, drive: { type: 'screw', nominalDiameter: 16 } }, /drive.lead is required for a screw drive/],
    [{ ...base, drive: { type: 'belt', beltPitch: 2 } }, /drive.pulleyTeeth is required for a belt drive/],
    [{ ...base, drive: { type: 'rack', pinionTeeth: 20 } }, /drive.pinionModule is required/],
    [
      { ...base, drive: { type: 'belt', beltPitch: 2, pulleyTeeth: 20, lead: 5 } },
      /drive.lead does not apply to a belt drive/,
    ],
    [{ ...base, drive: { type: 'chain' } }, /drive.type must be one of screw, belt, rack/],
    [{ ...base, drive: { ...base.drive, lead: 'five' } }, /drive.lead must be a finite number/],
    [{ ...base, drive: { ...base.drive, lead: -5 } }, /drive.lead must be greater than zero/],
    [
      { ...base, drive: { ...base.drive, rootDiameter: 17 } },
      /rootDiameter must not be larger than drive.nominalDiameter/,
    ],
    [{ ...base, drive: { ...base.drive, mounting: 'glued' } }, /drive.mounting must be one of/],
    [{ ...base, drive: { ...base.drive, pulleyTeeth: 20 } }, /drive.pulleyTeeth does not apply/],
    [{ ...base, drive: undefined }, /drive must be an object/],
    [{ ...base, stepsPerMm: 0 }, /stepsPerMm must be greater than zero/],
    [{ ...base, stepsPerMm: 'lots' }, /stepsPerMm must be a finite number/],
    [{ ...base, motorStepsPerRev: 200.5 }, /motorStepsPerRev must be a whole number/],
    [{ ...base, microsteps: null }, /microsteps must be a finite number/],
    [{ ...base, maxFeedRate: -1 }, /maxFeedRate must be greater than zero/],
    [{ ...base, measuredTravelMm: 0 }, /measuredTravelMm must be greater than zero/],
    [{ ...base, name: '  ' }, /name is required/],
    [{ ...base, colour: 'red' }, /colour should not exist/],
  ])('refuses %j with 400 naming the field', async (body, message) => {
    const res = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('a non-finite number in JSON (1e999 → Infinity) is a 400, and a bad id a 400', async () => {
    const res = await ws.as.technician
      .post(`/api/machines/${machineId}/axes`)
      .set('Content-Type', 'application/json')
      .send(
        '{"name":"D","drive":{"type":"screw","lead":1e999},"motorStepsPerRev":200,"microsteps":16,"stepsPerMm":640}',
      );
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/drive.lead must be a finite number/);
    expect((await ws.as.technician.get('/api/axes/not-a-uuid')).status).toBe(400);
  });

  it('a refused PATCH leaves the axis as it was', async () => {
    const id = await newAxis(ws, machineId, screwAxis('E'));
    const before = await ws.as.technician.get(`/api/axes/${id}`);
    const res = await ws.as.technician.patch(`/api/axes/${id}`).send({ stepsPerMm: 700, drive: { type: 'screw' } });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/drive.lead is required/);
    expect((await ws.as.technician.get(`/api/axes/${id}`)).body).toEqual(before.body);
  });
});
