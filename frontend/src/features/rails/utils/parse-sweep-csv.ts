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

const SPLIT = /\s*[,;\t]\s*|\s+/;

// A decimal comma ("0,5") is only taken as such when the separator is a semicolon or a tab.
function toNumber(cell: string | undefined, decimalComma: boolean): number | null {
  if (cell === undefined) return null;
  const t = (decimalComma ? cell.replace(',', '.') : cell).trim();
  if (t === '' || !/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(t)) return null;
  return Number(t);
}

/** Reads "position, reading" per line (comma, semicolon, tab or spaces), an optional header first. */
export function parseSweepCsv(text: string): ParsedCsv {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  const rows: CsvRow[] = [];
  let header: string | null = null;
  const seen = new Map<number, number>();
  lines.forEach((raw, i) => {
    const textLine = raw.trim();
    if (!textLine || textLine.startsWith('#')) return;
    const decimalComma = /[;\t]/.test(textLine);
    const cells = decimalComma ? textLine.split(/\s*[;\t]\s*/) : textLine.split(SPLIT);
    if (!rows.length && header === null && cells.some((c) => /[a-z]/i.test(c)) && cells.every((c) => toNumber(c, decimalComma) === null)) {
      header = textLine;
      return;
    }
    const position = toNumber(cells[0], decimalComma);
    const reading = toNumber(cells[1], decimalComma);
    let problem: string | null = null;
    if (position === null) problem = cells[0] ? `Position "${cells[0]}" is not a number` : 'No position';
    else if (cells[1] === undefined || cells[1] === '') problem = 'Missing reading';
    else if (reading === null) problem = `Reading "${cells[1]}" is not a number`;
    else if (cells.length > 2) problem = `More than two values (${cells.length})`;
    else if (seen.has(position)) problem = `Position ${position} mm repeats line ${seen.get(position)}`;
    if (position !== null && !problem) seen.set(position, i + 1);
    rows.push({ line: i + 1, text: textLine, position, reading, problem });
  });
  return { rows, header };
}
