import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import type { Ctx, DriverHarness } from './evidence-cases.js';
import { CSV, makeElf, makePe, makePng, makePngBomb, upload } from './evidence-fixtures.js';

/** Uploads the API must refuse, each with a clear message and without keeping a byte or a row. */
export function refusalCases(ctx: Ctx, harness: DriverHarness) {
  const onMachine = () => ({ subjectType: 'machine', subjectId: ctx.machineId });

  describe('refused files leave nothing behind', () => {
    const refusals: [string, () => Promise<Buffer> | Buffer, string, number, RegExp][] = [
      [
        'a Linux program named photo.jpg',
        makeElf,
        'photo.jpg',
        415,
        /photo\.jpg is a program \(ELF\), whatever its name says/,
      ],
      ['a Windows program named photo.jpg', makePe, 'photo.jpg', 415, /photo\.jpg is a program \(EXE\)/],
      [
        'a GIF',
        () => Buffer.from('GIF89a\x01\x00\x01\x00\x00\x00\x00;', 'latin1'),
        'anim.gif',
        415,
        /^"anim\.gif is a GIF file \(image\/gif\)\. Accepted: JPEG, PNG, WebP, PDF, CSV\./,
      ],
      ['text not named .csv', () => CSV, 'readings.txt', 415, /not a type Railwright keeps/],
      [
        'a .csv holding NUL bytes',
        () => Buffer.concat([CSV, Buffer.from([0, 1, 2])]),
        'readings.csv',
        415,
        /not plain UTF-8 text/,
      ],
      [
        'a .csv that is not UTF-8',
        () => Buffer.from([0x61, 0x2c, 0xff, 0xfe, 0x0a]),
        'readings.csv',
        415,
        /not plain UTF-8/,
      ],
      ['a photo of more than 250 megapixels', makePngBomb, 'huge.png', 415, /huge\.png has more than 250 megapixels/],
      ['a cut-short PNG', async () => (await makePng()).subarray(0, 300), 'half.png', 415, /could not be read/],
      ['an empty file', () => Buffer.alloc(0), 'empty.png', 400, /empty/],
    ];
    it.each(refusals)('refuses %s', async (_what, make, name, status, message) => {
      const before = await harness.storedKeys();
      const listBefore = (await ctx.ws.as.owner.get('/api/evidence').query(onMachine())).body.length;
      const res = await upload(ctx.ws.as.builder, onMachine(), { body: await make(), name, type: 'image/jpeg' });
      expect(res.status).toBe(status);
      expect(JSON.stringify(res.body.message)).toMatch(message);
      expect(await harness.storedKeys()).toEqual(before);
      expect((await ctx.ws.as.owner.get('/api/evidence').query(onMachine())).body.length).toBe(listBefore);
    });

    it.each([
      [{ subjectType: 'spaceship', subjectId: randomUUID() }, 400, /subjectType must be one of .*machine.*test-cut/],
      [{ subjectType: 'machine', subjectId: 'not-a-uuid' }, 400, /subjectId must be the id/],
      [{ subjectType: 'machine' }, 400, /subjectId must be the id/],
      [{ subjectType: 'machine', subjectId: randomUUID() }, 404, /No such machine/],
      [{ subjectType: 'machine', subjectId: '', colour: 'red' }, 400, /colour should not exist/],
    ])('refuses fields %j', async (fields, status, message) => {
      const before = await harness.storedKeys();
      const res = await upload(ctx.ws.as.builder, fields as Record<string, string>, {
        body: await makePng(16, 16),
        name: 'x.png',
      });
      expect(res.status).toBe(status);
      expect(JSON.stringify(res.body.message)).toMatch(message);
      expect(await harness.storedKeys()).toEqual(before);
    });

    it('refuses an upload without a file, and a second file in one upload', async () => {
      const none = await upload(ctx.ws.as.builder, onMachine());
      expect(none.status).toBe(400);
      const before = await harness.storedKeys();
      const png = await makePng(16, 16);
      const two = await ctx.ws.as.builder
        .post('/api/evidence')
        .field(onMachine())
        .attach('file', png, 'a.png')
        .attach('file', png, 'b.png');
      expect(two.status).toBe(400);
      expect(JSON.stringify(two.body.message)).toMatch(/one file per upload/);
      expect(await harness.storedKeys()).toEqual(before);
    });
  });

  it('answers 400 to a body that is not well-formed multipart, and keeps nothing', async () => {
    const before = await harness.storedKeys();
    const noBoundary = await ctx.ws.as.builder
      .post('/api/evidence')
      .set('Content-Type', 'multipart/form-data')
      .send('garbage');
    expect(noBoundary.status).toBe(400);
    const cut = await ctx.ws.as.builder
      .post('/api/evidence')
      .set('Content-Type', 'multipart/form-data; boundary=XYZ')
      .send(
        `--XYZ\r\nContent-Disposition: form-data; name="subjectType"\r\n\r\nmachine\r\n--XYZ\r\nContent-Disposition: form-data; name="subjectId"\r\n\r\n${ctx.machineId}\r\n--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\nContent-Type: image/png\r\n\r\n\x89PNG half a fi`,
      );
    expect(cut.status).toBe(400);
    expect(JSON.stringify(cut.body.message)).toMatch(/cut off/);
    const json = await ctx.ws.as.builder
      .post('/api/evidence')
      .send({ subjectType: 'machine', subjectId: ctx.machineId });
    expect(json.status).toBe(400);
    expect(JSON.stringify(json.body.message)).toMatch(/multipart\/form-data/);
    expect(await harness.storedKeys()).toEqual(before);
  });
}

/** A second app with a small size limit: an over-size file is refused with 413 and not kept. */
export function evidenceSizeLimitCases(harness: DriverHarness) {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let machineId: string;
  const saved = { ...process.env };
  const LIMIT = 64 * 1024;

  beforeAll(async () => {
    Object.assign(process.env, harness.env(), { EVIDENCE_MAX_BYTES: String(LIMIT) });
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Evidence limit');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Limit table', kind: 'plasma', workArea: { x: 1000, y: 1000 } })
    ).body.id;
  });
  afterAll(async () => {
    await app?.close();
    process.env = saved;
  });

  it('refuses a file over EVIDENCE_MAX_BYTES with 413 and keeps nothing', async () => {
    const before = await harness.storedKeys();
    const big = Buffer.concat([await makePng(8, 8), Buffer.alloc(LIMIT * 3, 7)]);
    const res = await upload(
      ws.as.builder,
      { subjectType: 'machine', subjectId: machineId },
      { body: big, name: 'huge.png' },
    );
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/huge\.png is larger than the limit of 64 kB a file/);
    expect(await harness.storedKeys()).toEqual(before);
    expect(
      (await ws.as.builder.get('/api/evidence').query({ subjectType: 'machine', subjectId: machineId })).body,
    ).toEqual([]);
    const justUnder = await upload(
      ws.as.builder,
      { subjectType: 'machine', subjectId: machineId },
      { body: await makePng(16, 16), name: 'small.png' },
    );
    expect(justUnder.status).toBe(201);
  });
}
