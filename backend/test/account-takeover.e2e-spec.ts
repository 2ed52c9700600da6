import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type pg from 'pg';
import request from 'supertest';
import { PG_POOL } from '../src/database/database.tokens.js';
import { MailService } from '../src/mail/mail.service.js';
import type { FakeSmtpServer } from '../src/mail/fake-smtp.server.js';
import {
  anonymous,
  createTestApp,
  createTestWorkshop,
  signIn,
  TEST_PASSWORD,
  type TestWorkshop,
} from './helpers/test-app.js';
import { newMachine } from './helpers/drives.js';
import { STATEMENT, waiveAllBut } from './support/approval-flow.js';

const tokenOf = (text: string) => /\/set-password\?token=([\w-]+)/.exec(text)?.[1];

/**
 * A signature cannot be taken over: nobody learns or sets another person's password, a reset
 * reaches that person alone and signs them out everywhere, sessions die with a password change
 * and a deactivation and do not come back, and sign-ins are kept in the history.
 */
describe('a signature cannot be taken over', () => {
  let app: NestFastifyApplication;
  let pool: pg.Pool;
  let smtp: FakeSmtpServer;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    smtp = app.get(MailService).fake!;
    ws = await createTestWorkshop(app, 'Takeover');
  });
  afterAll(() => app.close());

  const history = async (kind: string) =>
    (await ws.as.admin.get('/api/history').query({ kind, limit: 200 })).body.entries as {
      action: string;
      summary: string;
      actor: string;
      recordId: string;
    }[];

  it('an admin cannot send the owner an invitation: the owner already has a password', async () => {
    const res = await ws.as.admin.post(`/api/people/${ws.userIds.owner}/invitation`);
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/already chosen a password.*reset/);
    expect(smtp.messages.some((m) => m.envelopeTo.includes(ws.emails.owner))).toBe(false);
  });

  it("no route lets an admin set another person's password", async () => {
    const attempts = [
      ws.as.admin.patch(`/api/people/${ws.userIds.owner}`).send({ password: 'admin chose this' }),
      ws.as.admin.post(`/api/people/${ws.userIds.owner}/password`).send({ password: 'admin chose this' }),
      ws.as.admin.put(`/api/people/${ws.userIds.owner}`).send({ password: 'admin chose this' }),
    ];
    for (const res of await Promise.all(attempts)) expect([400, 404, 405]).toContain(res.status);
    // The owner's password is unchanged.
    await signIn(app, ws.emails.owner, TEST_PASSWORD);
  });

  it('a reset mails the link to the owner only, never in a response or on the outbox page, ends their sessions and tells them', async () => {
    const owner = await signIn(app, ws.emails.owner, TEST_PASSWORD);
    expect((await owner.get('/api/auth/me')).status).toBe(200);
    const since = smtp.messages.length;
    const res = await ws.as.admin.post(`/api/people/${ws.userIds.owner}/password-reset`);
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ resetSent: true, resetExpiresAt: expect.any(String) });
    expect(JSON.stringify(res.body)).not.toMatch(/token|set-password/);
    // The old session is over, and so is the old password.
    expect((await owner.get('/api/auth/me')).status).toBe(401);
    expect((await ws.as.owner.get('/api/machines')).status).toBe(401);
    expect(
      (await anonymous(app).post('/api/auth/login').send({ email: ws.emails.owner, password: TEST_PASSWORD })).status,
    ).toBe(401);
    // The link went to the owner alone.
    const mail = await smtp.waitFor((m) => m.envelopeTo.includes(ws.emails.owner) && /was reset/.test(m.subject));
    expect(mail.envelopeTo).toEqual([ws.emails.owner]);
    const token = tokenOf(mail.text)!;
    expect(token).toBeTruthy();
    const fresh = smtp.messages.slice(since);
    expect(fresh.filter((m) => m.text.includes(token)).every((m) => m.envelopeTo.join() === ws.emails.owner)).toBe(
      true,
    );
    // Nowhere an admin can look shows it.
    for (const path of ['/api/dev/outbox', '/api/people', '/api/history?limit=200']) {
      const page = await ws.as.admin.get(path);
      expect(page.status).toBe(200);
      expect(JSON.stringify(page.body)).not.toContain(token);
    }
    const outboxEntry = (await ws.as.admin.get('/api/dev/outbox')).body.find((m: { id: string }) => m.id === mail.id);
    expect(outboxEntry).toMatchObject({ linkHidden: true, text: expect.stringContaining('link hidden') });
    // The owner chooses a new password from their own mail, and is told it changed.
    expect(
      (await anonymous(app).post('/api/auth/password-reset').send({ token, password: 'the owner chose this one' }))
        .status,
    ).toBe(200);
    await smtp.waitFor((m) => m.envelopeTo.includes(ws.emails.owner) && /was changed/.test(m.subject));
    ws.as.owner = await signIn(app, ws.emails.owner, 'the owner chose this one');
    // All of it is in the history, by plain name.
    const entries = await history('password');
    expect(entries.find((e) => e.action === 'password-reset')).toMatchObject({
      actor: expect.stringContaining('admin'),
      summary: expect.stringMatching(/reset the password of owner/),
    });
    expect(entries.find((e) => e.action === 'password-changed')).toMatchObject({
      actor: expect.stringContaining('owner'),
    });
  });

  it('sessions die when the password changes, even one written back by a request in flight', async () => {
    const person = await ws.as.admin
      .post('/api/people')
      .send({ name: 'Paula Planer', email: `paula.${Date.now()}@test.example.com`, role: 'builder' });
    const link = tokenOf((await smtp.waitFor((m) => m.envelopeTo.includes(person.body.person.email))).text)!;
    expect(
      (await anonymous(app).post('/api/auth/password-reset').send({ token: link, password: 'paula first password' }))
        .status,
    ).toBe(200);
    const old = await signIn(app, person.body.person.email, 'paula first password');
    // Keep a copy of the session row as a request in flight would write it back.
    // (Choosing the password signed her in too: that session and this one both belong to her.)
    const { rows } = await pool.query(
      "select sid, sess, expire from session where sess->>'userId' = $1 order by (sess->>'createdAt')::bigint desc",
      [person.body.person.id],
    );
    expect(rows).toHaveLength(2);
    await ws.as.admin.post(`/api/people/${person.body.person.id}/password-reset`);
    expect(
      (await pool.query("select 1 from session where sess->>'userId' = $1", [person.body.person.id])).rowCount,
    ).toBe(0);
    await pool.query('insert into session (sid, sess, expire) values ($1, $2, $3)', [
      rows[0].sid,
      rows[0].sess,
      rows[0].expire,
    ]);
    const res = await old.get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/session has ended/);
  });

  it('deactivation ends the sessions; reactivation does not bring them back', async () => {
    const agent = await signIn(app, ws.emails.technician, TEST_PASSWORD);
    expect((await agent.get('/api/machines')).status).toBe(200);
    expect((await ws.as.admin.patch(`/api/people/${ws.userIds.technician}`).send({ active: false })).status).toBe(200);
    expect((await agent.get('/api/machines')).status).toBe(401);
    expect((await ws.as.technician.get('/api/machines')).status).toBe(401);
    expect((await ws.as.admin.patch(`/api/people/${ws.userIds.technician}`).send({ active: true })).status).toBe(200);
    expect((await agent.get('/api/machines')).status).toBe(401);
    expect((await ws.as.technician.get('/api/machines')).status).toBe(401);
    ws.as.technician = await signIn(app, ws.emails.technician, TEST_PASSWORD);
    expect((await ws.as.technician.get('/api/machines')).status).toBe(200);
    const people = await history('person');
    expect(people.some((e) => /deactivated technician/.test(e.summary))).toBe(true);
    expect(people.some((e) => /reactivated technician/.test(e.summary))).toBe(true);
  });

  it('sign-ins and failed sign-ins are in the history; a failed one survives its 401', async () => {
    await signIn(app, ws.emails.builder, TEST_PASSWORD);
    const failed = await request(app.getHttpServer())
      .post('/api/auth/login')
      .send({ email: ws.emails.builder, password: 'a wrong password' });
    expect(failed.status).toBe(401);
    const entries = await history('sign-in');
    expect(
      entries.some(
        (e) => e.action === 'signed-in' && e.recordId === ws.userIds.builder && /builder .* signed in/.test(e.summary),
      ),
    ).toBe(true);
    expect(entries.find((e) => e.action === 'sign-in-failed' && e.recordId === ws.userIds.builder)).toMatchObject({
      summary: expect.stringMatching(/Failed sign-in to builder .*wrong password/),
      actor: expect.stringMatching(/^Unknown/),
    });
    // The entry names the account by its person, never by the address typed or the password tried.
    expect(JSON.stringify(entries)).not.toContain('a wrong password');
  });

  it('wrong signing passwords are throttled like sign-ins, and the count survives the refused command', async () => {
    const machineId = await newMachine(ws, 'router');
    await waiveAllBut(ws, machineId, () => false);
    expect((await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(201);
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      statuses.push(
        (
          await ws.as.owner
            .post(`/api/machines/${machineId}/approvals`)
            .send({ password: `wrong ${i}`, statement: 'I approve this machine as ready to cut.' })
        ).status,
      );
    }
    expect(statuses).toEqual([403, 403, 403, 403, 403, 429, 429]);
    // Even the right password waits now; the machine is still awaiting approval.
    expect(
      (
        await ws.as.owner
          .post(`/api/machines/${machineId}/approvals`)
          .send({ password: 'the owner chose this one', statement: STATEMENT })
      ).status,
    ).toBe(429);
  });
});
