import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import {
  anonymous,
  createTestApp,
  createTestWorkshop,
  signIn,
  TEST_PASSWORD,
  type TestWorkshop,
} from './helpers/test-app.js';

describe('sign-in, sessions and health', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Auth');
  });
  afterAll(() => app.close());

  it('answers health with the database state', async () => {
    const res = await anonymous(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });

  it('signs in, returns the user with the workshop and an HttpOnly SameSite=Lax cookie', async () => {
    const res = await anonymous(app).post('/api/auth/login').send({ email: ws.emails.owner, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({
      id: ws.userIds.owner,
      email: ws.emails.owner,
      name: expect.any(String),
      role: 'owner',
      workshop: { id: ws.id, name: ws.name },
    });
    expect(JSON.stringify(res.body)).not.toMatch(/password|scrypt/i);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/railwright\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('accepts the e-mail in any letter case', async () => {
    const res = await anonymous(app)
      .post('/api/auth/login')
      .send({ email: ws.emails.viewer.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });

  it('me answers the same user while signed in and 401 after logout', async () => {
    const agent = await signIn(app, ws.emails.technician, TEST_PASSWORD);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe('technician');
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('me is 401 when signed out', async () => {
    const res = await anonymous(app).get('/api/auth/me');
    expect(res.status).toBe(401);
  });

  it('gives the same message for a wrong password and an unknown e-mail', async () => {
    const wrongPassword = await anonymous(app)
      .post('/api/auth/login')
      .send({ email: ws.emails.builder, password: 'nope' });
    const unknown = await anonymous(app)
      .post('/api/auth/login')
      .send({ email: 'nobody@test.example.com', password: 'nope' });
    expect(wrongPassword.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrongPassword.body.message).toEqual(unknown.body.message);
    expect(wrongPassword.body.message).not.toMatch(/password is wrong|no such user/i);
  });

  it.each([
    [{}, /email/],
    [{ email: 'a@b.c' }, /password/],
    [{ email: 42, password: 'x' }, /email must be a string/],
    [{ email: 'a@b.c', password: ['x'] }, /password must be a string/],
    [{ email: 'a@b.c', password: 'x', extra: 1 }, /extra should not exist/],
    [{ email: 'a'.repeat(300), password: 'x' }, /email/],
  ])('refuses a malformed body %j with 400 before checking credentials', async (body, message) => {
    const res = await anonymous(app).post('/api/auth/login').send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });

  it('slows down repeated failures with 429, even for the right password, and tells when to retry', async () => {
    const target = { email: ws.emails.admin };
    for (let i = 0; i < 5; i++) {
      const res = await anonymous(app)
        .post('/api/auth/login')
        .send({ ...target, password: `wrong-${i}` });
      expect(res.status).toBe(401);
    }
    const blocked = await anonymous(app)
      .post('/api/auth/login')
      .send({ ...target, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.message).toMatch(/Too many failed sign-ins/);
  });

  it('refuses a deactivated member at sign-in and ends their open session', async () => {
    const victim = await createTestWorkshop(app, 'Deactivate');
    const viewerSession = victim.as.viewer;
    const res = await victim.as.admin.patch(`/api/people/${victim.userIds.viewer}`).send({ active: false });
    expect(res.status).toBe(200);
    expect((await viewerSession.get('/api/auth/me')).status).toBe(401);
    const login = await anonymous(app)
      .post('/api/auth/login')
      .send({ email: victim.emails.viewer, password: TEST_PASSWORD });
    expect(login.status).toBe(401);
  });

  it('answers JSON 404 for unknown API paths', async () => {
    const res = await ws.as.owner.get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
  });
});
