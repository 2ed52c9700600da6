import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Reads the published and constructed check data kept beside the engine, for its specs. */
const here = dirname(fileURLToPath(import.meta.url));

// The files are published data of many shapes; each spec reads the fields it checks.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function referenceJson<T = any>(name: string): T {
  return JSON.parse(readFileSync(join(here, name), 'utf8')) as T;
}

/** Parses a small CSV with a header row; numeric-looking cells become numbers. */
export function referenceCsv(name: string): Record<string, string | number>[] {
  const lines = readFileSync(join(here, name), 'utf8').trim().split(/\r?\n/);
  const header = lines[0].split(',');
  return lines.slice(1).map((line) => {
    const cells = line.split(',');
    const row: Record<string, string | number> = {};
    header.forEach((h, i) => {
      const cell = cells[i];
      row[h] = cell !== '' && Number.isFinite(Number(cell)) ? Number(cell) : cell;
    });
    return row;
  });
}
