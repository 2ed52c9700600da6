import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { loadConfig } from '../src/config/config.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

/**
 * A page on another site can make the browser send a form (urlencoded, multipart, text/plain)
 * with the person's cookie. Writes therefore take JSON only, and a request whose Origin (or
 * Referer) is not the app's own is refused; scripts and API clients send neither and still work.
 */
describe('cross-site requests cannot write', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  const own = new URL(loadConfig({ ...process.env, FRONTEND_DIST: '' }).appUrl).origin;
  const person = () => ({
    name: 'Cross Site',
    email: `cross.${Math.random().toString(36).slice(2, 8)}@test.example.com`,
    role: 'admin',
  });
  const peopleCount = async () => (await ws.as.admin.get('/api/people')).body.length;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Cross site');
  });
  afterAll(() => app.close());

  it('refuses a form-encoded POST from a foreign page (the attack of the report) and creates no one', async () => {
    const before = await peopleCount();
    const res = await ws.as.admin
      .post('/api/people')
      .set('Origin', 'https://evil.example.net')
      .type('form')
      .send('name=Mallory&email=mallory%40evil.example.net&role=admin');
    expect(res.status).toBe(403);
    expect(await peopleCount()).toBe(before);
  });

  it('refuses form-encoded and text/plain bodies even with no Origin (415)', async () => {
    const before = await peopleCount();
    const form = await ws.as.admin.post('/api/people').type('form').send('name=Mallory&email=m%40x.example&role=admin');
    expect(form.status).toBe(415);
    const text = await ws.as.admin.post('/api/people').set('Content-Type', 'text/plain').send(JSON.stringify(person()));
    expect(text.status).toBe(415);
    expect(text.body.message).toMatch(/application\/json/);
    const multipart = await ws.as.admin
      .post('/api/people')
      .field('name', 'Mallory')
      .field('email', 'm@x.example')
      .field('role', 'admin');
    expect(multipart.status).toBe(415);
    expect(await peopleCount()).toBe(before);
  });

  it('refuses JSON from a foreign Origin, or a foreign Referer when there is no Origin (403)', async () => {
    const before = await peopleCount();
    expect(
      (await ws.as.admin.post('/api/people').set('Origin', 'https://evil.example.net').send(person())).status,
    ).toBe(403);
    expect((await ws.as.admin.post('/api/people').set('Origin', 'null').send(person())).status).toBe(403);
    expect(
      (await ws.as.admin.post('/api/people').set('Referer', 'https://evil.example.net/page').send(person())).status,
    ).toBe(403);
    // A look-alike host is not the app.
    expect((await ws.as.admin.post('/api/people').set('Origin', `${own}.evil.example.net`).send(person())).status).toBe(
      403,
    );
    expect(
      (
        await ws.as.admin
          .patch(`/api/people/${ws.userIds.viewer}`)
          .set('Origin', 'https://evil.example.net')
          .send({ name: 'x' })
      ).status,
    ).toBe(403);
    expect(await peopleCount()).toBe(before);
  });

  it('accepts JSON from the app itself (Origin or Referer), through the dev server, and with neither header', async () => {
    const before = await peopleCount();
    expect((await ws.as.admin.post('/api/people').set('Origin', own).send(person())).status).toBe(201);
    expect((await ws.as.admin.post('/api/people').set('Referer', `${own}/people`).send(person())).status).toBe(201);
    expect((await ws.as.admin.post('/api/people').set('Origin', 'http://127.0.0.1:5173').send(person())).status).toBe(
      201,
    );
    expect((await ws.as.admin.post('/api/people').send(person())).status).toBe(201);
    // Opened by another address of this server (its LAN address): the page and the request name the same host.
    expect(
      (
        await ws.as.admin
          .post('/api/people')
          .set('Host', '192.0.2.9:3000')
          .set('Origin', 'http://192.0.2.9:3000')
          .send(person())
      ).status,
    ).toBe(201);
    expect(await peopleCount()).toBe(before + 5);
  });

  it('a foreign page cannot sign anyone in or out either, but reading stays open to the session', async () => {
    const login = await ws.as.admin
      .post('/api/auth/login')
      .set('Origin', 'https://evil.example.net')
      .send({ email: ws.emails.viewer, password: 'x' });
    expect(login.status).toBe(403);
    expect((await ws.as.admin.post('/api/auth/logout').set('Origin', 'https://evil.example.net')).status).toBe(403);
    expect((await ws.as.admin.get('/api/auth/me')).status).toBe(200);
  });
});
