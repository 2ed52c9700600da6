import { existsSync } from 'node:fs';
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { benchTable } from './bench-table.js';
import { engineTimings } from './engine-timings.js';
import { seedBenchWorkshop } from './server/bench-seed.js';
import type { BenchContext, BenchRow } from './server/bench-types.js';
import { writeScenarios } from './server/scenarios-writes.js';

/**
 * `npm run bench` (scripts/bench.sh starts PostgreSQL, the product and the bare baseline, then
 * this): reads, writes and calculations of the product against the bare server in one run, the
 * page's sizes, and the engine's own timings, printed as one table of goals met or not.
 * Without BENCH_PRODUCT_URL only the engine is timed.
 */

async function optional<T>(
  file: string,
  name: string,
  call: (fn: (...a: never[]) => Promise<T>) => Promise<T>,
): Promise<T | null> {
  const path = fileURLToPath(new URL(file, import.meta.url));
  if (!existsSync(path)) return null;
  try {
    const mod = (await import(path)) as Record<string, (...a: never[]) => Promise<T>>;
    return await call(mod[name]);
  } catch (err) {
    // One section failing (e.g. no frontend build to weigh) must not lose the rest of the table.
    console.error(`bench: ${file} failed: ${(err as Error).message}`);
    return null;
  }
}

const rows: BenchRow[] = [];
const started = Date.now();
const productUrl = process.env.BENCH_PRODUCT_URL;
if (productUrl) {
  const ctx = await seedBenchWorkshop(productUrl, process.env.BENCH_BARE_URL!, process.env.BENCH_OWNER_DATABASE_URL!);
  const reads = await optional<BenchRow[]>('./server/scenarios-reads.js', 'readScenarios', (fn) =>
    (fn as unknown as (c: BenchContext) => Promise<BenchRow[]>)(ctx),
  );
  if (reads) rows.push(...reads);
  else console.error('bench: no read scenarios (bench/server/scenarios-reads.ts) in this build');
  rows.push(...(await writeScenarios(ctx)));
}
const sizes = await optional<BenchRow[]>('./server/frontend-sizes.js', 'frontendSizes', (fn) =>
  (fn as unknown as () => Promise<BenchRow[]>)(),
);
if (sizes) rows.push(...sizes);
rows.push(...engineTimings());

const cpu = os.cpus()[0]?.model.trim() ?? 'unknown CPU';
console.log(
  `\nRailwright bench, ${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} × ${cpu}, Node ${process.version}, ${Math.round((Date.now() - started) / 1000)} s\n`,
);
console.log(benchTable(rows));
const missed = rows.filter((r) => r.met === false);
console.log(
  `\n${rows.filter((r) => r.met).length} goals met, ${missed.length} missed${missed.length ? `: ${missed.map((r) => r.name).join('; ')}` : ''}`,
);
