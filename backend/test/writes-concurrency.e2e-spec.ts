import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import {
  createTestApp,
  createTestWorkshop,
  signIn,
  TEST_PASSWORD,
  type Agent,
  type TestWorkshop,
} from './helpers/test-app.js';

// A 900 mm rail with holes every 60 mm from 30 mm: 15 holes, 30 … 870 mm.
const RAIL = { label: 'Y2 (right)', axis: 'Y2', length: 900, profileSize: 20, holePitch: 60, firstHole: 30 };
const HOLES = 15;

/**
 * Concurrent writers on one bolt-down, through two server instances on one database, as three
 * builders at one rail would be: every write must land (no deadlock answered as 500), each fix
 * gets its own place in the fixing order, and each write has its audit entry.
 */
describe('concurrent hole writes', () => {
  let a: NestFastifyApplication;
  let b: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    a = await createTestApp();
    b = await createTestApp();
    ws = await createTestWorkshop(a, 'Concurrent');
    machineId = (
      await ws.as.builder.post('/api/machines').send({ name: 'Gantry', kind: 'router', workArea: { x: 1500, y: 900 } })
    ).body.id;
  });
  afterAll(async () => {
    await a.close();
    await b.close();
  });

  const begin = async () => {
    const railId = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(RAIL)).body.id;
    const res = await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'mm' });
    expect(res.status).toBe(201);
    expect(res.body.holeCount).toBe(HOLES);
    return res.body.id as string;
  };

  it('three writers, 15 fixes sent at once over two instances: all 200, all fixed, fix order 1…15', async () => {
    const id = await begin();
    // The builder and the owner on instance a, the technician on instance b.
    const writers: Agent[] = [ws.as.builder, ws.as.owner, await signIn(b, ws.emails.technician, TEST_PASSWORD)];
    const writes = Array.from({ length: HOLES }, (_, hole) => ({
      hole,
      agent: writers[hole % 3],
      writeId: randomUUID(),
    }));
    const answers = await Promise.all(
      writes.map((w) =>
        w.agent
          .put(`/api/bolt-downs/${id}/holes/${w.hole}`)
          .send({ reading: (w.hole % 5) * 0.001, fixed: true, writeId: w.writeId }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual(Array(HOLES).fill(200));
    expect(answers.every((r) => r.body.repeated === false)).toBe(true);
    // The answer of each write already shows its own hole fixed (built from what was written).
    answers.forEach((r, i) => expect(r.body.holes[writes[i].hole].fixed).toBe(true));
    // Writers took turns: the answers saw 1, 2, … 15 holes fixed, each count once.
    expect(answers.map((r) => r.body.fixedCount).sort((x, y) => x - y)).toEqual(
      Array.from({ length: HOLES }, (_, i) => i + 1),
    );

    const final = await ws.as.viewer.get(`/api/bolt-downs/${id}`);
    expect(final.body.fixedCount).toBe(HOLES);
    expect(final.body.holes.every((h: { fixed: boolean }) => h.fixed)).toBe(true);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    const holeEntries = (history.body.entries as { recordId: string; changes: { writeId?: string } | null }[]).filter(
      (e) => e.recordId === id && e.changes?.writeId,
    );
    expect(new Set(holeEntries.map((e) => e.changes!.writeId))).toEqual(new Set(writes.map((w) => w.writeId)));
  });

  it('the same 15 writes sent twice at once (lost answers retried): applied once, the copies answer repeated', async () => {
    const id = await begin();
    const writers: Agent[] = [ws.as.builder, ws.as.technician, await signIn(b, ws.emails.owner, TEST_PASSWORD)];
    const writes = Array.from({ length: HOLES }, (_, hole) => ({ hole, writeId: randomUUID() }));
    const sends = [...writes, ...writes].map((w, i) =>
      writers[i % 3]
        .put(`/api/bolt-downs/${id}/holes/${w.hole}`)
        .send({ reading: 0.002, fixed: true, writeId: w.writeId }),
    );
    const answers = await Promise.all(sends);
    expect(answers.map((r) => r.status)).toEqual(Array(2 * HOLES).fill(200));
    expect(answers.filter((r) => r.body.repeated).length).toBe(HOLES);
    const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    const holeEntries = (history.body.entries as { recordId: string; changes: { writeId?: string } | null }[]).filter(
      (e) => e.recordId === id && e.changes?.writeId,
    );
    expect(holeEntries).toHaveLength(HOLES);
  });
});
