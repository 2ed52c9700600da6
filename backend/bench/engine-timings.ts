import { evaluatePositioning, type PositioningRun } from '../src/engine/positioning.js';
import { randomRailSweep, seededRandom } from '../src/engine/seeded-random.js';
import { leastSquaresStraightness, minimumZoneStraightness } from '../src/engine/straightness.js';
import type { BenchRow } from './server/bench-types.js';

/**
 * The engine's heavy computations, timed in this process: least-squares and minimum-zone
 * straightness for 10k, 100k and 1M stations (cost should grow no faster than n log n; the
 * minimum zone also on shuffled stations), and an ISO 230-2 evaluation of 20 targets × 5 runs ×
 * 2 directions. Each figure is the median of several runs. The 200 000-point request limit is
 * lifted for these calls so the 1M case can be timed.
 */

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

function time(runs: number, fn: () => unknown): number {
  fn(); // warm-up: let the JIT compile before timing
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    fn();
    samples.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return median(samples);
}

const ms = (v: number) => Math.round(v * 100) / 100;

export function engineTimings(): BenchRow[] {
  const rows: BenchRow[] = [];
  for (const n of [10_000, 100_000, 1_000_000]) {
    const sweep = randomRailSweep(n, 42);
    const rand = seededRandom(7);
    const order = Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1));
      [order[i], order[j]] = [order[j], order[i]];
    }
    const shuffled = {
      positionsMm: order.map((i) => sweep.positionsMm[i]),
      readingsMm: order.map((i) => sweep.readingsMm[i]),
    };
    const runs = n >= 1_000_000 ? 3 : 9;
    const label = n.toLocaleString('en-US');
    rows.push({
      name: `Engine: least squares, ${label} stations`,
      value: ms(time(runs, () => leastSquaresStraightness(sweep, { maxPoints: Infinity }))),
      unit: 'ms',
    });
    rows.push({
      name: `Engine: minimum zone, ${label} stations`,
      value: ms(time(runs, () => minimumZoneStraightness(sweep, { maxPoints: Infinity }))),
      unit: 'ms',
    });
    rows.push({
      name: `Engine: minimum zone, ${label} stations shuffled`,
      value: ms(time(runs, () => minimumZoneStraightness(shuffled, { maxPoints: Infinity }))),
      unit: 'ms',
    });
  }
  const rand = seededRandom(3);
  const targetsMm = Array.from({ length: 20 }, (_, i) => i * 97 + Math.round(rand() * 20));
  const positioningRuns: PositioningRun[] = [];
  for (let k = 0; k < 10; k++) {
    positioningRuns.push({
      direction: k < 5 ? 'up' : 'down',
      deviationsMm: targetsMm.map((t) => 1e-5 * t + (k < 5 ? 0.004 : -0.004) + (rand() - 0.5) * 0.006),
    });
  }
  rows.push({
    name: 'Engine: ISO 230-2, 20 targets × 5 runs × 2 directions',
    value: ms(time(200, () => evaluatePositioning({ targetsMm, runs: positioningRuns }))),
    unit: 'ms',
  });
  return rows;
}
