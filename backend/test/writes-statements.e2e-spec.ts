import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import pg from 'pg';
import { randomUUID } from 'node:crypto';
import { createTestApp, createTestWorkshop, signIn, TEST_PASSWORD, type TestWorkshop } from './helpers/test-app.js';
import { PG_POOL } from '../src/database/database.tokens.js';
import { SessionChangesListener } from '../src/database/session-changes.listener.js';

/**
 * How many SQL statements one sweep write and one hole write send to PostgreSQL, counted at the
 * pg client (session store, transaction control and the command's own statements alike). A sweep
 * write took 21 (12 of its own and 13 recounting the machine's readiness from every contributor)
 * and a hole write 10; now 6 and 5: the session and its person are read together and kept a few
 * seconds between requests; the transaction opens with its actor; a record goes in with its audit
 * entry and the machine's touch in one statement; a recorded check asks only its own contributor
 * again, whose first read (the rails with their newest sweeps) goes with the machine's context;
 * and a hole write locks the machine in the statement that reads the bolt-down.
 * The bounds are the counts now, so a change that adds a round trip to the hot paths fails here.
 */

// Tables only other contributors read: a sweep's recount must not touch them.
const OTHER_CONTRIBUTORS =
  /"?(axes|travel_trials|positioning_runs|backlash_checks|diagonal_checks|bed_grids|test_cuts|safety_walks|safety_items|safety_answers)"?\b/;

const RAIL = { label: 'X1', axis: 'X', length: 300, profileSize: 20, holePitch: 60, firstHole: 30 };

let statements: string[] = [];
let counting = false;
const originalQuery = pg.Client.prototype.query;

function startCounting() {
  statements = [];
  counting = true;
}
function stopCounting(): string[] {
  counting = false;
  return statements;
}

