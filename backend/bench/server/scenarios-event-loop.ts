import { readFileSync } from 'node:fs';
import { randomRailSweep } from '../../src/engine/seeded-random.js';
import { round } from './autocannon.js';
import type { BenchContext, BenchRow } from './bench-types.js';

const FIT_POINTS = 200_000;
const FITS = 5;
const HOLD_GOAL_MS = 100;

/**
 * The longest the product's event loop was held while maximum-size calculator bodies were
 * handled one after another: 200 000 stations in, every residual out (about 3 MB in, 10 MB of
 * JSON out, compressed). Read from the product's own event-loop monitor (loop-monitor.ts), which
 * scripts/bench.sh loads; without it the row is left out. The first fit (worker start, warm-up)
 * is not counted.
 */
export async function eventLoopDuringLargeBodies(ctx: BenchContext): Promise<BenchRow[]> {
  const file = process.env.BENCH_LOOP_FILE;
  if (!file) return [];
  // The monitor writes one line per 100 ms window: "<epoch ms> <longest delay, ms>".
  const longestSince = async (from: number) => {
    await new Promise((resolve) => setTimeout(resolve, 250));
    const windows = readFileSync(file, 'utf8')
      .trim()
      .split('\n')
      .map((line) => line.split(' ').map(Number));
    return Math.max(0, ...windows.filter(([at]) => at > from).map(([, ms]) => ms));
  };
  const sweep = randomRailSweep(FIT_POINTS, 7);
  const body = JSON.stringify({ positions: sweep.positionsMm, readings: sweep.readingsMm });
  // A first fit starts the worker thread and warms the code paths; it is not counted.
  const fit = async () => {
    const res = await fetch(`${ctx.productUrl}/api/calc/straightness?residuals=true`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'accept-encoding': 'gzip', cookie: ctx.cookie },
      body,
    });
    if (!res.ok) throw new Error(`200 000-point fit with residuals: ${res.status} ${await res.text()}`);
    await res.arrayBuffer();
  };
  await fit();
  await new Promise((resolve) => setTimeout(resolve, 250));
  const from = Date.now();
  for (let i = 0; i < FITS; i++) await fit();
  const heldMs = await longestSince(from);
  return [
    {
      name: `longest event-loop hold while ${FITS} fits of ${FIT_POINTS} stations with residuals are answered`,
      value: round(heldMs),
      unit: 'ms',
      goal: `< ${HOLD_GOAL_MS} ms`,
      met: heldMs < HOLD_GOAL_MS,
    },
  ];
}
