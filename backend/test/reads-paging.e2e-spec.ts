import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

const rail = { label: 'Y1', axis: 'Y', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
const positions = [0, 100, 200, 300, 400, 500, 600, 700, 800, 900];
const sweep = (i: number) => ({
  readingUnit: 'mm',
  phase: 'as-found',
  // Distinct times a minute apart, oldest first, so the expected order is known.
  takenAt: new Date(Date.UTC(2026, 0, 1, 8, i)).toISOString(),
  stations: positions.map((position, k) => ({ position, reading: (k % 3) * 0.001 * (i + 1) })),
});

/** A rail's sweep list: newest first, a page at a time, summaries without readings. */
describe('reads: paged sweep lists', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let railId: string;
  const ids: string[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Paging');
    const machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Paging table', kind: 'plasma', workArea: { x: 900, y: 600 } })
    ).body.id;
    railId = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(rail)).body.id;
    for (let i = 0; i < 5; i++) {
      const res = await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send(sweep(i));
      expect(res.status).toBe(201);
      ids.unshift(res.body.id);
    }
  });
  afterAll(() => app.close());

  it('walks the list two at a time through X-Next-Cursor, newest first, each sweep once', async () => {
    const seen: string[] = [];
    let cursor: string | undefined;
    let pages = 0;
    do {
      const res = await ws.as.viewer.get(`/api/rails/${railId}/sweeps?limit=2${cursor ? `&cursor=${cursor}` : ''}`);
      expect(res.status).toBe(200);
      expect(res.body.length).toBeLessThanOrEqual(2);
      seen.push(...res.body.map((s: { id: string }) => s.id));
      cursor = res.headers['x-next-cursor'];
      pages++;
    } while (cursor && pages < 10);
    expect(pages).toBe(3);
    expect(seen).toEqual(ids);
  });

  it('lists summaries without readings; the single sweep keeps them', async () => {
    const list = await ws.as.viewer.get(`/api/rails/${railId}/sweeps`);
    expect(list.headers['x-next-cursor']).toBeUndefined();
    expect(list.body).toHaveLength(5);
    const [first] = list.body;
    expect(first).toMatchObject({
      id: ids[0],
      railId,
      readingUnit: 'mm',
      phase: 'as-found',
      stationCount: 10,
      locked: false,
    });
    expect(typeof first.leastSquaresStraightness).toBe('number');
    expect(first.stations).toBeUndefined();
    expect(first.result).toBeUndefined();
    const one = await ws.as.viewer.get(`/api/sweeps/${ids[0]}`);
    expect(one.body.stations).toHaveLength(10);
    expect(one.body.result.leastSquares.straightness).toBeCloseTo(first.leastSquaresStraightness, 12);
    expect(one.body.result.leastSquares.residuals).toHaveLength(10);
  });

  it.each([
    ['limit=0', /limit must be at least 1/],
    ['limit=201', /limit must be at most 200/],
    ['limit=many', /limit must be a whole number/],
    ['cursor=yesterday', /cursor must be the X-Next-Cursor/],
  ])('refuses ?%s with a 400 naming the field', async (query, message) => {
    const res = await ws.as.viewer.get(`/api/rails/${railId}/sweeps?${query}`);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(message);
  });
});
