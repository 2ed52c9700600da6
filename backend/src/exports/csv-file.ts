import Papa from 'papaparse';
import { MM_PER_UNIT, type LengthUnit } from '../engine/units.js';

/** A value of a cell: numbers stay numbers (so a minus sign is never taken for a formula). */
export type Cell = string | number | null;

/** Unit names as they stand in a column's header. */
export const UNIT_NAMES: Readonly<Record<LengthUnit, string>> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };

/**
 * One CSV file: a header row naming each column with its unit, then one row per value, comma
 * separated with CRLF line ends (RFC 4180). Text that a spreadsheet would run as a formula
 * (starting with =, +, -, @, tab or CR) is written with a leading apostrophe.
 */
export function csvFile(header: string[], rows: Cell[][]): string {
  const text = Papa.unparse({ fields: header, data: rows }, { newline: '\r\n', escapeFormulae: true, quotes: false });
  // With no rows papaparse already ends the header's line; every line ends once.
  return text.endsWith('\r\n') ? text : text + '\r\n';
}

/** A length given in `from` expressed in `to`, exactly (1 in = 25.4 mm), to ten significant digits. */
export function convert(value: number | null | undefined, from: LengthUnit, to: LengthUnit): number | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  return tidy((value * MM_PER_UNIT[from]) / MM_PER_UNIT[to]);
}

/** Millimetres in `to`. */
export const fromMmTo = (mm: number | null | undefined, to: LengthUnit) => convert(mm, 'mm', to);

/** Ten significant digits: more than any indicator reads, without the float noise of a fit (0.00499999999997). */
export const tidy = (v: number) => Number(v.toPrecision(10));

/** A state or phase code in words: "within-target" → "within target". */
export const words = (code: string | null | undefined) => (code ? code.replace(/-/g, ' ') : null);

/** A target's unit as people write it (µm rather than um). */
export const unitName = (unit: string) => (unit in UNIT_NAMES ? UNIT_NAMES[unit as LengthUnit] : unit);

/** ISO 8601 with its zone (UTC, `Z`), to the second. */
export const isoTime = (iso: string | Date) => new Date(iso).toISOString().replace(/\.\d{3}Z$/, 'Z');

/** A file name safe on every system: letters, digits and dashes. */
export const fileName = (...parts: string[]) =>
  parts
    .join(' ')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '') + '.csv';
