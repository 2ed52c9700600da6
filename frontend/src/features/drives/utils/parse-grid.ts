import { cellProblem, normaliseCell, parseNumberCell, readRows } from '../../../lib/tabular-input';

/**
 * A block pasted from a spreadsheet or read from a CSV file, as the text of each cell: numbers with
 * a decimal point ("0,5" pasted becomes "0.5"), anything else as it was for the grid to flag.
 * Blank lines are left out.
 */
export function splitRows(text: string): string[][] {
  return readRows(text).map((row) => row.cells.map(normaliseCell));
}

export interface GridImport {
  targets: number[] | null;
  rows: { direction: 'up' | 'down' | null; values: (number | null)[] }[];
  problems: string[];
}

const DIRECTION = /^(up|down|↑|↓|\+|-|pos|neg)/i;

/**
 * A repeat-and-reverse block: optionally a header row of targets ("target, 10, 210, …"), then
 * rows of deviations, each optionally led by its direction ("up", "down").
 */
export function parseRunsCsv(text: string): GridImport {
  const problems: string[] = [];
  let targets: number[] | null = null;
  const rows: GridImport['rows'] = [];
  readRows(text).forEach((row) => {
    const { cells } = row;
    const first = cells[0];
    if (/^(targets?|positions?|direction|run)/i.test(first) && targets === null) {
      const t = cells.slice(1).map(parseNumberCell);
      const bad = t.findIndex((v) => !v.ok);
      if (bad >= 0)
        problems.push(
          `${cellProblem(row, bad + 1, (t[bad] as { reason: string }).reason)}: the targets must be numbers of mm`,
        );
      else targets = t.flatMap((v) => (v.ok && v.value !== null ? [v.value] : []));
      return;
    }
    let direction: 'up' | 'down' | null = null;
    let rest = cells;
    let skipped = 0;
    if (!parseNumberCell(first).ok && DIRECTION.test(first)) {
      direction = /^(up|↑|\+|pos)/i.test(first) ? 'up' : 'down';
      rest = cells.slice(1);
      skipped = 1;
      // "up, 1, …" style: a run number after the direction
      if (rest.length && /^\d+$/.test(rest[0]) && targets && rest.length === targets.length + 1) {
        rest = rest.slice(1);
        skipped = 2;
      }
    }
    const values = rest.map(parseNumberCell);
    const bad = values.findIndex((v) => !v.ok);
    if (bad >= 0) {
      problems.push(cellProblem(row, bad + skipped, (values[bad] as { reason: string }).reason));
      return;
    }
    rows.push({ direction, values: values.map((v) => (v.ok ? v.value : null)) });
  });
  return { targets, rows, problems };
}
