import { cellProblem, parseNumberCell, readRows } from '../../../lib/tabular-input';

/**
 * The calculators' tables, read as every other table of the app is (lib/tabular-input.ts: one
 * row splitter, one number parser). A first line that is not numbers is taken as a header.
 */

export interface ParsedTable {
  rows: number[][];
  /** One message per line that could not be read, naming the line (and the cell). */
  errors: string[];
  headerSkipped: boolean;
}

/**
 * Rows of at least `minColumns` numbers. With `maxColumns`, extra cells are ignored (a pasted
 * block may carry a notes column). Empty cells at the end of a line are dropped (a spreadsheet's
 * trailing tab); an empty cell between numbers is refused, never closed up.
 */
export function parseTable(text: string, minColumns: number, maxColumns = Infinity, label = 'numbers'): ParsedTable {
  const rows: number[][] = [];
  const errors: string[] = [];
  let headerSkipped = false;
  for (const row of readRows(text)) {
    const cells = row.cells.slice(0, maxColumns);
    while (cells.length && cells[cells.length - 1] === '') cells.pop();
    const parsed = cells.map((cell) =>
      cell === '' ? { ok: false as const, reason: 'the cell is empty' } : parseNumberCell(cell),
    );
    const bad = parsed.findIndex((p) => !p.ok);
    if (bad >= 0) {
      if (!rows.length && !errors.length && !headerSkipped && parsed.every((p) => !p.ok)) {
        headerSkipped = true;
        continue;
      }
      const reason = parsed[bad];
      errors.push(cellProblem(row, bad, reason.ok ? '' : reason.reason));
      continue;
    }
    if (cells.length < minColumns) {
      errors.push(`Line ${row.line}: needs ${minColumns} values (${label}), found ${cells.length}`);
      continue;
    }
    rows.push(parsed.map((p) => (p.ok ? p.value! : NaN)));
  }
  return { rows, errors, headerSkipped };
}

/** A single number typed in a field: blank is null, anything unreadable is NaN. */
export function parseNumber(text: string): number | null {
  const parsed = parseNumberCell(text);
  return parsed.ok ? parsed.value : NaN;
}
