import { randomUUID } from 'node:crypto';
import { randomRailSweep } from '../../src/engine/seeded-random.js';
import { loadAutocannon, round, type Autocannon, type AutocannonRequest, type AutocannonResult } from './autocannon.js';
import { productJson } from './bench-seed.js';
import type { BenchContext, BenchRow } from './bench-types.js';
import { eventLoopDuringLargeBodies } from './scenarios-event-loop.js';

/**
 * The product's hot writes against the bare baseline doing the same work: a rail sweep and a
 * bolt-down hole write, at 10 connections (throughput and p99) and at a fixed 200 req/s; and
 * /api/health while 200 000-point fits run. Writes are spread over several machines, as several
 * builders at several machines would send them (writes of one machine take turns by design).
 */

const CONNECTIONS = 10;
const THROUGHPUT_S = 8;
const FIXED_RATE = 200;
const FIXED_RATE_S = 10;
const MACHINES = 10;
const P99_GOAL_MS = 50;
const OF_BARE = 0.5;
const FIT_POINTS = 200_000;

interface Target {
  machineId: string;
  railId: string;
  boltDownId: string;
  holes: number;
}

async function benchMachines(ctx: BenchContext): Promise<Target[]> {
  const out: Target[] = [];
  for (let i = 0; i < MACHINES; i++) {
    const machine = await productJson<{ id: string }>(ctx, 'POST', '/api/machines', {
      name: `Bench writes ${i + 1}`,
      kind: 'router',
      workArea: { x: 2400, y: 1200 },
    });
    const rail = await productJson<{ id: string }>(ctx, 'POST', `/api/machines/${machine.id}/rails`, {
      label: 'X1',
      axis: 'X',
      lengthUnit: 'mm',
      length: 3000,
      profileSize: 20,
      holePitch: 60,
      firstHole: 30,
    });
    const boltDown = await productJson<{ id: string; holeCount: number }>(
      ctx,
      'POST',
      `/api/rails/${rail.id}/bolt-downs`,
      { mode: 'line', readingUnit: 'mm' },
    );
    out.push({ machineId: machine.id, railId: rail.id, boltDownId: boltDown.id, holes: boltDown.holeCount });
  }
  return out;
}

const STATIONS = [0, 300, 600, 900, 1200, 1500, 1800, 2100, 2400, 2700];
let counter = 0;
const sweepBody = () => {
  const k = ++counter;
  return JSON.stringify({
    readingUnit: 'mm',
    phase: 'as-left',
    stations: STATIONS.map((position, i) => ({ position, reading: ((i * 7 + k) % 11) * 0.001 })),
  });
};
const holeBody = () => JSON.stringify({ reading: ((++counter % 9) - 4) * 0.001, fixed: true, writeId: randomUUID() });

/** Each request of a run goes to the next machine, with a fresh body. */
function spread(
  targets: Target[],
  method: string,
  path: (t: Target, n: number) => string,
  body: () => string,
  headers: Record<string, string>,
): AutocannonRequest[] {
  let n = 0;
  return [
    {
      method,
      headers,
      setupRequest: (req) => {
        const t = targets[n++ % targets.length];
        return { ...req, path: path(t, n), body: body() };
      },
    },
  ];
}

