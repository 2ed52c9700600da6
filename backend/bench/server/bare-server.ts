import Fastify, { type FastifyInstance } from 'fastify';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { boltDownSession } from '../../src/engine/bolt-down-session.js';
import { evaluateStraightness, type ReferenceLineResult } from '../../src/engine/straightness.js';
import { arrayToMm, toMm, type LengthUnit } from '../../src/engine/units.js';
import type { TargetValue } from '../../src/database/schema/target-sets.js';
import { targetInBaseUnit } from '../../src/target-sets/target-keys.js';

/**
 * The bench's bare baseline: plain Fastify and pg on the product's database, doing the same work
 * as the product's hot routes — the same engine call, the same rows written (record, audit entry,
 * machine touch, with the same triggers guarding and logging them) in one transaction — but
 * without NestJS, validation, sessions or mapping. The product's throughput is measured against it.
 * Started by scripts/bench.sh: BARE_PORT, DATABASE_URL.
 */

const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
const fastify: FastifyInstance = Fastify({ bodyLimit: 16 * 1024 * 1024 });

/** One transaction with the actor set for the change log, as the product's commands run. */
async function command<T>(
  actor: { id: string; name: string; workshopId: string },
  work: (c: pg.PoolClient) => Promise<T>,
): Promise<T> {
  const client = await pool.connect();
  try {
    await client.query('begin');
    await client.query(
      "select set_config('railwright.actor_id', $1, true), set_config('railwright.actor_name', $2, true), set_config('railwright.workshop_id', $3, true)",
      [actor.id, actor.name, actor.workshopId],
    );
    const out = await work(client);
    await client.query('commit');
    return out;
  } catch (err) {
    await client.query('rollback').catch(() => undefined);
    throw err;
  } finally {
    client.release();
  }
}

const AUDIT_AND_TOUCH = `
  with audit as (
    insert into audit_entries (workshop_id, machine_id, record_type, record_id, action, summary, changes, actor_id, actor_name, at)
    values ($1, $2, $3, $4, $5, $6, $7, $8, $9, clock_timestamp())
  ) update machines set last_activity_at = now() where id = $2`;

const line = (r: ReferenceLineResult) => ({
  slope: r.slope,
  intercept: r.interceptMm,
  straightness: r.straightnessMm,
  residuals: r.residualsMm,
});

// The actor comes in headers (there are no sessions here).
function actorOf(headers: Record<string, unknown>) {
  return {
    id: String(headers['x-actor-id']),
    name: String(headers['x-actor-name']),
    workshopId: String(headers['x-workshop-id']),
  };
}

interface SweepBody {
  readingUnit: LengthUnit;
  phase: string;
  stations: { position: number; reading: number }[];
}

fastify.post<{ Params: { id: string }; Body: SweepBody }>('/bare/rails/:id/sweeps', async (req, reply) => {
  const actor = actorOf(req.headers);
  const body = req.body;
  return command(actor, async (c) => {
    const { rows: rails } = await c.query(
      'select r.id, r.machine_id, r.label, m.target_set_id from rails r join machines m on m.id = r.machine_id where r.workshop_id = $1 and r.id = $2',
      [actor.workshopId, req.params.id],
    );
    if (!rails.length) return reply.status(404).send({ message: 'no such rail' });
    const rail = rails[0];
    const positionsMm = body.stations.map((s) => s.position);
    const readingsRaw = body.stations.map((s) => s.reading);
    const readingsMm = arrayToMm(readingsRaw, body.readingUnit);
    const fitted = evaluateStraightness({ positionsMm, readingsMm });
    const result = {
      leastSquares: line(fitted.leastSquares),
      minimumZone: line(fitted.minimumZone),
      endPoint: line(fitted.endPoint),
    };
    const { rows: sets } = await c.query('select targets from target_sets where workshop_id = $1 and id = $2', [
      actor.workshopId,
      rail.target_set_id,
    ]);
    const target = (sets[0].targets as Record<string, TargetValue>).railStraightness;
    const status = result.leastSquares.straightness <= targetInBaseUnit(target) ? 'within-target' : 'outside-target';
    const { rows } = await c.query(
      `insert into rail_sweeps (workshop_id, machine_id, rail_id, reading_unit, positions_mm, readings_raw, readings_mm, phase, taken_by, result, status, target, created_by_id)
       values ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13) returning id, taken_at, created_at`,
      [
        actor.workshopId,
        rail.machine_id,
        rail.id,
        body.readingUnit,
        JSON.stringify(positionsMm),
        JSON.stringify(readingsRaw),
        JSON.stringify(readingsMm),
        body.phase,
        actor.name,
        JSON.stringify(result),
        status,
        JSON.stringify(target),
        actor.id,
      ],
    );
    await c.query(AUDIT_AND_TOUCH, [
      actor.workshopId,
      rail.machine_id,
      'rail-sweep',
      rows[0].id,
      'recorded',
      `Sweep of rail ${rail.label}`,
      JSON.stringify({ status }),
      actor.id,
      actor.name,
    ]);
    return reply.status(201).send({
      id: rows[0].id,
      railId: rail.id,
      readingUnit: body.readingUnit,
      lengthUnit: 'mm',
      positionsMm,
      readingsRaw,
      readingsMm,
      result,
      status,
      target,
      takenAt: rows[0].taken_at,
      createdAt: rows[0].created_at,
    });
  });
});

