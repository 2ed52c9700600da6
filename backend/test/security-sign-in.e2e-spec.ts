import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import request from 'supertest';
import { createApp } from '../src/create-app.js';
import { PG_POOL } from '../src/database/database.tokens.js';
import { createTestApp, createTestWorkshop, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';

/**
 * Sign-in throttling counted in PostgreSQL: parallel attempts are all counted, a restart or a
 * second instance sees the same counts, and a busy address slows down without locking out the
 * others behind it. Clients here come through a trusted proxy (TRUST_PROXY=true) with
 * documentation addresses (RFC 5737), so no other spec's sign-ins share their counters.
 */
async function proxiedApp(): Promise<NestFastifyApplication> {
  const app = await createApp({ ...process.env, FRONTEND_DIST: '', TRUST_PROXY: 'true' });
  await app.init();
  await app.getHttpAdapter().getInstance().ready();
  return app;
}

const login = (app: NestFastifyApplication, address: string, email: string, password: string) =>
  request(app.getHttpServer()).post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password });

describe('sign-in throttling that holds', () => {
  let base: NestFastifyApplication;
  let ws: TestWorkshop;
  let pool: pg.Pool;
  const apps: NestFastifyApplication[] = [];
  const run = Math.floor(Math.random() * 200) + 20; // a fresh address block per run of the suite

  beforeAll(async () => {
    base = await createTestApp();
    pool = base.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(base, 'Throttle');
  });
  afterAll(async () => {
    for (const app of apps) await app.close();
    await base.close();
  });

  // Waits are measured from the last counted attempt; on a loaded machine a slow password check
  // could outlast a short wait, so the tests that look at a wait start it from now.
  const freshen = (key: string) =>
    pool.query(`update sign_in_attempts set last_attempt_at = now() where key = $1`, [key]);
  const age = (key: string, interval: string) =>
    pool.query(`update sign_in_attempts set last_attempt_at = last_attempt_at - $2::interval where key = $1`, [
      key,
      interval,
    ]);

  it('30 parallel wrong passwords: exactly 5 are evaluated, 25 are refused with 429 and Retry-After', async () => {
    const app = await proxiedApp();
    apps.push(app);
    const address = `203.0.113.${run}`;
    const results = await Promise.all(
      Array.from({ length: 30 }, (_, i) => login(app, address, ws.emails.builder, `wrong-${i}`)),
    );
    const statuses = results.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(25);
    for (const r of results.filter((x) => x.status === 429)) {
      expect(Number(r.headers['retry-after'])).toBeGreaterThanOrEqual(1);
      expect(r.body.message).toMatch(/Too many failed sign-ins/);
    }
    // The right password waits too: the account is the one being guessed.
    expect((await login(app, address, ws.emails.builder, TEST_PASSWORD)).status).toBe(429);
  }, 120_000);

  it('a restart (a new instance on the same database) keeps the count; once the wait is over the right password works and clears it', async () => {
    await apps[0].close();
    apps.shift();
    const restarted = await proxiedApp();
    apps.push(restarted);
    const address = `203.0.113.${run}`;
    await freshen(`account:${ws.emails.builder}`);
    expect((await login(restarted, address, ws.emails.builder, TEST_PASSWORD)).status).toBe(429);
    await age(`account:${ws.emails.builder}`, '20 minutes');
    expect((await login(restarted, address, ws.emails.builder, TEST_PASSWORD)).status).toBe(200);
    const left = await pool.query(`select failures from sign_in_attempts where key = $1`, [
      `account:${ws.emails.builder}`,
    ]);
    expect(left.rowCount).toBe(0);
  });

  it('two instances count together: five failures spread over both, the sixth is refused on either', async () => {
    const [a, b] = [await proxiedApp(), await proxiedApp()];
    apps.push(a, b);
    const address = `198.51.100.${run}`;
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++)
      statuses.push((await login(i % 2 ? b : a, address, ws.emails.technician, `wrong-${i}`)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    await freshen(`account:${ws.emails.technician}`);
    expect((await login(a, address, ws.emails.technician, 'wrong-5')).status).toBe(429);
    expect((await login(b, address, ws.emails.technician, TEST_PASSWORD)).status).toBe(429);
  }, 120_000);

  it('a busy address slows down (429, Retry-After at most 30 s) but another account behind it gets in once the short wait is over', async () => {
    const app = apps[0];
    const address = `198.51.100.${run + 1}`;
    // 30 wrong attempts on 30 different (unknown) accounts: no account limit is reached.
    const guesses = await Promise.all(
      Array.from({ length: 30 }, (_, i) => login(app, address, `guess${i}.${run}@test.example.com`, 'wrong')),
    );
    expect(guesses.map((r) => r.status)).toEqual(Array(30).fill(401));
    await freshen(`address:${address}`);
    const slowed = await login(app, address, ws.emails.owner, TEST_PASSWORD);
    expect(slowed.status).toBe(429);
    const wait = Number(slowed.headers['retry-after']);
    expect(wait).toBeGreaterThanOrEqual(1);
    expect(wait).toBeLessThanOrEqual(30);
    // Another address is not affected at all.
    expect((await login(app, `198.51.100.${run + 2}`, ws.emails.viewer, TEST_PASSWORD)).status).toBe(200);
    // After the wait (aged in the database rather than slept) the owner behind the busy address signs in.
    await age(`address:${address}`, `${wait} seconds`);
    expect((await login(app, address, ws.emails.owner, TEST_PASSWORD)).status).toBe(200);
    // Even at the longest wait the address is never shut for more than 30 s.
    await pool.query(`update sign_in_attempts set failures = 1000, last_attempt_at = now() where key = $1`, [
      `address:${address}`,
    ]);
    const longest = await login(app, address, ws.emails.owner, TEST_PASSWORD);
    expect(longest.status).toBe(429);
    expect(Number(longest.headers['retry-after'])).toBeLessThanOrEqual(30);
  }, 120_000);
});