describe('statements per write', () => {
  let app: NestFastifyApplication;
  let ws: TestWorkshop;
  let railId: string;
  let boltDownId: string;

  beforeAll(async () => {
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      if (counting) {
        const q = args[0] as string | { text?: string };
        statements.push(typeof q === 'string' ? q : (q?.text ?? '?'));
      }
      return (originalQuery as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof pg.Client.prototype.query;
    app = await createTestApp();
    ws = await createTestWorkshop(app, 'Statements');
    const machine = await ws.as.builder
      .post('/api/machines')
      .send({ name: 'Router', kind: 'router', workArea: { x: 1200, y: 800 } });
    railId = (await ws.as.builder.post(`/api/machines/${machine.body.id}/rails`).send(RAIL)).body.id;
    boltDownId = (await ws.as.builder.post(`/api/rails/${railId}/bolt-downs`).send({ mode: 'line', readingUnit: 'mm' }))
      .body.id;
  });
  afterAll(async () => {
    pg.Client.prototype.query = originalQuery;
    await app.close();
  });

  const report = (what: string, list: string[]) => {
    if (process.env.SHOW_STATEMENTS)
      console.log(
        `${what}: ${list.length}\n${list.map((s) => `  ${s.replace(/\s+/g, ' ').slice(0, 160)}`).join('\n')}`,
      );
  };

  it('a sweep write: session read, transaction, record with its audit, nothing read back, its own contributor recounted', async () => {
    // Warm up once so one-off lookups (e.g. default target sets) are not counted.
    await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send({
      readingUnit: 'mm',
      phase: 'as-found',
      stations: [0, 1, 2, 3].map((i) => ({ position: i * 100, reading: i * 0.01 })),
    });
    startCounting();
    const res = await ws.as.builder.post(`/api/rails/${railId}/sweeps`).send({
      readingUnit: 'mm',
      phase: 'as-found',
      stations: [0, 1, 2, 3].map((i) => ({ position: i * 100, reading: (i % 2) * 0.01 })),
    });
    const list = stopCounting();
    report('sweep write', list);
    expect(res.status).toBe(201);
    // Readiness listeners run between the audit and the commit.
    const audit = list.findIndex((s) => /audit_entries/.test(s));
    const commit = list.lastIndexOf('commit');
    const own = list.filter((_, i) => i <= audit || i >= commit);
    const listeners = list.slice(audit + 1, commit);
    report('sweep write without check-recorded listeners', own);
    expect(list.filter((s) => /audit_entries/.test(s))).toHaveLength(1);
    expect(list.filter((s) => /^update "machines"/i.test(s.trim()))).toEqual([]);
    expect(res.body.result.leastSquares.straightness).toBeGreaterThan(0);
    // The answer comes from what was inserted: no statement reads the new sweep back.
    expect(list.filter((s) => /^select/i.test(s.trim()) && /from "rail_sweeps"/i.test(s))).toEqual([]);
    // The session and its person were read by the request before and are kept; the transaction
    // opens with its actor.
    expect(list.filter((s) => /"session"/.test(s))).toEqual([]);
    expect(list.filter((s) => /from "users"/i.test(s))).toEqual([]);
    expect(list.filter((s) => /set_config/.test(s))).toEqual([expect.stringMatching(/^begin; select set_config/)]);
    // The sweep, its audit entry and the machine's touch go in one statement.
    expect(list.filter((s) => /insert into "rail_sweeps"/.test(s))).toEqual([expect.stringMatching(/audit_entries/)]);
    expect(own.length).toBeLessThanOrEqual(4);
    // Only the rails' contributor is asked again: the machine's context read with its rails and
    // their newest sweeps, and the summary written; nothing of the axes, frame or safety walk.
    expect(listeners.filter((s) => OTHER_CONTRIBUTORS.test(s))).toEqual([]);
    expect(listeners.filter((s) => /machine_readiness/.test(s) && /^insert/i.test(s.trim()))).toHaveLength(1);
    expect(listeners.length).toBeLessThanOrEqual(2);
    expect(list.length).toBeLessThanOrEqual(6);
  });

  it('a hole write: the bolt-down read with the machine locked, the hole, its audit, the answer from one read of the holes', async () => {
    await ws.as.builder
      .put(`/api/bolt-downs/${boltDownId}/holes/0`)
      .send({ reading: 0, fixed: true, writeId: randomUUID() });
    startCounting();
    const res = await ws.as.builder
      .put(`/api/bolt-downs/${boltDownId}/holes/1`)
      .send({ reading: 0.01, fixed: true, writeId: randomUUID() });
    const list = stopCounting();
    report('hole write', list);
    expect(res.status).toBe(200);
    expect(res.body.fixedCount).toBe(2);
    expect(res.body.holes[1]).toMatchObject({ fixed: true, readingMm: 0.01 });
    // The bolt-down row is read once, and the machine's row locked by that same statement.
    const read = list.filter((s) => /^select/i.test(s.trim()) && /from "bolt_downs"/i.test(s));
    expect(read).toHaveLength(1);
    expect(read[0]).toMatch(/for no key update of "machines"/i);
    expect(list.filter((s) => /from "machines"/i.test(s))).toEqual([]);
    expect(list.filter((s) => /savepoint/i.test(s))).toEqual([]);
    expect(list.filter((s) => /set_config/.test(s))).toEqual([expect.stringMatching(/^begin; select set_config/)]);
    expect(list.filter((s) => /"session"/.test(s))).toEqual([]);
    // The hole, its write id, its audit entry and the machine's touch go in one statement.
    expect(list.filter((s) => /audit_entries/.test(s))).toEqual([
      expect.stringMatching(/insert into "bolt_down_holes"/),
    ]);
    expect(list.length).toBeLessThanOrEqual(5);
  });

  it('an authenticated read writes no session row while the session is fresh, and reads it once while kept', async () => {
    const agent = await signIn(app, ws.emails.viewer, TEST_PASSWORD);
    startCounting();
    const first = await agent.get('/api/auth/me');
    const firstList = stopCounting();
    startCounting();
    const res = await agent.get('/api/auth/me');
    const list = stopCounting();
    report('GET /api/auth/me, first', firstList);
    report('GET /api/auth/me, again', list);
    expect(first.status).toBe(200);
    expect(res.status).toBe(200);
    expect([...firstList, ...list].filter((s) => /insert into "session"|update "session"/i.test(s))).toEqual([]);
    // One statement reads the session and the person it names; the next request finds them kept.
    expect(firstList).toHaveLength(1);
    expect(firstList[0]).toMatch(/from "session"/);
    expect(list).toEqual([]);
    expect(res.body.user).toMatchObject({ email: ws.emails.viewer, role: 'viewer' });
  });

  it('what the session store reads beside a session (its person) is never stored with it, also when the session is refreshed', async () => {
    const pool = app.get<pg.Pool>(PG_POOL);
    const agent = await signIn(app, ws.emails.technician, TEST_PASSWORD);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    // Last refreshed two days ago: the next request pushes its expiry on and stores it again.
    const twoDaysAgo = Date.now() - 2 * 24 * 3600_000;
    await pool.query(
      `update "session" set sess = jsonb_set(sess::jsonb, '{refreshedAt}', to_jsonb($2::bigint))::json where sess->>'userId' = $1`,
      [ws.userIds.technician, twoDaysAgo],
    );
    // Changed by hand, as another server would: counts once the change's announcement is heard.
    await app.get(SessionChangesListener).caughtUp();
    startCounting();
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const list = stopCounting();
    expect(list.filter((s) => /insert into "session"|update "session"/i.test(s))).toHaveLength(1);
    const { rows } = await pool.query<{ sess: Record<string, unknown> }>(
      `select sess from "session" where sess->>'userId' = $1`,
      [ws.userIds.technician],
    );
    expect(rows.length).toBeGreaterThanOrEqual(2);
    expect(rows.some((r) => Number(r.sess.refreshedAt) > twoDaysAgo)).toBe(true);
    for (const row of rows) {
      expect(row.sess.userId).toBe(ws.userIds.technician);
      expect(row.sess).not.toHaveProperty('loadedUser');
    }
  });
});
