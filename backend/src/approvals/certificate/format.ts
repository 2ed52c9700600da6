import { CHECK_KINDS } from '../../records/kinds.js';
import type { BoardCheck } from '../snapshot.js';

const UNIT_WORDS: Record<string, string> = {
  um: '\u00b5m',
  thou: 'thou',
  in: 'in',
  mm: 'mm',
  'mm/m': 'mm/m',
  '%': '%',
  days: 'days',
};

export const unitLabel = (unit: string) => UNIT_WORDS[unit] ?? unit;

/** A result value for reading, without exponents for everyday sizes. */
export function num(v: number): string {
  if (v === 0) return '0';
  if (Math.abs(v) < 1e-4) return v.toExponential(2);
  // Three significant figures, whole numbers from 100 up: the board is read, not computed with.
  return Math.abs(v) >= 100 ? String(Math.round(v)) : String(Number(v.toPrecision(3)));
}

/** How the target reads depends on the kind's sense (records/kinds.ts): at most, at least, a ± band, every item passed. */
export function targetText(c: Pick<BoardCheck, 'kind' | 'target'>): string {
  if (!c.target) return '\u2014';
  const value = `${num(c.target.value)} ${unitLabel(c.target.unit)}`;
  const sense = CHECK_KINDS[c.kind]?.sense ?? 'at-most';
  if (sense === 'at-least') return `\u2265 ${value}`;
  if (sense === 'plus-minus') return `\u00b1 ${value}`;
  if (sense === 'all-passed') return c.target.value ? `${value}` : 'every item passed';
  return `\u2264 ${value}`;
}

export function resultText(c: Pick<BoardCheck, 'result'>): string {
  return c.result ? `${num(c.result.value)} ${unitLabel(c.result.unit)}` : 'not recorded';
}

export const utc = (iso: string | Date) => `${new Date(iso).toISOString().replace('T', ' ').slice(0, 16)} UTC`;
export const dayOf = (iso: string | Date) => new Date(iso).toISOString().slice(0, 10);
