import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { board, requestAndApprove, waiveAllBut } from './support/approval-flow.js';
import { lockAsApproved } from './support/stand-in-approval.js';

// A 300 mm rail with holes every 60 mm from 30 mm: five holes at 30, 90, 150, 210, 270 mm.
const RAIL = { label: 'X1 (front)', axis: 'X1', length: 300, profileSize: 20, holePitch: 60, firstHole: 30 };
const REASON = 'Reference face had a burr; the rail is to be re-seated';

interface BoltDown {
  id: string;
  fixedCount: number;
  abandoned: { at: string; by: string | null; reason: string } | null;
}

describe('abandoning a bolt-down', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  const newRail = async () => {
    const res = await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(RAIL);
    expect(res.status).toBe(201);
    return res.body.id as string;
  };
  const start = async (railId: string) => {
    const res = await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'thou' });
    expect(res.status).toBe(201);
    return res.body as BoltDown;
  };
  const fix = (id: string, index: number, reading: number, agent: Agent = ws.as.builder) =>
    agent.put(`/api/bolt-downs/${id}/holes/${index}`).send({ reading, fixed: true, writeId: randomUUID() });
  const abandon = (id: string, body: unknown, agent: Agent = ws.as.builder) =>
    agent.post(`/api/bolt-downs/${id}/abandon`).send(body as object);
  const history = async () => {
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
    return res.body.entries as {
      recordType: string;
      recordId: string;
      summary: string;
      changes: Record<string, unknown> | null;
      actorName: string;
    }[];
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Abandon');
    other = await createTestWorkshop(app, 'Abandon other');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Plasma A', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
  });
  afterAll(() => app.close());

  it('keeps the reason, who and when; the history names it; no hole or final sweep is written after it; a new bolt-down can begin', async () => {
    const railId = await newRail();
    const bd = await start(railId);
    expect(bd.abandoned).toBeNull();
    expect((await fix(bd.id, 0, 0)).status).toBe(200);

    const res = await abandon(bd.id, { reason: `  ${REASON}  ` });
    expect(res.status).toBe(200);
    expect(res.body.abandoned).toMatchObject({ reason: REASON, by: expect.any(String) });
    expect(Date.parse(res.body.abandoned.at)).not.toBeNaN();
    expect(res.body.fixedCount).toBe(1);

    const read = await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`);
    expect(read.body.abandoned.reason).toBe(REASON);
    const entry = (await history()).find(
      (e) => e.recordType === 'bolt-down' && e.recordId === bd.id && e.summary.includes('abandoned'),
    );
    expect(entry?.summary).toContain(REASON);
    expect(entry?.summary).toContain('1 of 5 holes fixed');
    expect(entry?.changes).toMatchObject({ abandoned: true, reason: REASON });

    const hole = await fix(bd.id, 4, 1);
    expect(hole.status).toBe(409);
    expect(hole.body.message).toMatch(/abandoned/);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.fixedCount).toBe(1);
    const again = await abandon(bd.id, { reason: 'A second time' });
    expect(again.status).toBe(409);
    const sweep = await ws.as.builder.post(`/api/bolt-downs/${bd.id}/final-sweep`).send({
      readingUnit: 'thou',
      phase: 'as-left',
      stations: [30, 90, 150, 210, 270].map((position) => ({ position, reading: 0 })),
    });
    expect(sweep.status).toBe(409);

    const next = await start(railId);
    expect(next.abandoned).toBeNull();
    const list = (await ws.as.viewer.get(`/api/rails/${railId}/bolt-downs`)).body as BoltDown[];
    expect(list.map((b) => [b.id, b.abandoned?.reason ?? null])).toEqual([
      [next.id, null],
      [bd.id, REASON],
    ]);
  });

  it('refuses a missing, empty or over-long reason with a 400 naming the field, and changes nothing', async () => {
    const bd = await start(await newRail());
    for (const body of [{}, { reason: '   ' }, { reason: 42 }, { reason: 'x'.repeat(1001) }, { reason: null }]) {
      const res = await abandon(bd.id, body);
      expect([JSON.stringify(body).slice(0, 40), res.status]).toEqual([JSON.stringify(body).slice(0, 40), 400]);
      expect(JSON.stringify(res.body.message)).toMatch(/reason/);
    }
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.abandoned).toBeNull();
  });

  it('is for people who record: a viewer gets 403; another workshop gets 404', async () => {
    const bd = await start(await newRail());
    expect((await abandon(bd.id, { reason: REASON }, ws.as.viewer)).status).toBe(403);
    expect((await abandon(bd.id, { reason: REASON }, other.as.builder)).status).toBe(404);
    expect((await abandon(randomUUID(), { reason: REASON })).status).toBe(404);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.abandoned).toBeNull();
  });

  it('two people abandoning at once: one is recorded, the other told it was already abandoned', async () => {
    const bd = await start(await newRail());
    const [a, b] = await Promise.all([
      abandon(bd.id, { reason: 'First reason given' }),
      abandon(bd.id, { reason: 'Second reason given' }, ws.as.owner),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const entries = (await history()).filter((e) => e.recordId === bd.id && e.summary.includes('abandoned'));
    expect(entries).toHaveLength(1);
  });

  it('is refused (409) when an approval was based on the bolt-down', async () => {
    const bd = await start(await newRail());
    await lockAsApproved(app, [{ recordType: 'bolt-down', recordId: bd.id }]);
    const res = await abandon(bd.id, { reason: REASON });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.abandoned).toBeNull();
  });

  it('is refused (409) while the machine is approved as ready to cut, with the approval named', async () => {
    const approved = (
      await ws.as.owner
        .post('/api/machines')
        .send({ name: 'Approved router', kind: 'router', workArea: { x: 900, y: 600 } })
    ).body.id as string;
    const railId = (await ws.as.builder.post(`/api/machines/${approved}/rails`).send(RAIL)).body.id as string;
    const bd = (await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'thou' }))
      .body as BoltDown;
    await waiveAllBut(ws, approved, () => false);
    await requestAndApprove(ws, approved, TEST_PASSWORD);
    expect((await board(ws, approved)).state).toBe('ready-to-cut');
    const res = await abandon(bd.id, { reason: REASON });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/approved as ready to cut/);
    expect((await ws.as.viewer.get(`/api/bolt-downs/${bd.id}`)).body.abandoned).toBeNull();
  }, 60_000);
});
