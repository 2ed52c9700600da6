import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { evaluatePositioning } from '../src/engine/positioning.js';
import { evaluateTravelTrial } from '../src/engine/travel-trial.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { MachinesService } from '../src/machines/machines.service.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, screwAxis } from './helpers/drives.js';
import { referenceCsv, referenceJson } from '../src/engine/reference-data/reference-data.js';
import { lockAsApproved } from './support/stand-in-approval.js';

// CONSTRUCTED ISO 230-2 data set of the reference folder (5 targets, 5 runs each way, µm),
// computed there from the formulas written from memory: an internal consistency check.
const iso = referenceJson('iso230_2_constructed_example_expected.json');
const rows = referenceCsv('iso230_2_constructed_example.csv') as {
  target_mm: number;
  direction: string;
  run: number;
  deviation_um: number;
}[];
const ISO_TARGETS = [...new Set(rows.map((r) => r.target_mm))].sort((a, b) => a - b);
const runOf = (direction: string) =>
  [1, 2, 3, 4, 5].map((run) =>
    ISO_TARGETS.map(
      (t) => rows.find((r) => r.direction === direction && r.run === run && r.target_mm === t)!.deviation_um,
    ),
  );
const ISO_UP = runOf('up');
const ISO_DOWN = runOf('down');

