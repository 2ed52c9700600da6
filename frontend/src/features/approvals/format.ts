import { isLengthUnit, UNIT_LABELS } from '../../lib/units';
import { CHECK_KINDS } from '../../lib/record-kinds';
import type { BoardCheck, Target } from './types';

export const unitLabel = (unit: string) => (isLengthUnit(unit) ? UNIT_LABELS[unit] : unit);

export function num(v: number): string {
  if (v === 0) return '0';
  if (Math.abs(v) < 1e-4) return v.toExponential(2);
  // Three significant figures, whole numbers from 100 up: the board is read, not computed with.
  return Math.abs(v) >= 100 ? String(Math.round(v)) : String(Number(v.toPrecision(3)));
}

/** How a target reads depends on its kind's sense (lib/record-kinds.ts): at most, at least, a ± band, every item passed. */
export function targetText(kind: BoardCheck['kind'], target: Target | null): string {
  if (!target) return '—';
  const value = `${num(target.value)} ${unitLabel(target.unit)}`;
  const sense = CHECK_KINDS[kind]?.sense ?? 'at-most';
  if (sense === 'at-least') return `≥ ${value}`;
  if (sense === 'plus-minus') return `± ${value}`;
  if (sense === 'all-passed') return target.value ? value : 'every item passed';
  return `≤ ${value}`;
}

export const resultText = (r: BoardCheck['result']) => (r ? `${num(r.value)} ${unitLabel(r.unit)}` : '—');

export { formatDateTime as dateTime, formatDate as dateOnly } from '../../lib/format-time';
