/**
 * Reading a block of numbers pasted from a spreadsheet or a CSV file. Tab-separated text (what
 * spreadsheets put on the clipboard) may use a decimal comma; comma- or semicolon-separated text
 * uses a decimal point. Empty cells stay empty (null).
 */
export function splitRows(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  while (lines.length && lines[lines.length - 1].trim() === '') lines.pop();
  const tabbed = lines.some((l) => l.includes('\t'));
  const semicolon = !tabbed && lines.some((l) => l.includes(';'));
  const sep = tabbed ? '\t' : semicolon ? ';' : ',';
  return lines.map((l) => l.split(sep).map((c) => (tabbed || semicolon ? c.trim().replace(',', '.') : c.trim())));
}

export function parseCell(cell: string): number | null | 'bad' {
  if (cell === '') return null;
  const v = Number(cell.replace(/^\+/, ''));
  return Number.isFinite(v) ? v : 'bad';
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
  splitRows(text).forEach((cells, r) => {
    if (cells.every((c) => c === '')) return;
    const first = cells[0];
    if (/^(targets?|positions?|direction|run)/i.test(first) && targets === null) {
      const t = cells.slice(1).filter((c) => c !== '').map(Number);
      if (t.some((v) => !Number.isFinite(v))) problems.push(`Row ${r + 1}: the targets must be numbers of mm`);
      else targets = t;
      return;
    }
    let direction: 'up' | 'down' | null = null;
    let rest = cells;
    if (parseCell(first) === 'bad' && DIRECTION.test(first)) {
      direction = /^(up|↑|\+|pos)/i.test(first) ? 'up' : 'down';
      rest = cells.slice(1);
      // "up, 1, …" style: a run number after the direction
      if (rest.length && /^\d+$/.test(rest[0]) && targets && rest.length === targets.length + 1) rest = rest.slice(1);
    }
    const values = rest.map(parseCell);
    const bad = values.findIndex((v) => v === 'bad');
    if (bad >= 0) {
      problems.push(`Row ${r + 1}, value ${bad + 1} ("${rest[bad]}") is not a number`);
      return;
    }
    rows.push({ direction, values: values as (number | null)[] });
  });
  return { targets, rows, problems };
}
