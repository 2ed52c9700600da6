import type { BenchRow } from './server/bench-types.js';

const cell = (v: number | undefined) => (v === undefined ? '' : String(Math.round(v * 100) / 100));

/** One Markdown table: it reads in a terminal and pastes into README as it is. */
export function benchTable(rows: BenchRow[]): string {
  const head = ['name', 'product', 'bare', 'unit', 'ratio', 'goal', 'met'];
  const body = rows.map((r) => [
    r.name,
    cell(r.value),
    cell(r.baseline),
    r.unit,
    cell(r.ratio),
    r.goal ?? '',
    r.met === undefined ? '' : r.met ? 'yes' : 'NO',
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => b[i].length)));
  const line = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i])).join(' | ')} |`;
  return [line(head), line(widths.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}
