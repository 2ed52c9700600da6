import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';
import { MachinesService } from '../src/machines/machines.service.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';

// Every route of the drives takes lengths in the axis's or the record's lengthUnit and readings in
// readingUnit; the same data in mm and in inches or thou must give the same results.
// unit_facts.json / international inch of 1959: 1 in = 25.4 mm exactly, 1 thou = 0.001 in.
const IN = 25.4;
const close = (a: number, b: number, rel = 1e-12) =>
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));

/** A 16 × 5 rolled screw axis in inches: the same screw as screwAxis(), every length ÷ 25.4. */
const screwAxisIn = (name: string) => ({
  name,
  lengthUnit: 'in',
  drive: {
    type: 'screw',
    lead: 5 / IN,
    nominalDiameter: 16 / IN,
    rootDiameter: 12.9 / IN,
    unsupportedLength: 1000 / IN,
    mounting: 'fixed-supported',
  },
  motorStepsPerRev: 200,
  microsteps: 16,
  stepsPerMm: 640,
  maxFeedRate: 5000 / IN,
  measuredTravel: 920 / IN,
});

describe('drives in mm and in inches', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Units');
    machineId = await newMachine(ws, 'router');
  });
  afterAll(() => app.close());

  it('an axis set up in inches has the same drive, travel and speed check as the same axis in mm', async () => {
    const mm = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(screwAxis('X'));
    const inch = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(screwAxisIn('Y'));
    expect([mm.status, inch.status]).toEqual([201, 201]);
    expect(inch.body.lengthUnit).toBe('in');
    close(inch.body.theoreticalStepsPerMm, mm.body.theoreticalStepsPerMm);
    close(inch.body.travelPerRevMm, 5);
    close(inch.body.measuredTravelMm, 920);
    close(inch.body.maxFeedRateMmPerMin, 5000);
    // Values come back as typed, in the axis's unit.
    expect(inch.body.drive.lead).toBe(Number((5 / IN).toPrecision(12)));
    expect(inch.body.measuredTravel).toBe(Number((920 / IN).toPrecision(12)));
    // Steps per inch = steps per mm × 25.4: 640 × 25.4 = 16 256.
    expect(inch.body.stepsPerInch).toBeCloseTo(16256, 9);
    const [sm, si] = await Promise.all([mm, inch].map((a) => ws.as.viewer.get(`/api/axes/${a.body.id}/speed-check`)));
    close(si.body.rpm, sm.body.rpm);
    close(si.body.headroomPercent, sm.body.headroomPercent);
    close(si.body.safeFeedRateMmPerMin, sm.body.safeFeedRateMmPerMin);
    expect(si.body.lengthUnit).toBe('in');
    close(si.body.feedRate, 5000 / IN, 1e-10); // shown to 12 digits
    close(si.body.safeFeedRate * IN, sm.body.safeFeedRate, 1e-10); // shown to 12 digits
  });

  // Common practice: steps per inch = steps per revolution × microsteps × threads per inch (single start);
  // 200 × 8 × 5 TPI = 8000 steps/in, = 8000 / 25.4 steps/mm.
  it('a lead given as threads per inch: 5 TPI with 200 × 8 steps is 8000 steps per inch', async () => {
    const res = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send({
      name: 'Z',
      lengthUnit: 'in',
      drive: { type: 'screw', threadsPerInch: 5 },
      motorStepsPerRev: 200,
      microsteps: 8,
      stepsPerMm: 314.96,
    });
    expect(res.status).toBe(201);
    expect(res.body.theoreticalStepsPerInch).toBeCloseTo(8000, 9);
    close(res.body.theoreticalStepsPerMm, 8000 / IN);
    expect(res.body.drive).toMatchObject({ threadsPerInch: 5, lead: 0.2 });
    expect(res.body.driveSummary).toMatch(/5 threads per inch \(lead 0\.2 in\)/);
    const both = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send({
      name: 'Z2',
      drive: { type: 'screw', threadsPerInch: 5, lead: 5 },
      motorStepsPerRev: 200,
      microsteps: 8,
      stepsPerMm: 300,
    });
    expect(both.status).toBe(400);
    expect(JSON.stringify(both.body.message)).toMatch(/drive.lead and drive.threadsPerInch/);
  });

  it('a travel trial in inches gives the same correction as in mm (20 in commanded, 19.95 in measured → 80.2 steps/mm)', async () => {
    const axis = await newAxis(ws, machineId, {
      name: 'B',
      drive: { type: 'belt', beltPitch: 2, pulleyTeeth: 20 },
      motorStepsPerRev: 200,
      microsteps: 16,
      stepsPerMm: 80,
    });
    const inch = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials`)
      .send({ lengthUnit: 'in', moves: [{ commanded: 20, measured: 19.95 }] });
    const mm = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials`)
      .send({ lengthUnit: 'mm', moves: [{ commanded: 508, measured: 506.73 }] });
    expect([inch.status, mm.status]).toEqual([201, 201]);
    // new = old × commanded ÷ measured (TRADE.md, common practice): 80 × 20 / 19.95 = 80.2005 steps/mm
    close(inch.body.result.correctedStepsPerMm, (80 * 20) / 19.95, 1e-12);
    close(inch.body.result.correctedStepsPerMm, mm.body.result.correctedStepsPerMm, 1e-12);
    close(inch.body.result.errorPercent, mm.body.result.errorPercent, 1e-9);
    expect(inch.body).toMatchObject({
      lengthUnit: 'in',
      moves: [{ commanded: 20, measured: 19.95 }],
      warnings: [expect.objectContaining({ code: 'single-distance' })],
    });
    expect(inch.body.result.farFromTheory).toBe(false);
  });

  it('a repeat-and-reverse run with targets in inches and deviations in thou equals the run in mm', async () => {
    const axis = await newAxis(ws, machineId, screwAxis('C'));
    const targetsMm = [10, 130.4, 250.8, 371.2, 500];
    const devThou = [
      [0.2, 0.4, -0.1, 0.3, 0.5],
      [0.1, 0.5, 0, 0.2, 0.6],
      [0.3, 0.3, -0.2, 0.4, 0.4],
      [0.2, 0.6, 0.1, 0.2, 0.5],
      [0.1, 0.4, 0, 0.3, 0.7],
    ];
    const runs = (f: (v: number) => number) => [
      ...devThou.map((d) => ({ direction: 'up', deviations: d.map(f) })),
      ...devThou.map((d) => ({ direction: 'down', deviations: d.map((v) => f(v - 0.4)) })),
    ];
    const inch = await ws.as.technician
      .post(`/api/axes/${axis}/positioning-runs`)
      .send({ lengthUnit: 'in', readingUnit: 'thou', targets: targetsMm.map((t) => t / IN), runs: runs((v) => v) });
    const mm = await ws.as.technician
      .post(`/api/axes/${axis}/positioning-runs`)
      .send({ lengthUnit: 'mm', readingUnit: 'mm', targets: targetsMm, runs: runs((v) => (v * 254) / 10000) });
    expect([inch.status, mm.status]).toEqual([201, 201]);
    for (const k of ['accuracy', 'repeatability', 'reversal', 'systematic', 'meanRange'] as const)
      close(inch.body.result[k], mm.body.result[k], 1e-9);
    inch.body.result.targets.forEach((t: { target: number }, i: number) => close(t.target, targetsMm[i], 1e-12));
    expect(inch.body).toMatchObject({ lengthUnit: 'in', readingUnit: 'thou' });
    expect(inch.body.status).toBe(mm.body.status);
  });

  it('holds back a 25× correction: recorded with a warning, applied only with confirmFarCorrection', async () => {
    // The reported case: a 320 steps/mm axis (200 × 8 ÷ 5 mm lead, TRADE.md common practice), 20 commanded
    // read as mm and 19.95 in measured: corrected 12.6 steps/mm.
    const axis = await newAxis(ws, machineId, { ...screwAxis('D'), microsteps: 8, stepsPerMm: 320 });
    const trial = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials`)
      .send({ lengthUnit: 'mm', moves: [{ commanded: 20, measured: 506.73 }] });
    expect(trial.status).toBe(201);
    close(trial.body.result.correctedStepsPerMm, (320 * 20) / 506.73, 1e-12);
    expect(trial.body.result.farFromTheory).toBe(true);
    const codes = trial.body.warnings.map((w: { code: string }) => w.code);
    expect(codes).toEqual(expect.arrayContaining(['correction-cannot-be-right', 'correction-far-from-theory']));
    expect(trial.body.warnings.find((w: { code: string }) => w.code === 'correction-far-from-theory').message).toMatch(
      /lead.*pulley teeth.*microsteps/,
    );
    const refused = await ws.as.technician.post(`/api/axes/${axis}/travel-trials/${trial.body.id}/apply`).send({});
    expect(refused.status).toBe(422);
    expect(JSON.stringify(refused.body.message)).toMatch(/confirmFarCorrection/);
    expect((await ws.as.viewer.get(`/api/axes/${axis}`)).body.stepsPerMm).toBe(320);
    const bad = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials/${trial.body.id}/apply`)
      .send({ confirmFarCorrection: 'yes' });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toMatch(/confirmFarCorrection must be true or false/);
    const applied = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials/${trial.body.id}/apply`)
      .send({ confirmFarCorrection: true });
    expect(applied.status).toBe(200);
    expect(applied.body.stepsPerMm).toBe(Math.round(((320 * 20) / 506.73) * 1e4) / 1e4); // 12.63, four decimals
    // The warning stays with the record on every later read.
    const read = await ws.as.viewer.get(`/api/axes/${axis}/travel-trials/${trial.body.id}`);
    expect(read.body.warnings.map((w: { code: string }) => w.code)).toEqual(codes);
    const listed = await ws.as.viewer.get(`/api/axes/${axis}/travel-trials`);
    expect(listed.body[0].warnings.map((w: { code: string }) => w.code)).toEqual(codes);
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, machineId);
    const check = (await app.get(ReadinessRegistry).checksFor(ref)).find((c) => c.key === `travel-trial:${axis}`)!;
    expect(check.warnings!.map((w) => w.code)).toEqual(codes);
  });

  it('a correction within 5 % of theory applies without confirmation', async () => {
    const axis = await newAxis(ws, machineId, screwAxis('E'));
    const trial = await ws.as.technician.post(`/api/axes/${axis}/travel-trials`).send({
      moves: [
        { commanded: 100, measured: 99.8 },
        { commanded: 300, measured: 299.4 },
      ],
    });
    expect(trial.body.warnings).toEqual([]);
    expect((await ws.as.technician.post(`/api/axes/${axis}/travel-trials/${trial.body.id}/apply`)).status).toBe(200);
  });

  it('refuses a travel trial whose correction would not be a finite positive number', async () => {
    const axis = await newAxis(ws, machineId, screwAxis('F'));
    for (const moves of [[{ commanded: 100, measured: -100 }], [{ commanded: 1e-300, measured: 1e300 }]]) {
      const res = await ws.as.technician.post(`/api/axes/${axis}/travel-trials`).send({ moves });
      expect(res.status).toBe(400);
    }
    expect((await ws.as.viewer.get(`/api/axes/${axis}/travel-trials`)).body).toEqual([]);
  });

  // ΔL = α·L·ΔT (TRADE.md: steel α ≈ 11–12 µm/m·K): a steel tape at 30 °C on a steel machine at 20 °C
  // reads 1000 mm where the axis moved 1000 × (1 + 11.5e-6 × 10) = 1000.115 mm.
  it('a travel trial records both temperatures and the scale material and is referred to 20 °C', async () => {
    const axis = await newAxis(ws, machineId, screwAxis('G'));
    const res = await ws.as.technician.post(`/api/axes/${axis}/travel-trials`).send({
      moves: [
        { commanded: 500, measured: 500 },
        { commanded: 1000, measured: 1000 },
      ],
      machineTemperature: 20,
      scaleTemperature: 30,
      scaleMaterial: 'steel',
    });
    expect(res.status).toBe(201);
    close(res.body.result.scale, 1 + 11.5e-6 * 10, 1e-12);
    expect(res.body).toMatchObject({
      machineTemperature: 20,
      scaleTemperature: 30,
      scaleMaterial: 'steel',
      thermal: { applied: true, scaleAlphaUmPerMK: 11.5 },
    });
    expect(res.body.thermal.source).toMatch(/TRADE\.md/);
    // 0.0115 % is more than a tenth of the router's 0.05 % target: the correction is pointed out.
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('thermal-correction');
    const one = await ws.as.technician
      .post(`/api/axes/${axis}/travel-trials`)
      .send({ moves: [{ commanded: 500, measured: 500 }], machineTemperature: 24 });
    expect(one.body.thermal.applied).toBe(false);
    expect(one.body.warnings.map((w: { code: string }) => w.code)).toContain('temperature-incomplete');
  });

  // Speed check: d·n limit 70 000 for rolled screws (TRADE.md; ballscrew_critical_speed.json, HIWIN):
  // a 16 mm screw may turn 4375 rpm, below THK's permissible 7791.6 rpm over 500 mm (derived table).
  it('takes the speed headroom from the d·n limit when it is the lower limit', async () => {
    const axis = await ws.as.technician
      .post(`/api/machines/${machineId}/axes`)
      .send({ ...screwAxis('H'), drive: { ...screwAxis().drive, unsupportedLength: 500 }, maxFeedRate: 5 * 4200 });
    const res = await ws.as.viewer.get(`/api/axes/${axis.body.id}/speed-check`);
    expect(res.body.limitSpeed).toBe(4375);
    close(res.body.headroomPercent, (1 - 4200 / 4375) * 100, 1e-12);
    expect(res.body.status).toBe('outside-target'); // 4 % headroom against the 10 % target
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, machineId);
    const check = (await app.get(ReadinessRegistry).checksFor(ref)).find(
      (c) => c.key === `speed-check:${axis.body.id}`,
    )!;
    expect(check.status).toBe('outside-target');
    close(check.result!.value, (1 - 4200 / 4375) * 100, 1e-12);
    expect(check.warnings!.map((w) => w.code)).toEqual(['dn-limit-governs']);
  });

  it('a repeat-and-reverse run records temperatures and an instrument too coarse for the target', async () => {
    const axis = await newAxis(ws, machineId, screwAxis('J'));
    const targets = [0, 100, 200, 300, 400];
    const runs = (['up', 'down'] as const).flatMap((direction) =>
      [0, 1, 2, 3, 4].map((k) => ({ direction, deviations: targets.map(() => k * 2) })),
    );
    // Router targets: repeatability 0.03 mm is the tightest; a 0.01 mm dial is coarser than 0.0075 mm.
    const res = await ws.as.technician.post(`/api/axes/${axis}/positioning-runs`).send({
      readingUnit: 'um',
      targets,
      runs,
      instrumentResolution: 10,
      machineTemperature: 22,
      scaleTemperature: 22,
      scaleMaterial: 'aluminium',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      instrumentResolution: 10,
      scaleMaterial: 'aluminium',
      thermal: { applied: true },
    });
    const codes = res.body.warnings.map((w: { code: string }) => w.code);
    expect(codes).toContain('coarse-instrument');
    // ΔL = α·L·ΔT: (23.1 − 11.5) µm/m·K × 0.4 m × 2 K = 9.28 µm over the run, more than a tenth of 0.03 mm.
    close(res.body.result.thermalCorrectionMax, (23.1 - 11.5) * 1e-6 * 400 * 2, 1e-9);
    expect(codes).toContain('thermal-correction');
  });

  it('changing only the unit an axis is set up in keeps every length; lengths sent with it are in it', async () => {
    const id = await newAxis(ws, machineId, screwAxis('K'));
    const res = await ws.as.technician.patch(`/api/axes/${id}`).send({ lengthUnit: 'in' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ lengthUnit: 'in', measuredTravelMm: 920, maxFeedRateMmPerMin: 5000 });
    expect(res.body.measuredTravel).toBe(Number((920 / IN).toPrecision(12)));
    const travel = await ws.as.technician.patch(`/api/axes/${id}`).send({ measuredTravel: 36 });
    close(travel.body.measuredTravelMm, 914.4); // 36 × 25.4
    const both = await ws.as.technician.patch(`/api/axes/${id}`).send({ measuredTravel: 36, measuredTravelMm: 914.4 });
    expect(both.status).toBe(400);
    expect(JSON.stringify(both.body.message)).toMatch(/measuredTravel and measuredTravelMm/);
  });
});