describe('travel trials and repeat-and-reverse runs', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;
  let axisId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Trials');
    other = await createTestWorkshop(app, 'Other');
    machineId = await newMachine(ws, 'router');
    axisId = await newAxis(ws, machineId, screwAxis('X'));
  });
  afterAll(() => app.close());

  const trialBody = { lengthUnit: 'mm', stepsPerMmUsed: 640, moves: [{ commanded: 100, measured: 99.8 }] };

  it('a single 100 mm move measured 99.8 mm: corrected 641.2826 steps/mm, outside the router target', async () => {
    const res = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(trialBody);
    expect(res.status).toBe(201);
    // stepper_steps_per_mm.json: old 640, commanded 100.000, measured 99.800 → 641.2825651302605 (new = old × commanded ÷ measured)
    expect(res.body.result.correctedStepsPerMm).toBeCloseTo(641.2825651302605, 9);
    expect(res.body.result.errorPercent).toBeCloseTo(-0.2, 9);
    expect(res.body.result.scale).toBeCloseTo(0.998, 12);
    expect(res.body.result.residuals).toHaveLength(1);
    expect(res.body.status).toBe('outside-target'); // router default: 0.05 %
    expect(res.body.target).toMatchObject({ value: 0.05, unit: '%' });
  });

  it('the engine results on the record equal the engine and the calculators for the same data', async () => {
    const moves = [
      { commanded: 100, measured: 3.9291 },
      { commanded: 300, measured: 11.7872 },
      { commanded: 600, measured: 23.5756 },
      { commanded: 900, measured: 35.3622 },
    ];
    // Commanded in mm, measured in inches: the calculators' form; the record takes one lengthUnit for both,
    // so the measured moves go to it in mm (× 25.4 exactly, unit_facts.json).
    const movesMm = moves.map((m) => ({ commanded: m.commanded, measured: (m.measured * 254) / 10 }));
    const res = await ws.as.technician
      .post(`/api/axes/${axisId}/travel-trials`)
      .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves: movesMm });
    expect(res.status).toBe(201);
    const engine = evaluateTravelTrial({
      stepsPerMmUsed: 640,
      moves: moves.map((m) => ({ commandedMm: m.commanded, measuredMm: (m.measured * 254) / 10 })),
    });
    expect(res.body.result.correctedStepsPerMm).toBe(engine.correctedStepsPerMm);
    expect(res.body.result.errorPercent).toBe(engine.errorPercent);
    expect(res.body.result.offset).toBe(engine.offsetMm);
    expect(res.body.result.residuals).toEqual(engine.moves.map((m) => m.residualMm));
    expect(res.body.moves).toEqual(movesMm); // kept as entered
    const calc = await ws.as.viewer
      .post('/api/calc/travel-trial')
      .send({ lengthUnit: 'mm', stepsPerMmUsed: 640, moves: movesMm });
    expect(calc.status).toBe(200);
    expect(res.body.result.correctedStepsPerMm).toBe(calc.body.correctedStepsPerMm);
    expect(res.body.result.residualMax).toBe(calc.body.residualMax);
    expect(res.body.result.moves).toEqual(calc.body.moves);
  });

  it('apply: the axis takes the corrected value, the old one stays in its history and the audit', async () => {
    const created = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(trialBody);
    const before = (await ws.as.technician.get(`/api/axes/${axisId}`)).body.stepsPerMm;
    const res = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials/${created.body.id}/apply`);
    expect(res.status).toBe(200);
    expect(res.body.stepsPerMm).toBe(641.2826); // four decimals, as a controller takes it
    expect(res.body.stepsHistory.at(-1)).toMatchObject({
      from: before,
      to: 641.2826,
      reason: 'travel-trial',
      trialId: created.body.id,
    });
    const trial = await ws.as.viewer.get(`/api/axes/${axisId}/travel-trials/${created.body.id}`);
    expect(trial.body.appliedAt).toEqual(expect.any(String));
    // Applying the same trial again (a double click, a retry) changes nothing and answers the axis.
    const again = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials/${created.body.id}/apply`);
    expect([again.status, again.body.stepsPerMm, again.body.stepsHistory.length]).toEqual([
      200,
      641.2826,
      res.body.stepsHistory.length,
    ]);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({
      recordType: 'axis',
      recordId: axisId,
      changes: { stepsPerMm: { from: before, to: 641.2826 } },
    });
    // The list of trials is newest first.
    const list = await ws.as.builder.get(`/api/axes/${axisId}/travel-trials`);
    expect(list.status).toBe(200);
    expect(list.body[0].id).toBe(created.body.id);
  });

  it('stepsPerMmUsed defaults to the axis value; throughOrigin fits without an offset', async () => {
    const id = await newAxis(ws, machineId, screwAxis('Y'));
    const res = await ws.as.owner.post(`/api/axes/${id}/travel-trials`).send({
      lengthUnit: 'mm',
      moves: [
        { commanded: 200, measured: 200.05 },
        { commanded: 400, measured: 400.09 },
      ],
      throughOrigin: true,
    });
    expect(res.status).toBe(201);
    expect(res.body.stepsPerMmUsed).toBe(640);
    expect(res.body.result.offset).toBe(0);
    // Through-origin least squares: k = Σxy / Σx² (NIST StRD NoInt model)
    const k = (200 * 200.05 + 400 * 400.09) / (200 * 200 + 400 * 400);
    expect(res.body.result.scale).toBeCloseTo(k, 12);
    expect(res.body.status).toBe('within-target'); // 0.023 % ≤ the router's 0.05 %
  });

  it('roles: builders and viewers read trials and runs but cannot record or apply; other workshops 404', async () => {
    const created = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(trialBody);
    for (const role of ['builder', 'viewer'] as const) {
      expect((await ws.as[role].post(`/api/axes/${axisId}/travel-trials`).send(trialBody)).status).toBe(403);
      expect((await ws.as[role].post(`/api/axes/${axisId}/travel-trials/${created.body.id}/apply`)).status).toBe(403);
      expect((await ws.as[role].post(`/api/axes/${axisId}/positioning-runs`).send({})).status).toBe(403);
      expect((await ws.as[role].get(`/api/axes/${axisId}/positioning-runs`)).status).toBe(200);
    }
    expect((await ws.as.admin.post(`/api/axes/${axisId}/travel-trials`).send(trialBody)).status).toBe(201);
    expect((await other.as.owner.get(`/api/axes/${axisId}/travel-trials`)).status).toBe(404);
    expect((await other.as.owner.post(`/api/axes/${axisId}/travel-trials`).send(trialBody)).status).toBe(404);
    expect((await other.as.owner.get(`/api/axes/${axisId}/travel-trials/${created.body.id}`)).status).toBe(404);
    expect((await other.as.owner.post(`/api/axes/${axisId}/travel-trials/${created.body.id}/apply`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/axes/${axisId}/positioning-runs`)).status).toBe(404);
  });

  it.each([
    [{ ...trialBody, lengthUnit: 'cubit' }, /lengthUnit must be one of mm, um, in, thou/],
    [{ ...trialBody, readingUnit: 'cubit' }, /readingUnit must be one of mm, um, in, thou/],
    [{ ...trialBody, unit: 'mm' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
    [{ ...trialBody, machineTemperature: 'warm' }, /machineTemperature must be a finite number/],
    [{ ...trialBody, machineTemperature: 20, scaleTemperature: 300 }, /scaleTemperature must be between -40 and 80/],
    [{ ...trialBody, scaleMaterial: 'wood' }, /scaleMaterial must be one of steel/],
    [{ ...trialBody, instrumentResolution: 0 }, /instrumentResolution must be greater than zero/],
    [{ ...trialBody, moves: [] }, /moves needs at least one/],
    [{ ...trialBody, moves: 'long' }, /moves must be a list/],
    [{ ...trialBody, moves: [{ commanded: 100 }] }, /moves\[\].measured must be a finite number/],
    [{ ...trialBody, moves: [{ commanded: 0, measured: 1 }] }, /commanded must not be zero/],
    [{ ...trialBody, moves: [{ commanded: 100, measured: -99 }] }, /measured moves must grow with the commanded moves/],
    [{ ...trialBody, stepsPerMmUsed: -640 }, /stepsPerMmUsed must be greater than zero/],
    [{ ...trialBody, throughOrigin: 'yes' }, /throughOrigin must be true or false/],
  ])('a travel trial %j is refused with 400 naming the field, and nothing is saved', async (body, message) => {
    const before = (await ws.as.technician.get(`/api/axes/${axisId}/travel-trials`)).body.length;
    const res = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
    expect((await ws.as.technician.get(`/api/axes/${axisId}/travel-trials`)).body.length).toBe(before);
  });

  const isoBody = (readingUnit = 'um') => ({
    readingUnit,
    targets: ISO_TARGETS,
    runs: [
      ...ISO_UP.map((d) => ({ direction: 'up', deviations: d })),
      ...ISO_DOWN.map((d) => ({ direction: 'down', deviations: d })),
    ],
  });

  it('a repeat-and-reverse run gives the ISO 230-2 values of the constructed example', async () => {
    const res = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(isoBody());
    expect(res.status).toBe(201);
    const r = res.body.result;
    const um = (v: number) => v * 1000;
    // iso230_2_constructed_example_expected.json (constructed, exact values: B = 4, R = 4 + 2√2, E = 9, M = 11/2, A = 9 + 2√2)
    expect(um(r.reversal)).toBeCloseTo(iso.axis_results_um.B, 9);
    expect(um(r.reversalMean)).toBeCloseTo(iso.axis_results_um.B_mean, 9);
    expect(um(r.repeatability)).toBeCloseTo(4 + 2 * Math.SQRT2, 9);
    expect(um(r.repeatabilityUp)).toBeCloseTo(iso.axis_results_um.R_up, 9);
    expect(um(r.systematic)).toBeCloseTo(iso.axis_results_um.E, 9);
    expect(um(r.meanRange)).toBeCloseTo(iso.axis_results_um.M, 9);
    expect(um(r.accuracy)).toBeCloseTo(9 + 2 * Math.SQRT2, 9);
    expect(r.targets).toHaveLength(5);
    expect(um(r.targets[2].sUp)).toBeCloseTo(iso.per_target[2].s_up, 9);
    expect(r.runsUp).toBe(5);
    expect(r.warnings).toEqual([]);
    // Router defaults: accuracy 0.1 mm, repeatability 0.03 mm, reversal 0.03 mm: all pass.
    expect(res.body.checks.accuracy.pass).toBe(true);
    expect(res.body.status).toBe('within-target');
    // Same data through the engine and the calculators API.
    const engine = evaluatePositioning({
      targetsMm: ISO_TARGETS,
      runs: isoBody().runs.map((x) => ({
        direction: x.direction as 'up' | 'down',
        deviationsMm: x.deviations.map((d) => d / 1000),
      })),
    });
    expect(r.accuracy).toBe(engine.accuracyMm);
    expect(r.repeatability).toBe(engine.repeatabilityMm);
    const calc = await ws.as.viewer.post('/api/calc/positioning').send(isoBody());
    expect(calc.status).toBe(200);
    for (const k of ['accuracy', 'repeatability', 'reversal', 'systematic', 'meanRange', 'reversalMean'] as const)
      expect(r[k]).toBe(calc.body[k]);
    expect(r.targets).toEqual(calc.body.targets);
  });

  it('the same run in thou is outside the router target; each failing figure is named', async () => {
    const res = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(isoBody('thou'));
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('outside-target');
    expect(res.body.checks.reversal).toMatchObject({ pass: false, target: { value: 0.03, unit: 'mm' } });
    expect(res.body.result.reversal).toBeCloseTo(4 * 0.0254, 12);
  });

  it('fewer than 5 runs a direction are kept with a warning', async () => {
    const body = {
      readingUnit: 'um',
      targets: ISO_TARGETS,
      runs: [
        ...ISO_UP.slice(0, 3).map((d) => ({ direction: 'up', deviations: d })),
        ...ISO_DOWN.slice(0, 3).map((d) => ({ direction: 'down', deviations: d })),
      ],
    };
    const res = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(body);
    expect(res.status).toBe(201);
    expect(res.body.warnings).toEqual([
      expect.objectContaining({
        code: 'few-runs',
        message: expect.stringMatching(/asks for 5 runs in each direction \(got 3 up, 3 down\)/),
      }),
    ]);
    // Kept with the record: the single read, the list and the readiness board return it.
    const again = await ws.as.viewer.get(`/api/axes/${axisId}/positioning-runs/${res.body.id}`);
    expect(again.body.warnings).toEqual(res.body.warnings);
    const list = await ws.as.viewer.get(`/api/axes/${axisId}/positioning-runs`);
    expect(list.body.find((x: { id: string }) => x.id === res.body.id).warnings).toEqual(res.body.warnings);
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, machineId);
    const check = (await app.get(ReadinessRegistry).checksFor(ref)).find((c) => c.key === `positioning:${axisId}`)!;
    expect(check.warnings).toEqual(res.body.warnings);
  });

  const good = isoBody();
  it.each([
    [
      { ...good, runs: [...good.runs.slice(0, 9), { direction: 'down', deviations: [1, 2, 3] }] },
      /runs\[9\].deviations must have one value per target \(5, got 3\)/,
    ],
    [{ ...good, runs: [good.runs[0], ...good.runs.slice(5)] }, /at least 2 runs in the up direction/],
    [{ ...good, runs: good.runs.slice(0, 5) }, /at least 2 runs in the down direction/],
    [
      { ...good, targets: [0, 250, 125, 375, 500] },
      /targets must rise along the axis \(targets\[2\] = 125 is not above 250\)/,
    ],
    [{ ...good, targets: [0, 125, 125, 375, 500] }, /targets\[2\] = 125 is not above 125/],
    [
      { ...good, runs: [{ direction: 'sideways', deviations: [1, 2, 3, 4, 5] }] },
      /runs\[\].direction must be up or down/,
    ],
    [
      { ...good, runs: [{ direction: 'up', deviations: [1, 'x', 3, 4, 5] }] },
      /every value in runs\[\].deviations must be a finite number/,
    ],
    [{ ...good, targets: 'all of them' }, /targets must be a list/],
    [{ ...good, readingUnit: 'cubit' }, /readingUnit must be one of/],
    [{ ...good, unit: 'um' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
  ])('a run %j is refused with 400 naming the field', async (body, message) => {
    const res = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('locked trials and runs cannot be deleted (409); apply on a locked trial still changes the axis', async () => {
    const id = await newAxis(ws, machineId, screwAxis('Z'));
    const trial = await ws.as.technician.post(`/api/axes/${id}/travel-trials`).send(trialBody);
    const run = await ws.as.technician.post(`/api/axes/${id}/positioning-runs`).send(isoBody());
    await lockAsApproved(app, [
      { recordType: 'travel-trial', recordId: trial.body.id },
      { recordType: 'positioning-run', recordId: run.body.id },
    ]);
    expect((await ws.as.technician.delete(`/api/axes/${id}/travel-trials/${trial.body.id}`)).status).toBe(409);
    expect((await ws.as.technician.delete(`/api/axes/${id}/positioning-runs/${run.body.id}`)).status).toBe(409);
    expect((await ws.as.technician.delete(`/api/axes/${id}`)).status).toBe(409);
    expect((await ws.as.viewer.get(`/api/axes/${id}/travel-trials`)).body[0].locked).toBe(true);
    const applied = await ws.as.technician.post(`/api/axes/${id}/travel-trials/${trial.body.id}/apply`);
    expect(applied.status).toBe(200);
    expect(applied.body.stepsPerMm).toBe(641.2826);
    // A locked axis refuses edits.
    await lockAsApproved(app, [{ recordType: 'axis', recordId: id }]);
    const patch = await ws.as.technician.patch(`/api/axes/${id}`).send({ notes: 'x' });
    expect(patch.status).toBe(409);
    expect((await ws.as.technician.get(`/api/axes/${id}`)).body.locked).toBe(true);
    // Records kept by an earlier approval (the machine since reopened) do not stop a recalibration.
    const again = await ws.as.technician
      .post(`/api/axes/${id}/travel-trials`)
      .send({ lengthUnit: 'mm', moves: [{ commanded: 100, measured: 100.1 }] });
    const reapplied = await ws.as.technician.post(`/api/axes/${id}/travel-trials/${again.body.id}/apply`);
    expect(reapplied.status).toBe(200);
    expect(reapplied.body.stepsHistory.at(-1)).toMatchObject({
      from: 641.2826,
      reason: 'travel-trial',
      trialId: again.body.id,
    });
  });

  it('parallel applies of one trial change the axis once', async () => {
    const id = await newAxis(ws, machineId, screwAxis('A'));
    const trial = await ws.as.technician.post(`/api/axes/${id}/travel-trials`).send(trialBody);
    const results = await Promise.all(
      [1, 2, 3, 4].map(() => ws.as.technician.post(`/api/axes/${id}/travel-trials/${trial.body.id}/apply`)),
    );
    expect(results.map((r) => r.status)).toEqual([200, 200, 200, 200]);
    const axis = await ws.as.viewer.get(`/api/axes/${id}`);
    expect(axis.body.stepsPerMm).toBe(641.2826);
    expect(axis.body.stepsHistory.filter((h: { trialId?: string }) => h.trialId === trial.body.id)).toHaveLength(1);
  });

  it('unlocked trials and runs can be deleted by a calibrator', async () => {
    const trial = await ws.as.technician.post(`/api/axes/${axisId}/travel-trials`).send(trialBody);
    const run = await ws.as.technician.post(`/api/axes/${axisId}/positioning-runs`).send(isoBody());
    expect((await ws.as.builder.delete(`/api/axes/${axisId}/travel-trials/${trial.body.id}`)).status).toBe(403);
    expect((await ws.as.technician.delete(`/api/axes/${axisId}/travel-trials/${trial.body.id}`)).status).toBe(204);
    expect((await ws.as.technician.delete(`/api/axes/${axisId}/positioning-runs/${run.body.id}`)).status).toBe(204);
    expect((await ws.as.technician.get(`/api/axes/${axisId}/positioning-runs/${run.body.id}`)).status).toBe(404);
  });

  it('readiness: per axis a travel-trial, positioning and speed-check check, and one travel envelope per machine', async () => {
    const m = await newMachine(ws, 'router', { x: 900, y: 600 });
    const x = await newAxis(ws, m, screwAxis('X'));
    await newAxis(ws, m, { ...screwAxis('Y'), measuredTravelMm: 605 });
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, m);
    let checks = await app.get(ReadinessRegistry).checksFor(ref);
    const mine = checks.filter((c) =>
      ['travel-trial', 'positioning', 'speed-check', 'travel-envelope'].includes(c.kind),
    );
    expect(mine.map((c) => c.kind).sort()).toEqual([
      'positioning',
      'positioning',
      'speed-check',
      'speed-check',
      'travel-envelope',
      'travel-trial',
      'travel-trial',
    ]);
    const trialCheck = mine.find((c) => c.key === `travel-trial:${x}`)!;
    expect(trialCheck).toMatchObject({
      status: 'not-started',
      subject: 'Axis X',
      result: null,
      place: { machineId: m, axisId: x },
    });
    // Y travels 605 mm; the router needs 600 + 10 mm.
    expect(mine.find((c) => c.kind === 'travel-envelope')).toMatchObject({
      status: 'outside-target',
      result: { value: 5, unit: 'mm' },
      target: { value: 10, unit: 'mm' },
    });
    // 5000 mm/min at 5 mm lead = 1000 rpm, permissible 1947.9 rpm (THK λ2 = 15.1, 12.9 mm root, 1000 mm): 48.66 % headroom
    expect(mine.find((c) => c.key === `speed-check:${x}`)!.result).toMatchObject({ unit: '%' });
    expect(mine.find((c) => c.key === `speed-check:${x}`)!.result!.value).toBeCloseTo((1 - 1000 / 1947.9) * 100, 9);
    const within = await ws.as.technician
      .post(`/api/axes/${x}/travel-trials`)
      .send({ lengthUnit: 'mm', moves: [{ commanded: 500, measured: 500.1 }] });
    expect(within.body.status).toBe('within-target'); // 0.02 % ≤ 0.05 %
    checks = await app.get(ReadinessRegistry).checksFor(ref);
    const trialCheck2 = checks.find((c) => c.key === `travel-trial:${x}`)!;
    expect(trialCheck2).toMatchObject({
      status: 'within-target',
      recordType: 'travel-trial',
      recordId: within.body.id,
      result: { unit: '%' },
    });
    expect(trialCheck2.series!.lines[0].points[0][0]).toBe(500);
    expect(trialCheck2.series!.lines[0].points[0][1]).toBeCloseTo(0.1, 12);
    await ws.as.technician.post(`/api/axes/${x}/positioning-runs`).send(isoBody());
    checks = await app.get(ReadinessRegistry).checksFor(ref);
    const runCheck = checks.find((c) => c.key === `positioning:${x}`)!;
    expect(runCheck.status).toBe('within-target');
    // chart series in µm: the constructed example's mean up at 125 mm is 5 µm, mean down 1 µm
    expect(runCheck.series!.lines.map((l) => l.label)).toEqual([
      'Mean up',
      'Mean up + 2s',
      'Mean up − 2s',
      'Mean down',
      'Mean down + 2s',
      'Mean down − 2s',
    ]);
    const line = (label: string) => runCheck.series!.lines.find((l) => l.label === label)!.points[1][1];
    expect(line('Mean up')).toBeCloseTo(iso.per_target[1].mean_up, 9);
    expect(line('Mean down')).toBeCloseTo(iso.per_target[1].mean_down, 9);
    // The ±2s band of ISO 230-2 (the reference example's s↑ = s↓ = 0.7071 µm at 125 mm).
    expect(line('Mean up + 2s')).toBeCloseTo(iso.per_target[1].mean_up + 2 * iso.per_target[1].s_up, 9);
    expect(line('Mean down − 2s')).toBeCloseTo(iso.per_target[1].mean_down - 2 * iso.per_target[1].s_down, 9);
    // Limits: a band as wide as the accuracy target, centred on zero.
    const sets = (await ws.as.viewer.get('/api/target-sets')).body as {
      id: string;
      targets: Record<string, { value: number; unit: string }>;
    }[];
    const accuracy = sets.find((set) => set.id === ref.targetSetId)!.targets.positioningAccuracy;
    const umPer: Record<string, number> = { mm: 1000, um: 1, in: 25400, thou: 25.4 }; // 1 in = 25.4 mm exactly
    const [upper, lower] = runCheck.series!.limits!;
    expect(upper.value - lower.value).toBeCloseTo(accuracy.value * umPer[accuracy.unit], 9);
    expect(upper.value + lower.value).toBeCloseTo(0, 12);
    // The Drives tab's list carries the same statuses.
    const list = await ws.as.viewer.get(`/api/machines/${m}/axes`);
    expect(list.body.find((a: { id: string }) => a.id === x).checks.travelTrial).toMatchObject({
      status: 'within-target',
      recordId: within.body.id,
    });
  });
});
