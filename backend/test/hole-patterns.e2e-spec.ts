import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { execFileSync } from 'node:child_process';
import { createTestApp, createTestWorkshop, type Agent, type TestWorkshop } from './helpers/test-app.js';
import { DRIZZLE, type Database } from '../src/database/database.tokens.js';
import { sql } from 'drizzle-orm';
import { pageCount, readPdfPages } from '../src/hole-patterns/template/pdf-readback.test-support.js';

// 72 points to the inch (ISO 32000-1 §8.3.2.3), 25.4 mm to the inch exactly.
const K = 72 / 25.4;
const plasma = { name: 'Template test table', kind: 'plasma', workArea: { x: 3000, y: 1500 } };
const bracket = {
  name: 'Y1 motor bracket',
  reference: 'bottom-left',
  lengthUnit: 'mm',
  width: 120,
  height: 90,
  entry: 'circle',
  circle: { centreX: 60, centreY: 45, circleDiameter: 66.68, count: 4, startAngleDeg: 45, diameter: 5.5 },
};
const binary = (
  res: NodeJS.ReadableStream & { setEncoding?: unknown },
  cb: (err: Error | null, body: Buffer) => void,
) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
/** The body as bytes (PDF or SVG), whatever its content type. */
const getPdf = (agent: Agent, url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse(binary as never);

describe('hole patterns and drilling templates', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Templates');
    other = await createTestWorkshop(app, 'Other');
    machineId = (await ws.as.builder.post('/api/machines').send(plasma)).body.id;
  });
  afterAll(() => app.close());

  const create = async (body: Record<string, unknown>, as: Agent = ws.as.builder) => {
    const res = await as.post(`/api/machines/${machineId}/hole-patterns`).send(body);
    expect(res.status).toBe(201);
    return res.body;
  };

  it('a builder saves a bolt-circle pattern; every role reads it; its holes are in mm on the circle', async () => {
    const p = await create(bracket);
    expect(p).toMatchObject({
      name: 'Y1 motor bracket',
      reference: 'bottom-left',
      lengthUnit: 'mm',
      widthMm: 120,
      heightMm: 90,
      entry: 'circle',
      circle: bracket.circle,
    });
    expect(p.holes).toHaveLength(4);
    // 66.68 mm PCD at 45°: each hole 66.68 / 2 / √2 = 23.5756 mm from the centre along x and y.
    expect(p.holes[0].xMm).toBeCloseTo(60 + 33.34 / Math.SQRT2, 9);
    expect(p.holes[0].yMm).toBeCloseTo(45 + 33.34 / Math.SQRT2, 9);
    for (const role of ['viewer', 'owner', 'technician'] as const) {
      expect((await ws.as[role].get(`/api/hole-patterns/${p.id}`)).body.id).toBe(p.id);
    }
    const list = await ws.as.viewer.get(`/api/machines/${machineId}/hole-patterns`);
    expect(list.body.map((x: { id: string }) => x.id)).toContain(p.id);
  });

  it('takes inches: 1 in = 25.4 mm exactly, and keeps the entry as typed', async () => {
    const p = await create({
      name: 'Carriage plate (inch)',
      reference: 'left',
      lengthUnit: 'in',
      width: 6,
      height: 4,
      entry: 'grid',
      grid: { originX: 0.5, originY: 0.5, rows: 2, columns: 3, pitchX: 2.5, pitchY: 3, diameter: 0.257 },
    });
    expect(p.widthMm).toBe(152.4);
    expect(p.heightMm).toBe(101.6);
    expect(p.holes[5]).toEqual({ xMm: 12.7 + 2 * 63.5, yMm: 12.7 + 76.2, diameterMm: expect.closeTo(6.5278, 12) });
    expect(p.grid).toEqual({
      originX: 0.5,
      originY: 0.5,
      rows: 2,
      columns: 3,
      pitchX: 2.5,
      pitchY: 3,
      diameter: 0.257,
    });
    expect([p.width, p.height]).toEqual([6, 4]);
  });

  // 1 in = 25.4 mm, 1 thou = 0.0254 mm exactly: one pattern typed in mm and in thou has the same holes.
  it('mm and thou give the same pattern', async () => {
    const grid = (k: number) => ({
      originX: 10 * k,
      originY: 12.7 * k,
      rows: 2,
      columns: 2,
      pitchX: 50.8 * k,
      pitchY: 25.4 * k,
      diameter: 6.35 * k,
    });
    const mm = await create({
      name: 'Plate mm',
      reference: 'left',
      lengthUnit: 'mm',
      width: 101.6,
      height: 63.5,
      entry: 'grid',
      grid: grid(1),
    });
    const thou = await create({
      name: 'Plate thou',
      reference: 'left',
      lengthUnit: 'thou',
      width: 4000,
      height: 2500,
      entry: 'grid',
      grid: grid(1000 / 25.4),
    });
    expect(thou.lengthUnit).toBe('thou');
    expect(thou.widthMm).toBeCloseTo(mm.widthMm, 9);
    thou.holes.forEach((h: { xMm: number; yMm: number; diameterMm: number }, i: number) => {
      expect(h.xMm).toBeCloseTo(mm.holes[i].xMm, 9);
      expect(h.yMm).toBeCloseTo(mm.holes[i].yMm, 9);
      expect(h.diameterMm).toBeCloseTo(mm.holes[i].diameterMm, 9);
    });
  });

  it('refuses bad patterns with 400s naming the field, and stores nothing', async () => {
    const count = async () => (await ws.as.viewer.get(`/api/machines/${machineId}/hole-patterns`)).body.length;
    const before = await count();
    const cases: [Record<string, unknown>, RegExp][] = [
      [{ ...bracket, width: 50 }, /^circle: hole \d .* wholly inside the 50 mm × 90 mm outline/],
      [
        {
          ...bracket,
          entry: 'list',
          circle: undefined,
          holes: [
            { x: 10, y: 10, diameter: 6 },
            { x: 14, y: 10, diameter: 6 },
          ],
        },
        /^holes\[1\]: hole 2 overlaps hole 1/,
      ],
      [
        { ...bracket, entry: 'list', circle: undefined, holes: [{ x: 10, y: 10, diameter: 0 }] },
        /^holes\[0\]: .* diameter greater than 0/,
      ],
      [
        { ...bracket, entry: 'list', circle: undefined, holes: [{ x: 10, y: 10, diameter: -1 }] },
        /holes\.0\.diameter must be greater than 0/,
      ],
      [
        {
          ...bracket,
          entry: 'grid',
          circle: undefined,
          grid: { originX: 10, originY: 10, rows: 40, columns: 40, pitchX: 1, pitchY: 1, diameter: 0.5 },
        },
        /^grid: rows × columns must be at most 1000/,
      ],
      [
        { ...bracket, entry: 'list', circle: undefined, holes: [{ x: 10, y: 10, diameter: 6 }, [[]]] },
        /every entry of holes must be \{x, y, diameter\}/,
      ],
      [{ ...bracket, entry: 'grid' }, /grid must give originX/],
      [{ ...bracket, lengthUnit: 'cm' }, /lengthUnit must be one of mm, um, in, thou/],
      [{ ...bracket, unit: 'mm' }, /unit is no longer accepted: send lengthUnit and readingUnit/],
      [{ ...bracket, reference: 'middle' }, /reference must be one of/],
      [{ ...bracket, name: '' }, /name is required/],
      [{ ...bracket, width: 0 }, /width must be greater than 0/],
      [{ ...bracket, lengthUnit: 'in', width: 300 }, /width must be at most 6000 mm/],
      [{ ...bracket, holes: [{ x: 1, y: 1, diameter: 1 }] }, /holes is only read when entry is list/],
      [{ ...bracket, circle: { ...bracket.circle, count: 2.5 } }, /count must be a whole number/],
    ];
    for (const [body, message] of cases) {
      const res = await ws.as.builder.post(`/api/machines/${machineId}/hole-patterns`).send(body);
      expect(res.status).toBe(400);
      expect(res.body.message.join('\n')).toMatch(message);
    }
    expect(await count()).toBe(before);
  });

  it('previews holes without saving; a viewer cannot write; another workshop sees nothing', async () => {
    const preview = await ws.as.builder.post('/api/hole-patterns/preview').send(bracket);
    expect(preview.status).toBe(200);
    expect(preview.body.holes).toHaveLength(4);
    expect((await ws.as.viewer.post(`/api/machines/${machineId}/hole-patterns`).send(bracket)).status).toBe(403);
    const p = await create(bracket, ws.as.technician);
    expect((await ws.as.viewer.put(`/api/hole-patterns/${p.id}`).send(bracket)).status).toBe(403);
    expect((await ws.as.viewer.delete(`/api/hole-patterns/${p.id}`)).status).toBe(403);
    expect((await other.as.owner.get(`/api/hole-patterns/${p.id}`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/hole-patterns/${p.id}/template.pdf`)).status).toBe(404);
    expect((await other.as.owner.get(`/api/machines/${machineId}/hole-patterns`)).status).toBe(404);
    expect((await other.as.owner.put(`/api/hole-patterns/${p.id}`).send(bracket)).status).toBe(404);
  });

  it('changes and deletions are audited in the history and the change log', async () => {
    const p = await create(bracket);
    const put = await ws.as.builder
      .put(`/api/hole-patterns/${p.id}`)
      .send({ ...bracket, name: 'Y2 motor bracket', circle: { ...bracket.circle, count: 6 } });
    expect(put.status).toBe(200);
    expect(put.body.holes).toHaveLength(6);
    expect((await ws.as.builder.delete(`/api/hole-patterns/${p.id}`)).status).toBe(204);
    expect((await ws.as.viewer.get(`/api/hole-patterns/${p.id}`)).status).toBe(404);
    const history = (await ws.as.viewer.get(`/api/machines/${machineId}/history`).query({ limit: 200 })).body
      .entries as { summary: string }[];
    const summaries = history.map((e) => e.summary);
    expect(summaries).toEqual(
      expect.arrayContaining([
        'Hole pattern Y1 motor bracket (4 holes) added',
        'Hole pattern Y2 motor bracket changed',
        'Hole pattern Y2 motor bracket removed',
      ]),
    );
    const db = app.get<Database>(DRIZZLE);
    const log = await db.execute(
      sql`select operation from change_log where table_name = 'hole_patterns' and record_id = ${p.id} order by at, txid`,
    );
    expect(log.rows.map((r) => r.operation)).toEqual(['insert', 'update', 'delete']);
  });

  it('a viewer prints a pattern’s template: every hole centre within 0.01 mm of the pattern, the bars 100 mm and 4 in', async () => {
    const p = await create({ ...bracket, name: 'Gantry trolley plate' });
    const res = await getPdf(ws.as.viewer, `/api/hole-patterns/${p.id}/template.pdf?paper=letter`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    const text = execFileSync('pdftotext', ['-layout', '-', '-'], { input: pdf }).toString('utf8');
    expect(text).toContain('Gantry trolley plate');
    expect(text).toMatch(/Print at actual size/);
    expect(text).toMatch(/Letter/);
    const [page] = readPdfPages(pdf);
    expect([page.widthPt, page.heightPt].sort((a, b) => a - b)).toEqual([
      expect.closeTo(215.9 * K, 3),
      expect.closeTo(279.4 * K, 3),
    ]);
    const o = page.outlines[0];
    const found = page.crosshairs.map((c) => ({ x: (c.x - o.x0) / K, y: (o.y1 - c.y) / K }));
    expect(found).toHaveLength(4);
    const errors = p.holes.map((h: { xMm: number; yMm: number }) =>
      Math.min(...found.map((f) => Math.hypot(f.x - h.xMm, f.y - h.yMm))),
    );
    expect(Math.max(...errors)).toBeLessThan(0.01);
    expect(page.bars.map((b) => b.x1 - b.x0).sort((a, b) => a - b)).toEqual([
      expect.closeTo(100 * K, 2),
      expect.closeTo(101.6 * K, 2),
    ]);
    const svg = await getPdf(ws.as.viewer, `/api/hole-patterns/${p.id}/template.svg`);
    expect(svg.status).toBe(200);
    expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect((svg.body as Buffer).toString('utf8')).toMatch(/class="crosshair"/);
    expect((await ws.as.viewer.get(`/api/hole-patterns/${p.id}/template.pdf?paper=a3`)).body.message.join()).toMatch(
      /paper must be one of a4, letter/,
    );
  });

  it('a rail’s template is derived from the rail: holes at its pitch on the centre line, tiled over A4', async () => {
    const rail = (
      await ws.as.builder
        .post(`/api/machines/${machineId}/rails`)
        .send({ label: 'Y1 (left)', axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 })
    ).body;
    const res = await getPdf(ws.as.viewer, `/api/rails/${rail.id}/template.pdf`);
    expect(res.status).toBe(200);
    const pdf = res.body as Buffer;
    expect(pageCount(pdf)).toBeGreaterThan(1);
    const seen = new Set<number>();
    let worst = 0;
    for (const page of readPdfPages(pdf)) {
      const o = page.outlines[0];
      // 1000 mm × 20 mm: the rail's length by its width (profile 20).
      expect((o.x1 - o.x0) / K).toBeCloseTo(1000, 2);
      expect((o.y1 - o.y0) / K).toBeCloseTo(20, 2);
      for (const c of page.crosshairs) {
        const x = (c.x - o.x0) / K;
        const y = (o.y1 - c.y) / K;
        const k = Math.round((x - 20) / 60);
        worst = Math.max(worst, Math.hypot(x - (20 + 60 * k), y - 10));
        seen.add(k);
      }
    }
    expect(worst).toBeLessThan(0.01);
    expect([...seen].sort((a, b) => a - b)).toEqual(rail.holes.map((h: { index: number }) => h.index));
    const svg = await getPdf(ws.as.viewer, `/api/rails/${rail.id}/template.svg`);
    expect(svg.status).toBe(200);
    expect(((svg.body as Buffer).toString('utf8').match(/class="crosshair"/g) ?? []).length).toBe(17);
    expect((await other.as.viewer.get(`/api/rails/${rail.id}/template.pdf`)).status).toBe(404);
  });
});
