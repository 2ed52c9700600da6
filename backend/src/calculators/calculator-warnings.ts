import type { ResultWarning } from '../engine/warnings.js';
import { fromMm, type LengthUnit } from '../engine/units.js';

/**
 * Warnings the calculators attach to their results. A calculation is never refused for these:
 * the number stands, and the warning says why it may not mean what it seems to.
 */

/** A correction further than this from the expected steps per mm is not a tuning matter (issue's 5 %). */
export const CORRECTION_WARNING_FRACTION = 0.05;
/** ISO 230-2:2014 §6.1.2 (five runs per direction at each target) and §5.3.2 (at least five targets per metre). */
export const ISO_RUNS_PER_DIRECTION = 5;
export const ISO_MIN_TARGETS = 5;

const sig = (v: number, digits = 4) => String(Number(v.toPrecision(digits)));
const UNIT_WORDS: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };
export const inUnit = (mm: number, unit: LengthUnit, digits = 4) =>
  `${sig(fromMm(mm, unit), digits)} ${UNIT_WORDS[unit]}`;

/**
 * A corrected steps per mm far from the expected value means the drive's figures are wrong (lead
 * taken for pitch, pulley teeth, microsteps) or the moves were measured in another unit, not that
 * the axis needs tuning (TRADE.md, "Drives": measured far from calculated usually means a wrong
 * ratio, lead or pulley).
 */
export function correctionWarning(
  subject: string,
  corrected: number,
  expected: number,
  expectedLabel: string,
): ResultWarning | null {
  if (!(expected > 0) || !Number.isFinite(corrected)) return null;
  const off = corrected / expected - 1;
  if (Math.abs(off) <= CORRECTION_WARNING_FRACTION) return null;
  return {
    code: 'correction-far-from-theory',
    message:
      `${subject}: the corrected ${sig(corrected)} steps/mm is ${sig(Math.abs(off) * 100, 3)} % ${off < 0 ? 'below' : 'above'} the ${sig(expected)} steps/mm ${expectedLabel}. ` +
      'A difference this large is not tuning: check the lead (not the thread pitch of a multi-start screw), the pulley teeth, the microstep setting and the unit the moves were measured in before applying it.',
  };
}

export function positioningWarnings(runsUp: number, runsDown: number, targets: number): ResultWarning[] {
  const out: ResultWarning[] = [];
  if (runsUp < ISO_RUNS_PER_DIRECTION || runsDown < ISO_RUNS_PER_DIRECTION) {
    out.push({
      code: 'few-runs',
      message: `ISO 230-2 asks for ${ISO_RUNS_PER_DIRECTION} runs in each direction; this run has ${runsUp} up and ${runsDown} down, so its repeatability and accuracy are less certain.`,
    });
  }
  if (targets < ISO_MIN_TARGETS) {
    out.push({
      code: 'few-targets',
      message: `ISO 230-2 asks for at least ${ISO_MIN_TARGETS} targets along the axis; this run has ${targets}.`,
    });
  }
  return out;
}

// Engine results carry plain sentences (or, where already converted, {code, message}); the codes
// of the known sentences let the calculators' own warnings take their place without repeating them.
const ENGINE_CODES: [RegExp, string][] = [
  [/\bruns\b/i, 'few-runs'],
  [/\btargets\b/i, 'few-targets'],
  [/diagonals do not match the sides/i, 'sides-diagonals-mismatch'],
  [/kerf/i, 'check-kerf'],
  [/set steps per mm first/i, 'steps-before-squaring'],
];

export function engineWarnings(list: unknown): ResultWarning[] {
  if (!Array.isArray(list)) return [];
  return list.flatMap((w): ResultWarning[] => {
    if (typeof w === 'string') {
      const code = ENGINE_CODES.find(([re]) => re.test(w))?.[1] ?? 'calculation-note';
      return [{ code, message: sentence(w) }];
    }
    if (
      w &&
      typeof w === 'object' &&
      typeof (w as ResultWarning).code === 'string' &&
      typeof (w as ResultWarning).message === 'string'
    ) {
      return [{ code: (w as ResultWarning).code, message: (w as ResultWarning).message }];
    }
    return [];
  });
}

const sentence = (s: string) => {
  const t = s.trim();
  return (t.charAt(0).toUpperCase() + t.slice(1)).replace(/([^.!?])$/, '$1.');
};

/**
 * The engine's warnings, then the calculator's own on points the engine did not raise: where
 * the engine already warns (it does for more and more results) its wording stands.
 */
export function mergeWarnings(engine: ResultWarning[], own: ResultWarning[]): ResultWarning[] {
  const codes = new Set(engine.map((w) => w.code));
  return [...engine, ...own.filter((w) => !codes.has(w.code))];
}
