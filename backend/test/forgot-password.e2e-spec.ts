import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { anonymous, createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { MailService } from '../src/mail/mail.service.js';
import type { FakeSmtpServer } from '../src/mail/fake-smtp.server.js';

const tokenOf = (text: string) => /\/set-password\?token=([\w-]+)/.exec(text)![1];

/**
 * "Forgot my password" from the sign-in page, and setting a password from a link signing the
 * person in. Each test sends from an address of its own (through a trusted proxy header) so the
 * per-address count of one does not slow another.
 */
describe('forgot password, and signed in after choosing one', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let smtp: FakeSmtpServer;

  beforeAll(async () => {
    process.env.TRUST_PROXY = 'true';
    app = await createTestApp();
    smtp = app.get(MailService).fake!;
    ws = await createTestWorkshop(app, 'Forgot');
  });
  afterAll(async () => {
    delete process.env.TRUST_PROXY;
    await app.close();
  });

  const ask = (email: unknown, from: string) =>
    anonymous(app).post('/api/auth/password-reset/request').set('X-Forwarded-For', from).send({ email });

  it('mails a link to the account’s own address, and the old password keeps working until it is used', async () => {
    const email = ws.emails.technician;
    const res = await ask(email, '198.51.100.10');
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/If an active account uses this address/);
    const mail = await smtp.waitFor(
      (m) => m.envelopeTo.includes(email) && /Choose a new Railwright password/.test(m.subject),
    );
    expect(mail.envelopeTo).toEqual([email]);
    expect(mail.text).toMatch(/current password keeps working/);
    expect((await anonymous(app).post('/api/auth/login').send({ email, password: TEST_PASSWORD })).status).toBe(200);

    // Choosing the new password signs the person in on this browser, on a new session.
    const browser = request.agent(app.getHttpServer());
    const set = await browser
      .post('/api/auth/password-reset')
      .send({ token: tokenOf(mail.text), password: 'a brand new dial reading' });
    expect(set.status).toBe(200);
    expect(set.body).toEqual({ email, signedIn: true });
    const me = await browser.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
    // The old password no longer works; the new one does.
    expect((await anonymous(app).post('/api/auth/login').send({ email, password: TEST_PASSWORD })).status).toBe(401);
    expect(
      (await anonymous(app).post('/api/auth/login').send({ email, password: 'a brand new dial reading' })).status,
    ).toBe(200);
    const history = await ws.as.owner.get('/api/history?limit=50');
    expect(JSON.stringify(history.body)).toMatch(/asked for on the sign-in page/);
  });

  it('answers an unknown address exactly as a known one, and mails nobody', async () => {
    const before = smtp.messages.length;
    const res = await ask('nobody.here@test.example.com', '198.51.100.11');
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/If an active account uses this address/);
    await new Promise((r) => setTimeout(r, 300));
    expect(smtp.messages.slice(before).some((m) => m.envelopeTo.includes('nobody.here@test.example.com'))).toBe(false);
  });

  it('refuses what is not an e-mail address with 400 naming the field', async () => {
    for (const bad of ['', 'not an address', null, 42, 'a\u0000b@test.example.com']) {
      const res = await ask(bad, '198.51.100.12');
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body.message)).toMatch(/email/);
    }
  });

  it('slows down repeated requests for one address (429 with a wait), counted in parallel', async () => {
    const email = ws.emails.viewer;
    const answers = await Promise.all(Array.from({ length: 8 }, () => ask(email, '198.51.100.13')));
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 202)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(3);
    const refused = answers.find((r) => r.status === 429)!;
    expect(refused.body.message).toMatch(/Too many requests for a password link/);
  });
});
