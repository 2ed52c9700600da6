import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

// A 300 mm rail with holes every 60 mm from 30 mm: five holes at 30, 90, 150, 210, 270 mm.
const RAIL = { label: 'Y2 (right)', axis: 'Y2', length: 300, profileSize: 20, holePitch: 60, firstHole: 30 };
const POSITIONS = [30, 90, 150, 210, 270];

/**
 * Entries typed at the rail without a connection are sent again and again until an answer comes
 * back, each with the key made when it was typed (Idempotency-Key): holes, the final sweep and
 * rail sweeps are each recorded once, whether the copies come one after another or together.
 */
describe('bolt-down holes and sweeps sent more than once', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;

  const history = async () => {
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    return res.body.entries as { recordType: string; recordId: string; action: string }[];
  };
  const newBoltDown = async () => {
    const railId = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(RAIL)).body.id as string;
    const bd = (await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'thou' }))
      .body as { id: string };
    return { railId, id: bd.id };
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Entries once');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Plasma E', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
  });
  afterAll(() => app.close());

  it('a hole fix sent three times, two of them together, is applied once and answered the same', async () => {
    const { id } = await newBoltDown();
    const writeId = randomUUID();
    const send = () =>
      ws.as.builder
        .put(`/api/bolt-downs/${id}/holes/0`)
        .set('Idempotency-Key', writeId)
        .send({ reading: 0.5, fixed: true, writeId });
    const first = await send();
    const [a, b] = await Promise.all([send(), send()]);
    expect([first.status, a.status, b.status]).toEqual([200, 200, 200]);
    expect(a.body.holes[0]).toEqual(first.body.holes[0]);
    const state = (await ws.as.viewer.get(`/api/bolt-downs/${id}`)).body;
    expect(state.fixedCount).toBe(1);
    expect(
      (await history()).filter((e) => e.recordType === 'bolt-down' && e.recordId === id && e.action === 'updated'),
    ).toHaveLength(1);
  });

  it('the final sweep sent twice together with one key is one sweep of the rail, linked once', async () => {
    const { railId, id } = await newBoltDown();
    for (const [hole, reading] of [
      [0, 0],
      [4, 0],
      [2, 0.5],
      [1, 0.25],
      [3, 0.25],
    ]) {
      const writeId = randomUUID();
      expect(
        (
          await ws.as.builder
            .put(`/api/bolt-downs/${id}/holes/${hole}`)
            .set('Idempotency-Key', writeId)
            .send({ reading, fixed: true, writeId })
        ).status,
      ).toBe(200);
    }
    const sweepId = randomUUID();
    const body = {
      id: sweepId,
      readingUnit: 'thou',
      lengthUnit: 'mm',
      phase: 'as-left',
      datum: 'Bar across both rails',
      stations: POSITIONS.map((position, i) => ({ position, reading: [0, 0.25, 0.5, 0.25, 0][i] })),
    };
    const send = () =>
      ws.as.builder.post(`/api/bolt-downs/${id}/final-sweep`).set('Idempotency-Key', sweepId).send(body);
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status].every((s) => s === 200 || s === 201)).toBe(true);
    expect(a.body.sweep.id).toBe(sweepId);
    expect(b.body.sweep.id).toBe(sweepId);
    const sweeps = (await ws.as.viewer.get(`/api/rails/${railId}/sweeps`)).body as {
      id: string;
      datum: string | null;
    }[];
    expect(sweeps).toEqual([expect.objectContaining({ id: sweepId, datum: 'Bar across both rails' })]);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${id}`)).body.finalSweepId).toBe(sweepId);
  });

  it('a rail sweep sent twice together with one key is recorded once', async () => {
    const { railId } = await newBoltDown();
    const sweepId = randomUUID();
    const body = {
      id: sweepId,
      readingUnit: 'thou',
      phase: 'as-found',
      stations: POSITIONS.map((position, i) => ({ position, reading: [0, 1, 2, 1, 0][i] })),
    };
    const send = () => ws.as.builder.post(`/api/rails/${railId}/sweeps`).set('Idempotency-Key', sweepId).send(body);
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status].every((s) => s === 200 || s === 201)).toBe(true);
    expect((await ws.as.viewer.get(`/api/rails/${railId}/sweeps`)).body).toHaveLength(1);
    expect((await history()).filter((e) => e.recordType === 'rail-sweep' && e.recordId === sweepId)).toHaveLength(1);
  });
});
