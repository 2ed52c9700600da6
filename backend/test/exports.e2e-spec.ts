import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import Papa from 'papaparse';
import { anonymous, createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

const rail = { label: 'Y1 (left)', axis: 'Y1', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
const positions = [0, 100, 200, 300, 400];

/** The rows of a CSV answer, read by papaparse (an independent reader), keyed by header. */
const rowsOf = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

describe('CSV downloads', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let other: TestWorkshop;
  let railId: string;
  let machineId: string;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Exports');
    other = await createTestWorkshop(app, 'Elsewhere');
    machineId = (
      await ws.as.builder
        .post('/api/machines')
        .send({ name: 'Export table', kind: 'plasma', workArea: { x: 3000, y: 1500 } })
    ).body.id;
    railId = (await ws.as.builder.post(`/api/machines/${machineId}/rails`).send(rail)).body.id;
  });
  afterAll(() => app.close());

  it('a rail without sweeps gives the header alone', async () => {
    const res = await ws.as.viewer.get(`/api/rails/${railId}/sweeps.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename=rail-y1-left-sweeps.csv');
    expect(res.text.split('\r\n')).toEqual([expect.stringMatching(/^Sweep,Taken at,/), '']);
  });

  it("gives every reading in the newest sweep's units, older sweeps converted exactly, formula-like text inert", async () => {
    const older = await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send({
      readingUnit: 'mm',
      phase: 'as-found',
      datum: 'Frame face',
      stations: positions.map((position, i) => ({ position, reading: [0, 0.0254, 0.0508, 0.0254, 0][i] })),
    });
    expect(older.status).toBe(201);
    const newer = await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send({
      readingUnit: 'thou',
      lengthUnit: 'in',
      phase: 'as-left',
      datum: '=HYPERLINK("x")',
      stations: positions.map((p, i) => ({ position: p / 25.4, reading: [0, 0.5, 1, 0.5, 0][i] })),
    });
    expect(newer.status).toBe(201);

    const res = await ws.as.viewer.get(`/api/rails/${railId}/sweeps.csv`);
    const parsed = rowsOf(res.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(
      expect.arrayContaining(['Position (in)', 'Reading (thou)', 'Residual from least-squares line (thou)']),
    );
    expect(parsed.data).toHaveLength(10);
    const [n, o] = [
      parsed.data.filter((r) => r.Sweep === newer.body.id),
      parsed.data.filter((r) => r.Sweep === older.body.id),
    ];
    expect(n.map((r) => Number(r['Reading (thou)']))).toEqual([0, 0.5, 1, 0.5, 0]);
    // 0.0254 mm is 1 thou exactly (1 in = 25.4 mm); 100 mm is 3.937007874 in to ten digits.
    expect(o.map((r) => Number(r['Reading (thou)']))).toEqual([0, 1, 2, 1, 0]);
    expect(o.map((r) => Number(r['Position (in)']))).toEqual([0, 3.937007874, 7.874015748, 11.81102362, 15.7480315]);
    expect(n[0].Datum).toBe(`'=HYPERLINK("x")`);
    expect(n[0]['Taken at']).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z$/);
    expect(n[0].Phase).toBe('as left');
  });

  it('is another workshop\'s "not found", and needs a sign-in', async () => {
    for (const path of [`/api/rails/${railId}/sweeps.csv`, `/api/machines/${machineId}/bed-grids.csv`]) {
      expect((await other.as.owner.get(path)).status).toBe(404);
      expect((await anonymous(app).get(path)).status).toBe(401);
    }
    expect((await ws.as.viewer.get(`/api/machines/${machineId}/bed-grids.csv`)).status).toBe(200);
  });

  it('axes: trials and runs of an axis, refused for an unknown axis', async () => {
    const unknown = '5f0c6c1e-8c1e-4c55-9d55-2b1f3f2a0d11';
    expect((await ws.as.viewer.get(`/api/axes/${unknown}/travel-trials.csv`)).status).toBe(404);
    expect((await ws.as.viewer.get(`/api/axes/${unknown}/positioning-runs.csv`)).status).toBe(404);
    expect((await ws.as.viewer.get('/api/axes/not-an-id/positioning-runs.csv')).status).toBe(400);
  });
});
