import { parseNumberCell, readRows } from '../../../lib/tabular-input';

/** One line of a pasted or uploaded sweep: position (mm) and reading, with what is wrong with it. */
export interface CsvRow {
  line: number;
  text: string;
  position: number | null;
  reading: number | null;
  problem: string | null;
}

export interface ParsedCsv {
  rows: CsvRow[];
  /** The first line was a header (words, not numbers) and is not a row. */
  header: string | null;
}

const numberOrNull = (cell: string | undefined) => {
  const parsed = parseNumberCell(cell ?? '');
  return parsed.ok ? parsed.value : null;
};

/** Reads "position, reading" per line (comma, semicolon, tab or spaces), an optional header first. */
export function parseSweepCsv(text: string): ParsedCsv {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  const rows: CsvRow[] = [];
  let header: string | null = null;
  const seen = new Map<number, number>();
  readRows(text).forEach(({ line, cells }) => {
    const textLine = (lines[line - 1] ?? '').trim();
    if (
      !rows.length &&
      header === null &&
      cells.some((c) => /[a-z]/i.test(c)) &&
      cells.every((c) => numberOrNull(c) === null)
    ) {
      header = textLine;
      return;
    }
    const pos = parseNumberCell(cells[0] ?? '');
    const read = parseNumberCell(cells[1] ?? '');
    const position = pos.ok ? pos.value : null;
    const reading = read.ok ? read.value : null;
    let problem: string | null = null;
    if (!pos.ok) problem = `Position ${pos.reason}`;
    else if (position === null) problem = 'No position';
    else if (cells[1] === undefined || cells[1] === '') problem = 'Missing reading';
    else if (!read.ok) problem = `Reading ${read.reason}`;
    else if (cells.length > 2) problem = `More than two values (${cells.length})`;
    else if (seen.has(position)) problem = `Position ${position} mm repeats line ${seen.get(position)}`;
    if (position !== null && !problem) seen.set(position, line);
    rows.push({ line, text: textLine, position, reading, problem });
  });
  return { rows, header };
}
