import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { createTestApp, createTestWorkshop, signIn, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { PG_POOL } from '../src/database/database.tokens.js';
import { SessionCache } from '../src/database/session-cache.js';
import { SessionChangesListener } from '../src/database/session-changes.listener.js';

/**
 * A session and its person are kept a few seconds between requests (session-cache.ts). Whatever
 * changes them must still count: at once when the change is made through this server, and as
 * soon as the database announces it when made anywhere else.
 */
describe('sessions kept between requests', () => {
  let app: NestFastifyApplication;
  let pool: pg.Pool;
  let ws: TestWorkshop;
  let sessionReads = 0;
  const originalQuery = pg.Client.prototype.query;

  beforeAll(async () => {
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      const q = args[0] as string | { text?: string };
      if (/from "session"/.test(typeof q === 'string' ? q : (q?.text ?? ''))) sessionReads++;
      return (originalQuery as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof pg.Client.prototype.query;
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Kept sessions');
  });
  afterAll(async () => {
    pg.Client.prototype.query = originalQuery;
    await app.close();
  });

  const readsOf = async <T>(work: () => Promise<T>): Promise<{ reads: number; result: T }> => {
    const before = sessionReads;
    const result = await work();
    return { reads: sessionReads - before, result };
  };

  it('reads a session once for a run of requests', async () => {
    const agent = await signIn(app, ws.emails.viewer, TEST_PASSWORD);
    const { reads, result } = await readsOf(async () => {
      const answers = [];
      for (let i = 0; i < 5; i++) answers.push((await agent.get('/api/auth/me')).status);
      return answers;
    });
    expect(result).toEqual([200, 200, 200, 200, 200]);
    expect(reads).toBe(1);
  });

  it('a role changed through the server counts from the very next request', async () => {
    const agent = await signIn(app, ws.emails.technician, TEST_PASSWORD);
    expect((await agent.get('/api/auth/me')).body.user.role).toBe('technician');
    const changed = await ws.as.admin.patch(`/api/people/${ws.userIds.technician}`).send({ role: 'viewer' });
    expect(changed.status).toBe(200);
    expect((await agent.get('/api/auth/me')).body.user.role).toBe('viewer');
    await ws.as.admin.patch(`/api/people/${ws.userIds.technician}`).send({ role: 'technician' });
    expect((await agent.get('/api/auth/me')).body.user.role).toBe('technician');
  });

  it('a person or session changed by hand counts once the database has announced it', async () => {
    const agent = await signIn(app, ws.emails.builder, TEST_PASSWORD);
    expect((await agent.get('/api/auth/me')).body.user.name).not.toBe('Renamed by hand');
    await pool.query('update users set name = $1 where id = $2', ['Renamed by hand', ws.userIds.builder]);
    await app.get(SessionChangesListener).caughtUp();
    expect((await agent.get('/api/auth/me')).body.user.name).toBe('Renamed by hand');

    await pool.query(`delete from "session" where sess->>'userId' = $1`, [ws.userIds.builder]);
    await app.get(SessionChangesListener).caughtUp();
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('keeps nothing while the announcements cannot be heard, and keeps again once they can', async () => {
    const cache = app.get(SessionCache);
    const agent = await signIn(app, ws.emails.owner, TEST_PASSWORD);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect(cache.isListening).toBe(true);
    const ended = await pool.query(
      'select pg_terminate_backend(pid) from pg_stat_activity where application_name = $1',
      [`railwright-session-changes-${process.pid}`],
    );
    expect(ended.rowCount).toBe(1);
    const deadline = Date.now() + 5_000;
    while (cache.isListening && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
    expect(cache.isListening).toBe(false);
    expect(cache.size).toBe(0);

    // Unheard, a change by hand counts at once: every request reads its session again.
    await pool.query('update users set name = $1 where id = $2', ['Owner while unheard', ws.userIds.owner]);
    const unheard = await readsOf(async () => [await agent.get('/api/auth/me'), await agent.get('/api/auth/me')]);
    expect(unheard.result.map((r) => r.body.user.name)).toEqual(['Owner while unheard', 'Owner while unheard']);
    expect(unheard.reads).toBe(2);

    // The listener connects again by itself.
    const back = Date.now() + 10_000;
    while (!cache.isListening && Date.now() < back) await new Promise((r) => setTimeout(r, 50));
    expect(cache.isListening).toBe(true);
    const heard = await readsOf(async () => [await agent.get('/api/auth/me'), await agent.get('/api/auth/me')]);
    expect(heard.reads).toBe(1);
    await pool.query('update users set name = $1 where id = $2', ['Owner heard again', ws.userIds.owner]);
    await app.get(SessionChangesListener).caughtUp();
    expect((await agent.get('/api/auth/me')).body.user.name).toBe('Owner heard again');
  });
});
