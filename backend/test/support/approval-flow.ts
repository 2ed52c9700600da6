import type { TestWorkshop } from '../helpers/test-app.js';

export const STATEMENT = 'I have reviewed every check of this machine and approve it as ready to cut.';

/** A machine file made through the API; a router, so its target set is the router defaults. */
export async function newMachine(ws: TestWorkshop, name = `Approval router ${Date.now() % 100000}`): Promise<string> {
  const res = await ws.as.builder.post('/api/machines').send({ name, kind: 'router', workArea: { x: 900, y: 600 } });
  if (res.status !== 201) throw new Error(`machine not created: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

export async function board(ws: TestWorkshop, machineId: string) {
  const res = await ws.as.viewer.get(`/api/machines/${machineId}/readiness`);
  if (res.status !== 200) throw new Error(`readiness: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as {
    state: string;
    checks: {
      key: string;
      status: string;
      recordId: string | null;
      waiver: { reason: string; by: string; at: string } | null;
    }[];
    blocking: { key: string }[];
    approval: { id: string; recordHash: string; recheckDueAt: string } | null;
    recheckDueAt: string | null;
    defaultStatement: string;
  };
}

/** The safety walk is never waived: a technician answers every item of it. */
export async function answerSafetyWalk(ws: TestWorkshop, machineId: string): Promise<void> {
  const walk = await ws.as.technician.get(`/api/machines/${machineId}/safety-walk`);
  if (walk.status !== 200) throw new Error(`safety walk: ${walk.status} ${JSON.stringify(walk.body)}`);
  for (const section of walk.body.sections as { items: { id: string }[] }[]) {
    for (const item of section.items) {
      const res = await ws.as.technician
        .put(`/api/machines/${machineId}/safety-walk/items/${item.id}`)
        .send({ answer: 'yes' });
      if (res.status !== 200) throw new Error(`safety item ${item.id}: ${res.status} ${JSON.stringify(res.body)}`);
    }
  }
}

/**
 * The other modules' checks of a fresh machine are not started; the safety walk is answered and
 * the owner waives each other one with a reason (as a real owner would for checks that do not
 * apply), leaving only the fake ones.
 */
export async function waiveAllBut(ws: TestWorkshop, machineId: string, keep: (key: string) => boolean): Promise<void> {
  if ((await board(ws, machineId)).blocking.some((c) => c.key.startsWith('safety-walk') && !keep(c.key)))
    await answerSafetyWalk(ws, machineId);
  for (const c of (await board(ws, machineId)).blocking) {
    if (keep(c.key)) continue;
    const res = await ws.as.owner
      .post(`/api/machines/${machineId}/checks/${encodeURIComponent(c.key)}/waiver`)
      .send({ reason: 'Not part of this test round; checked separately.' });
    if (res.status !== 201) throw new Error(`waiver of ${c.key}: ${res.status} ${JSON.stringify(res.body)}`);
  }
}

export async function requestAndApprove(ws: TestWorkshop, machineId: string, password: string) {
  const req = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
  if (req.status !== 201) throw new Error(`request: ${req.status} ${JSON.stringify(req.body)}`);
  const res = await ws.as.owner.post(`/api/machines/${machineId}/approvals`).send({ password, statement: STATEMENT });
  if (res.status !== 201) throw new Error(`approval: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; approvedAt: string; approvedBy: string; recordHash: string };
}