export async function writeScenarios(ctx: BenchContext & { userId: string; userName: string }): Promise<BenchRow[]> {
  const autocannon = await loadAutocannon();
  const targets = await benchMachines(ctx);
  const productHeaders = { cookie: ctx.cookie, 'content-type': 'application/json', accept: 'application/json' };
  const bareHeaders = {
    'content-type': 'application/json',
    'x-actor-id': ctx.userId,
    'x-actor-name': ctx.userName,
    'x-workshop-id': ctx.workshopId,
  };
  const rows: BenchRow[] = [];

  const scenarios = [
    {
      name: 'Sweep write (10 stations)',
      method: 'POST',
      product: (t: Target) => `/api/rails/${t.railId}/sweeps`,
      bare: (t: Target) => `/bare/rails/${t.railId}/sweeps`,
      body: sweepBody,
    },
    {
      name: 'Hole write',
      method: 'PUT',
      product: (t: Target, n: number) => `/api/bolt-downs/${t.boltDownId}/holes/${n % t.holes}`,
      bare: (t: Target, n: number) => `/bare/bolt-downs/${t.boltDownId}/holes/${n % t.holes}`,
      body: holeBody,
    },
  ];

  for (const s of scenarios) {
    const run = (product: boolean, opts: { duration: number; overallRate?: number }) =>
      checked(
        autocannon,
        {
          url: product ? ctx.productUrl : ctx.bareUrl,
          connections: CONNECTIONS,
          ...opts,
          requests: spread(
            targets,
            s.method,
            product ? s.product : s.bare,
            s.body,
            product ? productHeaders : bareHeaders,
          ),
        },
        `${s.name} (${product ? 'product' : 'bare'})`,
      );
    // Alternating runs, bare first, so neither side always gets the warmer machine.
    const bare = await run(false, { duration: THROUGHPUT_S });
    const product = await run(true, { duration: THROUGHPUT_S });
    const ratio = product.requests.average / bare.requests.average;
    rows.push({
      name: `${s.name}: throughput at ${CONNECTIONS} connections`,
      value: round(product.requests.average),
      baseline: round(bare.requests.average),
      unit: 'req/s',
      ratio: round(ratio),
      goal: `≥ ${OF_BARE} of bare`,
      met: ratio >= OF_BARE,
    });
    rows.push({
      name: `${s.name}: p99 at ${CONNECTIONS} connections`,
      value: product.latency.p99,
      baseline: bare.latency.p99,
      unit: 'ms',
      ratio: round(product.latency.p99 / bare.latency.p99),
      goal: `< ${P99_GOAL_MS} ms`,
      met: product.latency.p99 < P99_GOAL_MS,
    });

    const bareFixed = await run(false, { duration: FIXED_RATE_S, overallRate: FIXED_RATE });
    const fixed = await run(true, { duration: FIXED_RATE_S, overallRate: FIXED_RATE });
    const held = (r: AutocannonResult) => r.requests.total / FIXED_RATE_S;
    const failures = fixed.errors + fixed.non2xx + fixed.timeouts;
    rows.push({
      name: `${s.name}: rate held at ${FIXED_RATE} req/s for ${FIXED_RATE_S} s`,
      value: round(held(fixed)),
      baseline: round(held(bareFixed)),
      unit: 'req/s',
      goal: `≥ ${FIXED_RATE * 0.95} req/s, no errors`,
      met: held(fixed) >= FIXED_RATE * 0.95 && failures === 0,
    });
    rows.push({
      name: `${s.name}: p99 at ${FIXED_RATE} req/s`,
      value: fixed.latency.p99,
      baseline: bareFixed.latency.p99,
      unit: 'ms',
      goal: `< ${P99_GOAL_MS} ms`,
      met: fixed.latency.p99 < P99_GOAL_MS,
    });
  }

  rows.push(...(await healthWhileFitting(autocannon, ctx)));
  rows.push(...(await eventLoopDuringLargeBodies(ctx)));
  return rows;
}

/** Runs an autocannon scenario; any error or non-2xx answer is reported with the run's name. */
async function checked(
  autocannon: Autocannon,
  opts: Parameters<Autocannon>[0],
  name: string,
): Promise<AutocannonResult> {
  const r = await autocannon(opts);
  const failures = r.errors + r.non2xx + r.timeouts;
  if (failures)
    console.error(
      `bench: ${name}: ${r.non2xx} non-2xx answers, ${r.errors} errors, ${r.timeouts} timeouts of ${r.requests.total}`,
    );
  return r;
}

/**
 * /api/health p99 while a client keeps sending 200 000-point straightness fits; the bare server
 * (which fits on its event loop) is the contrast. The fits run the whole time health is measured.
 */
async function healthWhileFitting(autocannon: Autocannon, ctx: BenchContext): Promise<BenchRow[]> {
  const sweep = randomRailSweep(FIT_POINTS, 42);
  const body = JSON.stringify({ positions: sweep.positionsMm, readings: sweep.readingsMm });
  const measure = async (product: boolean) => {
    let fitting = true;
    let fits = 0;
    const url = product ? `${ctx.productUrl}/api/calc/straightness` : `${ctx.bareUrl}/bare/calc/straightness`;
    const fitter = (async () => {
      while (fitting) {
        const res = await fetch(url, {
          method: 'POST',
          headers: { 'content-type': 'application/json', ...(product ? { cookie: ctx.cookie } : {}) },
          body,
        });
        if (!res.ok) throw new Error(`200 000-point fit: ${res.status} ${await res.text()}`);
        await res.arrayBuffer();
        fits++;
      }
    })();
    // Let the first fit get going before health is measured.
    await new Promise((resolve) => setTimeout(resolve, 300));
    const health = await checked(
      autocannon,
      {
        url: product ? `${ctx.productUrl}/api/health` : `${ctx.bareUrl}/bare/health`,
        connections: 2,
        duration: 6,
        overallRate: 50,
      },
      'health while fitting',
    );
    fitting = false;
    await fitter;
    return { health, fits };
  };
  const bare = await measure(false);
  const product = await measure(true);
  return [
    {
      name: `/api/health p99 while 200 000-point fits run (${product.fits} fits product, ${bare.fits} bare)`,
      value: product.health.latency.p99,
      baseline: bare.health.latency.p99,
      unit: 'ms',
      goal: `< ${P99_GOAL_MS} ms`,
      met: product.health.latency.p99 < P99_GOAL_MS && product.health.non2xx === 0,
    },
  ];
}
