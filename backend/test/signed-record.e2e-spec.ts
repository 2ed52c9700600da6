import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { execFileSync } from 'node:child_process';
import { createHash, createPrivateKey, createPublicKey, sign, verify } from 'node:crypto';
import { readFileSync, statSync } from 'node:fs';
import pg from 'pg';
import { anonymous, createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { board, newMachine, requestAndApprove, STATEMENT, waiveAllBut } from './support/approval-flow.js';
import { signingKeyPath } from '../src/approvals/signing/signing-key.service.js';
import { canonicalJson } from '../src/approvals/canonical-json.js';
import { decimalTimes } from '../src/approvals/signing/decimal-times.js';
import { MailService } from '../src/mail/mail.service.js';
import { disposition } from './support/disposition.js';

const pdfText = (pdf: Buffer) => execFileSync('pdftotext', ['-layout', '-', '-'], { input: pdf }).toString('utf8');
const binary = (res: unknown, cb: (err: Error | null, body: Buffer) => void) => {
  const stream = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
};

/** Writes straight to the database as its owner, with the approval-lock triggers off: what someone with database access could do. */
async function tamper(sql: string, params: unknown[]): Promise<void> {
  const client = new pg.Client({ connectionString: process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL });
  await client.connect();
  try {
    await client.query('BEGIN');
    await client.query('SET LOCAL session_replication_role = replica');
    const res = await client.query(sql, params);
    if (res.rowCount !== 1) throw new Error(`tamper touched ${res.rowCount} rows: ${sql}`);
    await client.query('COMMIT');
  } catch (err) {
    await client.query('ROLLBACK');
    throw err;
  } finally {
    await client.end();
  }
}

interface Difference {
  path: string;
  record: { kind: string; id: string } | null;
  change: string;
  signed: unknown;
  current: unknown;
}

describe('the signed record', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;
  let sweepId: string;
  let approvalId: string;
  let token: string;
  const readings = [0, 2, 1, 3, 2];

  const verification = async () => {
    const res = await ws.as.viewer.get(`/api/machines/${machineId}/approvals/${approvalId}/verification`);
    expect(res.status).toBe(200);
    return res.body as {
      status: string;
      valid: boolean;
      unchanged: boolean | null;
      message: string;
      differences: Difference[];
      signedCopyIntact: boolean | null;
      keyId: string;
      signedBy: string;
      signedAt: string;
    };
  };

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Signing');
    machineId = await newMachine(ws, 'Sealed router');
    const rail = await ws.as.builder
      .post(`/api/machines/${machineId}/rails`)
      .send({ label: 'Y1 (left)', axis: 'Y1', length: 800, holePitch: 60, firstHole: 40 });
    expect([rail.status, rail.body.message]).toEqual([201, undefined]);
    const stations = [0, 200, 400, 600, 800].map((position, i) => ({ position, reading: readings[i] }));
    const sweep = await ws.as.builder
      .post(`/api/rails/${rail.body.id}/sweeps`)
      .send({ readingUnit: 'um', phase: 'as-left', stations });
    expect([sweep.status, sweep.body.message]).toEqual([201, undefined]);
    sweepId = sweep.body.id;
    const straightKey = (await board(ws, machineId)).checks.find((c) => c.recordId === sweepId)?.key;
    await waiveAllBut(ws, machineId, (key) => key === straightKey);
    approvalId = (await requestAndApprove(ws, machineId, TEST_PASSWORD)).id;
    const pdf = await ws.as.viewer.get(`/api/machines/${machineId}/certificate.pdf`).buffer(true).parse(binary);
    token = /\/verify\/([A-Za-z0-9_-]+)/.exec(pdfText(pdf.body))![1];
  });
  afterAll(() => app.close());

  it('is signed with a key kept in the data folder, readable only by its owner', () => {
    expect(statSync(signingKeyPath()).mode & 0o777).toBe(0o600);
  });

  it('verifies as valid and unchanged right after approval, naming signer, time and key', async () => {
    const v = await verification();
    expect(v).toMatchObject({
      status: 'valid',
      valid: true,
      unchanged: true,
      differences: [],
      signedBy: expect.stringContaining('owner'),
      signedAt: expect.any(String),
    });
    const pem = (await anonymous(app).get('/api/public/signing-key')).text;
    expect(v.keyId).toBe(
      createHash('sha256')
        .update(createPublicKey(pem).export({ type: 'spki', format: 'der' }))
        .digest('hex'),
    );
  });

  it('prints the public verification address and its QR code on the certificate, the same bytes every time', async () => {
    const get = () => ws.as.viewer.get(`/api/machines/${machineId}/certificate.pdf`).buffer(true).parse(binary);
    const [a, b] = [await get(), await get()];
    expect(Buffer.compare(a.body, b.body)).toBe(0);
    const text = pdfText(a.body);
    expect(text).toMatch(new RegExp(`https?://\\S+/verify/${token}`));
    expect(text).toMatch(/Scan the code or open this address/);
    expect(token.length).toBeGreaterThanOrEqual(32);
  });

  it('mails the verification address with the approval', async () => {
    const smtp = app.get(MailService).fake!;
    const mail = await smtp.waitFor((m) => m.subject === 'Ready to cut: Sealed router approved');
    expect(mail.text).toContain(`/verify/${token}`);
  });

  describe('without an account', () => {
    it('gives the public key as PEM', async () => {
      const res = await anonymous(app).get('/api/public/signing-key');
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/plain/);
      expect(res.text).toMatch(/^-----BEGIN PUBLIC KEY-----\n[\s\S]+\n-----END PUBLIC KEY-----\n$/);
    });

    it('shows the approval by its token: machine, workshop, signer, time, statement, re-check date and the verdict', async () => {
      const res = await anonymous(app).get(`/api/public/verify/${token}`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({
        status: 'valid',
        valid: true,
        unchanged: true,
        machine: { name: 'Sealed router', kind: 'router' },
        workshop: ws.name,
        signedBy: expect.stringContaining('owner'),
        statement: STATEMENT,
        recheckDueAt: expect.any(String),
        stands: true,
        reopened: null,
      });
    });

    it("offers the signed record, whose signature checks with node:crypto and the public route's key alone", async () => {
      const pem = (await anonymous(app).get('/api/public/signing-key')).text;
      const res = await anonymous(app).get(`/api/public/verify/${token}/record.json`);
      expect(res.status).toBe(200);
      expect(disposition(res.headers['content-disposition'])).toEqual({
        type: 'attachment',
        filename: expect.stringMatching(/^railwright-signed-record-.*\.json$/),
      });
      const record = res.body as {
        algorithm: string;
        keyId: string;
        publicKey: string;
        content: string;
        signature: string;
      };
      expect(record.algorithm).toBe('Ed25519');
      expect(
        verify(
          null,
          Buffer.from(record.content, 'utf8'),
          createPublicKey(pem),
          Buffer.from(record.signature, 'base64'),
        ),
      ).toBe(true);
      // The content is canonical JSON and covers the manifestation, the targets and every reading.
      const content = JSON.parse(record.content);
      expect(canonicalJson(content)).toBe(record.content);
      expect(content.approval).toMatchObject({
        id: approvalId,
        machineId,
        statement: STATEMENT,
        signerName: expect.stringContaining('owner'),
        recheckIntervalDays: 90,
      });
      expect(content.records[`rail-sweep:${sweepId}`].row.readingsRaw).toEqual(readings);
      expect(Object.keys(content.targetValues).length).toBeGreaterThan(0);
      expect(content.records[`machine:${machineId}`].row).toMatchObject({ name: 'Sealed router', workAreaXMm: 900 });
      const walk = Object.values(content.records as Record<string, { kind: string; answers?: unknown[] }>).find(
        (r) => r.kind === 'safety-walk',
      );
      expect(walk?.answers?.length).toBeGreaterThan(0);
    });

    it('answers 404 with a message for a made-up or malformed token', async () => {
      for (const url of [
        '/api/public/verify/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA',
        '/api/public/verify/not-a-token',
        '/api/public/verify/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA/record.json',
      ]) {
        const res = await anonymous(app).get(url);
        expect([res.status, res.body.message]).toEqual([
          404,
          expect.stringMatching(/No approval has this verification address/),
        ]);
      }
    });

    it('keeps the other routes closed', async () => {
      expect((await anonymous(app).get(`/api/machines/${machineId}/approvals/${approvalId}/verification`)).status).toBe(
        401,
      );
    });
  });

  describe('signed before a database upgrade changed the layout of its rows', () => {
    type Content = { records: Record<string, { kind: string; row: Record<string, unknown> }> };
    const ownerQuery = async <T>(sql: string, params: unknown[] = []) => {
      const client = new pg.Client({ connectionString: process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL });
      await client.connect();
      try {
        return (await client.query(sql, params)).rows as T[];
      } finally {
        await client.end();
      }
    };
    let original: { signed_content: string; signature: string };

    /**
     * Re-signs the record as the server would have signed it before migrations 0018–0027: sweeps
     * with one `unit` (the readings' unit) and no face, warnings or length unit; rails and the
     * machine without their length unit, spacing and end distance.
     */
    const signInOldLayout = async () => {
      [original] = await ownerQuery<{ signed_content: string; signature: string }>(
        'SELECT signed_content, signature FROM approvals WHERE id = $1',
        [approvalId],
      );
      const old = JSON.parse(original.signed_content) as Content;
      for (const entry of Object.values(old.records)) {
        const row = entry.row;
        if (entry.kind === 'rail-sweep') {
          row.unit = row.readingUnit;
          for (const k of ['readingUnit', 'lengthUnit', 'face', 'warnings']) delete row[k];
        }
        if (entry.kind === 'rail') for (const k of ['lengthUnit', 'spacingMm', 'endDistanceMm']) delete row[k];
        if (entry.kind === 'machine') delete row.lengthUnit;
      }
      const text = canonicalJson(old);
      const key = createPrivateKey(readFileSync(signingKeyPath(), 'utf8'));
      const signature = sign(null, Buffer.from(text, 'utf8'), key).toString('base64');
      await tamper('UPDATE approvals SET signed_content = $2, signature = $3 WHERE id = $1', [
        approvalId,
        text,
        signature,
      ]);
      return { text, old };
    };
    const restore = () =>
      tamper('UPDATE approvals SET signed_content = $2, signature = $3 WHERE id = $1', [
        approvalId,
        original.signed_content,
        original.signature,
      ]);

    it('still verifies as valid and unchanged, and the offered record is the text that was signed', async () => {
      const { text, old } = await signInOldLayout();
      expect(old.records[`rail-sweep:${sweepId}`].row.unit).toBe('um');
      try {
        const v = await verification();
        expect(v).toMatchObject({
          status: 'valid',
          valid: true,
          unchanged: true,
          signedCopyIntact: true,
          differences: [],
        });
        expect(v.message).toMatch(/earlier layout/);
        const pem = (await anonymous(app).get('/api/public/signing-key')).text;
        const record = (await anonymous(app).get(`/api/public/verify/${token}/record.json`)).body as {
          content: string;
          currentContent: string;
          signature: string;
        };
        expect(record.content).toBe(text);
        expect(
          verify(
            null,
            Buffer.from(record.content, 'utf8'),
            createPublicKey(pem),
            Buffer.from(record.signature, 'base64'),
          ),
        ).toBe(true);
        expect(JSON.parse(record.currentContent).records[`rail-sweep:${sweepId}`].row.readingUnit).toBe('um');
      } finally {
        await restore();
      }
    });

    it('a reading changed since is still found, and only the reading is named', async () => {
      await signInOldLayout();
      try {
        await tamper(`UPDATE rail_sweeps SET readings_raw = '[0,2,1,4,2]'::jsonb WHERE id = $1`, [sweepId]);
        const v = await verification();
        expect(v).toMatchObject({ status: 'changed', valid: false, signedCopyIntact: true });
        expect(v.differences).toEqual([
          {
            path: `records["rail-sweep:${sweepId}"].row.readingsRaw[3]`,
            record: { kind: 'rail-sweep', id: sweepId },
            change: 'changed',
            signed: 3,
            current: 4,
          },
        ]);
      } finally {
        await tamper(`UPDATE rail_sweeps SET readings_raw = '[0,2,1,3,2]'::jsonb WHERE id = $1`, [sweepId]);
        await restore();
      }
      expect((await verification()).valid).toBe(true);
    });

    it('a unit changed by hand after signing is not taken for the upgrade', async () => {
      await signInOldLayout();
      try {
        await tamper(`UPDATE rail_sweeps SET reading_unit = 'thou' WHERE id = $1`, [sweepId]);
        const v = await verification();
        expect(v.valid).toBe(false);
        expect(v.differences).toEqual([
          expect.objectContaining({
            path: `records["rail-sweep:${sweepId}"].row.readingUnit`,
            signed: 'um',
            current: 'thou',
          }),
        ]);
      } finally {
        await tamper(`UPDATE rail_sweeps SET reading_unit = 'um' WHERE id = $1`, [sweepId]);
        await restore();
      }
    });

    it('converts measured moves to mm exactly as the migration did in PostgreSQL numeric arithmetic', async () => {
      // Independent reference: PostgreSQL's own numeric type, with migration 0024's expression.
      let seed = 7;
      const next = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
      const values = [
        19.95,
        0.1,
        1e-7,
        3.3333333333333335,
        -12.7,
        1234.56789,
        2.5e-13,
        1.5e21,
        ...Array.from({ length: 200 }, () => (next() - 0.3) * 10 ** Math.floor(next() * 8 - 3)),
      ];
      for (const [unit, factor] of [
        ['in', '25.4'],
        ['thou', '0.0254'],
        ['um', '0.001'],
      ] as const) {
        const rows = await ownerQuery<{ v: number }>(
          `SELECT round((e.m->>'measured')::numeric * $2::numeric, 12)::float8 AS v FROM jsonb_array_elements($1::jsonb) WITH ORDINALITY AS e(m, ord) ORDER BY ord`,
          [JSON.stringify(values.map((measured) => ({ measured }))), factor],
        );
        expect([unit, values.map((v) => decimalTimes(v, factor, 12))]).toEqual([unit, rows.map((r) => Number(r.v))]);
      }
    });
  });

  describe('tampered with in the database', () => {
    it('a changed reading of the signed sweep makes verification fail, naming the reading', async () => {
      await tamper(`UPDATE rail_sweeps SET readings_raw = '[0,2,9,3,2]'::jsonb WHERE id = $1`, [sweepId]);
      const v = await verification();
      expect(v).toMatchObject({ status: 'changed', valid: false, unchanged: false, signedCopyIntact: true });
      expect(v.differences).toContainEqual({
        path: `records["rail-sweep:${sweepId}"].row.readingsRaw[2]`,
        record: { kind: 'rail-sweep', id: sweepId },
        change: 'changed',
        signed: 1,
        current: 9,
      });
      const pub = await anonymous(app).get(`/api/public/verify/${token}`);
      expect(pub.body).toMatchObject({ valid: false, unchanged: false });
      await tamper(`UPDATE rail_sweeps SET readings_raw = '[0,2,1,3,2]'::jsonb WHERE id = $1`, [sweepId]);
      expect((await verification()).valid).toBe(true);
    });

    it('a changed statement makes verification fail, naming it', async () => {
      await tamper('UPDATE approvals SET statement = $2 WHERE id = $1', [approvalId, 'I approve nothing.']);
      const v = await verification();
      expect(v.valid).toBe(false);
      expect(v.differences).toEqual([
        {
          path: 'approval.statement',
          record: null,
          change: 'changed',
          signed: STATEMENT,
          current: 'I approve nothing.',
        },
      ]);
      await tamper('UPDATE approvals SET statement = $2 WHERE id = $1', [approvalId, STATEMENT]);
      expect((await verification()).valid).toBe(true);
    });

    it('a changed target value makes verification fail, naming the target', async () => {
      const record = JSON.parse((await anonymous(app).get(`/api/public/verify/${token}/record.json`)).body.content);
      const [key, target] = Object.entries(record.targetValues as Record<string, { value: number }>)[0];
      await tamper(
        `UPDATE approvals SET target_values = jsonb_set(target_values, ARRAY[$2, 'value'], to_jsonb($3::float8)) WHERE id = $1`,
        [approvalId, key, target.value * 10],
      );
      const v = await verification();
      expect(v.valid).toBe(false);
      expect(v.differences).toEqual([
        {
          path: `targetValues.${key}.value`,
          record: null,
          change: 'changed',
          signed: target.value,
          current: target.value * 10,
        },
      ]);
      await tamper(
        `UPDATE approvals SET target_values = jsonb_set(target_values, ARRAY[$2, 'value'], to_jsonb($3::float8)) WHERE id = $1`,
        [approvalId, key, target.value],
      );
      expect((await verification()).valid).toBe(true);
    });

    it('a rewritten signed copy with a recomputed hash does not make a tampered record valid', async () => {
      await tamper(`UPDATE rail_sweeps SET readings_raw = '[0,2,1,3,20]'::jsonb WHERE id = $1`, [sweepId]);
      const forged = (await anonymous(app).get(`/api/public/verify/${token}/record.json`)).body.content as string;
      const saved = JSON.parse((await anonymous(app).get(`/api/public/verify/${token}/record.json`)).body.content);
      expect(saved.records[`rail-sweep:${sweepId}`].row.readingsRaw[4]).toBe(20);
      await tamper('UPDATE approvals SET signed_content = $2, record_hash = $3 WHERE id = $1', [
        approvalId,
        forged,
        createHash('sha256').update(forged).digest('hex'),
      ]);
      const v = await verification();
      expect(v).toMatchObject({
        status: 'changed',
        valid: false,
        unchanged: false,
        signedCopyIntact: false,
        differences: [],
      });
      expect(v.message).toMatch(/kept copy of the signed record was altered too/);
      expect((await anonymous(app).get(`/api/public/verify/${token}`)).body.valid).toBe(false);
    });

    it('an approval signed before signatures were kept says so, and is not valid', async () => {
      await tamper('UPDATE approvals SET signature = NULL, signing_key_id = NULL WHERE id = $1', [approvalId]);
      const v = await verification();
      expect(v).toMatchObject({
        status: 'unsigned',
        valid: false,
        unchanged: null,
        message: expect.stringMatching(/signed before signatures were kept/),
      });
      expect((await anonymous(app).get(`/api/public/verify/${token}/record.json`)).status).toBe(404);
    });
  });

  it('shows a reopened approval as no longer standing, with when, who and why', async () => {
    const machine2 = await newMachine(ws, 'Reopened router');
    await waiveAllBut(ws, machine2, () => false);
    await requestAndApprove(ws, machine2, TEST_PASSWORD);
    const pdf = await ws.as.viewer.get(`/api/machines/${machine2}/certificate.pdf`).buffer(true).parse(binary);
    const token2 = /\/verify\/([A-Za-z0-9_-]+)/.exec(pdfText(pdf.body))![1];
    expect(
      (await ws.as.owner.post(`/api/machines/${machine2}/reopen`).send({ reason: 'Y2 rail was knocked by a forklift' }))
        .status,
    ).toBe(201);
    const res = await anonymous(app).get(`/api/public/verify/${token2}`);
    expect(res.body).toMatchObject({
      valid: true,
      stands: false,
      reopened: {
        at: expect.any(String),
        by: expect.stringContaining('owner'),
        reason: 'Y2 rail was knocked by a forklift',
      },
    });
  });
});
