import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';

/**
 * Size before work: a list longer than its cap is refused from its length, before any element is
 * looked at, and the server keeps answering others while a maximum-size body is handled.
 * Speed goals themselves live in `npm run bench`; these tests assert order and refusals.
 */
describe('overload: size is checked before work', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;

  beforeAll(async () => {
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Overload');
  });
  afterAll(() => app.close());

  /** Sends `big`, and health checks every 10 ms until it is answered; returns both finishing orders. */
  async function healthDuring(big: () => Promise<request.Response>) {
    const order: string[] = [];
    let done = false;
    const bigRun = big().then((res) => {
      done = true;
      order.push('big');
      return res;
    });
    const healthRuns: Promise<void>[] = [];
    for (let i = 0; i < 200 && !done; i++) {
      healthRuns.push(
        request(app.getHttpServer())
          .get('/api/health')
          .then((res) => {
            order.push(`health ${res.status}`);
          }),
      );
      await new Promise((r) => setTimeout(r, 10));
    }
    const res = await bigRun;
    await Promise.all(healthRuns);
    return { res, order };
  }

  it('a 300 000-value calculator body is refused from its length (400 naming the field), and health answers meanwhile', async () => {
    const many = Array.from({ length: 300_000 }, (_, i) => i * 0.001);
    const { res, order } = await healthDuring(() =>
      ws.as.viewer.post('/api/calc/straightness?residuals=true').send({ positions: many, readings: many }),
    );
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.message)).toMatch(/positions has more than 200000 values/);
    expect(order.some((o) => o.startsWith('health'))).toBe(true);
  }, 120_000);

  it('a list of 300 000 objects (stations, moves) is refused from its length, not element by element', async () => {
    // Every element is wrong too: had the elements been validated, their errors would be in the answer.
    const moves = Array.from({ length: 300_000 }, () => ({ commanded: 'ten', measured: null }));
    const res = await ws.as.viewer.post('/api/calc/travel-trial').send({ stepsPerMmUsed: 80, moves });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual([expect.stringMatching(/^moves has more than 200000/)]);
  });

  it('a body beyond a route’s size limit is refused with 413 before it is parsed', async () => {
    const big = { name: 'x'.repeat(300 * 1024), kind: 'router', workArea: { x: 100, y: 100 } };
    const res = await ws.as.owner.post('/api/machines').send(big);
    expect(res.status).toBe(413);
  });

  it('health keeps answering while a maximum-size calculator body (200 000 stations) is handled', async () => {
    const positions = Array.from({ length: 200_000 }, (_, i) => i * 0.5);
    const readings = positions.map((p) => Math.round(Math.sin(p / 40) * 10_000) / 1_000_000);
    const { res, order } = await healthDuring(() =>
      ws.as.viewer.post('/api/calc/straightness?residuals=true').send({ positions, readings }),
    );
    expect(res.status).toBe(200);
    expect(res.body.leastSquares.residuals).toHaveLength(200_000);
    // The server answered a health check before it finished the big body (on a loaded machine the
    // check may say the database is slow, 503; what matters is that it answered).
    const firstHealth = order.findIndex((o) => o.startsWith('health'));
    expect(firstHealth).toBeGreaterThanOrEqual(0);
    expect(firstHealth).toBeLessThan(order.indexOf('big'));
  }, 120_000);
});
