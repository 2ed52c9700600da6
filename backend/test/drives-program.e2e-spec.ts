import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { sql } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, rackAxis, screwAxis } from './helpers/drives.js';
import { readProgram } from './support/program-reader.js';
import { disposition } from './support/disposition.js';

/** The program read back by an independent RS-274 reader and simulated (support/program-reader.ts). */
function parseProgram(text: string, letter: string) {
  const run = readProgram(text, letter);
  const moves = run.moves.map((m) => ({ from: m.fromMm, to: m.toMm, code: m.code, feed: m.feedMmPerMin }));
  const readings = run.stops.map((s) => ({ at: s.atMm, approach: s.approach }));
  return { ...run, moves, readings, stopsAt: run.stops.map((s) => s.atMm), words: run.codes };
}

/** What every program must keep, whatever its kind (RS-274/NGC modal groups; common practice for a safety line). */
function expectSafeProgram(text: string, letter: string, travelMm: number, units: 'G20' | 'G21') {
  const run = readProgram(text, letter);
  expect(run.safetyAt).toBeGreaterThan(0);
  // No motion or axis word before the safety line, and no word of any kind before it.
  expect(run.firstMotionAt).toBeGreaterThan(run.safetyAt);
  expect(run.blocks.slice(0, run.safetyAt).every((b) => b.words.length === 0)).toBe(true);
  expect(run.modalAfterSafety).toMatchObject({
    plane: 'G17',
    units,
    distance: 'G90',
    feedMode: 'G94',
    cutterComp: 'G40',
  });
  // RS-274/NGC: one word of each modal group per block.
  expect(run.groupClashes).toEqual([]);
  expect(run.moves.length).toBeGreaterThan(0);
  for (const m of run.moves) {
    expect(m.toMm).toBeGreaterThanOrEqual(-1e-6);
    expect(m.toMm).toBeLessThanOrEqual(travelMm + 1e-6);
  }
  // Every comment is whole: nothing in it could end it early or open another.
  for (const b of run.blocks) for (const c of b.comments) expect(c).not.toMatch(/[()[\];%\r\n]/);
  expect(text).not.toMatch(/\r/);
  return run;
}

