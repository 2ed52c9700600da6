import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { SubjectsRegistry } from '../src/records/subjects.registry.js';
import { anonymous, createTestApp, createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { eq } from 'drizzle-orm';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { rails } from '../src/database/schema/index.js';
import { lockAsApproved } from './support/stand-in-approval.js';

// A 300 mm rail with holes every 60 mm from 30 mm: holes 0…4 at 30, 90, 150, 210, 270 mm.
// Proposed fixing order (one end, the far end, then halving the gaps): 0, 4, 2, 1, 3.
const RAIL = { label: 'Y1 (left)', axis: 'Y1', length: 300, profileSize: 20, holePitch: 60, firstHole: 30 };
const POSITIONS = [30, 90, 150, 210, 270];
const THOU_MM = 0.0254; // 1 thou = 0.001 in = 0.0254 mm exactly

interface Hole {
  index: number;
  position: number;
  at: number;
  order: number;
  target: number | null;
  targetMm: number | null;
  reading: number | null;
  readingMm: number | null;
  difference: number | null;
  onTarget: boolean | null;
  fixed: boolean;
  fixedAt: string | null;
  fixedBy: string | null;
}

describe('bolt-down guide API', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  const newRail = async (agent: Agent = ws.as.builder) => {
    const res = await agent.post(`/api/machines/${machineId}/rails`).send(RAIL);
    expect(res.status).toBe(201);
    return res.body.id as string;
  };
  const start = async (
    railId: string,
    body: Record<string, unknown> = { mode: 'line', readingUnit: 'thou' },
    agent: Agent = ws.as.builder,
  ) => {
    const res = await agent.post(`/api/rails/${railId}/bolt-downs`).send(body);
    expect(res.status).toBe(201);
    return res.body as { id: string; holes: Hole[]; [k: string]: unknown };
  };
  const put = (id: string, index: number | string, body: Record<string, unknown>, agent: Agent = ws.as.builder) =>
    agent.put(`/api/bolt-downs/${id}/holes/${index}`).send(body);
  const fix = async (id: string, index: number, reading: number, agent: Agent = ws.as.builder) => {
    const res = await put(id, index, { reading, fixed: true, writeId: randomUUID() }, agent);
    expect(res.status).toBe(200);
    return res.body as {
      holes: Hole[];
      nextHole: number | null;
      complete: boolean;
      repeated: boolean;
      fixedCount: number;
    };
  };
  const boltDownHistory = async (writeId?: string) => {
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    const entries = (
      res.body.entries as { recordType: string; changes: { writeId?: string } | null; summary: string }[]
    ).filter((e) => e.recordType === 'bolt-down');
    return writeId ? entries.filter((e) => e.changes?.writeId === writeId) : entries;
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Bolt-down');
    other = await createTestWorkshop(app, 'Other');
    const machine = await ws.as.builder
      .post('/api/machines')
      .send({ name: 'Plasma', kind: 'plasma', workArea: { x: 3000, y: 1500 } });
    machineId = machine.body.id;
  });
  afterAll(() => app.close());

  // 1 thou = 0.0254 mm exactly: the same readings typed in mm and in thou give the same aims in mm;
  // hole positions come back in the bolt-down's length unit as well as in mm.
  it('mm and thou/inch give the same guide', async () => {
    const metric = await start(await newRail(), { mode: 'line', readingUnit: 'mm', lengthUnit: 'mm' });
    const inch = await start(await newRail(), { mode: 'line', readingUnit: 'thou', lengthUnit: 'in' });
    expect(inch).toMatchObject({ readingUnit: 'thou', lengthUnit: 'in' });
    expect(inch.holes[1].at).toBeCloseTo(90 / 25.4, 12);
    const thou = [0, 2, 1, 3, 1];
    let a: Awaited<ReturnType<typeof fix>> | null = null;
    let b: Awaited<ReturnType<typeof fix>> | null = null;
    for (let k = 0; k < 4; k++) {
      const hole = a?.nextHole ?? 0;
      a = await fix(metric.id, hole, (thou[k] * 254) / 10000);
      b = await fix(inch.id, hole, thou[k]);
    }
    a!.holes.forEach((h, i) => {
      expect(b!.holes[i].targetMm ?? null).toEqual(h.targetMm === null ? null : expect.closeTo(h.targetMm, 12));
      expect(b!.holes[i].onTarget).toBe(h.onTarget);
    });
  });

  it('refuses to begin on a rail whose holes sit on its end, naming the rail field', async () => {
    const db = app.get<Database>(DRIZZLE);
    const id = await newRail();
    // A rail saved before end distances were kept: 300 mm long, holes from 0 mm.
    await db.update(rails).set({ firstHoleMm: 0 }).where(eq(rails.id, id));
    const res = await ws.as.builder.post(`/api/rails/${id}/bolt-downs`).send({ mode: 'line' });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual([
      expect.stringMatching(
        /^railId: rail Y1 \(left\) has a hole at 0 mm on or beyond its start .* correct the rail's firstHole, holePitch or length first/,
      ),
    ]);
  });

  it('a builder begins a bolt-down: holes from the rail, the proposed order, nothing fixed yet', async () => {
    const railId = await newRail();
    const res = await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'thou' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      railId,
      machineId,
      mode: 'line',
      readingUnit: 'thou',
      nextHole: 0,
      fixedCount: 0,
      holeCount: 5,
      complete: false,
      finalSweepId: null,
    });
    expect(res.body.rail).toEqual({ label: 'Y1 (left)', axis: 'Y1', lengthMm: 300 });
    expect(res.body.holes.map((h: Hole) => h.position)).toEqual(POSITIONS);
    expect(res.body.holes.map((h: Hole) => h.order)).toEqual([0, 3, 2, 4, 1]);
    expect(res.body.holes[0]).toEqual({
      index: 0,
      position: 30,
      at: 30,
      order: 0,
      target: null,
      targetMm: null,
      reading: null,
      readingMm: null,
      difference: null,
      onTarget: null,
      fixed: false,
      fixedAt: null,
      fixedBy: null,
    });
    // The plasma default target is 2 thou of straightness (common practice); the band is half of it.
    expect(res.body.band).toBeCloseTo(1, 12);
    expect(res.body.bandMm).toBeCloseTo(THOU_MM, 12);
    // mm when no unit is given; a band given in the unit is kept.
    const mm = await start(railId, { mode: 'face', band: 0.01 });
    expect(mm).toMatchObject({ readingUnit: 'mm', mode: 'face', band: 0.01, bandMm: 0.01 });
  });

  it('recomputes the aims of the open holes as holes are fixed (line mode, worked by hand)', async () => {
    const railId = await newRail();
    const bd = await start(railId);
    let s = await fix(bd.id, 0, 0);
    expect(s.nextHole).toBe(4);
    expect(s.holes[4].target).toBe(0); // only hole 0 fixed: its reading
    s = await fix(bd.id, 4, 2.0);
    // Line from (30 mm, 0) to (270 mm, 2.0 thou): at 150 mm, 1.0 thou.
    expect(s.nextHole).toBe(2);
    expect(s.holes[2].target).toBeCloseTo(1.0, 12);
    expect(s.holes[4]).toMatchObject({ reading: 2.0, fixed: true, fixedBy: expect.stringContaining('builder') });
    expect(s.holes[4].readingMm).toBeCloseTo(2 * THOU_MM, 15);
    expect(Date.parse(s.holes[4].fixedAt!)).not.toBeNaN();
    s = await fix(bd.id, 2, 1.4);
    // (30, 0)–(150, 1.4): at 90 → 0.7; (150, 1.4)–(270, 2.0): at 210 → 1.7 thou.
    expect(s.holes[1].target).toBeCloseTo(0.7, 12);
    expect(s.holes[3].target).toBeCloseTo(1.7, 12);
    // Hole 2 keeps the aim it was fixed against; 0.4 thou off is within the ±1 thou band.
    expect(s.holes[2].target).toBeCloseTo(1.0, 12);
    expect(s.holes[2].difference).toBeCloseTo(0.4, 12);
    expect(s.holes[2].onTarget).toBe(true);
    expect(s).toMatchObject({ nextHole: 1, fixedCount: 3, complete: false });
  });

  it('aims every hole at the first fixed reading in face mode', async () => {
    const bd = await start(await newRail(), { mode: 'face', readingUnit: 'mm' });
    await fix(bd.id, 0, 0.012);
    const s = await fix(bd.id, 4, 0.05);
    for (const i of [1, 2, 3, 4]) expect(s.holes[i].target).toBe(0.012);
    expect(s.holes[4].difference).toBeCloseTo(0.038, 12);
    // 0.038 mm off is outside the default band of 1 thou (0.0254 mm).
    expect(s.holes[4].onTarget).toBe(false);
  });

  it('keeps progress on the server: another device and a later visit see the same state', async () => {
    const railId = await newRail();
    const bd = await start(railId);
    await fix(bd.id, 0, 0.5, ws.as.technician);
    await fix(bd.id, 4, 1.5);
    const again = await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`);
    expect(again.status).toBe(200);
    expect(again.body.holes[0]).toMatchObject({
      reading: 0.5,
      fixed: true,
      fixedBy: expect.stringContaining('technician'),
    });
    expect(again.body).toMatchObject({ nextHole: 2, fixedCount: 2 });
    const second = await start(railId, { mode: 'face' });
    const list = await ws.as.viewer.get(`/api/rails/${railId}/bolt-downs`);
    expect(list.status).toBe(200);
    expect(list.body.map((b: { id: string }) => b.id)).toEqual([second.id, bd.id]);
    expect(list.body[1].fixedCount).toBe(2);
  });

  it('treats a repeated writeId as the same write: applied once, answered the same', async () => {
    const bd = await start(await newRail());
    const writeId = randomUUID();
    const first = await put(bd.id, 0, { reading: 0.3, fixed: true, writeId });
    const repeat = await put(bd.id, 0, { reading: 0.3, fixed: true, writeId });
    expect(first.status).toBe(200);
    expect(repeat.status).toBe(200);
    expect(first.body).toMatchObject({ writeId, repeated: false });
    expect(repeat.body).toMatchObject({ writeId, repeated: true });
    expect(repeat.body.holes[0]).toEqual(first.body.holes[0]);
    expect(await boltDownHistory(writeId)).toHaveLength(1);

    // A later write with a new id for the same hole changes it; replaying the old id does not undo it.
    const later = await put(bd.id, 0, { reading: 0.6, fixed: true, writeId: randomUUID() });
    expect(later.body.holes[0].reading).toBe(0.6);
    const stale = await put(bd.id, 0, { reading: 0.3, fixed: true, writeId });
    expect(stale.body).toMatchObject({ repeated: true });
    expect(stale.body.holes[0].reading).toBe(0.6);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.holes[0].reading).toBe(0.6);

    // The same id for another hole is not the same write.
    const misuse = await put(bd.id, 4, { reading: 1, fixed: true, writeId });
    expect(misuse.status).toBe(409);
    expect(misuse.body.message).toMatch(/writeId/);
  });

  it('applies copies of one write racing each other exactly once', async () => {
    const bd = await start(await newRail());
    const writeId = randomUUID();
    const answers = await Promise.all([0, 1, 2, 3].map(() => put(bd.id, 0, { reading: 0.2, fixed: true, writeId })));
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200]);
    expect(answers.filter((a) => a.body.repeated === false)).toHaveLength(1);
    expect(await boltDownHistory(writeId)).toHaveLength(1);
    // One fix, so the next fix is the second in sequence and the datum is still hole 0.
    const s = await fix(bd.id, 4, 1);
    expect(s.holes[2].target).toBeCloseTo(0.6, 12);
  });

  it('loosening a fixed hole takes it out of the aims and the count', async () => {
    const bd = await start(await newRail(), { mode: 'face', readingUnit: 'thou' });
    await fix(bd.id, 0, 0.2);
    await fix(bd.id, 4, 0.5);
    const res = await put(bd.id, 0, { reading: 0.2, fixed: false, writeId: randomUUID() });
    expect(res.status).toBe(200);
    expect(res.body.holes[0]).toMatchObject({ fixed: false, fixedAt: null, fixedBy: null, reading: 0.2 });
    // Hole 4 is now the first fixed hole: every aim is its reading.
    expect(res.body.holes[2].target).toBe(0.5);
    expect(res.body).toMatchObject({ fixedCount: 1, nextHole: 0 });
    expect((await boltDownHistory()).some((e) => /loosened/.test(e.summary))).toBe(true);
  });

  it('lets builders, technicians, owners and admins record; viewers only read', async () => {
    const railId = await newRail();
    const bd = await start(railId);
    for (const [i, role] of (['builder', 'technician', 'owner', 'admin'] as const).entries()) {
      expect((await put(bd.id, i, { reading: i, fixed: true, writeId: randomUUID() }, ws.as[role])).status).toBe(200);
    }
    for (const role of ['technician', 'owner', 'admin'] as const) {
      expect((await ws.as[role].post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line' })).status).toBe(201);
    }
    expect((await ws.as.viewer.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line' })).status).toBe(403);
    expect((await put(bd.id, 4, { reading: 1, fixed: true, writeId: randomUUID() }, ws.as.viewer)).status).toBe(403);
    expect((await ws.as.viewer.post(`/api/bolt-downs/${bd.id}/final-sweep`).send({})).status).toBe(403);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).status).toBe(200);
    expect((await ws.as.viewer.get(`/api/rails/${railId}/bolt-downs`)).status).toBe(200);
    expect((await anonymous(app).get(`/api/bolt-downs/${bd.id}`)).status).toBe(401);
  });

  it("answers 404 for another workshop's rail or bolt-down, and changes nothing", async () => {
    const railId = await newRail();
    const bd = await start(railId);
    const them = other.as.owner;
    expect((await them.get(`/api/bolt-downs/${bd.id}`)).status).toBe(404);
    expect((await them.get(`/api/rails/${railId}/bolt-downs`)).status).toBe(404);
    expect((await them.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line' })).status).toBe(404);
    expect((await put(bd.id, 0, { reading: 1, fixed: true, writeId: randomUUID() }, them)).status).toBe(404);
    expect(
      (
        await them.post(`/api/bolt-downs/${bd.id}/final-sweep`).send({
          readingUnit: 'thou',
          phase: 'as-left',
          stations: POSITIONS.map((position) => ({ position, reading: 0 })),
        })
      ).status,
    ).toBe(404);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.fixedCount).toBe(0);
    expect((await ws.as.builder.get(`/api/bolt-downs/${randomUUID()}`)).status).toBe(404);
  });

  it.each([
    [{ mode: 'edge' }, /mode must be one of face, line/],
    [{}, /mode must be one of/],
    [{ mode: 'line', readingUnit: 'cm' }, /readingUnit must be one of mm, um, in, thou/],
    [{ mode: 'line', unit: 'thou' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
    [{ mode: 'line', band: -1 }, /band must not be negative/],
    [{ mode: 'line', band: 'wide' }, /band must be a number/],
    [{ mode: 'line', colour: 'red' }, /colour should not exist/],
  ])('refuses to begin with %j: 400 naming the field', async (body, message) => {
    const res = await ws.as.builder.post(`/api/rails/${await newRail()}/bolt-downs`).send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('refuses a bad hole write with 400 naming the field, and keeps what was saved', async () => {
    const bd = await start(await newRail());
    await fix(bd.id, 0, 0.25);
    const cases: [number | string, Record<string, unknown>, RegExp][] = [
      [5, { reading: 1, fixed: true }, /index must be a hole of this rail: a whole number from 0 to 4/],
      [-1, { reading: 1, fixed: true }, /index must be a hole/],
      ['two', { reading: 1, fixed: true }, /index must be a hole/],
      [1, { reading: 'abc', fixed: true }, /reading must be a number/],
      [1, { fixed: true }, /reading must be a number/],
      [1, { reading: 1e9, fixed: true }, /reading must be within/],
      [1, { reading: 1, fixed: 'yes' }, /fixed must be true or false/],
    ];
    for (const [index, body, message] of cases) {
      const res = await put(bd.id, index, { writeId: randomUUID(), ...body });
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body.message)).toMatch(message);
    }
    const noId = await put(bd.id, 1, { reading: 1, fixed: true });
    expect(JSON.stringify(noId.body.message)).toMatch(/writeId must be a uuid/);
    expect((await put(bd.id, 1, { reading: 1, fixed: true, writeId: 'abc' })).status).toBe(400);
    expect(
      (
        await ws.as.builder
          .put(`/api/bolt-downs/not-an-id/holes/0`)
          .send({ reading: 1, fixed: true, writeId: randomUUID() })
      ).status,
    ).toBe(400);

    // A refused write leaves its id unused: the corrected write with the same id is applied.
    const writeId = randomUUID();
    expect((await put(bd.id, 9, { reading: 1, fixed: true, writeId })).status).toBe(400);
    const ok = await put(bd.id, 4, { reading: 1, fixed: true, writeId });
    expect(ok.body).toMatchObject({ repeated: false });
    const state = (await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body;
    expect(state.holes[0]).toMatchObject({ reading: 0.25, fixed: true });
    expect(state.fixedCount).toBe(2);
  });

  it('is a subject other records can be attached to, within its workshop only', async () => {
    const bd = await start(await newRail());
    const subjects = app.get(SubjectsRegistry);
    expect(subjects.types()).toContain('bolt-down');
    expect(await subjects.resolve(ws.id, 'bolt-down', bd.id)).toEqual({
      machineId,
      recordType: 'bolt-down',
      recordId: bd.id,
      label: 'Bolt-down of rail Y1 (left)',
    });
    expect(await subjects.resolve(other.id, 'bolt-down', bd.id)).toBeNull();
  });

  it('refuses changes (409) once an approval was based on the bolt-down, and keeps it as it was', async () => {
    const bd = await start(await newRail());
    await fix(bd.id, 0, 0.1);
    await lockAsApproved(app, [{ recordType: 'bolt-down', recordId: bd.id }]);
    const res = await put(bd.id, 4, { reading: 1, fixed: true, writeId: randomUUID() });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.fixedCount).toBe(1);
  });

  describe('final sweep', () => {
    let railId: string;
    let bd: { id: string };
    // Hand-worked: equally spaced stations reading 0, 0, d, 0, 0 have a least-squares line of
    // slope 0 through d/5, residuals −d/5 … +4d/5, so straightness d; the minimum zone (two
    // parallel lines holding all points) is also d. Here d = 1 thou = 0.0254 mm.
    const READINGS = [0, 0, 1, 0, 0];
    const sweepBody = (overrides: Record<string, unknown> = {}) => ({
      id: randomUUID(),
      readingUnit: 'thou',
      phase: 'as-left',
      instrument: 'Dial indicator 0.0005 in',
      resolution: 0.5,
      boltSize: 'M5',
      torqueNm: 8.8,
      stations: POSITIONS.map((position, i) => ({ position, reading: READINGS[i] })),
      ...overrides,
    });

    beforeAll(async () => {
      railId = await newRail();
      bd = await start(railId);
    });

    it('is refused until every hole is fixed', async () => {
      for (const [hole, reading] of [
        [0, 0],
        [4, 0],
        [2, 1],
        [1, 0],
      ])
        await fix(bd.id, hole, reading);
      const res = await ws.as.builder.post(`/api/bolt-downs/${bd.id}/final-sweep`).send(sweepBody());
      expect(res.status).toBe(409);
      expect(res.body.message).toMatch(/4 of 5 holes are fixed/);
      const last = await fix(bd.id, 3, 0);
      expect(last).toMatchObject({ complete: true, nextHole: null, fixedCount: 5 });
    });

    it('needs one station at every hole and names what is wrong', async () => {
      const missing = await ws.as.builder
        .post(`/api/bolt-downs/${bd.id}/final-sweep`)
        .send(sweepBody({ stations: POSITIONS.slice(0, 4).map((position) => ({ position, reading: 0 })) }));
      expect(missing.status).toBe(400);
      expect(JSON.stringify(missing.body.message)).toMatch(/stations must include every hole: missing 270 mm/);
      const extra = await ws.as.builder
        .post(`/api/bolt-downs/${bd.id}/final-sweep`)
        .send(sweepBody({ stations: [...POSITIONS, 100].map((position) => ({ position, reading: 0 })) }));
      expect(JSON.stringify(extra.body.message)).toMatch(/100 mm is not a hole/);
      const badUnit = await ws.as.builder
        .post(`/api/bolt-downs/${bd.id}/final-sweep`)
        .send(sweepBody({ readingUnit: 'furlong' }));
      expect(JSON.stringify(badUnit.body.message)).toMatch(/readingUnit must be one of/);
      expect((await ws.as.viewer.get(`/api/rails/${railId}/sweeps`)).body).toHaveLength(0);
    });

    it("becomes the rail's sweep with the engine's result, once, however often it is sent", async () => {
      const body = sweepBody();
      const res = await ws.as.builder.post(`/api/bolt-downs/${bd.id}/final-sweep`).send(body);
      expect(res.status).toBe(201);
      expect(res.body.boltDown).toMatchObject({ id: bd.id, finalSweepId: body.id, complete: true });
      expect(res.body.sweep).toMatchObject({
        id: body.id,
        railId,
        readingUnit: 'thou',
        phase: 'as-left',
        boltSize: 'M5',
        torqueNm: 8.8,
        status: 'within-target',
      });
      expect(res.body.sweep.result.leastSquares.straightness).toBeCloseTo(THOU_MM, 9);
      expect(res.body.sweep.result.minimumZone.straightness).toBeCloseTo(THOU_MM, 9);

      const repeat = await ws.as.builder.post(`/api/bolt-downs/${bd.id}/final-sweep`).send(body);
      expect(repeat.status).toBe(200);
      expect(repeat.body.sweep.id).toBe(body.id);
      const sweeps = await ws.as.viewer.get(`/api/rails/${railId}/sweeps`);
      expect(sweeps.body.map((s: { id: string }) => s.id)).toEqual([body.id]);

      const another = await ws.as.builder.post(`/api/bolt-downs/${bd.id}/final-sweep`).send(sweepBody());
      expect(another.status).toBe(409);
      // A finished bolt-down takes no more hole writes.
      expect((await put(bd.id, 0, { reading: 3, fixed: true, writeId: randomUUID() })).status).toBe(409);
      const history = await boltDownHistory();
      expect(history.some((e) => /finished with a final sweep/.test(e.summary))).toBe(true);
    });
  });
});
