import { fromMm, toMm, type LengthUnit } from '../../lib/units';

/**
 * One reading line as digital indicators send it: an optional sign, digits with a decimal point or
 * a decimal comma, and an optional unit (mm, in, um/µm, thou). "0,012", "-0.004", "+0.0120 mm",
 * "- 0.5thou" all read; anything else is refused with a message saying what was expected.
 */
export type LineFormat = 'number' | 'last-number';

export const LINE_FORMATS: Record<LineFormat, string> = {
  number: 'Number, optional unit',
  'last-number': 'Last number in the line',
};

/** `text` is the number as sent, with a point for a comma and no plus sign ("+0,0120" → "0.0120"): the trailing zeros tell the resolution. */
export type ParsedReading =
  { ok: true; value: number; text: string; unit: LengthUnit | null } | { ok: false; message: string };

// Unit words as indicators print them; µ (micro sign) and μ (Greek mu) both occur.
const UNIT_WORDS: Record<string, LengthUnit> = {
  mm: 'mm',
  in: 'in',
  inch: 'in',
  '"': 'in',
  um: 'um',
  µm: 'um',
  μm: 'um',
  thou: 'thou',
};
const NUMBER = String.raw`([+\-−]?)\s*(\d+(?:[.,]\d*)?|[.,]\d+)`;
const UNIT = String.raw`\s*(mm|inch|in|"|um|µm|μm|thou)?`;
const WHOLE = new RegExp(`^${NUMBER}${UNIT}$`, 'i');
const LAST = new RegExp(`${NUMBER}${UNIT}$`, 'i');

const EXPECTED = 'expected a number such as -0.012 or 0,012, optionally followed by mm, in, µm or thou';

export function parseReadingLine(line: string, format: LineFormat = 'number'): ParsedReading {
  const text = line.trim();
  if (!text) return { ok: false, message: `An empty line is not a reading: ${EXPECTED}` };
  const m = (format === 'number' ? WHOLE : LAST).exec(text);
  // "1,234.5" would read as 234.5 in the last-number format: a thousands separator is refused instead.
  if (!m || (format === 'last-number' && /\d[.,]$/.test(text.slice(0, m.index)))) {
    return {
      ok: false,
      message: `“${text.length > 40 ? `${text.slice(0, 40)}…` : text}” is not a reading: ${EXPECTED}`,
    };
  }
  const magnitude = Number(m[2].replace(',', '.'));
  const value = m[1] === '-' || m[1] === '−' ? -magnitude : magnitude;
  const digits = m[2].replace(',', '.').replace(/^\./, '0.');
  return {
    ok: true,
    value: Object.is(value, -0) ? 0 : value,
    text: value < 0 ? `-${digits}` : digits,
    unit: m[3] ? (UNIT_WORDS[m[3].toLowerCase()] ?? null) : null,
  };
}

/** The reading as cell text in the grid's unit: as sent, or converted when sent in another unit. */
export function readingInUnit(
  reading: { value: number; text: string; unit: LengthUnit | null },
  to: LengthUnit,
): string {
  if (!reading.unit || reading.unit === to) return reading.text;
  const v = fromMm(toMm(reading.value, reading.unit), to);
  // Ten significant figures drop the binary noise of the conversion and keep every real digit.
  return String(Number(v.toPrecision(10)));
}
