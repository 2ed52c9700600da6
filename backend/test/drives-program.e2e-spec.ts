import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newAxis, newMachine, rackAxis, screwAxis } from './helpers/drives.js';

/** A tiny RS-274 reader for what the test programs use: words after stripping (comments). */
function parseProgram(text: string, letter: string) {
  let pos: number | null = null;
  let feed: number | null = null;
  const moves: { from: number | null; to: number; code: string; feed: number | null }[] = [];
  const readings: { at: number; approach: 'up' | 'down' }[] = [];
  const stops: number[] = [];
  const words = new Set<string>();
  let lastMoveDir: 'up' | 'down' | null = null;
  for (const raw of text.split('\n')) {
    const line = raw.replace(/\([^)]*\)/g, '').trim();
    if (!line || line === '%') continue;
    const tokens = line.split(/\s+/);
    const codes = tokens.filter((t) => /^[GM]\d+$/.test(t));
    codes.forEach((c) => words.add(c));
    for (const t of tokens) if (!/^[GMFP]\d+(\.\d+)?$/.test(t) && !new RegExp(`^${letter}-?\\d+\\.\\d{3}$`).test(t)) throw new Error(`unexpected word ${t} in "${raw}"`);
    const f = tokens.find((t) => t.startsWith('F'));
    if (f) feed = Number(f.slice(1));
    const axisWord = tokens.find((t) => t.startsWith(letter));
    if (axisWord && (codes.includes('G0') || codes.includes('G1'))) {
      const to = Number(axisWord.slice(1));
      if (pos !== null && to !== pos) lastMoveDir = to > pos ? 'up' : 'down';
      moves.push({ from: pos, to, code: codes.includes('G0') ? 'G0' : 'G1', feed: codes.includes('G1') ? feed : null });
      pos = to;
    }
    if (codes.includes('G4')) readings.push({ at: pos!, approach: lastMoveDir! });
    if (codes.includes('M0')) stops.push(pos!);
  }
  return { moves, readings, stops, words };
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
    const res = await ws.as.viewer.get(`/api/axes/${xId}/test-program`).query({ kind: 'positioning', targets: targets.join(','), runs: 5, overrun: 4, feed: 800, dwell: 3 });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/plain/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename=".*-x-repeat-and-reverse\.nc"$/);
    const text = res.text;
    expect(text).toMatch(/\(CAUTION: run this program with the plasma source or torch off, the spindle off/);
    expect(text).toMatch(/hands, tools and people clear of the gantry/);
    expect(text).toMatch(/\(Targets mm: 20, 215.3, 431.7, 640.2, 880\)/);
    expect(text).toMatch(/\(Runs: 5 up and 5 down {2}Overrun: 4 mm\)/);
    expect(text).toMatch(/\(Written: \d{4}-\d{2}-\d{2}\)/);
    const p = parseProgram(text, 'X');
    expect([...p.words].sort()).toEqual(['G0', 'G1', 'G21', 'G4', 'G90', 'M2']);
    expect(text.indexOf('G21')).toBeLessThan(text.indexOf('G0 '));
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
    expect(text).toMatch(/G4 P3 /);
    expect(text.trim().split('\n').slice(-2)).toEqual(['M2', '%']);
  });

  it('default targets: at least five, rising, inside the measured travel with room for the overrun', async () => {
    const res = await ws.as.technician.get(`/api/axes/${xId}/test-program?kind=positioning&format=txt`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/\.txt"$/);
    const p = parseProgram(res.text, 'X');
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
    const res = await ws.as.technician.get(`/api/axes/${xId}/test-program`).query({ kind: 'travel', distances: '100,300,600,850', start: 10, overrun: 5, feed: 1200 });
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/travel-trial\.nc"$/);
    const p = parseProgram(res.text, 'X');
    expect(p.words.has('M0')).toBe(true);
    expect(p.stops).toEqual([10, 110, 310, 610, 860]);
    // every measured position is reached moving up, from the start approached from below
    const arrivals = p.moves.filter((m) => p.stops.slice(1).includes(m.to));
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
    [{ kind: 'positioning', targets: '2,500' }, /below 0 mm/],
    [{ kind: 'positioning', feed: 9000 }, /feed must not exceed the axis's fastest feed of 5000 mm\/min/],
    [{ kind: 'positioning', feed: 'fast' }, /feed must be a number of mm\/min/],
    [{ kind: 'travel', distances: 'far' }, /distances must be comma-separated numbers/],
    [{ kind: 'travel', distances: '100,-50' }, /distances must all be greater than zero/],
    [{ kind: 'travel', start: 2 }, /start less the overrun takes the axis to -3.000 mm, below 0 mm/],
    [{ kind: 'travel', start: 100, distances: '500,900' }, /distances takes the axis to 1000.000 mm, beyond its measured travel of 920 mm/],
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
    expect(parseProgram(ok.text, 'Y').stops).toEqual([5, 55, 105]);
    expect((await other.as.owner.get(`/api/axes/${id}/test-program?kind=travel&letter=Y&distances=50`)).status).toBe(404);
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
      expect(res.body).toMatchObject({ applicable: true, withinLimits: true, status: 'within-target', limitedBy: 'critical-speed' });
      expect(res.body.source).toMatch(/THK Ball Screw General Catalog/);
      const calc = await ws.as.viewer.post('/api/calc/screw-speed').send({ nominalDiameter: 16, rootDiameter: 12.9, unsupportedLength: 1000, lead: 5, mounting: 'fixed-supported', feedRate: 5000 });
      expect(calc.status).toBe(200);
      for (const k of ['rpm', 'criticalSpeed', 'permissibleSpeed', 'dnLimitSpeed', 'maxFeedRate', 'withinLimits'] as const) expect(res.body[k]).toBe(calc.body[k]);
    });

    it('MISUMI worked example: Ø15, lead 5, root 12.5 mm, fixed-support, 790 mm → 3024 rpm allowed', async () => {
      const id = await newAxis(ws, machineId, { ...screwAxis('Y'), drive: { type: 'screw', lead: 5, nominalDiameter: 15, rootDiameter: 12.5, unsupportedLength: 790, mounting: 'fixed-supported' }, maxFeedRate: 14500 });
      const res = await ws.as.technician.get(`/api/axes/${id}/speed-check`);
      // MISUMI Economy Series, allowable rotational speed example: 3024 min⁻¹ (0.8 factor included)
      expect(Math.round(res.body.permissibleSpeed)).toBe(3024);
      // 2900 rpm is below 3024 rpm but not 10 % below it: within the catalogue limit, outside the target
      expect(res.body.rpm).toBe(2900);
      expect(res.body.withinLimits).toBe(true);
      expect(res.body.status).toBe('outside-target');
    });

    it('DENSO example: 3000 rpm over 850 mm needs root ≥ 14.4 mm and d·n ≤ 70 000 gives d ≤ 23.3 mm', async () => {
      const denso = (root: number, nominal: number, name: string) => ({ ...screwAxis(name), drive: { type: 'screw', lead: 10, nominalDiameter: nominal, rootDiameter: root, unsupportedLength: 850, mounting: 'fixed-supported' }, maxFeedRate: 30000, motorStepsPerRev: 200, microsteps: 8, stepsPerMm: 160 });
      const pass = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, denso(14.4, 23, 'Z1'))}/speed-check`);
      expect(pass.body.rpm).toBe(3000);
      expect(pass.body.permissibleSpeed).toBeGreaterThanOrEqual(3000);
      expect(pass.body.withinLimits).toBe(true);
      const thinRoot = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, denso(14.3, 23, 'Z2'))}/speed-check`);
      expect(thinRoot.body.permissibleSpeed).toBeLessThan(3000);
      expect(thinRoot.body.withinLimits).toBe(false);
      const fat = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, denso(14.4, 24, 'Z3'))}/speed-check`);
      expect(fat.body.dnLimitSpeed).toBeLessThan(3000);
      expect(fat.body).toMatchObject({ withinLimits: false, status: 'outside-target' });
    });

    it('belt and rack drives: not applicable, said in words; a screw without a fastest feed is not started', async () => {
      const rack = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, rackAxis('A'))}/speed-check`);
      expect(rack.body).toMatchObject({ applicable: false, status: 'not-applicable', rpm: null });
      expect(rack.body.reason).toMatch(/rack-and-pinion drive has no screw to whirl/);
      const bare = await ws.as.technician.get(`/api/axes/${await newAxis(ws, machineId, { ...screwAxis('B'), maxFeedRate: undefined })}/speed-check`);
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