describe('test programs, speed check and travel envelope', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;
  let xId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Programs');
    other = await createTestWorkshop(app, 'Other');
    machineId = await newMachine(ws, 'router');
    xId = await newAxis(ws, machineId, screwAxis('X'));
  });
  afterAll(() => app.close());

  it('a repeat-and-reverse program: every target in order, from its side, past the ends by the overrun, at the feed asked', async () => {
    const targets = [20, 215.3, 431.7, 640.2, 880];
    const res = await ws.as.viewer
      .get(`/api/axes/${xId}/test-program`)
      .query({ kind: 'positioning', targets: targets.join(','), runs: 5, overrun: 4, feed: 800, dwell: 3 });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/plain/);
    expect(disposition(res.headers['content-disposition'])).toEqual({
      type: 'attachment',
      filename: expect.stringMatching(/-x-repeat-and-reverse\.nc$/),
    });
    const text = res.text;
    // The usual cautions (TRADE.md: moving gantry pinch points, E-stop, plasma off; common practice).
    expect(text).toMatch(/\(CAUTIONS - the machine moves on its own while this program runs\.\)/);
    expect(text).toMatch(/\(Plasma source off so the torch cannot fire, spindle off, laser off\.\)/);
    expect(text).toMatch(/keep hands, tools and people clear of the gantry and its pinch points/);
    expect(text).toMatch(/\(Keep the E-stop within reach/);
    expect(text).toMatch(/\(WORK ZERO: before running, move the X axis to the end its travel is measured from\)/);
    expect(text).toMatch(/Positive X moves away from that zero towards the far end/);
    expect(text).toMatch(/\(The axis will move between X16\.000 and X884\.000 mm\.\)/);
    expect(text).toMatch(/\(Targets mm: 20, 215.3, 431.7, 640.2, 880\)/);
    expect(text).toMatch(/\(Runs: 5 up and 5 down Overrun: 4 mm\)/);
    expect(text).toMatch(/\(Written: \d{4}-\d{2}-\d{2}\)/);
    expectSafeProgram(text, 'X', 920, 'G21');
    const p = parseProgram(text, 'X');
    expect([...p.words].sort()).toEqual(['G0', 'G1', 'G17', 'G21', 'G4', 'G40', 'G80', 'G90', 'G94', 'M1', 'M2']);
    // One optional stop at each target of each run, where the reading is taken.
    expect(p.readings).toHaveLength(5 * 2 * targets.length);
    for (let run = 0; run < 5; run++) {
      const up = p.readings.slice(run * 10, run * 10 + 5);
      const down = p.readings.slice(run * 10 + 5, run * 10 + 10);
      expect(up.map((r) => r.at)).toEqual(targets);
      expect(down.map((r) => r.at)).toEqual([...targets].reverse());
      expect(up.every((r) => r.approach === 'up')).toBe(true);
      expect(down.every((r) => r.approach === 'down')).toBe(true);
    }
    // Reversals happen only beyond the targets, by the overrun.
    const positions = p.moves.map((m) => m.to);
    expect(Math.min(...positions)).toBe(20 - 4);
    expect(Math.max(...positions)).toBe(880 + 4);
    expect(positions.filter((x) => x === 884)).toHaveLength(5);
    expect(p.moves.filter((m) => m.code === 'G1').every((m) => m.feed === 800)).toBe(true);
    expect(text).toMatch(/^G4 P3$/m);
    expect(text.trim().split('\n').slice(-2)).toEqual(['M2', '%']);
  });

  it('default targets: at least five, rising, inside the measured travel with room for the overrun', async () => {
    const res = await ws.as.technician.get(`/api/axes/${xId}/test-program?kind=positioning&format=txt`);
    expect(res.status).toBe(200);
    expect(disposition(res.headers['content-disposition']).filename).toMatch(/\.txt$/);
    const p = parseProgram(res.text, 'X');
    expectSafeProgram(res.text, 'X', 920, 'G21');
    const up = p.readings.slice(0, p.readings.length / 10);
    expect(up.length).toBeGreaterThanOrEqual(5);
    const at = up.map((r) => r.at);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(Math.min(...p.moves.map((m) => m.to))).toBeGreaterThanOrEqual(0);
    expect(Math.max(...p.moves.map((m) => m.to))).toBeLessThanOrEqual(920);
    // uneven spacing so periodic errors are not sampled at one phase
    const gaps = at.slice(1).map((t, i) => Math.round((t - at[i]) * 10) / 10);
    expect(new Set(gaps).size).toBeGreaterThan(1);
    expect(p.readings).toHaveLength(up.length * 10); // five runs each way by default
  });

  it('a travel-trial program: out to each distance from the start and back, a stop to measure at each', async () => {
    const res = await ws.as.technician
      .get(`/api/axes/${xId}/test-program`)
      .query({ kind: 'travel', distances: '100,300,600,850', start: 10, overrun: 5, feed: 1200 });
    expect(res.status).toBe(200);
    expect(disposition(res.headers['content-disposition']).filename).toMatch(/travel-trial\.nc$/);
    const p = parseProgram(res.text, 'X');
    expectSafeProgram(res.text, 'X', 920, 'G21');
    expect(p.words.has('M0')).toBe(false);
    // An optional stop at the start and at each distance: one per reading.
    expect(p.stopsAt).toEqual([10, 110, 310, 610, 860]);
    // every measured position is reached moving up, from the start approached from below
    const arrivals = p.moves.filter((m) => p.stopsAt.slice(1).includes(m.to));
    expect(arrivals.every((m) => m.from === 10)).toBe(true);
    const backToStart = p.moves.filter((m) => m.to === 10);
    expect(backToStart.every((m) => m.from === 5)).toBe(true);
    expect(p.moves.filter((m) => m.code === 'G1').every((m) => m.feed === 1200)).toBe(true);
    expect(res.text).toMatch(/\(Steps per mm in use: 640\)/);
  });

  it.each([
    [{}, /kind must be travel or positioning/],
    [{ kind: 'positioning', runs: 1 }, /runs must be a whole number from 2 to 20/],
    [{ kind: 'positioning', runs: 'five' }, /runs must be a whole number/],
    [{ kind: 'positioning', overrun: 0 }, /overrun must be greater than zero/],
    [{ kind: 'positioning', targets: '100,50,200' }, /targets must rise along the axis/],
    [{ kind: 'positioning', targets: '100' }, /targets needs at least 2 positions/],
    [{ kind: 'positioning', targets: '100,500,918' }, /beyond its measured travel of 920 mm/],
    [{ kind: 'positioning', targets: '2,500' }, /below 0 of its work coordinates/],
    [
      { kind: 'positioning', lengthUnit: 'in', targets: '1,36.1' },
      /targets with the overrun takes the axis to 36.29685 in, beyond its measured travel of 36.220472 in/,
    ],
    [{ kind: 'positioning', lengthUnit: 'cm' }, /lengthUnit must be one of mm, um, in, thou/],
    [{ kind: 'positioning', notes: 'x'.repeat(201) }, /notes must be at most 200 characters/],
    [{ kind: 'positioning', feed: 9000 }, /feed must not exceed the axis's fastest feed of 5000 mm\/min/],
    [{ kind: 'positioning', feed: 'fast' }, /feed must be a number \(lengthUnit per minute\)/],
    [{ kind: 'travel', distances: 'far' }, /distances must be comma-separated numbers/],
    [{ kind: 'travel', distances: '100,-50' }, /distances must all be greater than zero/],
    [{ kind: 'travel', start: 2 }, /start less the overrun takes the axis to -3 mm, below 0 of its work coordinates/],
    [
      { kind: 'travel', start: 100, distances: '500,900' },
      /distances takes the axis to 1000 mm, beyond its measured travel of 920 mm/,
    ],
    [{ kind: 'travel', letter: 'Q' }, /letter must be one of/],
    [{ kind: 'travel', format: 'pdf' }, /format must be nc or txt/],
  ])('test program %j is refused with 400 naming the field', async (query, message) => {
    const res = await ws.as.technician.get(`/api/axes/${xId}/test-program`).query(query);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('an axis whose name is no axis letter needs ?letter=; one without measured travel needs the positions', async () => {
    const id = await newAxis(ws, machineId, { ...screwAxis('Gantry left'), measuredTravelMm: undefined });
    const res = await ws.as.technician.get(`/api/axes/${id}/test-program?kind=travel`);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/letter is needed/);
    expect(JSON.stringify(res.body.message)).toMatch(/distances is required when the axis has no measured travel/);
    const ok = await ws.as.technician.get(`/api/axes/${id}/test-program?kind=travel&letter=y&distances=50,100`);
    expect(ok.status).toBe(200);
    expect(parseProgram(ok.text, 'Y').stopsAt).toEqual([5, 55, 105]);
    expect((await other.as.owner.get(`/api/axes/${id}/test-program?kind=travel&letter=Y&distances=50`)).status).toBe(
      404,
    );
  });

  describe('text that reaches a program', () => {
    const hostile = [
      'Table\nG0 X-500',
      'Table\r\nG0 X-500\rM3',
      'Table (G0 X-500) and ) G0 X-500 (',
      'Table ; G0 X-500',
      'Table %\nG0 X-500\n%',
      'Table [G0 X-500] {M3} <G0> #1=5 *7 / G0 X-500',
      'Tablé µ – “quoted”\u0085G0 X-500\u2028G0 X-500',
    ];

    it.each(hostile)('a machine, axis and notes text %j cannot end a comment or make a new block', async (name) => {
      const m = await newMachine(ws, 'router');
      const axis = await newAxis(ws, m, screwAxis('X'));
      const db = app.get<Database>(DRIZZLE);
      // Written straight to the rows, so the test holds whatever the forms let through.
      await db.execute(sql`update machines set name = ${name} where id = ${m}`);
      await db.execute(sql`update axes set name = ${`X ${name}`} where id = ${axis}`);
      const plain = await ws.as.technician
        .get(`/api/axes/${axis}/test-program`)
        .query({ kind: 'positioning', targets: '20,400,880', runs: 2, letter: 'X' });
      expect(plain.status).toBe(200);
      const withNotes = await ws.as.technician
        .get(`/api/axes/${axis}/test-program`)
        .query({ kind: 'positioning', targets: '20,400,880', runs: 2, letter: 'X', notes: name });
      expect(withNotes.status).toBe(200);
      for (const text of [plain.text, withNotes.text]) {
        const run = expectSafeProgram(text, 'X', 920, 'G21');
        expect(run.moves.every((m) => m.toMm !== -500)).toBe(true);
        expect(run.codes.has('M3')).toBe(false);
        // Only the program's own words, each block as written: % twice, comments, and the known words.
        for (const b of run.blocks)
          for (const w of b.words)
            expect(w).toMatch(/^(G(0|1|4|17|21|40|80|90|94)|M(1|2)|X\d+(\.\d+)?|F\d+(\.\d+)?|P\d+(\.\d+)?)$/);
        expect(text.split('\n').filter((l) => l === '%')).toHaveLength(2);
        expect(
          text
            .split('\n')
            .filter((l) => l !== '' && l !== '%')
            .every((l) => /^(\(|G|M)/.test(l)),
        ).toBe(true);
      }
      // The notes add exactly one line to the header, and nothing else.
      expect(withNotes.text.split('\n').length).toBe(plain.text.split('\n').length + 1);
      expect(disposition(plain.headers['content-disposition'])).toEqual({
        type: 'attachment',
        filename: expect.stringMatching(/^[a-z0-9-]+\.nc$/),
      });
    });
  });

  describe('an axis set up in inches', () => {
    let inchAxis: string;
    beforeAll(async () => {
      inchAxis = await newAxis(ws, machineId, screwAxis('U'));
      await app.get<Database>(DRIZZLE).execute(sql`update axes set length_unit = 'in' where id = ${inchAxis}`);
    });

    it('gets its program in G20: every coordinate and feed in inches, the same moves as in mm', async () => {
      const res = await ws.as.technician
        .get(`/api/axes/${inchAxis}/test-program`)
        .query({ kind: 'positioning', lengthUnit: 'in', targets: '1,10,20,30,35', runs: 2, overrun: 0.25, feed: 40 });
      expect(res.status).toBe(200);
      const run = expectSafeProgram(res.text, 'U', 920, 'G20');
      expect(run.codes.has('G21')).toBe(false);
      // 1 in = 25.4 mm exactly (NIST SP 811); the reader converts G20 coordinates back to mm.
      expect(run.stops.slice(0, 5).map((s) => s.atMm)).toEqual(
        [25.4, 254, 508, 762, 889].map((v) => expect.closeTo(v, 9)),
      );
      expect(Math.min(...run.moves.map((m) => m.toMm))).toBeCloseTo(0.75 * 25.4, 9);
      expect(run.moves.filter((m) => m.code === 'G1').every((m) => Math.abs(m.feedMmPerMin! - 40 * 25.4) < 1e-9)).toBe(
        true,
      );
      expect(res.text).toMatch(/^G1 U10\.0000 F40$/m);
      expect(res.text).toMatch(/\(Units: inches G20/);
      // The same run asked in mm gives the same moves.
      const mm = await ws.as.technician
        .get(`/api/axes/${inchAxis}/test-program`)
        .query({ kind: 'positioning', targets: '25.4,254,508,762,889', runs: 2, overrun: 6.35, feed: 1016 });
      const again = readProgram(mm.text, 'U');
      expect(again.moves.map((m) => m.toMm)).toEqual(run.moves.map((m) => expect.closeTo(m.toMm, 6)));
    });

    it('a travel trial in inches keeps its stops where they were asked', async () => {
      const res = await ws.as.technician
        .get(`/api/axes/${inchAxis}/test-program`)
        .query({ kind: 'travel', lengthUnit: 'in', start: 0.5, distances: '4,12,24', overrun: 0.25 });
      expect(res.status).toBe(200);
      const run = expectSafeProgram(res.text, 'U', 920, 'G20');
      expect(run.stops.map((s) => s.atMm / 25.4)).toEqual([0.5, 4.5, 12.5, 24.5].map((v) => expect.closeTo(v, 9)));
    });
  });

  describe('the targets of the repeat-and-reverse run', () => {
    it('one list for the program and the entry grid: the program reads at exactly the targets the route gives', async () => {
      const t = await ws.as.viewer.get(`/api/axes/${xId}/test-targets`);
      expect(t.status).toBe(200);
      expect(t.body).toMatchObject({ lengthUnit: 'mm', overrun: 5, overrunMm: 5, runs: 5, reason: null });
      expect(t.body.targets.length).toBeGreaterThanOrEqual(5);
      expect(t.body.targetsMm).toEqual(t.body.targets);
      expect(t.body.source).toMatch(/ISO 230-2/);
      const prog = await ws.as.technician.get(`/api/axes/${xId}/test-program?kind=positioning`);
      const run = readProgram(prog.text, 'X');
      expect(run.stops.slice(0, t.body.targets.length).map((s) => s.atMm)).toEqual(t.body.targetsMm);
      // M1 count = targets × runs × 2 directions: a stop at every reading and nowhere else.
      expect(run.stops).toHaveLength(t.body.targets.length * t.body.runs * 2);
      const wider = await ws.as.viewer.get(`/api/axes/${xId}/test-targets`).query({ overrun: 20 });
      expect(Math.min(...wider.body.targetsMm)).toBe(40);
      expect((await ws.as.viewer.get(`/api/axes/${xId}/test-targets`).query({ overrun: 0 })).status).toBe(400);
    });

    it('an inch axis gets its targets in inches, and an axis without travel says why the list is empty', async () => {
      const inch = await newAxis(ws, machineId, screwAxis('V'));
      await app.get<Database>(DRIZZLE).execute(sql`update axes set length_unit = 'in' where id = ${inch}`);
      const t = await ws.as.viewer.get(`/api/axes/${inch}/test-targets`);
      expect(t.body.lengthUnit).toBe('in');
      t.body.targets.forEach((v: number, i: number) => {
        expect(Math.abs(v * 10 - Math.round(v * 10))).toBeLessThan(1e-9);
        expect(t.body.targetsMm[i]).toBeCloseTo(v * 25.4, 9);
      });
      const bare = await newAxis(ws, machineId, { ...screwAxis('W'), measuredTravelMm: undefined });
      const none = await ws.as.viewer.get(`/api/axes/${bare}/test-targets`);
      expect(none.body).toMatchObject({ targets: [], targetsMm: [] });
      expect(none.body.reason).toMatch(/no measured travel/);
      expect((await other.as.owner.get(`/api/axes/${xId}/test-targets`)).status).toBe(404);
    });
  });

  describe('speed check', () => {
    it('16 × 5 rolled screw, fixed-supported over 1000 mm at 5000 mm/min', async () => {
      const res = await ws.as.builder.get(`/api/axes/${xId}/speed-check`);
      expect(res.status).toBe(200);
      // ballscrew_16x5_derived_speeds.csv: THK λ2 = 15.1, d1 = 12.9 mm, lb = 1000 mm → permissible 1947.9 rpm, critical 2434.875 rpm
      expect(res.body.permissibleSpeed).toBeCloseTo(1947.9, 6);
      expect(res.body.criticalSpeed).toBeCloseTo(2434.875, 6);
      // HIWIN d·n ≤ 70 000 for rolled screws, ds = 16 → 4375 rpm (ballscrew_critical_speed.json)
      expect(res.body.dnLimitSpeed).toBeCloseTo(4375, 9);
      expect(res.body.rpm).toBe(1000);
      expect(res.body.feedRate).toBe(5000);
      // router default headroom 10 %: allowed 0.9 × 1947.9 rpm, highest safe feed 5 mm × that
      expect(res.body.allowedSpeed).toBeCloseTo(1753.11, 6);
      expect(res.body.safeFeedRate).toBeCloseTo(8765.55, 6);
      expect(res.body.maxFeedRate).toBeCloseTo(9739.5, 6);
      expect(res.body).toMatchObject({
        applicable: true,
        withinLimits: true,
        status: 'within-target',
        limitedBy: 'critical-speed',
      });
      expect(res.body.source).toMatch(/THK Ball Screw General Catalog/);
      const calc = await ws.as.viewer.post('/api/calc/screw-speed').send({
        nominalDiameter: 16,
        rootDiameter: 12.9,
        unsupportedLength: 1000,
        lead: 5,
        mounting: 'fixed-supported',
        feedRate: 5000,
      });
      expect(calc.status).toBe(200);
      for (const k of [
        'rpm',
        'criticalSpeed',
        'permissibleSpeed',
        'dnLimitSpeed',
        'maxFeedRate',
        'withinLimits',
      ] as const)
        expect(res.body[k]).toBe(calc.body[k]);
    });

    it('MISUMI worked example: Ø15, lead 5, root 12.5 mm, fixed-support, 790 mm → 3024 rpm allowed', async () => {
      const id = await newAxis(ws, machineId, {
        ...screwAxis('Y'),
        drive: {
          type: 'screw',
          lead: 5,
          nominalDiameter: 15,
          rootDiameter: 12.5,
          unsupportedLength: 790,
          mounting: 'fixed-supported',
        },
        maxFeedRate: 14500,
      });
      const res = await ws.as.technician.get(`/api/axes/${id}/speed-check`);
      // MISUMI Economy Series, allowable rotational speed example: 3024 min⁻¹ (0.8 factor included)
      expect(Math.round(res.body.permissibleSpeed)).toBe(3024);
      // 2900 rpm is below 3024 rpm but not 10 % below it: within the catalogue limit, outside the target
      expect(res.body.rpm).toBe(2900);
      expect(res.body.withinLimits).toBe(true);
      expect(res.body.status).toBe('outside-target');
    });

    it('DENSO example: 3000 rpm over 850 mm needs root ≥ 14.4 mm and d·n ≤ 70 000 gives d ≤ 23.3 mm', async () => {
      const denso = (root: number, nominal: number, name: string) => ({
        ...screwAxis(name),
        drive: {
          type: 'screw',
          lead: 10,
          nominalDiameter: nominal,
          rootDiameter: root,
          unsupportedLength: 850,
          mounting: 'fixed-supported',
        },
        maxFeedRate: 30000,
        motorStepsPerRev: 200,
        microsteps: 8,
        stepsPerMm: 160,
      });
      const pass = await ws.as.technician.get(
        `/api/axes/${await newAxis(ws, machineId, denso(14.4, 23, 'Z1'))}/speed-check`,
      );
      expect(pass.body.rpm).toBe(3000);
      expect(pass.body.permissibleSpeed).toBeGreaterThanOrEqual(3000);
      expect(pass.body.withinLimits).toBe(true);
      const thinRoot = await ws.as.technician.get(
        `/api/axes/${await newAxis(ws, machineId, denso(14.3, 23, 'Z2'))}/speed-check`,
      );
      expect(thinRoot.body.permissibleSpeed).toBeLessThan(3000);
      expect(thinRoot.body.withinLimits).toBe(false);
      const fat = await ws.as.technician.get(
        `/api/axes/${await newAxis(ws, machineId, denso(14.4, 24, 'Z3'))}/speed-check`,
      );
      expect(fat.body.dnLimitSpeed).toBeLessThan(3000);
      expect(fat.body).toMatchObject({ withinLimits: false, status: 'outside-target' });
    });

    it('belt and rack drives: not applicable, said in words; a screw without a fastest feed is not started', async () => {
      const rack = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, rackAxis('A'))}/speed-check`);
      expect(rack.body).toMatchObject({ applicable: false, status: 'not-applicable', rpm: null });
      expect(rack.body.reason).toMatch(/rack-and-pinion drive has no screw to whirl/);
      const bare = await ws.as.technician.get(
        `/api/axes/${await newAxis(ws, machineId, { ...screwAxis('B'), maxFeedRate: undefined })}/speed-check`,
      );
      expect(bare.body).toMatchObject({ applicable: true, status: 'not-started', missing: ['maxFeedRate'] });
    });
  });

  describe('travel envelope', () => {
    it('a 3000 × 1500 plasma table: X and both Y sides must cover the work area plus 25 mm', async () => {
      const m = await newMachine(ws, 'plasma', { x: 3000, y: 1500 });
      let res = await ws.as.viewer.get(`/api/machines/${m}/travel-envelope`);
      expect(res.body).toMatchObject({ status: 'not-started', missing: ['an X axis', 'a Y axis'] });
      await newAxis(ws, m, { ...rackAxis('X'), measuredTravelMm: 3030 });
      await newAxis(ws, m, { ...rackAxis('Y1'), measuredTravelMm: 1530 });
      const y2 = await newAxis(ws, m, { ...rackAxis('Y2'), measuredTravelMm: 1520 });
      await newAxis(ws, m, { ...screwAxis('Z'), measuredTravelMm: 150 });
      res = await ws.as.viewer.get(`/api/machines/${m}/travel-envelope`);
      expect(res.status).toBe(200);
      expect(res.body.marginMm).toBe(25);
      expect(res.body.axes.map((a: { axis: string }) => a.axis)).toEqual(['X', 'Y1', 'Y2']);
      expect(res.body.axes[0]).toMatchObject({ requiredTravel: 3025, spare: 5, covers: true });
      expect(res.body.axes[2]).toMatchObject({ requiredTravel: 1525, spare: -5, covers: false });
      expect(res.body.status).toBe('outside-target');
      expect(res.body.summary).toMatch(/Y2 is 5.0 mm short/);
      await ws.as.technician.patch(`/api/axes/${y2}`).send({ measuredTravelMm: 1531 });
      res = await ws.as.viewer.get(`/api/machines/${m}/travel-envelope`);
      expect(res.body.status).toBe('within-target');
    });
  });
});
