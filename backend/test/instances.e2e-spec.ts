import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { freePort, ownCluster, type OwnCluster } from './support/own-cluster.js';

const here = path.dirname(fileURLToPath(import.meta.url));
const MAIN = path.resolve(here, '../dist/backend/src/main.js');

interface Server {
  port: number;
  process: ChildProcess;
  output: () => string;
}

function startServer(cluster: OwnCluster, db: string, data: string, port: number, seed = true): Server {
  let output = '';
  const child = spawn(process.execPath, [MAIN], {
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_URL: cluster.appUrl(db),
      DATABASE_OWNER_URL: cluster.ownerUrl(db),
      RAILWRIGHT_DATA: data,
      FRONTEND_DIST: '',
      SESSION_SECRET: 'instances-spec-session-secret-long-enough-0123',
      RAILWRIGHT_SEED: seed ? 'on' : 'off',
      NODE_OPTIONS: '',
      JEST_WORKER_ID: '',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (b) => (output += b));
  child.stderr!.on('data', (b) => (output += b));
  return { port, process: child, output: () => output };
}

async function health(port: number): Promise<number> {
  try {
    const res = await fetch(`http://127.0.0.1:${port}/api/health`);
    return res.status;
  } catch {
    return 0;
  }
}

async function waitFor(what: string, test: () => Promise<boolean>, ms = 60_000): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (await test()) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`timed out waiting for ${what}`);
}

async function stopServer(s: Server) {
  if (s.process.exitCode !== null || s.process.signalCode !== null) return;
  const done = new Promise((r) => s.process.once('exit', r));
  s.process.kill('SIGTERM');
  await done;
}

/** Several instances on one database, and a database that goes away and comes back. */
describe('instances and database restarts', () => {
  let cluster: OwnCluster;
  let data: string;
  const servers: Server[] = [];

  beforeAll(async () => {
    if (!existsSync(MAIN)) throw new Error(`${MAIN} is missing: npm test builds it before the specs run`);
    cluster = await ownCluster();
    data = mkdtempSync('/tmp/railwright-instances-data-');
  }, 60_000);
  afterAll(async () => {
    await Promise.all(servers.map(stopServer));
    cluster?.remove();
    if (data) rmSync(data, { recursive: true, force: true });
  });

  it('two instances starting together on an empty database migrate and seed once, and both serve', async () => {
    cluster.createDatabase('together');
    const [a, b] = [
      startServer(cluster, 'together', data, await freePort()),
      startServer(cluster, 'together', data, await freePort()),
    ];
    servers.push(a, b);
    await waitFor('both instances', async () => (await health(a.port)) === 200 && (await health(b.port)) === 200);
    expect(a.process.exitCode).toBeNull();
    expect(b.process.exitCode).toBeNull();
    const client = new pg.Client({ connectionString: cluster.ownerUrl('together') });
    await client.connect();
    try {
      const workshops = await client.query('select name, count(*)::int as n from workshops group by name');
      expect(workshops.rows.length).toBeGreaterThan(0);
      expect(workshops.rows.every((r) => r.n === 1)).toBe(true);
      const applied = await client.query('select count(*)::int as n from drizzle.__drizzle_migrations');
      const journal = (await import(path.resolve(here, '../../drizzle/meta/_journal.json'), { with: { type: 'json' } }))
        .default as { entries: unknown[] };
      expect(applied.rows[0].n).toBe(journal.entries.length);
      // The application's role is no superuser and cannot rewrite history.
      const role = await client.query(`select rolsuper from pg_roles where rolname = 'railwright_app'`);
      expect(role.rows[0].rolsuper).toBe(false);
    } finally {
      await client.end();
    }
    const history = new pg.Client({ connectionString: cluster.appUrl('together') });
    await history.connect();
    try {
      await expect(history.query('delete from audit_entries')).rejects.toMatchObject({ code: '42501' });
      await expect(history.query('update change_log set actor_name = $1', ['someone else'])).rejects.toMatchObject({
        code: '42501',
      });
    } finally {
      await history.end();
    }
    await Promise.all([stopServer(a), stopServer(b)]);
  }, 120_000);

  it('survives PostgreSQL restarting: health answers 503 meanwhile, then ok, and the process never dies', async () => {
    cluster.createDatabase('restart');
    const s = startServer(cluster, 'restart', data, await freePort(), false);
    servers.push(s);
    await waitFor('the instance', async () => (await health(s.port)) === 200);
    cluster.stop();
    await waitFor('health to report the database gone', async () => (await health(s.port)) === 503, 20_000);
    // Requests meanwhile get an answer, not a hang or a crash.
    const during = await fetch(`http://127.0.0.1:${s.port}/api/machines`);
    expect(during.status).toBeGreaterThanOrEqual(400);
    expect(s.process.exitCode).toBeNull();
    cluster.start();
    await waitFor('health to recover', async () => (await health(s.port)) === 200, 30_000);
    const signIn = await fetch(`http://127.0.0.1:${s.port}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'nobody@example.com', password: 'not the password' }),
    });
    expect(signIn.status).toBe(401);
    expect(s.process.exitCode).toBeNull();
    await stopServer(s);
  }, 120_000);
});
