import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { SubjectsRegistry } from '../src/records/subjects.registry.js';
import { MachinesService } from '../src/machines/machines.service.js';
import { anonymous, createTestApp, createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { lockAsApproved } from './support/stand-in-approval.js';

interface WalkItem {
  id: string;
  text: string;
  builtIn: boolean;
  answer: { id: string; answer: string; note: string; answeredBy: { name: string }; answeredAt: string } | null;
}
interface Walk {
  id: string | null;
  status: string;
  blocking: boolean;
  locked: boolean;
  counts: { total: number; answered: number; no: number };
  sections: { id: string; label: string; items: WalkItem[] }[];
}

const itemsOf = (w: Walk) => w.sections.flatMap((s) => s.items);

describe('safety walk', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Safety');
    other = await createTestWorkshop(app, 'Other');
  });
  afterAll(() => app.close());

  const newMachine = async () =>
    (
      await ws.as.owner
        .post('/api/machines')
        .send({ name: `P ${randomUUID().slice(0, 4)}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id as string;
  const walkOf = async (agent: Agent, machine: string) =>
    (await agent.get(`/api/machines/${machine}/safety-walk`)).body as Walk;
  const answer = (agent: Agent, machine: string, item: string, body: object) =>
    agent.put(`/api/machines/${machine}/safety-walk/items/${item}`).send(body);

  it('starts not started, in four sections with the stopping, electrical, cutting and people items', async () => {
    const machine = await newMachine();
    const res = await ws.as.viewer.get(`/api/machines/${machine}/safety-walk`);
    expect(res.status).toBe(200);
    const walk = res.body as Walk;
    expect(walk.status).toBe('not-started');
    expect(walk.sections.map((s) => s.label)).toEqual(['Stopping', 'Electrical', 'Cutting', 'People']);
    expect(itemsOf(walk).every((i) => i.answer === null)).toBe(true);
    const text = itemsOf(walk)
      .map((i) => i.text)
      .join(' ');
    for (const words of [
      /emergency stop/i,
      /cutting power/i,
      /limit switch/i,
      /home switch/i,
      /licensed electrician/i,
      /strain relief/i,
      /torch lead/i,
      /extraction or ventilation/i,
      /extinguisher/i,
      /water table/i,
      /pinch points/i,
      /briefing/i,
    ]) {
      expect(text).toMatch(words);
    }
  });

  it('records who answered and when; partial is not within target; all yes or n/a is', async () => {
    const machine = await newMachine();
    const walk = await walkOf(ws.as.viewer, machine);
    const [first, ...rest] = itemsOf(walk);
    const res = await answer(ws.as.technician, machine, first.id, { answer: 'yes', note: 'tested at both ends' });
    expect(res.status).toBe(200);
    const answered = itemsOf(res.body).find((i) => i.id === first.id)!;
    expect(answered.answer).toMatchObject({
      answer: 'yes',
      note: 'tested at both ends',
      answeredBy: { name: expect.stringContaining('technician') },
    });
    expect(Date.now() - Date.parse(answered.answer!.answeredAt)).toBeLessThan(60_000);
    expect(res.body.status).toBe('outside-target');
    for (const item of rest)
      expect(
        (await answer(ws.as.owner, machine, item.id, { answer: item.id === 'cut-water' ? 'na' : 'yes' })).status,
      ).toBe(200);
    const done = await walkOf(ws.as.viewer, machine);
    expect(done).toMatchObject({
      status: 'within-target',
      blocking: false,
      counts: { answered: done.counts.total, no: 0 },
    });
    const ref = await app.get(MachinesService).getRef({ workshopId: ws.id }, machine);
    const check = (await app.get(ReadinessRegistry).checksFor(ref)).find((c) => c.kind === 'safety-walk');
    expect(check).toMatchObject({
      status: 'within-target',
      recordType: 'safety-walk',
      recordId: done.id,
      place: { machineId: machine, tab: 'safety' },
    });
    const history = await ws.as.viewer.get(`/api/machines/${machine}/history?limit=200`);
    expect(history.body.entries[0]).toMatchObject({ recordType: 'safety-walk', action: 'recorded' });
  });

  it('a "no" blocks approval until it is answered again', async () => {
    const machine = await newMachine();
    const items = itemsOf(await walkOf(ws.as.viewer, machine));
    for (const item of items) await answer(ws.as.technician, machine, item.id, { answer: 'yes' });
    const res = await answer(ws.as.technician, machine, 'stop-estop-power', {
      answer: 'no',
      note: 'the torch keeps firing on E-stop',
    });
    expect(res.body).toMatchObject({ status: 'outside-target', blocking: true, counts: { no: 1 } });
    const fixed = await answer(ws.as.technician, machine, 'stop-estop-power', {
      answer: 'yes',
      note: 'relay added in the torch circuit',
    });
    expect(fixed.body).toMatchObject({ status: 'within-target', blocking: false });
    expect(itemsOf(fixed.body).find((i) => i.id === 'stop-estop-power')!.answer!.note).toBe(
      'relay added in the torch circuit',
    );
  });

  it.each([
    [{ answer: 'maybe' }, /answer must be one of yes, no, na/],
    [{}, /answer must be one of/],
    [{ answer: 'yes', note: 42 }, /note must be text/],
    [{ answer: 'yes', who: 'me' }, /who should not exist/],
  ])('refuses %j with 400 naming the field', async (body, message) => {
    const machine = await newMachine();
    const res = await answer(ws.as.technician, machine, 'stop-limits', body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('an unknown item is 404; builders and viewers cannot answer; other workshops get 404', async () => {
    const machine = await newMachine();
    expect((await answer(ws.as.technician, machine, 'no-such-item', { answer: 'yes' })).status).toBe(404);
    expect((await answer(ws.as.builder, machine, 'stop-limits', { answer: 'yes' })).status).toBe(403);
    expect((await answer(ws.as.viewer, machine, 'stop-limits', { answer: 'yes' })).status).toBe(403);
    expect((await answer(other.as.technician, machine, 'stop-limits', { answer: 'yes' })).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${machine}/safety-walk`)).status).toBe(404);
    expect((await anonymous(app).get(`/api/machines/${machine}/safety-walk`)).status).toBe(401);
    expect((await answer(ws.as.admin, machine, 'stop-limits', { answer: 'yes' })).status).toBe(200);
  });

  it("the workshop's own items are asked on every machine's walk (owner or admin adds them)", async () => {
    const m1 = await newMachine();
    const m2 = await newMachine();
    for (const item of itemsOf(await walkOf(ws.as.viewer, m1)))
      await answer(ws.as.technician, m1, item.id, { answer: 'yes' });
    expect((await walkOf(ws.as.viewer, m1)).status).toBe('within-target');
    expect(
      (await ws.as.technician.post('/api/safety-items').send({ section: 'cutting', text: 'Slag bin emptied' })).status,
    ).toBe(403);
    const added = await ws.as.owner
      .post('/api/safety-items')
      .send({ section: 'cutting', text: 'Slag bin emptied and the bin lid closes' });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ section: 'cutting', builtIn: false });
    const w1 = await walkOf(ws.as.viewer, m1);
    expect(w1.sections.find((s) => s.id === 'cutting')!.items.map((i) => i.id)).toContain(added.body.id);
    // A new item is unanswered, so the walk is no longer complete.
    expect(w1.status).toBe('outside-target');
    expect(itemsOf(await walkOf(ws.as.viewer, m2)).map((i) => i.id)).toContain(added.body.id);
    expect((await answer(ws.as.technician, m1, added.body.id, { answer: 'yes' })).body.status).toBe('within-target');
    const theirs = await other.as.owner
      .post('/api/machines')
      .send({ name: 'O', kind: 'router', workArea: { x: 400, y: 300 } });
    expect(itemsOf(await walkOf(other.as.owner, theirs.body.id)).map((i) => i.id)).not.toContain(added.body.id);
    expect((await answer(other.as.owner, theirs.body.id, added.body.id, { answer: 'yes' })).status).toBe(404);
    expect(
      (await ws.as.admin.post('/api/safety-items').send({ section: 'kitchen', text: 'Kettle off' })).body.message.join(
        ' ',
      ),
    ).toMatch(/section must be one of/);
    expect((await ws.as.admin.post('/api/safety-items').send({ section: 'people', text: '' })).status).toBe(400);
    const list = await ws.as.viewer.get('/api/safety-items');
    expect(list.body.workshop.map((i: { id: string }) => i.id)).toContain(added.body.id);
  });

  it('a "no" blocks approval and the walk cannot be waived', async () => {
    const machine = await newMachine();
    expect(
      (await answer(ws.as.technician, machine, 'stop-limits', { answer: 'no', note: 'Y2 limit switch loose' })).status,
    ).toBe(200);
    const board = await ws.as.owner.get(`/api/machines/${machine}/readiness`);
    const walk = board.body.checks.find((c: { kind: string }) => c.kind === 'safety-walk');
    expect(walk.status).toBe('outside-target');
    const waiver = await ws.as.owner
      .post(`/api/machines/${machine}/checks/${encodeURIComponent(walk.key)}/waiver`)
      .send({ reason: 'We will fix the switch next week.' });
    expect(waiver.status).toBe(409);
    expect(waiver.body.message).toMatch(/safety walk cannot be waived/);
    const request = await ws.as.technician.post(`/api/machines/${machine}/approval-requests`);
    expect(request.status).toBe(409);
  });

  it('an approved walk is locked (409); a new walk can then be started', async () => {
    const machine = await newMachine();
    const res = await answer(ws.as.technician, machine, 'stop-limits', { answer: 'yes' });
    await lockAsApproved(app, [{ recordType: 'safety-walk', recordId: res.body.id }]);
    const refused = await answer(ws.as.technician, machine, 'stop-limits', { answer: 'no' });
    expect(refused.status).toBe(409);
    expect((await walkOf(ws.as.viewer, machine)).locked).toBe(true);
    const fresh = await ws.as.technician.post(`/api/machines/${machine}/safety-walk/rounds`);
    expect(fresh.status).toBe(201);
    expect(fresh.body).toMatchObject({ status: 'not-started', locked: false });
    expect(fresh.body.id).not.toBe(res.body.id);
    expect((await ws.as.technician.post(`/api/machines/${machine}/safety-walk/rounds`)).status).toBe(409);
    expect((await answer(ws.as.technician, machine, 'stop-limits', { answer: 'yes' })).status).toBe(200);
  });

  it('an answered item is a subject evidence can attach to', async () => {
    const machine = await newMachine();
    const res = await answer(ws.as.technician, machine, 'stop-estop-motion', { answer: 'yes' });
    const answerId = itemsOf(res.body).find((i) => i.id === 'stop-estop-motion')!.answer!.id;
    const subject = await app.get(SubjectsRegistry).resolve(ws.id, 'safety-item', answerId);
    expect(subject).toMatchObject({
      machineId: machine,
      recordType: 'safety-walk',
      recordId: res.body.id,
      label: expect.stringMatching(/emergency stop/),
    });
    expect(await app.get(SubjectsRegistry).resolve(other.id, 'safety-item', answerId)).toBeNull();
  });
});
