import Papa from 'papaparse';

/**
 * Tables typed, pasted from a spreadsheet or uploaded as CSV, read the same way everywhere.
 *
 * Rows: papaparse does the splitting (quoted fields, quotes doubled inside them). The separator is
 * a tab when the text holds one (what spreadsheets put on the clipboard), else a semicolon (CSV
 * written where the decimal mark is a comma), else a comma; text with none of them is split on
 * spaces. Blank lines and lines starting with # are skipped; every row keeps its line number.
 *
 * Numbers: one parser for every cell. A decimal point or a decimal comma, a leading + or a minus
 * (- or the typographic −), an exponent after a decimal point ("1.5e-3"). Thousands separators are
 * refused rather than guessed: "1.234,5", "1,234.5" and "1 234" are errors, never 1234.5 or 1.2345.
 */

export interface TabularRow {
  /** Line of the text the row starts on, from 1. */
  line: number;
  /** The cells, trimmed. */
  cells: string[];
}

function delimiterOf(text: string): string {
  const outsideQuotes = text.replace(/"(?:[^"]|"")*"/g, '');
  if (outsideQuotes.includes('\t')) return '\t';
  if (outsideQuotes.includes(';')) return ';';
  if (outsideQuotes.includes(',')) return ',';
  return ' ';
}

/** The rows of a pasted or uploaded table, blank and # lines left out. */
export function readRows(input: string): TabularRow[] {
  let text = input.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  let delimiter = delimiterOf(text);
  if (delimiter === ' ') {
    // Columns lined up with spaces: any run of spaces or tabs is one separator.
    text = text
      .split('\n')
      .map((l) => l.trim().replace(/\s+/g, '\t'))
      .join('\n');
    delimiter = '\t';
  }
  const rows: TabularRow[] = [];
  let offset = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter,
    skipEmptyLines: false,
    step: (result) => {
      const cells = result.data.map((c) => c.trim());
      const next = result.meta.cursor;
      if (cells.some((c) => c !== '') && !cells[0].startsWith('#')) rows.push({ line, cells });
      for (let i = offset; i < next && i < text.length; i++) if (text[i] === '\n') line++;
      offset = next;
    },
  });
  return rows;
}

export type NumberCell = { ok: true; value: number | null } | { ok: false; reason: string };

const PLAIN = /^\d+(?:[.,]\d*)?$|^[.,]\d+$/;
const SCIENTIFIC = /^(?:\d+(?:\.\d*)?|\.\d+)e[+-]?\d+$/i;

/** One cell as a number: empty is null; a cell that is not a plain number says why. */
export function parseNumberCell(raw: string): NumberCell {
  const text = raw.trim();
  if (text === '') return { ok: true, value: null };
  const sign = /^[+\-\u2212]/.test(text) ? text[0] : '';
  const body = text.slice(sign.length);
  const grouped = /^\d{1,3}([ .,\u00a0\u202f'])\d{3}(\1\d{3})*([.,]\d+)?$/.test(body) && /[ \u00a0\u202f']/.test(body);
  if (grouped || /^\d{1,3}([.,])\d{3}(\1\d{3})+$/.test(body)) {
    return { ok: false, reason: `"${text}" has a thousands separator; write it without one` };
  }
  if (body.includes('.') && body.includes(',')) {
    return {
      ok: false,
      reason: `"${text}" has both a point and a comma; write it without a thousands separator, with one decimal mark`,
    };
  }
  if (!PLAIN.test(body) && !SCIENTIFIC.test(body)) return { ok: false, reason: `"${text}" is not a number` };
  const value = Number(body.replace(',', '.')) * (sign === '' || sign === '+' ? 1 : -1);
  if (!Number.isFinite(value)) return { ok: false, reason: `"${text}" is too large` };
  return { ok: true, value: Object.is(value, -0) ? 0 : value };
}

/**
 * A cell as the text to put in an entry field: a number keeps its digits but gets a decimal point
 * and a plain minus ("−0,50" → "-0.50"); anything else stays as it is, for the field to flag.
 */
export function normaliseCell(raw: string): string {
  const text = raw.trim();
  const parsed = parseNumberCell(text);
  if (!parsed.ok || parsed.value === null) return text;
  const negative = /^[-\u2212]/.test(text);
  return `${negative ? '-' : ''}${text.replace(/^[+\-\u2212]/, '').replace(',', '.')}`;
}

/** Where a cell sits, in words: "line 4, column 2". */
export const cellPlace = (line: number, column: number) => `line ${line}, column ${column + 1}`;

/** A message for a cell that is not a number, naming its line and column. */
export function cellProblem(row: TabularRow, column: number, reason: string): string {
  const place = cellPlace(row.line, column);
  return `${place[0].toUpperCase()}${place.slice(1)}: ${reason}`;
}
