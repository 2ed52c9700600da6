import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { PG_POOL } from '../src/database/database.tokens.js';
import { FALLBACK_TARGETS, PLASMA_DEFAULTS, ROUTER_DEFAULTS } from '../src/target-sets/default-target-sets.js';
import { TARGET_KEYS } from '../src/target-sets/target-keys.js';
import { createTestApp, createTestWorkshop, type TestWorkshop } from './helpers/test-app.js';
import { newMachine } from './helpers/drives.js';

const MIGRATIONS = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../drizzle');

/**
 * A target set stored before a key existed (or written by hand without it): every read answers
 * with the product's default for that key instead of failing, and the key's migration writes
 * the default into the stored set.
 */
describe('a stored target set without a key', () => {
  let app: NestFastifyApplication;
  let pool: pg.Pool;
  let ws: TestWorkshop;
  let routerId: string;
  let routerSetId: string;

  beforeAll(async () => {
    app = await createTestApp();
    pool = app.get<pg.Pool>(PG_POOL);
    ws = await createTestWorkshop(app, 'Target keys');
    routerId = await newMachine(ws, 'router');
    routerSetId = (await ws.as.viewer.get(`/api/machines/${routerId}`)).body.targetSet.id;
    // As an older version would have left it: two keys this version judges by are not stored.
    await pool.query("update target_sets set targets = targets - 'partTolerance' - 'squareness' where id = $1", [
      routerSetId,
    ]);
  });
  afterAll(async () => {
    await app?.close();
  });

  const stored = async (id: string) =>
    (
      await pool.query<{ targets: Record<string, { value: number; unit: string }> }>(
        'select targets from target_sets where id = $1',
        [id],
      )
    ).rows[0].targets;

  it('answers the readiness board with the default for the missing keys', async () => {
    const res = await ws.as.viewer.get(`/api/machines/${routerId}/readiness`);
    expect(res.status).toBe(200);
    const cut = res.body.checks.find((c: { kind: string }) => c.kind === 'test-cut');
    expect(cut.target).toMatchObject({
      value: FALLBACK_TARGETS.partTolerance.value,
      unit: FALLBACK_TARGETS.partTolerance.unit,
    });
    const square = res.body.checks.find((c: { kind: string }) => c.kind === 'diagonal-check');
    expect(square.target).toMatchObject({ value: FALLBACK_TARGETS.squareness.value, unit: 'mm/m' });
  });

  it('answers the machines list, the target sets and a recorded check, none with a 500', async () => {
    expect((await ws.as.viewer.get('/api/machines')).status).toBe(200);
    const sets = await ws.as.viewer.get('/api/target-sets');
    expect(sets.status).toBe(200);
    const set = sets.body.find((s: { id: string }) => s.id === routerSetId);
    expect(set.targets.partTolerance).toMatchObject({
      value: FALLBACK_TARGETS.partTolerance.value,
      unit: FALLBACK_TARGETS.partTolerance.unit,
    });
    expect(Object.keys(set.targets).sort()).toEqual([...TARGET_KEYS].sort());
    // A check judged against a missing key is recorded and judged against the default.
    const diag = await ws.as.technician
      .post(`/api/machines/${routerId}/diagonal-checks`)
      .send({ sideX: 500, sideY: 500, diagonal1: 707.2, diagonal2: 707.0 });
    expect(diag.status).toBe(201);
    expect(diag.body.target).toMatchObject({ value: FALLBACK_TARGETS.squareness.value, unit: 'mm/m' });
  });

  it('gets the key written in by the migration: the router default for a set only routers use, else the plasma one', async () => {
    const plasmaSetId = (await ws.as.viewer.get('/api/target-sets')).body.find(
      (s: { id: string }) => s.id !== routerSetId,
    ).id;
    await pool.query("update target_sets set targets = targets - 'reversal' where id = $1", [plasmaSetId]);
    await pool.query("update target_sets set targets = targets - 'partTolerance' - 'squareness' where id = $1", [
      routerSetId,
    ]);
    const before = await stored(plasmaSetId);
    const file = readdirSync(MIGRATIONS).find((f) => f.endsWith('_target-sets-every-key.sql'))!;
    // The migration's own statements, run again (they only touch sets that lack a key). Trigger
    // changes need the owner: npm test gives its URL; a single-owner dev database has one URL.
    const owner = new pg.Pool({ connectionString: process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL, max: 1 });
    try {
      for (const statement of readFileSync(path.join(MIGRATIONS, file), 'utf8').split('--> statement-breakpoint'))
        await owner.query(statement);
    } finally {
      await owner.end();
    }
    const router = await stored(routerSetId);
    expect(router.partTolerance).toEqual(ROUTER_DEFAULTS.partTolerance);
    expect(router.squareness).toEqual(ROUTER_DEFAULTS.squareness);
    const plasma = await stored(plasmaSetId);
    expect(plasma.reversal).toEqual(PLASMA_DEFAULTS.reversal);
    // Values the set already had are kept as they were.
    expect({ ...plasma, reversal: undefined }).toEqual({ ...before, reversal: undefined });
    for (const key of TARGET_KEYS) expect([key, key in router, key in plasma]).toEqual([key, true, true]);
  });
});
