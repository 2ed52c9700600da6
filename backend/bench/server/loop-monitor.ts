import { appendFileSync, writeFileSync } from 'node:fs';
import { monitorEventLoopDelay } from 'node:perf_hooks';

const WINDOW_MS = 100;

/**
 * Loaded into the product under bench (`node --import`): measures how long the event loop is
 * held. Every 100 ms it appends "<epoch ms> <longest delay in the window, ms>" to BENCH_LOOP_FILE,
 * so the bench can ask what the longest hold was between two moments of its own.
 */
const file = process.env.BENCH_LOOP_FILE;
if (file) {
  writeFileSync(file, '');
  const histogram = monitorEventLoopDelay({ resolution: 5 });
  histogram.enable();
  setInterval(() => {
    appendFileSync(file, `${Date.now()} ${(histogram.max / 1e6).toFixed(1)}\n`);
    histogram.reset();
  }, WINDOW_MS).unref();
}
