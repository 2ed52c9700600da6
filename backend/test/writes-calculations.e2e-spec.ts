import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { randomRailSweep } from '../src/engine/seeded-random.js';
import { leastSquaresStraightness } from '../src/engine/straightness.js';
import { anonymous, createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';

/**
 * Large calculations: checked in one pass, residuals only when asked, answers compressed above a
 * size. (That large ones leave the event loop is timed by the bench, not here.)
 */
describe('large calculations', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  const N = 200_000;
  const sweep = randomRailSweep(N, 42);

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Calculations');
  });
  afterAll(() => app.close());

  it('a 200 000-point straightness answers its lines without residuals unless asked', async () => {
    const body = { positions: sweep.positionsMm, readings: sweep.readingsMm };
    const res = await ws.as.viewer.post('/api/calc/straightness').send(body);
    expect(res.status).toBe(200);
    expect(res.body.leastSquares.residuals).toBeUndefined();
    expect(res.text.length).toBeLessThan(1000);
    // The same fit as the engine's own least-squares line (checked against NIST StRD in its spec).
    expect(res.body.leastSquares.straightness).toBeCloseTo(leastSquaresStraightness(sweep).straightnessMm, 12);

    const asked = await ws.as.viewer.post('/api/calc/straightness?residuals=true').send(body);
    expect(asked.status).toBe(200);
    expect(asked.body.leastSquares.residuals).toHaveLength(N);
    expect(asked.body.minimumZone.residuals).toHaveLength(N);
  });

  it('small calculations keep their residuals unasked, and can refuse them; a bad flag is a 400', async () => {
    const body = { positions: [0, 100, 200, 300], readings: [0, 0.01, 0.03, 0.02] };
    expect((await ws.as.viewer.post('/api/calc/straightness').send(body)).body.leastSquares.residuals).toHaveLength(4);
    expect(
      (await ws.as.viewer.post('/api/calc/straightness?residuals=false').send(body)).body.leastSquares.residuals,
    ).toBeUndefined();
    const bad = await ws.as.viewer.post('/api/calc/straightness?residuals=maybe').send(body);
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual(['residuals must be true or false']);
  });

  it('a bad value deep in a long list is named with its place, in one pass', async () => {
    const readings: unknown[] = [...sweep.readingsMm];
    readings[150_000] = 'x';
    const res = await ws.as.viewer.post('/api/calc/straightness').send({ positions: sweep.positionsMm, readings });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(['every value in readings must be a finite number (readings[150000])']);
  });

  it('long lists of {x, y, z} and nested lists are checked in one pass with the same messages as short ones', async () => {
    const points = Array.from({ length: 10_000 }, (_, i) => ({
      x: (i % 100) * 10,
      y: Math.floor(i / 100) * 10,
      z: ((i * 7) % 13) / 1000,
    }));
    const ok = await ws.as.viewer.post('/api/calc/flatness').send({ points });
    expect(ok.status).toBe(200);
    expect(ok.body.leastSquares.residuals).toBeUndefined();
    expect(Number.isFinite(ok.body.leastSquares.flatness)).toBe(true);

    const badZ = points.map((p, i) => (i === 9_000 ? { ...p, z: null } : p));
    const refused = await ws.as.viewer.post('/api/calc/flatness').send({ points: badZ });
    expect(refused.status).toBe(400);
    expect(refused.body.message).toEqual(['points.9000.z must be a finite number']);
    // The same message class-validator gives a short list.
    const short = await ws.as.viewer
      .post('/api/calc/flatness')
      .send({ points: [...points.slice(0, 3), { x: 1, y: 1, z: null }] });
    expect(short.body.message).toContain('points.3.z must be a finite number');

    const extra = points.map((p, i) => (i === 5_000 ? { ...p, w: 1 } : p));
    const stray = await ws.as.viewer.post('/api/calc/flatness').send({ points: extra });
    expect(stray.status).toBe(400);
    expect(stray.body.message).toEqual(['points.5000.property w should not exist']);

    const targets = Array.from({ length: 100 }, (_, i) => i * 10);
    const deviations = targets.map(() => 0.001);
    const runs = [
      { direction: 'up', deviations },
      { direction: 'up', deviations },
      { direction: 'down', deviations: deviations.map((d, i) => (i === 80 ? Infinity : d)) },
      { direction: 'down', deviations },
    ];
    // JSON has no Infinity: it arrives as null, which is not a finite number.
    const nested = await ws.as.viewer.post('/api/calc/positioning').send({ targets, runs });
    expect(nested.status).toBe(400);
    expect(nested.body.message).toEqual(['every value in deviations must be a finite number (runs.2.deviations[80])']);
  });

  it('answers above 2 kB go out compressed as the client asks; small ones as they are', async () => {
    const body = { positions: sweep.positionsMm.slice(0, 5000), readings: sweep.readingsMm.slice(0, 5000) };
    // Through node's own http client, which (unlike supertest) hands back the bytes as sent.
    const login = await anonymous(app)
      .post('/api/auth/login')
      .send({ email: ws.emails.viewer, password: TEST_PASSWORD });
    const cookie = String(login.headers['set-cookie']).split(';')[0];
    const server = app.getHttpServer();
    if (!server.listening) await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const port = (server.address() as AddressInfo).port;
    const raw = (encoding: string) =>
      new Promise<{ status: number; encoding?: string; bytes: Buffer }>((resolve, reject) => {
        const req = httpRequest(
          {
            host: '127.0.0.1',
            port,
            agent: false,
            method: 'POST',
            path: '/api/calc/straightness?residuals=true',
            headers: { cookie, 'accept-encoding': encoding, 'content-type': 'application/json' },
          },
          (res) => {
            const chunks: Buffer[] = [];
            res.on('data', (c: Buffer) => chunks.push(c));
            res.on('end', () =>
              resolve({
                status: res.statusCode!,
                encoding: res.headers['content-encoding'],
                bytes: Buffer.concat(chunks),
              }),
            );
          },
        );
        req.on('error', reject);
        req.end(JSON.stringify(body));
      });
    const br = await raw('br');
    expect(br.status).toBe(200);
    expect(br.encoding).toBe('br');
    const json = JSON.parse(brotliDecompressSync(br.bytes).toString('utf8'));
    expect(json.leastSquares.residuals).toHaveLength(5000);
    expect(br.bytes.length).toBeLessThan(Buffer.byteLength(JSON.stringify(json)) / 2);
    const gzip = await raw('gzip');
    expect(gzip.encoding).toBe('gzip');
    expect(JSON.parse(gunzipSync(gzip.bytes).toString('utf8'))).toEqual(json);

    const health = await ws.as.viewer.get('/api/health').set('accept-encoding', 'br, gzip');
    expect(health.status).toBe(200);
    expect(health.headers['content-encoding']).toBeUndefined();
  });
});