interface HoleBody {
  reading: number;
  fixed: boolean;
  writeId: string;
}

fastify.put<{ Params: { id: string; index: string }; Body: HoleBody }>(
  '/bare/bolt-downs/:id/holes/:index',
  async (req, reply) => {
    const actor = actorOf(req.headers);
    const { reading, fixed, writeId } = req.body;
    const holeIndex = Number(req.params.index);
    return command(actor, async (c) => {
      const { rows: found } = await c.query('select * from bolt_downs where workshop_id = $1 and id = $2', [
        actor.workshopId,
        req.params.id,
      ]);
      if (!found.length) return reply.status(404).send({ message: 'no such bolt-down' });
      const bd = found[0];
      await c.query('select state from machines where id = $1 for no key update', [bd.machine_id]);
      const { rows: holes } = await c.query(
        'select * from bolt_down_holes where bolt_down_id = $1 order by hole_index',
        [bd.id],
      );
      const before = holes.find((h) => h.hole_index === holeIndex);
      const newFix = fixed && !before?.fixed;
      const keptSeq = fixed && before?.fixed ? before.fix_seq : null;
      const { rows: written } = await c.query(
        `with claim as (
         insert into bolt_down_writes (write_id, workshop_id, bolt_down_id, target) values ($1, $2, $3, $4) on conflict do nothing returning write_id
       ), b as (
         update bolt_downs set fix_counter = fix_counter + $5::int, updated_at = now() where id = $3 and exists (select 1 from claim) returning fix_counter
       )
       insert into bolt_down_holes (bolt_down_id, hole_index, reading_raw, reading_mm, fixed, fix_seq, fixed_at, fixed_by_id, fixed_by_name, last_write_id, updated_at)
       select $3, $6, $7, $8, $9, case when $5::int = 1 then b.fix_counter else $10::int end, case when $9 then now() end, $11, $12, $1, now() from b
       on conflict (bolt_down_id, hole_index) do update set reading_raw = excluded.reading_raw, reading_mm = excluded.reading_mm, fixed = excluded.fixed,
         fix_seq = excluded.fix_seq, fixed_at = excluded.fixed_at, fixed_by_id = excluded.fixed_by_id, fixed_by_name = excluded.fixed_by_name,
         last_write_id = excluded.last_write_id, updated_at = excluded.updated_at
       returning *`,
        [
          writeId,
          actor.workshopId,
          bd.id,
          `hole:${holeIndex}`,
          newFix ? 1 : 0,
          holeIndex,
          reading,
          toMm(reading, bd.reading_unit),
          fixed,
          keptSeq,
          fixed ? actor.id : null,
          fixed ? actor.name : null,
        ],
      );
      await c.query(AUDIT_AND_TOUCH, [
        actor.workshopId,
        bd.machine_id,
        'bolt-down',
        bd.id,
        'updated',
        `Rail: hole ${holeIndex + 1} written`,
        JSON.stringify({ hole: holeIndex, reading, fixed, writeId }),
        actor.id,
        actor.name,
      ]);
      const all = [...holes.filter((h) => h.hole_index !== holeIndex), ...written];
      const session = boltDownSession(
        bd.hole_positions_mm,
        bd.mode,
        new Map(all.map((h) => [h.hole_index, { readingMm: h.reading_mm, fixed: h.fixed, fixSeq: h.fix_seq }])),
      );
      return {
        id: bd.id,
        holes: session.holes,
        nextHole: session.nextHole,
        fixedCount: session.fixedCount,
        writeId,
        repeated: false,
      };
    });
  },
);

fastify.post<{ Body: { positions: number[]; readings: number[] } }>('/bare/calc/straightness', async (req) => {
  const r = evaluateStraightness({ positionsMm: req.body.positions, readingsMm: req.body.readings });
  return {
    leastSquares: { straightness: r.leastSquares.straightnessMm },
    minimumZone: { straightness: r.minimumZone.straightnessMm },
  };
});

fastify.get('/bare/health', async () => {
  await pool.query('select 1');
  return { status: 'ok', database: 'ok' };
});

// The read routes of the same baseline, written beside the product's reads.
const readsFile = fileURLToPath(new URL('./bare-reads.js', import.meta.url));
if (existsSync(readsFile)) {
  const { registerBareReads } = (await import(readsFile)) as {
    registerBareReads: (f: FastifyInstance, p: pg.Pool) => void;
  };
  registerBareReads(fastify, pool);
}

await fastify.listen({ host: '127.0.0.1', port: Number(process.env.BARE_PORT ?? 3599) });
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(
    signal,
    () =>
      void fastify
        .close()
        .then(() => pool.end())
        .then(() => process.exit(0)),
  );
}
