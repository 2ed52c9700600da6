import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import type { Role } from '../src/database/schema/index.js';
import { SubjectsRegistry } from '../src/records/subjects.registry.js';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { CSV, download, makeJpeg, makePng, makeWebp, PDF, sha256, upload } from './evidence-fixtures.js';
import { refusalCases } from './evidence-refusal-cases.js';
import { disposition } from './support/disposition.js';
import { lockAsApproved } from './support/stand-in-approval.js';

/** What a driver's spec provides: a way to start the app on it and to see every stored key. */
export interface DriverHarness {
  /** Environment for the app on this driver (storage settings, data folder). */
  env(): Record<string, string>;
  /** Every object or file the driver holds, temporary ones included. */
  storedKeys(): Promise<string[]>;
  /** Takes an object away behind the app's back. */
  removeKey(key: string): Promise<void>;
}

export interface Ctx {
  app: NestFastifyApplication;
  ws: TestWorkshop;
  other: TestWorkshop;
  machineId: string;
  otherMachineId: string;
  /** A check of this workshop's machine, registered in place of the subject type "test-cut". */
  checkId: string;
}

/**
 * The evidence API's behaviour, run once per storage driver: roles, types from bytes, same bytes
 * back, thumbnails, workshops kept apart, deletes refused after approval, nothing left behind.
 */
