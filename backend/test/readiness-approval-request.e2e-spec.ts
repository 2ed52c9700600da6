import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { newMachine, STATEMENT, waiveAllBut } from './support/approval-flow.js';

/**
 * The readiness page names the machine's latest approval and its open request, read together in
 * one statement: each can be there without the other, and an answered request is no longer open.
 */
describe('readiness: the latest approval and the open request', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Readiness request');
  });
  afterAll(() => app.close());

  const readiness = async (machineId: string) =>
    (await ws.as.viewer.get(`/api/machines/${machineId}/readiness`)).body as {
      state: string;
      approval: { id: string; approvedAt: string; reopened: { at: string; reason: string | null } | null } | null;
      request: { id: string } | null;
    };

  it('neither, then a request alone, then an approval alone, then an ended approval with a new request', async () => {
    const machineId = await newMachine(ws, 'Readiness request router');
    await waiveAllBut(ws, machineId, () => false);
    expect(await readiness(machineId)).toMatchObject({ state: 'being-built', approval: null, request: null });

    const asked = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
    expect(asked.status).toBe(201);
    expect(await readiness(machineId)).toMatchObject({
      state: 'awaiting-approval',
      approval: null,
      request: { id: asked.body.id },
    });

    const approved = await ws.as.owner
      .post(`/api/machines/${machineId}/approvals`)
      .send({ password: TEST_PASSWORD, statement: STATEMENT });
    expect(approved.status).toBe(201);
    expect(await readiness(machineId)).toMatchObject({
      state: 'ready-to-cut',
      approval: { id: approved.body.id },
      request: null,
    });

    const reopened = await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'Rail re-seated' });
    expect(reopened.status).toBe(201);
    const again = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
    expect(again.status).toBe(201);
    const last = await readiness(machineId);
    expect(last).toMatchObject({ approval: { id: approved.body.id }, request: { id: again.body.id } });
    // Times and texts come back as the approval's own row gives them.
    expect(last.approval?.reopened).toMatchObject({ reason: 'Rail re-seated' });
    expect(Date.parse(last.approval!.reopened!.at)).toBeGreaterThanOrEqual(Date.parse(last.approval!.approvedAt));
  });
});
