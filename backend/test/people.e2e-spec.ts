import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { ROLES } from '../src/database/schema/users.js';
import { MailService } from '../src/mail/mail.service.js';

describe('people (admin only, one workshop)', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'People');
    other = await createTestWorkshop(app, 'Elsewhere');
  });
  afterAll(() => app.close());

  describe('the role matrix', () => {
    it('anonymous callers get 401 on every people route', async () => {
      expect((await anonymous(app).get('/api/people')).status).toBe(401);
      expect(
        (await anonymous(app).post('/api/people').send({ name: 'x', email: 'x@y.z', role: 'viewer' })).status,
      ).toBe(401);
      expect((await anonymous(app).patch(`/api/people/${ws.userIds.viewer}`).send({ role: 'builder' })).status).toBe(
        401,
      );
    });

    it.each(ROLES.filter((r) => r !== 'admin'))('%s gets 403 on every people route', async (role) => {
      const agent = ws.as[role];
      expect((await agent.get('/api/people')).status).toBe(403);
      expect(
        (await agent.post('/api/people').send({ name: 'x', email: `x.${role}@test.example.com`, role: 'viewer' }))
          .status,
      ).toBe(403);
      expect((await agent.patch(`/api/people/${ws.userIds.viewer}`).send({ role: 'builder' })).status).toBe(403);
    });

    it('an admin sees only their own workshop', async () => {
      const res = await ws.as.admin.get('/api/people');
      expect(res.status).toBe(200);
      expect(res.body.map((p: { email: string }) => p.email).sort()).toEqual(Object.values(ws.emails).sort());
      expect(JSON.stringify(res.body)).not.toMatch(/password/i);
    });

    it("another workshop's member is 404, and is left untouched", async () => {
      const res = await ws.as.admin.patch(`/api/people/${other.userIds.viewer}`).send({ role: 'owner' });
      expect(res.status).toBe(404);
      const theirs = await other.as.admin.get('/api/people');
      expect(theirs.body.find((p: { id: string }) => p.id === other.userIds.viewer).role).toBe('viewer');
    });
  });

  it('adds a member and e-mails them a set-your-password link instead of showing a password', async () => {
    const email = `new.${Date.now()}@test.example.com`;
    const res = await ws.as.admin.post('/api/people').send({ name: 'New Person', email, role: 'builder' });
    expect(res.status).toBe(201);
    expect(res.body.person).toMatchObject({ email, role: 'builder', active: true });
    expect(res.body).toMatchObject({ invitationSent: true, invitationExpiresAt: expect.any(String) });
    expect(res.body.temporaryPassword).toBeUndefined();
    const mail = await app.get(MailService).fake!.waitFor((m) => m.envelopeTo.includes(email));
    const token = /set-password\?token=([\w-]+)/.exec(mail.text)![1];
    const set = await anonymous(app).post('/api/auth/password-reset').send({ token, password: 'a new long password' });
    expect(set.status).toBe(200);
    const login = await anonymous(app).post('/api/auth/login').send({ email, password: 'a new long password' });
    expect(login.status).toBe(200);
    const list = await ws.as.admin.get('/api/people');
    expect(JSON.stringify(list.body)).not.toContain(token);
  });

  it('refuses a second account for the same e-mail with 409', async () => {
    const res = await ws.as.admin
      .post('/api/people')
      .send({ name: 'Dup', email: ws.emails.viewer.toUpperCase(), role: 'viewer' });
    expect(res.status).toBe(409);
  });

  it.each([
    [{ email: 'a@test.example.com', role: 'viewer' }, /name/],
    [{ name: 'A', email: 'not-an-email', role: 'viewer' }, /email must be an e-mail/],
    [{ name: 'A', email: 'b@test.example.com', role: 'boss' }, /role must be one of/],
    [{ name: 'A'.repeat(500), email: 'c@test.example.com', role: 'viewer' }, /name/],
    [{ name: 'A', email: 'd@test.example.com', role: 'viewer', isAdmin: true }, /isAdmin should not exist/],
  ])('refuses %j with 400 naming the field', async (body, message) => {
    const res = await ws.as.admin.post('/api/people').send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('400 for a malformed id, never 500', async () => {
    const res = await ws.as.admin.patch('/api/people/not-a-uuid').send({ role: 'viewer' });
    expect(res.status).toBe(400);
  });

  it('changes a role', async () => {
    const res = await ws.as.admin.patch(`/api/people/${ws.userIds.builder}`).send({ role: 'technician' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('technician');
    await ws.as.admin.patch(`/api/people/${ws.userIds.builder}`).send({ role: 'builder' });
  });

  it('keeps the last admin: neither demoted nor deactivated', async () => {
    const solo = await createTestWorkshop(app, 'Solo');
    const demote = await solo.as.admin.patch(`/api/people/${solo.userIds.admin}`).send({ role: 'owner' });
    expect(demote.status).toBe(409);
    expect(demote.body.message).toMatch(/at least one active admin/);
    const deactivate = await solo.as.admin.patch(`/api/people/${solo.userIds.admin}`).send({ active: false });
    expect(deactivate.status).toBe(409);
    // with a second admin it is allowed
    await solo.as.admin.patch(`/api/people/${solo.userIds.owner}`).send({ role: 'admin' });
    const ok = await solo.as.admin.patch(`/api/people/${solo.userIds.admin}`).send({ role: 'owner' });
    expect(ok.status).toBe(200);
  });
});
