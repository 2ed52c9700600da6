/**
 * Reads numbers pasted from a spreadsheet or typed by hand: one row per line, cells split by
 * tabs (spreadsheets), semicolons, commas or spaces. A decimal comma is accepted inside tab- or
 * semicolon-separated cells ("0,012"). A first line that is not numeric is taken as a header.
 */

export interface ParsedTable {
  rows: number[][];
  /** One message per line that could not be read, naming the line. */
  errors: string[];
  headerSkipped: boolean;
}

const MINUS = /[\u2212\u2013]/g; // typographic minus and en dash, as some sheets export
const DECIMAL_COMMA = /^([-\u2212]?\d+),(\d+)$/;

function splitLine(line: string): string[] {
  const separator = line.includes('\t') ? '\t' : line.includes(';') ? ';' : null;
  const cells = separator ? line.split(separator).map((c) => c.trim().replace(DECIMAL_COMMA, '$1.$2')) : line.trim().split(/[\s,]+/);
  return cells.filter((c) => c !== '');
}

function toNumber(cell: string): number | null {
  const text = cell.replace(MINUS, '-').replace(/^\+/, '');
  if (!/^-?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(text)) return null;
  const v = Number(text);
  return Number.isFinite(v) ? v : null;
}

/**
 * Rows of at least `minColumns` numbers. With `maxColumns`, extra cells are ignored (a pasted
 * block may carry a notes column).
 */
export function parseTable(text: string, minColumns: number, maxColumns = Infinity, label = 'numbers'): ParsedTable {
  const rows: number[][] = [];
  const errors: string[] = [];
  let headerSkipped = false;
  let seenData = false;
  text.split(/\r?\n/).forEach((raw, index) => {
    if (raw.trim() === '') return;
    const cells = splitLine(raw);
    const values = cells.slice(0, maxColumns).map(toNumber);
    if (values.some((v) => v === null)) {
      if (!seenData && !headerSkipped) {
        headerSkipped = true;
        return;
      }
      errors.push(`Line ${index + 1}: “${raw.trim()}” is not a row of ${label}`);
      return;
    }
    seenData = true;
    if (values.length < minColumns) {
      errors.push(`Line ${index + 1}: needs ${minColumns} values, found ${values.length}`);
      return;
    }
    rows.push(values as number[]);
  });
  return { rows, errors, headerSkipped };
}

/** A single number typed in a field: blank is null, anything unreadable is NaN. */
export function parseNumber(text: string): number | null {
  if (text.trim() === '') return null;
  const v = toNumber(text.trim().replace(DECIMAL_COMMA, '$1.$2'));
  return v === null ? NaN : v;
}
