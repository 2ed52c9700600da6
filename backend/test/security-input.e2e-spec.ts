import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newMachine } from './helpers/drives.js';

/** Text that cannot be shown or stored, and null in optional fields: a 400 naming the field, and nothing changes. */
describe('bad text and null in optional fields', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;
  let railId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Input');
    machineId = await newMachine(ws, 'router');
    railId = (
      await ws.as.builder
        .post(`/api/machines/${machineId}/rails`)
        .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 })
    ).body.id;
  });
  afterAll(() => app.close());

  it.each([
    ['name', 'Gantry\u0000one'],
    ['name', 'tab\there'],
    ['notes', 'bell\u0007'],
    ['notes', 'half a pair \ud800'],
  ])('refuses %s holding %j with 400 naming the field, and the machine is unchanged', async (field, value) => {
    const before = (await ws.as.viewer.get(`/api/machines/${machineId}`)).body;
    const res = await ws.as.owner.patch(`/api/machines/${machineId}`).send({ [field]: value });
    expect(res.status).toBe(400);
    expect(res.body.message.join(' ')).toMatch(new RegExp(`^${field} must not contain control characters`));
    expect((await ws.as.viewer.get(`/api/machines/${machineId}`)).body).toEqual(before);
  });

  it('keeps line breaks and tabs in a multi-line note', async () => {
    const res = await ws.as.owner
      .patch(`/api/machines/${machineId}`)
      .send({ notes: 'Line one\n\tindented\r\nline three' });
    expect(res.status).toBe(200);
    expect(res.body.notes).toBe('Line one\n\tindented\r\nline three');
  });

  it('refuses NUL in the sign-in e-mail (it answered 500) and in query strings', async () => {
    const res = await ws.as.viewer
      .post('/api/auth/login')
      .send({ email: 'owner\u0000@test.example.com', password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.message.join(' ')).toMatch(/^email must not contain control characters/);
    const q = await ws.as.viewer.get('/api/evidence').query({ subjectType: 'rail\u0000' });
    expect(q.status).toBe(400);
  });

  it.each([
    ['machine notes', () => ws.as.owner.patch(`/api/machines/${machineId}`), { notes: null }, /notes/],
    [
      'machine notes on create',
      () => ws.as.owner.post('/api/machines'),
      { name: 'N', kind: 'router', workArea: { x: 100, y: 100 }, notes: null },
      /notes/,
    ],
    [
      'rail hole pitch',
      () => ws.as.builder.patch(`/api/rails/${railId}`),
      { holePitch: null },
      /holePitch must be a number/,
    ],
    [
      'bolt-down band',
      () => ws.as.builder.post(`/api/rails/${railId}/bolt-downs`),
      { mode: 'line', band: null },
      /band/,
    ],
    ['person role', () => ws.as.admin.patch(`/api/people/${ws.userIds.viewer}`), { role: null }, /role/],
    [
      'target-set description',
      () => ws.as.owner.post('/api/target-sets'),
      { name: 'With null', description: null, targets: {} },
      /description/,
    ],
  ])('null in an optional field (%s) is a 400 naming it, never a 500', async (_label, req, body, field) => {
    const res = await req().send(body);
    expect(res.status).toBe(400);
    expect(res.body.message.join(' ')).toMatch(field);
  });

  it('refuses a NUL in an upload caption (a multipart field, not JSON) with 400 naming it, and attaches nothing', async () => {
    const png = Buffer.from(
      '89504e470d0a1a0a0000000d4948445200000001000000010806000000' +
        '1f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082',
      'hex',
    );
    const before = (await ws.as.viewer.get('/api/evidence').query({ machineId })).body;
    const res = await ws.as.builder
      .post('/api/evidence')
      .field('subjectType', 'machine')
      .field('subjectId', machineId)
      .field('caption', 'dial \u0000 set-up')
      .attach('file', png, 'set-up.png');
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/caption must not contain control characters/);
    expect((await ws.as.viewer.get('/api/evidence').query({ machineId })).body).toEqual(before);
  });

  it('null still clears where the field says so (partner rail)', async () => {
    const res = await ws.as.builder.patch(`/api/rails/${railId}`).send({ partnerRailId: null });
    expect(res.status).toBe(200);
  });
});
