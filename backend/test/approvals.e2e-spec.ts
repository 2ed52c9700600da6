import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { anonymous, createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { FakeChecks } from './support/fake-checks.js';
import { board, newMachine, requestAndApprove, STATEMENT, waiveAllBut } from './support/approval-flow.js';
import { ReadinessRegistry } from '../src/records/readiness.registry.js';
import { RecordsService } from '../src/records/records.service.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { count } from 'drizzle-orm';
import { approvals, auditEntries, changeLog, machines } from '../src/database/schema/index.js';
import { RecheckService } from '../src/approvals/recheck.service.js';
import { CronExpression, SchedulerRegistry } from '@nestjs/schedule';
import { MailService } from '../src/mail/mail.service.js';
import type { FakeSmtpServer } from '../src/mail/fake-smtp.server.js';
import { disposition } from './support/disposition.js';

const isFake = (key: string) => key.startsWith('fake-');
const pdfText = (pdf: Buffer) => execFileSync('pdftotext', ['-layout', '-', '-'], { input: pdf }).toString('utf8');

async function pdfOf(agent: TestWorkshop['as']['viewer'], machineId: string) {
  return agent
    .get(`/api/machines/${machineId}/certificate.pdf`)
    .buffer(true)
    .parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
}

describe('readiness board, waivers, approval and certificate', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let fake: FakeChecks;
  let smtp: FakeSmtpServer;

  beforeAll(async () => {
    app = await createTestApp();
    fake = new FakeChecks();
    app.get(ReadinessRegistry).register(fake);
    smtp = app.get(MailService).fake!;
    ws = await createTestWorkshop(app, 'Approvals');
    other = await createTestWorkshop(app, 'Elsewhere');
  });
  afterAll(() => app.close());

  describe('the board', () => {
    let machineId: string;
    beforeAll(async () => {
      machineId = await newMachine(ws);
      fake.seed(machineId);
    });

    it('shows every reported check with its result, target, state and evidence link, to every role', async () => {
      for (const role of ['viewer', 'builder', 'technician', 'owner', 'admin'] as const) {
        expect((await ws.as[role].get(`/api/machines/${machineId}/readiness`)).status).toBe(200);
      }
      const b = await board(ws, machineId);
      expect(b.state).toBe('being-built');
      const y1 = b.checks.find((c) => c.key === 'fake-straightness:Y1');
      expect(y1).toMatchObject({
        kind: 'rail-straightness',
        subject: 'Rail Y1 (left)',
        status: 'within-target',
        target: { value: 20, unit: 'um' },
        result: { value: 12.5, unit: 'µm' },
        place: { machineId, tab: 'rails' },
        recordType: 'test-cut',
        waiver: null,
      });
      expect(b.blocking.some((c) => isFake(c.key))).toBe(false);
      expect(b.defaultStatement).toMatch(/ready to cut/);
    });

    it('is 404 for another workshop, 401 signed out and 400 for a malformed id', async () => {
      expect((await other.as.owner.get(`/api/machines/${machineId}/readiness`)).status).toBe(404);
      expect((await anonymous(app).get(`/api/machines/${machineId}/readiness`)).status).toBe(401);
      expect((await ws.as.owner.get('/api/machines/not-a-uuid/readiness')).status).toBe(400);
    });

    it('refuses a request while checks block it (409 listing them), and refuses builders and viewers (403)', async () => {
      fake.record(machineId, 'fake-positioning:X', 0.22, 'outside-target');
      expect((await ws.as.builder.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(403);
      expect((await ws.as.viewer.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(403);
      const res = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
      expect(res.status).toBe(409);
      expect(res.body.blocking).toEqual(
        expect.arrayContaining([expect.objectContaining({ key: 'fake-positioning:X', status: 'outside-target' })]),
      );
      expect(res.body.message).toMatch(/Repeat-and-reverse run \(Axis X\)/);
      expect((await board(ws, machineId)).state).toBe('being-built');
    });

    it('lets only an owner waive, with a reason of at least 10 characters naming the field', async () => {
      const url = `/api/machines/${machineId}/checks/${encodeURIComponent('fake-positioning:X')}/waiver`;
      expect((await ws.as.technician.post(url).send({ reason: 'Good enough for sheet work.' })).status).toBe(403);
      expect((await ws.as.admin.post(url).send({ reason: 'Good enough for sheet work.' })).status).toBe(403);
      const short = await ws.as.owner.post(url).send({ reason: 'ok' });
      expect(short.status).toBe(400);
      expect(JSON.stringify(short.body.message)).toMatch(/reason/);
      expect((await ws.as.owner.post(url).send({})).status).toBe(400);
      const unknown = await ws.as.owner
        .post(`/api/machines/${machineId}/checks/no-such-check/waiver`)
        .send({ reason: 'A reason long enough.' });
      expect(unknown.status).toBe(400);
      expect(JSON.stringify(unknown.body.message)).toMatch(/checkId/);
      const within = await ws.as.owner
        .post(`/api/machines/${machineId}/checks/${encodeURIComponent('fake-straightness:Y1')}/waiver`)
        .send({ reason: 'A reason long enough.' });
      expect(within.status).toBe(409);
      expect((await other.as.owner.post(url).send({ reason: 'Good enough for sheet work.' })).status).toBe(404);
    });

    it('shows a waived check as waived with the reason, who and when; a new record of it needs a new waiver', async () => {
      const url = `/api/machines/${machineId}/checks/${encodeURIComponent('fake-positioning:X')}/waiver`;
      const res = await ws.as.owner
        .post(url)
        .send({ reason: '  Rack drive: 0.22 mm is fine for sheet work until the new pinion arrives.  ' });
      expect(res.status).toBe(201);
      let x = (await board(ws, machineId)).checks.find((c) => c.key === 'fake-positioning:X')!;
      expect(x.status).toBe('waived');
      expect(x.waiver).toEqual({
        id: expect.any(String),
        reason: 'Rack drive: 0.22 mm is fine for sheet work until the new pinion arrives.',
        by: expect.stringContaining('owner'),
        at: expect.any(String),
      });
      expect((await ws.as.owner.post(url).send({ reason: 'Waiving the same record twice.' })).status).toBe(409);
      fake.record(machineId, 'fake-positioning:X', 0.25, 'outside-target');
      x = (await board(ws, machineId)).checks.find((c) => c.key === 'fake-positioning:X')!;
      expect(x.status).toBe('outside-target');
      expect(x.waiver).toBeNull();
      const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
      expect(history.body.entries.find((e: { recordType: string }) => e.recordType === 'waiver')).toMatchObject({
        action: 'created',
        summary: expect.stringContaining('0.22 mm is fine'),
        actor: expect.stringContaining('owner'),
      });
    });
  });

  describe('request, approval and the signed record', () => {
    let machineId: string;
    let approval: { id: string; approvedAt: string; approvedBy: string; recordHash: string };

    beforeAll(async () => {
      machineId = await newMachine(ws, 'Signed router');
      fake.seed(machineId);
      await waiveAllBut(ws, machineId, isFake);
    });

    it('refuses approval before a request (409), and anyone but an owner (403)', async () => {
      expect(
        (
          await ws.as.owner
            .post(`/api/machines/${machineId}/approvals`)
            .send({ password: TEST_PASSWORD, statement: STATEMENT })
        ).status,
      ).toBe(409);
      expect(
        (
          await ws.as.technician
            .post(`/api/machines/${machineId}/approvals`)
            .send({ password: TEST_PASSWORD, statement: STATEMENT })
        ).status,
      ).toBe(403);
    });

    it('a technician requests approval: 201, awaiting approval, the owners are e-mailed', async () => {
      const res = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({});
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({
        id: expect.any(String),
        state: 'awaiting-approval',
        requestedBy: expect.stringContaining('technician'),
      });
      expect((await board(ws, machineId)).state).toBe('awaiting-approval');
      expect((await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(409);
      const mail = await smtp.waitFor(
        (m) => m.subject === 'Approval requested: Signed router' && m.envelopeTo.includes(ws.emails.owner),
      );
      expect(mail.envelopeTo).toEqual([ws.emails.owner]);
      expect(mail.text).toContain(`/machines/${machineId}?tab=readiness`);
      const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
      expect(history.body.entries[0]).toMatchObject({
        action: 'state-changed',
        changes: { state: { from: 'being-built', to: 'awaiting-approval' } },
      });
    });

    it('refuses a technician (403), a wrong password (403) and a missing statement (400)', async () => {
      const url = `/api/machines/${machineId}/approvals`;
      expect((await ws.as.technician.post(url).send({ password: TEST_PASSWORD, statement: STATEMENT })).status).toBe(
        403,
      );
      expect((await ws.as.admin.post(url).send({ password: TEST_PASSWORD, statement: STATEMENT })).status).toBe(403);
      const wrong = await ws.as.owner.post(url).send({ password: 'not my password', statement: STATEMENT });
      expect(wrong.status).toBe(403);
      expect(wrong.body.message).toMatch(/password/);
      const noStatement = await ws.as.owner.post(url).send({ password: TEST_PASSWORD });
      expect(noStatement.status).toBe(400);
      expect(JSON.stringify(noStatement.body.message)).toMatch(/statement/);
      expect((await other.as.owner.post(url).send({ password: TEST_PASSWORD, statement: STATEMENT })).status).toBe(404);
      expect((await board(ws, machineId)).state).toBe('awaiting-approval');
    });

    it('an owner approves with password and statement: 201, ready to cut, re-check date from the target set', async () => {
      const res = await ws.as.owner
        .post(`/api/machines/${machineId}/approvals`)
        .send({ password: TEST_PASSWORD, statement: STATEMENT });
      expect(res.status).toBe(201);
      approval = res.body;
      expect(approval).toMatchObject({
        id: expect.any(String),
        approvedAt: expect.any(String),
        approvedBy: expect.stringContaining('owner'),
        recordHash: expect.stringMatching(/^[0-9a-f]{64}$/),
      });
      const b = await board(ws, machineId);
      expect(b.state).toBe('ready-to-cut');
      // The router default target set asks for a re-check every 90 days.
      expect(new Date(b.recheckDueAt!).getTime() - new Date(approval.approvedAt).getTime()).toBe(90 * 24 * 3600_000);
      expect(b.approval).toMatchObject({ id: approval.id, recordHash: approval.recordHash, statement: STATEMENT });
      expect(
        (
          await ws.as.owner
            .post(`/api/machines/${machineId}/approvals`)
            .send({ password: TEST_PASSWORD, statement: STATEMENT })
        ).status,
      ).toBe(409);
    });

    it('keeps a hash that is the SHA-256 of the canonical JSON of the stored results', async () => {
      const db = app.get<Database>(DRIZZLE);
      const [row] = await db.select().from(approvals).where(eq(approvals.id, approval.id));
      // Independent canonical form: JSON.stringify with keys sorted at every level.
      const sorted = (v: unknown): unknown =>
        Array.isArray(v)
          ? v.map(sorted)
          : v && typeof v === 'object'
            ? Object.fromEntries(
                Object.keys(v)
                  .sort()
                  .map((k) => [k, sorted((v as Record<string, unknown>)[k])]),
              )
            : v;
      expect(
        createHash('sha256')
          .update(JSON.stringify(sorted(row.snapshot)))
          .digest('hex'),
      ).toBe(approval.recordHash);
      expect(row.snapshot.checks.find((c) => c.key === 'fake-straightness:Y1')).toMatchObject({
        status: 'within-target',
        result: { value: 12.5 },
        recordId: fake.get(machineId, 'fake-straightness:Y1').recordId,
      });
      expect(row.snapshot.checks.filter((c) => c.status === 'waived').every((c) => c.waiver?.reason)).toBe(true);
      const verify = await ws.as.viewer.get(`/api/machines/${machineId}/approvals/${approval.id}/verification`);
      expect(verify.body).toMatchObject({
        approvalId: approval.id,
        status: 'valid',
        valid: true,
        unchanged: true,
        differences: [],
        recordHash: approval.recordHash,
      });
    });

    it('locks the records it was based on: editing them answers 409', async () => {
      const records = app.get(RecordsService);
      const y1 = fake.get(machineId, 'fake-straightness:Y1');
      await expect(records.assertEditable('test-cut', y1.recordId!)).rejects.toMatchObject({
        status: 409,
        message: expect.stringMatching(/approved commissioning record/),
      });
      await expect(records.assertEditable('test-cut', '00000000-0000-4000-8000-000000000000')).resolves.toBeUndefined();
    });

    it('e-mails the whole workshop that the machine is approved, with the certificate attached', async () => {
      const mail = await smtp.waitFor((m) => m.subject === 'Ready to cut: Signed router approved');
      expect([...mail.envelopeTo].sort()).toEqual(Object.values(ws.emails).sort());
      expect(mail.text).toContain(approval.recordHash);
      expect(mail.attachments).toHaveLength(1);
      expect(mail.attachments[0]).toMatchObject({
        contentType: 'application/pdf',
        filename: expect.stringMatching(/^commissioning-certificate-signed-router-\d{4}-\d\d-\d\d\.pdf$/),
      });
      expect(mail.attachments[0].content.subarray(0, 5).toString()).toBe('%PDF-');
      const fromRoute = await pdfOf(ws.as.viewer, machineId);
      expect(Buffer.compare(fromRoute.body, mail.attachments[0].content)).toBe(0);
    });

    it('gives any role the certificate PDF, the same bytes every time, holding the machine, results and hash', async () => {
      const first = await pdfOf(ws.as.viewer, machineId);
      expect(first.status).toBe(200);
      expect(first.headers['content-type']).toBe('application/pdf');
      expect(disposition(first.headers['content-disposition'])).toEqual({
        type: 'attachment',
        filename: expect.stringMatching(/^commissioning-certificate-signed-router/),
      });
      const second = await pdfOf(ws.as.builder, machineId);
      expect(Buffer.compare(first.body, second.body)).toBe(0);
      const text = pdfText(first.body);
      expect(text).toContain('Commissioning certificate');
      expect(text).toContain('Signed router');
      expect(text).toContain(ws.name);
      expect(text).toContain(approval.recordHash);
      expect(text).toMatch(/Rail Y1 \(left\)\s+12\.5 µm\s+≤ 20 µm\s+Within target/);
      expect(text).toContain('Not part of this test round; checked separately.');
      expect(text).toMatch(/Electric shock|Moving gantry/);
      expect(text).toMatch(/licensed electrician/);
      expect(text).toContain(STATEMENT);
      expect(text).toMatch(/no chart data/);
      expect((await other.as.owner.get(`/api/machines/${machineId}/certificate.pdf`)).status).toBe(404);
    });

    it('keeps the record read-only while the approval stands; the owner reopens it with a reason, audited and mailed', async () => {
      const before = await pdfOf(ws.as.viewer, machineId);
      // Only the owner reopens, and only with a reason.
      expect(
        (
          await ws.as.technician
            .post(`/api/machines/${machineId}/reopen`)
            .send({ reason: 'Y2 rail was knocked by a forklift' })
        ).status,
      ).toBe(403);
      const short = await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'bump' });
      expect([short.status, short.body.message]).toEqual([400, [expect.stringMatching(/^reason /)]]);
      expect((await board(ws, machineId)).state).toBe('ready-to-cut');
      const reopened = await ws.as.owner
        .post(`/api/machines/${machineId}/reopen`)
        .send({ reason: 'Y2 rail was knocked by a forklift' });
      expect([reopened.status, reopened.body.state]).toEqual([201, 'reopened']);
      // A second reopen (a double click) finds nothing standing.
      expect(
        (
          await ws.as.owner
            .post(`/api/machines/${machineId}/reopen`)
            .send({ reason: 'Y2 rail was knocked by a forklift' })
        ).status,
      ).toBe(409);
      fake.record(machineId, 'fake-straightness:Y2', 31, 'outside-target');
      const b = await board(ws, machineId);
      expect(b.state).toBe('reopened');
      expect(b.approval?.id).toBe(approval.id);
      const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
      expect(history.body.entries.find((e: { action: string }) => e.action === 'reopened')).toMatchObject({
        actor: expect.stringContaining('owner'),
        summary: expect.stringMatching(/reopened the machine for changes: Y2 rail was knocked by a forklift/),
      });
      await smtp.waitFor((m) => m.subject.startsWith('Reopened: Signed router'));
      const after = await pdfOf(ws.as.viewer, machineId);
      expect(Buffer.compare(before.body, after.body)).toBe(0);
    });

    it('shows what drifted: the approved round beside the latest results', async () => {
      const res = await ws.as.viewer.get(`/api/machines/${machineId}/drift`);
      expect(res.status).toBe(200);
      expect(res.body.approval.id).toBe(approval.id);
      const y2 = res.body.rows.find((r: { key: string }) => r.key === 'fake-straightness:Y2');
      expect(y2).toMatchObject({
        approved: { status: 'within-target', result: { value: 9.8 } },
        latest: { status: 'outside-target', result: { value: 31 } },
        change: 21.2,
        unit: 'µm',
        rechecked: true,
        worse: true,
      });
      const y1 = res.body.rows.find((r: { key: string }) => r.key === 'fake-straightness:Y1');
      expect(y1).toMatchObject({ change: null, rechecked: false });
    });
  });

  it('refuses approval (409, listing the checks) when a check went outside target after the request', async () => {
    const machineId = await newMachine(ws, 'Stale request router');
    fake.seed(machineId);
    await waiveAllBut(ws, machineId, isFake);
    expect((await ws.as.owner.post(`/api/machines/${machineId}/approval-requests`).send({})).status).toBe(201);
    fake.record(machineId, 'fake-straightness:Y1', 44, 'outside-target');
    const res = await ws.as.owner
      .post(`/api/machines/${machineId}/approvals`)
      .send({ password: TEST_PASSWORD, statement: STATEMENT });
    expect(res.status).toBe(409);
    expect(res.body.blocking).toEqual([
      expect.objectContaining({ key: 'fake-straightness:Y1', status: 'outside-target' }),
    ]);
  });

  it('locks a real rail sweep it was based on: deleting it answers 409, and a new sweep takes the machine out of ready to cut', async () => {
    const machineId = await newMachine(ws, 'Swept router');
    const rail = await ws.as.builder
      .post(`/api/machines/${machineId}/rails`)
      .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 });
    expect([rail.status, rail.body.message]).toEqual([201, undefined]);
    // Readings within a few µm of a straight line: well inside the router's 20 µm.
    const stations = [0, 200, 400, 600, 800].map((position, i) => ({ position, reading: [0, 2, 1, 3, 2][i] }));
    const sweep = await ws.as.builder
      .post(`/api/rails/${rail.body.id}/sweeps`)
      .send({ readingUnit: 'um', phase: 'as-left', stations });
    expect([sweep.status, sweep.body.message]).toEqual([201, undefined]);
    const straightKey = (await board(ws, machineId)).checks.find((c) => c.recordId === sweep.body.id)?.key;
    expect(straightKey).toBeDefined();
    await waiveAllBut(ws, machineId, (key) => key === straightKey);
    await requestAndApprove(ws, machineId, TEST_PASSWORD);
    const del = await ws.as.builder.delete(`/api/sweeps/${sweep.body.id}`);
    expect(del.status).toBe(409);
    expect(del.body.message).toMatch(/approved commissioning record/);
    expect((await ws.as.builder.get(`/api/sweeps/${sweep.body.id}`)).status).toBe(200);
    // A new sweep is refused while the approval stands; after reopening it is recorded.
    const badSweep = {
      readingUnit: 'um',
      phase: 'as-left',
      stations: stations.map((st, i) => ({ ...st, reading: [0, 60, -40, 70, 0][i] })),
    };
    const refused = await ws.as.builder.post(`/api/rails/${rail.body.id}/sweeps`).send(badSweep);
    expect([refused.status, refused.body.message]).toEqual([
      409,
      expect.stringMatching(
        /Swept router is approved as ready to cut: .* The owner can reopen the machine with a reason/,
      ),
    ]);
    expect(
      (await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'Rail re-bedded after a crash' }))
        .status,
    ).toBe(201);
    const bad = await ws.as.builder.post(`/api/rails/${rail.body.id}/sweeps`).send(badSweep);
    expect(bad.status).toBe(201);
    expect((await board(ws, machineId)).state).toBe('reopened');
  });

  it('answers 409 with a message for the certificate of a machine never approved', async () => {
    const machineId = await newMachine(ws, 'Unapproved router');
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/certificate.pdf`);
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/has not been approved yet/);
  });

  describe('re-checks', () => {
    it('reads as re-check due once the date passes without any read writing, and the schedule e-mails owners and technicians once', async () => {
      const machineId = await newMachine(ws, 'Recheck router');
      fake.seed(machineId);
      await waiveAllBut(ws, machineId, isFake);
      const a = await requestAndApprove(ws, machineId, TEST_PASSWORD);
      const db = app.get<Database>(DRIZZLE);
      expect(await app.get(RecheckService).remindDue()).toBe(0); // not due yet: nothing to send
      await db
        .update(approvals)
        .set({ recheckDueAt: new Date(Date.now() - 60_000) })
        .where(eq(approvals.id, a.id));
      // Everything the reads could write: the machine's row, the approval's row, the history.
      const written = async () => ({
        machine: (await db.select().from(machines).where(eq(machines.id, machineId)))[0],
        approval: (await db.select().from(approvals).where(eq(approvals.id, a.id)))[0],
        audit: (await db.select({ n: count() }).from(auditEntries).where(eq(auditEntries.machineId, machineId)))[0].n,
        changes: (await db.select({ n: count() }).from(changeLog).where(eq(changeLog.workshopId, ws.id)))[0].n,
      });
      const before = await written();
      expect(before.machine.state).toBe('ready-to-cut');
      const list = await ws.as.viewer.get('/api/machines');
      expect(list.body.find((m: { id: string }) => m.id === machineId).state).toBe('recheck-due');
      expect((await ws.as.viewer.get(`/api/machines/${machineId}`)).body.state).toBe('recheck-due');
      const b = await board(ws, machineId);
      expect([b.state, b.recheckDueAt]).toEqual(['recheck-due', expect.any(String)]);
      expect((await ws.as.viewer.get(`/api/machines/${machineId}/approvals`)).body[0]).toMatchObject({
        id: a.id,
        recheckDue: true,
      });
      const token = before.approval.verificationToken!;
      expect((await anonymous(app).get(`/api/public/verify/${token}`)).body).toMatchObject({
        stands: true,
        recheckDue: true,
      });
      expect(await written()).toEqual(before);
      // A request while due is refused in the state's own words.
      const requestRefused = await ws.as.technician.post(`/api/machines/${machineId}/approval-requests`);
      expect([requestRefused.status, requestRefused.body.message]).toEqual([
        409,
        expect.stringMatching(/approved and due for its re-check/),
      ]);

      // The schedule's hourly job sends the reminder once, however often it runs.
      expect(app.get(SchedulerRegistry).getCronJob('recheck-reminders').cronTime.source).toBe(
        CronExpression.EVERY_HOUR,
      );
      const recheck = app.get(RecheckService);
      expect(await recheck.remindDue()).toBe(1);
      expect(await recheck.remindDue()).toBe(0);
      await smtp.waitFor((m) => m.subject === 'Re-check due: Recheck router');
      await new Promise((r) => setTimeout(r, 200));
      const mails = smtp.messages.filter((m) => m.subject === 'Re-check due: Recheck router');
      expect(mails).toHaveLength(1);
      expect([...mails[0].envelopeTo].sort()).toEqual([ws.emails.owner, ws.emails.technician].sort());
      expect(mails[0].text).toContain(`/machines/${machineId}?tab=readiness`);
      expect((await written()).approval.recheckNotifiedAt).not.toBeNull();
      const history = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
      expect(history.body.entries[0]).toMatchObject({
        action: 'state-changed',
        changes: { state: { from: 'ready-to-cut', to: 'recheck-due' } },
      });
      // A re-check round: the owner reopens the machine, and it is approved again through the same flow.
      expect(
        (await ws.as.owner.post(`/api/machines/${machineId}/reopen`).send({ reason: 'Six-monthly re-check' })).status,
      ).toBe(201);
      const reopened = await ws.as.viewer.get(`/api/machines/${machineId}/history?limit=200`);
      expect(reopened.body.entries.find((e: { action: string }) => e.action === 'state-changed')).toMatchObject({
        changes: { state: { from: 'recheck-due', to: 'reopened' } },
      });
      fake.record(machineId, 'fake-straightness:Y1', 13.1, 'within-target');
      const again = await requestAndApprove(ws, machineId, TEST_PASSWORD);
      expect(again.recordHash).not.toBe(a.recordHash);
      expect((await board(ws, machineId)).state).toBe('ready-to-cut');
      expect(await recheck.remindDue()).toBe(0);
    });
  });
});