export function evidenceApiCases(driver: string, harness: DriverHarness) {
  const ctx = {} as Ctx;
  const saved = { ...process.env };

  beforeAll(async () => {
    Object.assign(process.env, harness.env());
    ctx.app = await createTestApp();
    ctx.ws = await createTestWorkshop(ctx.app, `Evidence ${driver}`);
    ctx.other = await createTestWorkshop(ctx.app, 'Evidence other');
    ctx.machineId = (
      await ctx.ws.as.builder
        .post('/api/machines')
        .send({ name: 'Evidence table', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
    ctx.otherMachineId = (
      await ctx.other.as.owner
        .post('/api/machines')
        .send({ name: 'Theirs', kind: 'router', workArea: { x: 900, y: 600 } })
    ).body.id;
    // A stand-in for a check owned by another module: resolves only inside its own workshop.
    ctx.checkId = randomUUID();
    const checks = new Map([[ctx.checkId, { workshopId: ctx.ws.id, machineId: ctx.machineId }]]);
    ctx.app.get(SubjectsRegistry).register('test-cut', async (workshopId, id) => {
      const c = checks.get(id);
      return c && c.workshopId === workshopId
        ? { machineId: c.machineId, recordType: 'test-cut', recordId: id, label: 'Bench check 1' }
        : null;
    });
  });
  afterAll(async () => {
    await ctx.app?.close();
    process.env = saved;
  });

  const onMachine = () => ({ subjectType: 'machine', subjectId: ctx.machineId });

  it.each<[Role, string]>([
    ['builder', 'photo'],
    ['technician', 'photo'],
    ['owner', 'photo'],
    ['admin', 'photo'],
  ])('%s attaches a %s: 201 with its type, size and a thumbnail', async (role) => {
    const png = await makePng();
    const res = await upload(
      ctx.ws.as[role],
      { ...onMachine(), caption: `set-up by ${role}` },
      { body: png, name: 'indicator set-up.png', type: 'image/png' },
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      contentType: 'image/png',
      size: png.length,
      kind: 'photo',
      fileName: 'indicator set-up.png',
      caption: `set-up by ${role}`,
      sha256: sha256(png),
      widthPx: 800,
      heightPx: 600,
      machineId: ctx.machineId,
      subject: { type: 'machine', id: ctx.machineId, label: 'Evidence table' },
      thumbnailUrl: `/api/evidence/${res.body.id}/thumbnail`,
      canDelete: true,
      locked: false,
    });
  });

  it('a viewer reads and downloads but cannot attach; anonymous callers get 401', async () => {
    const png = await makePng(64, 48);
    const made = await upload(ctx.ws.as.builder, onMachine(), { body: png, name: 'rail.png' });
    expect((await upload(ctx.ws.as.viewer, onMachine(), { body: png, name: 'rail.png' })).status).toBe(403);
    const list = await ctx.ws.as.viewer.get('/api/evidence').query(onMachine());
    expect(list.status).toBe(200);
    const mine = list.body.find((e: { id: string }) => e.id === made.body.id);
    expect(mine).toMatchObject({ canDelete: false });
    expect((await ctx.ws.as.viewer.get(`/api/evidence/${made.body.id}/content`)).status).toBe(200);
    expect((await ctx.ws.as.viewer.delete(`/api/evidence/${made.body.id}`)).status).toBe(403);
    expect((await upload(anonymous(ctx.app), onMachine(), { body: png, name: 'rail.png' })).status).toBe(401);
    expect((await anonymous(ctx.app).get('/api/evidence').query(onMachine())).status).toBe(401);
    expect((await anonymous(ctx.app).get(`/api/evidence/${made.body.id}/content`)).status).toBe(401);
    expect((await anonymous(ctx.app).get(`/api/evidence/${made.body.id}/thumbnail`)).status).toBe(401);
  });

  it('gives back the same bytes with the right type, disposition and nosniff', async () => {
    const jpeg = await makeJpeg();
    const cases = [
      {
        body: jpeg,
        name: 'squaring marks.jpg',
        type: 'image/jpeg',
        disposition: /^inline; filename="squaring marks.jpg"/,
      },
      {
        body: PDF,
        name: 'screw datasheet.pdf',
        type: 'application/pdf',
        disposition: /^attachment; filename="screw datasheet.pdf"/,
      },
      {
        body: CSV,
        name: 'sweep Y1.csv',
        type: 'text/csv; charset=utf-8',
        disposition: /^attachment; filename="sweep Y1.csv"/,
      },
      { body: await makeWebp(), name: 'carriage.webp', type: 'image/webp', disposition: /^inline/ },
    ];
    for (const c of cases) {
      const made = await upload(ctx.ws.as.technician, onMachine(), {
        body: c.body,
        name: c.name,
        type: 'application/octet-stream',
      });
      expect(made.status).toBe(201);
      const res = await download(ctx.ws.as.viewer, `/api/evidence/${made.body.id}/content`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe(c.type);
      expect(res.headers['content-disposition']).toMatch(c.disposition);
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(Number(res.headers['content-length'])).toBe(c.body.length);
      expect(sha256(res.body as Buffer)).toBe(sha256(c.body));
      expect(Buffer.compare(res.body as Buffer, c.body)).toBe(0);
    }
  });

  it('streams a file larger than one S3 part (9 MiB) and gives back the same bytes', async () => {
    const body = Buffer.concat([PDF, Buffer.alloc(9 * 1024 * 1024, 0x20), Buffer.from('\n%%EOF\n')]);
    const made = await upload(ctx.ws.as.builder, onMachine(), { body, name: 'wiring drawings.pdf' });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ size: body.length, sha256: sha256(body), contentType: 'application/pdf' });
    const res = await download(ctx.ws.as.builder, `/api/evidence/${made.body.id}/content`);
    expect(sha256(res.body as Buffer)).toBe(sha256(body));
  });

  it('makes a WebP thumbnail at most 320 px for photos, none for files', async () => {
    const made = await upload(ctx.ws.as.builder, onMachine(), { body: await makeJpeg(1600, 1200), name: 'gantry.jpg' });
    const thumb = await download(ctx.ws.as.viewer, `/api/evidence/${made.body.id}/thumbnail`);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect(meta.format).toBe('webp');
    expect(meta).toMatchObject({ width: 320, height: 240 });
    const pdf = await upload(ctx.ws.as.builder, onMachine(), { body: PDF, name: 'manual.pdf' });
    expect(pdf.body.thumbnailUrl).toBeNull();
    expect((await ctx.ws.as.builder.get(`/api/evidence/${pdf.body.id}/thumbnail`)).status).toBe(404);
  });

  it('turns a phone photo upright: size and thumbnail follow its camera orientation', async () => {
    // EXIF orientation 6: stored 1200 wide × 900 high, shown turned a quarter, 900 × 1200.
    const turned = await sharp({ create: { width: 1200, height: 900, channels: 3, background: '#777' } })
      .jpeg()
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const made = await upload(ctx.ws.as.builder, onMachine(), { body: turned, name: 'portrait.jpg' });
    expect(made.body).toMatchObject({ widthPx: 900, heightPx: 1200 });
    const thumb = await download(ctx.ws.as.builder, made.body.thumbnailUrl);
    expect(await sharp(thumb.body as Buffer).metadata()).toMatchObject({ width: 240, height: 320 });
  });

  it('decides the type from the bytes, not the name', async () => {
    const png = await makePng(32, 32);
    const misnamed = await upload(ctx.ws.as.builder, onMachine(), {
      body: png,
      name: 'really-a-png.jpg',
      type: 'image/jpeg',
    });
    expect(misnamed.status).toBe(201);
    expect(misnamed.body.contentType).toBe('image/png');
    expect(misnamed.body.fileName).toBe('really-a-png.jpg.png');
    const noName = await upload(ctx.ws.as.builder, onMachine(), { body: PDF, name: 'scan' });
    expect(noName.body).toMatchObject({ contentType: 'application/pdf', fileName: 'scan.pdf' });
  });

  refusalCases(ctx, harness);

  it('checks fields that follow the file too: a subject swapped in after the file is refused', async () => {
    const before = await harness.storedKeys();
    const swapped = await ctx.ws.as.builder
      .post('/api/evidence')
      .field('subjectType', 'machine')
      .field('subjectId', ctx.machineId)
      .attach('file', await makePng(20, 20), 'swap.png')
      .field('subjectId', ctx.otherMachineId);
    expect(swapped.status).toBe(404);
    const longCaption = await ctx.ws.as.builder
      .post('/api/evidence')
      .field(onMachine())
      .attach('file', await makePng(20, 20), 'caption.png')
      .field('caption', 'x'.repeat(501));
    expect(longCaption.status).toBe(400);
    expect(JSON.stringify(longCaption.body.message)).toMatch(/caption must be at most 500 characters/);
    expect(await harness.storedKeys()).toEqual(before);
  });

  it('takes the fields after the file as well', async () => {
    const res = await ctx.ws.as.builder
      .post('/api/evidence')
      .attach('file', await makePng(20, 20), 'first.png')
      .field('subjectType', 'machine')
      .field('subjectId', ctx.machineId);
    expect(res.status).toBe(201);
  });

  it('sanitises names: no folders, no control characters, no over-long names', async () => {
    const png = await makePng(16, 16);
    const a = await upload(ctx.ws.as.builder, onMachine(), { body: png, name: '../../etc/pass\u0007wd\u202e.png' });
    expect(a.body.fileName).toBe('passwd.png');
    const b = await upload(ctx.ws.as.builder, onMachine(), { body: png, name: 'C:\\Users\\me\\rail.png' });
    expect(b.body.fileName).toBe('rail.png');
    const c = await upload(ctx.ws.as.builder, onMachine(), { body: png, name: `${'y'.repeat(300)}.png` });
    expect(c.body.fileName).toHaveLength(120);
    expect(c.body.fileName.endsWith('.png')).toBe(true);
    const down = await ctx.ws.as.builder.get(`/api/evidence/${a.body.id}/content`);
    expect(disposition(down.headers['content-disposition'])).toEqual({ type: 'inline', filename: 'passwd.png' });
  });

  it("keeps workshops apart: another workshop's machine, evidence and downloads are 404", async () => {
    const png = await makePng(16, 16);
    const mine = await upload(ctx.ws.as.builder, onMachine(), { body: png, name: 'mine.png' });
    const before = await harness.storedKeys();
    expect((await upload(ctx.other.as.owner, onMachine(), { body: png, name: 'sneak.png' })).status).toBe(404);
    expect(
      (
        await upload(
          ctx.other.as.owner,
          { subjectType: 'test-cut', subjectId: ctx.checkId },
          { body: png, name: 'sneak.png' },
        )
      ).status,
    ).toBe(404);
    expect(await harness.storedKeys()).toEqual(before);
    for (const path of ['', '/content', '/thumbnail']) {
      expect((await ctx.other.as.owner.get(`/api/evidence/${mine.body.id}${path}`)).status).toBe(404);
    }
    expect((await ctx.other.as.owner.delete(`/api/evidence/${mine.body.id}`)).status).toBe(404);
    expect((await ctx.other.as.owner.get('/api/evidence').query(onMachine())).status).toBe(404);
    expect((await ctx.other.as.owner.get('/api/evidence').query({ machineId: ctx.machineId })).status).toBe(404);
    expect((await ctx.ws.as.owner.get('/api/evidence').query({ machineId: ctx.otherMachineId })).status).toBe(404);
  });

  it('lists a whole machine grouped by subject, and a single subject', async () => {
    const check = { subjectType: 'test-cut', subjectId: ctx.checkId };
    const made = await upload(
      ctx.ws.as.technician,
      { ...check, caption: 'dial at hole 4' },
      { body: CSV, name: 'bench.csv' },
    );
    expect(made.status).toBe(201);
    expect(made.body.subject).toEqual({ type: 'test-cut', id: ctx.checkId, label: 'Bench check 1' });
    const one = await ctx.ws.as.viewer.get('/api/evidence').query(check);
    expect(one.body.map((e: { id: string }) => e.id)).toEqual([made.body.id]);
    const all = await ctx.ws.as.viewer.get('/api/evidence').query({ machineId: ctx.machineId });
    expect(all.status).toBe(200);
    const types = new Set(all.body.map((e: { subject: { type: string } }) => e.subject.type));
    expect(types).toEqual(new Set(['machine', 'test-cut']));
    expect((await ctx.ws.as.viewer.get('/api/evidence')).status).toBe(400);
  });

  it('deletes: own evidence or as owner/admin, refused once the check is part of an approval, all audited', async () => {
    const check = { subjectType: 'test-cut', subjectId: ctx.checkId };
    const png = await makePng(40, 30);
    const a = await upload(ctx.ws.as.builder, check, { body: png, name: 'a.png' });
    const b = await upload(ctx.ws.as.builder, check, { body: png, name: 'b.png' });
    const c = await upload(ctx.ws.as.builder, check, { body: png, name: 'c.png' });
    const before = await harness.storedKeys();
    expect((await ctx.ws.as.technician.delete(`/api/evidence/${a.body.id}`)).status).toBe(403);
    expect((await ctx.ws.as.builder.delete(`/api/evidence/${a.body.id}`)).status).toBe(204);
    expect((await ctx.ws.as.builder.get(`/api/evidence/${a.body.id}/content`)).status).toBe(404);
    expect((await harness.storedKeys()).length).toBe(before.length - 2); // the file and its thumbnail
    expect((await ctx.ws.as.owner.delete(`/api/evidence/${b.body.id}`)).status).toBe(204);

    await lockAsApproved(ctx.app, [{ recordType: 'test-cut', recordId: ctx.checkId }]);
    const refused = await ctx.ws.as.builder.delete(`/api/evidence/${c.body.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/Bench check 1 is part of an approved commissioning record/);
    expect((await ctx.ws.as.admin.delete(`/api/evidence/${c.body.id}`)).status).toBe(409);
    const listed = await ctx.ws.as.owner.get('/api/evidence').query(check);
    expect(listed.body.find((e: { id: string }) => e.id === c.body.id)).toMatchObject({
      locked: true,
      canDelete: false,
    });
    expect((await ctx.ws.as.builder.get(`/api/evidence/${c.body.id}/content`)).status).toBe(200);

    const history = await ctx.ws.as.viewer.get(`/api/machines/${ctx.machineId}/history?limit=200`);
    const evidenceEntries = history.body.entries.filter((h: { recordType: string }) => h.recordType === 'evidence');
    expect(
      evidenceEntries.find(
        (h: { recordId: string; action: string }) => h.recordId === a.body.id && h.action === 'deleted',
      ),
    ).toMatchObject({ summary: 'Photo a.png removed from Bench check 1' });
    expect(
      evidenceEntries.find(
        (h: { recordId: string; action: string }) => h.recordId === c.body.id && h.action === 'attached',
      ),
    ).toMatchObject({ summary: 'Photo c.png attached to Bench check 1' });
  });

  it('answers 404 with a message when the stored file has gone missing', async () => {
    const made = await upload(ctx.ws.as.builder, onMachine(), { body: PDF, name: 'lost.pdf' });
    const key = (await harness.storedKeys()).find((k) => k.endsWith(made.body.id));
    expect(key).toBeDefined();
    await harness.removeKey(key!);
    const res = await ctx.ws.as.builder.get(`/api/evidence/${made.body.id}/content`);
    expect(res.status).toBe(404);
    expect(res.body.message).toMatch(/stored file is missing/);
  });

  it('reports its limits and the accepted types', async () => {
    const res = await ctx.ws.as.viewer.get('/api/evidence/limits');
    expect(res.status).toBe(200);
    expect(res.body.accepted.map((t: { label: string }) => t.label)).toEqual(['JPEG', 'PNG', 'WebP', 'PDF', 'CSV']);
    expect(res.body.maxBytes).toBe(Number(harness.env().EVIDENCE_MAX_BYTES ?? 25 * 1024 * 1024));
  });

  it('never leaves temporary uploads behind', async () => {
    expect((await harness.storedKeys()).filter((k) => k.startsWith('incoming/'))).toEqual([]);
  });
}
