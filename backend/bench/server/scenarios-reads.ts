import pg from 'pg';
import type { BenchContext, BenchRow } from './bench-types.js';

/**
 * The product's hot reads against the bare baseline (same tables, one plain query each), and
 * their growth curve: the machines list and a machine's readiness with 0, 1 000 and 10 000
 * sweeps on one rail. Goals: within 3× of the bare latency, and flat as sweeps pile up.
 */

interface AutocannonResult {
  requests: { average: number };
  latency: { average: number; p99: number };
  non2xx: number;
  errors: number;
}
type Autocannon = (opts: {
  url: string;
  connections: number;
  duration: number;
  headers?: Record<string, string>;
}) => Promise<AutocannonResult>;

const CONNECTIONS = 10;
const DURATION_S = 5;
const CURVE_DURATION_S = 3;
const WITHIN_BARE = 3;
// "Flat": the latency at 10 000 sweeps at most this many times the latency at none.
const FLAT = 1.5;

async function loadAutocannon(): Promise<Autocannon> {
  const name = 'autocannon';
  return ((await import(name)) as { default: Autocannon }).default;
}

async function json<T>(ctx: BenchContext, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${ctx.productUrl}${path}`, {
    method,
    headers: {
      cookie: ctx.cookie,
      accept: 'application/json',
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

const positions = [0, 100, 200, 300, 400, 500, 600, 700, 800, 900];
const sweep = (offset: number) => ({
  readingUnit: 'mm',
  lengthUnit: 'mm',
  phase: 'as-left',
  datum: 'Frame face',
  stations: positions.map((position, i) => ({ position, reading: offset + (i % 3) * 0.001 })),
});

/** A machine as a builder leaves it mid-commissioning: two partner rails swept once, one screw axis. */
async function benchMachine(ctx: BenchContext): Promise<{ machineId: string; railId: string }> {
  const machine = await json<{ id: string }>(ctx, 'POST', '/api/machines', {
    name: `Bench reads ${Date.now()}`,
    kind: 'plasma',
    workArea: { x: 900, y: 600 },
  });
  const rail = { axis: 'Y', lengthUnit: 'mm', length: 1000, profileSize: 20, holePitch: 60, firstHole: 20 };
  const a = await json<{ id: string }>(ctx, 'POST', `/api/machines/${machine.id}/rails`, {
    ...rail,
    label: 'Y1 (left)',
  });
  const b = await json<{ id: string }>(ctx, 'POST', `/api/machines/${machine.id}/rails`, {
    ...rail,
    label: 'Y2 (right)',
    partnerRailId: a.id,
  });
  await json(ctx, 'POST', `/api/rails/${a.id}/sweeps`, sweep(0));
  await json(ctx, 'POST', `/api/rails/${b.id}/sweeps`, sweep(0.01));
  await json(ctx, 'POST', `/api/machines/${machine.id}/axes`, {
    name: 'X',
    drive: {
      type: 'screw',
      lead: 5,
      nominalDiameter: 16,
      rootDiameter: 12.9,
      unsupportedLength: 1000,
      mounting: 'fixed-supported',
    },
    motorStepsPerRev: 200,
    microsteps: 16,
    stepsPerMm: 640,
    maxFeedRate: 5000,
    measuredTravelMm: 920,
  });
  return { machineId: machine.id, railId: a.id };
}

/** Older sweeps copied from the rail's newest one, straight into the table (triggers off for speed). */
async function growSweeps(ownerUrl: string, railId: string, total: number): Promise<void> {
  const client = new pg.Client({ connectionString: ownerUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ n: string }>('select count(*) as n from rail_sweeps where rail_id = $1', [
      railId,
    ]);
    const missing = total - (Number(rows[0].n) - 1);
    if (missing <= 0) return;
    await client.query('begin');
    await client.query('set local session_replication_role = replica');
    await client.query(
      `insert into rail_sweeps (workshop_id, machine_id, rail_id, reading_unit, length_unit, face, positions_mm, readings_raw, readings_mm, phase, taken_by, datum, result, status, target, taken_at)
       select s.workshop_id, s.machine_id, s.rail_id, s.reading_unit, s.length_unit, s.face, s.positions_mm, s.readings_raw, s.readings_mm, 'as-found', 'Bench history', s.datum, s.result, s.status, s.target,
              s.taken_at - make_interval(secs => g)
       from rail_sweeps s cross join generate_series(1, $2::int) g
       where s.id = (select id from rail_sweeps where rail_id = $1 order by taken_at desc, created_at desc limit 1)`,
      [railId, missing],
    );
    await client.query('commit');
    await client.query('analyze rail_sweeps');
  } finally {
    await client.end();
  }
}

export async function readScenarios(ctx: BenchContext): Promise<BenchRow[]> {
  const autocannon = await loadAutocannon();
  const rows: BenchRow[] = [];
  const { machineId, railId } = await benchMachine(ctx);
  const machines = (await json<unknown[]>(ctx, 'GET', '/api/machines')).length;

  const run = async (url: string, product: boolean, duration = DURATION_S) => {
    const r = await autocannon({
      url,
      connections: CONNECTIONS,
      duration,
      headers: product ? { cookie: ctx.cookie, accept: 'application/json' } : { accept: 'application/json' },
    });
    if (r.non2xx || r.errors) throw new Error(`${url}: ${r.non2xx} non-2xx answers, ${r.errors} errors`);
    return r;
  };
  const pair = async (name: string, productPath: string, barePath: string) => {
    // Alternating runs, bare first, so neither side always gets the warmer machine.
    const bare = await run(`${ctx.bareUrl}${barePath}`, false);
    const product = await run(`${ctx.productUrl}${productPath}`, true);
    const ratio = product.latency.average / bare.latency.average;
    rows.push({
      name: `${name}: mean latency at ${CONNECTIONS} connections`,
      value: round(product.latency.average),
      baseline: round(bare.latency.average),
      unit: 'ms',
      ratio: round(ratio),
      goal: `≤ ${WITHIN_BARE}× bare`,
      met: ratio <= WITHIN_BARE,
    });
    rows.push({
      name: `${name}: throughput at ${CONNECTIONS} connections`,
      value: round(product.requests.average),
      baseline: round(bare.requests.average),
      unit: 'req/s',
      ratio: round(product.requests.average / bare.requests.average),
      goal: `≥ 1/${WITHIN_BARE} of bare`,
      met: product.requests.average * WITHIN_BARE >= bare.requests.average,
    });
  };

  const ws = `workshopId=${ctx.workshopId}`;
  await pair(`GET /api/machines (${machines} machines)`, '/api/machines', `/machines?${ws}`);
  await pair(
    'GET /api/machines/:id/readiness',
    `/api/machines/${machineId}/readiness`,
    `/machines/${machineId}/readiness?${ws}`,
  );

  // The growth curve: one rail's history grows; neither read may grow with it.
  const curve: Record<'list' | 'readiness', number[]> = { list: [], readiness: [] };
  const sizes = [0, 1_000, 10_000];
  for (const n of sizes) {
    await growSweeps(ctx.ownerDatabaseUrl, railId, n);
    const list = await run(`${ctx.productUrl}/api/machines`, true, CURVE_DURATION_S);
    const board = await run(`${ctx.productUrl}/api/machines/${machineId}/readiness`, true, CURVE_DURATION_S);
    curve.list.push(list.latency.average);
    curve.readiness.push(board.latency.average);
    rows.push({
      name: `GET /api/machines with ${n} sweeps on one rail: mean latency`,
      value: round(list.latency.average),
      unit: 'ms',
    });
    rows.push({
      name: `GET /api/machines/:id/readiness with ${n} sweeps on one rail: mean latency`,
      value: round(board.latency.average),
      unit: 'ms',
    });
  }
  for (const key of ['list', 'readiness'] as const) {
    const growth = curve[key][sizes.length - 1] / curve[key][0];
    rows.push({
      name: `${key === 'list' ? 'Machines list' : 'Readiness'}: latency at 10 000 sweeps ÷ at 0`,
      value: round(growth),
      unit: '×',
      ratio: round(growth),
      goal: `flat (≤ ${FLAT}×)`,
      met: growth <= FLAT,
    });
  }
  return rows;
}

const round = (v: number) => Math.round(v * 100) / 100;
