import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { MailService } from '../src/mail/mail.service.js';
import type { FakeSmtpServer } from '../src/mail/fake-smtp.server.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { passwordLinks } from '../src/database/schema/index.js';

const tokenOf = (text: string) => /\/set-password\?token=([\w-]+)/.exec(text)![1];

describe('mail: the fake SMTP server, the outbox, and set-your-password links', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let smtp: FakeSmtpServer;

  beforeAll(async () => {
    app = await createTestApp();
    smtp = app.get(MailService).fake!;
    ws = await createTestWorkshop(app, 'Mail');
    other = await createTestWorkshop(app, 'Elsewhere');
  });
  afterAll(() => app.close());

  async function invite(email: string, role = 'technician') {
    const res = await ws.as.admin.post('/api/people').send({ name: 'Ines Invited', email, role });
    expect(res.status).toBe(201);
    return { res, mail: await smtp.waitFor((m) => m.envelopeTo.includes(email)) };
  }

  it('runs the fake on 127.0.0.1 and sends a new member a sign-in mail with an expiring link', async () => {
    expect(smtp.port).toBeGreaterThan(0);
    const email = `ines.${Date.now()}@test.example.com`;
    const { res, mail } = await invite(email);
    expect(res.body.invitationSent).toBe(true);
    expect(mail.subject).toBe(`Your Railwright sign-in for ${ws.name}`);
    expect(mail.text).toMatch(/technician/);
    expect(mail.text).toMatch(/72 hours/);
    const expiresInHours = (new Date(res.body.invitationExpiresAt).getTime() - Date.now()) / 3600_000;
    expect(expiresInHours).toBeGreaterThan(71.9);
    expect(expiresInHours).toBeLessThanOrEqual(72);
  });

  it('stores only the hash of the token, and the link works once', async () => {
    const email = `once.${Date.now()}@test.example.com`;
    const { mail } = await invite(email);
    const token = tokenOf(mail.text);
    const db = app.get<Database>(DRIZZLE);
    const rows = await db
      .select()
      .from(passwordLinks)
      .where(eq(passwordLinks.tokenHash, createHash('sha256').update(token).digest('hex')));
    expect(rows).toHaveLength(1);
    expect(JSON.stringify(await db.select().from(passwordLinks))).not.toContain(token);

    const inspect = await anonymous(app).get(`/api/auth/password-reset/${token}`);
    expect(inspect.status).toBe(200);
    expect(inspect.body).toMatchObject({ email, name: 'Ines Invited', workshop: ws.name });

    const short = await anonymous(app).post('/api/auth/password-reset').send({ token, password: 'short' });
    expect(short.status).toBe(400);
    expect(JSON.stringify(short.body.message)).toMatch(/password must be at least 12 characters/);
    // ASVS 2.1.1: 12 characters at least; eleven are refused.
    const eleven = await anonymous(app).post('/api/auth/password-reset').send({ token, password: 'gantry true' });
    expect(eleven.status).toBe(400);

    const set = await anonymous(app)
      .post('/api/auth/password-reset')
      .send({ token, password: 'gantry square and true' });
    expect(set.status).toBe(200);
    expect(set.body).toEqual({ email, signedIn: true });
    expect(
      (await anonymous(app).post('/api/auth/login').send({ email, password: 'gantry square and true' })).status,
    ).toBe(200);

    const again = await anonymous(app)
      .post('/api/auth/password-reset')
      .send({ token, password: 'someone else entirely' });
    expect(again.status).toBe(410);
    expect(again.body.message).toMatch(/already been used/);
    expect(
      (await anonymous(app).post('/api/auth/login').send({ email, password: 'someone else entirely' })).status,
    ).toBe(401);
  });

  it('refuses an expired link (410) and an unknown one (404); a malformed one is 400', async () => {
    const email = `late.${Date.now()}@test.example.com`;
    const { mail } = await invite(email);
    const token = tokenOf(mail.text);
    const db = app.get<Database>(DRIZZLE);
    await db
      .update(passwordLinks)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(passwordLinks.tokenHash, createHash('sha256').update(token).digest('hex')));
    const expired = await anonymous(app)
      .post('/api/auth/password-reset')
      .send({ token, password: 'too late for this one' });
    expect(expired.status).toBe(410);
    expect(expired.body.message).toMatch(/expired/);
    expect((await anonymous(app).get(`/api/auth/password-reset/${token}`)).status).toBe(410);
    expect(
      (
        await anonymous(app)
          .post('/api/auth/password-reset')
          .send({ token: 'A'.repeat(43), password: 'a long enough password' })
      ).status,
    ).toBe(404);
    const bad = await anonymous(app)
      .post('/api/auth/password-reset')
      .send({ token: 'x y', password: 'a long enough password' });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toMatch(/token/);
  });

  it('lets an admin send a fresh link; using one closes the others', async () => {
    const email = `again.${Date.now()}@test.example.com`;
    const { res, mail } = await invite(email);
    const first = tokenOf(mail.text);
    expect((await ws.as.owner.post(`/api/people/${res.body.person.id}/invitation`)).status).toBe(403);
    expect((await other.as.admin.post(`/api/people/${res.body.person.id}/invitation`)).status).toBe(404);
    const resend = await ws.as.admin.post(`/api/people/${res.body.person.id}/invitation`);
    expect(resend.status).toBe(201);
    const second = tokenOf((await smtp.waitFor((m) => m.envelopeTo.includes(email) && !m.text.includes(first))).text);
    expect(second).not.toBe(first);
    expect(
      (await anonymous(app).post('/api/auth/password-reset').send({ token: second, password: 'the second link works' }))
        .status,
    ).toBe(200);
    expect(
      (
        await anonymous(app)
          .post('/api/auth/password-reset')
          .send({ token: first, password: 'the first is closed now' })
      ).status,
    ).toBe(410);
  });

  describe('the development outbox', () => {
    it('shows an admin the messages of their own workshop only', async () => {
      const email = `outbox.${Date.now()}@test.example.com`;
      await invite(email, 'viewer');
      await other.as.admin
        .post('/api/people')
        .send({ name: 'Elsewhere Person', email: `else.${Date.now()}@test.example.com`, role: 'viewer' });
      const res = await ws.as.admin.get('/api/dev/outbox');
      expect(res.status).toBe(200);
      const mine = res.body.find((m: { to: string[] }) => m.to.includes(email));
      // The set-your-password link is for the person alone: the admin's outbox shows it hidden.
      expect(mine).toMatchObject({
        subject: `Your Railwright sign-in for ${ws.name}`,
        linkHidden: true,
        text: expect.stringContaining(`[link hidden: only ${email} can open it]`),
        attachments: [],
      });
      expect(JSON.stringify(res.body)).not.toMatch(/token=/);
      expect(res.body.some((m: { subject: string }) => m.subject.includes(other.name))).toBe(false);
    });

    it('is for admins only', async () => {
      for (const role of ['owner', 'technician', 'builder', 'viewer'] as const)
        expect((await ws.as[role].get('/api/dev/outbox')).status).toBe(403);
      expect((await anonymous(app).get('/api/dev/outbox')).status).toBe(401);
    });
  });
});
