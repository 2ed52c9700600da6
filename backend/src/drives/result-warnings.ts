import type { ResultWarning } from '../engine/warnings.js';

/**
 * The warnings kept in a stored result. Runs recorded before warnings had codes kept plain
 * sentences; those read as notes. Anything else (a damaged row) reads as none.
 */
export function storedWarnings(result: unknown): ResultWarning[] {
  const list = result && typeof result === 'object' ? (result as { warnings?: unknown }).warnings : undefined;
  if (!Array.isArray(list)) return [];
  const out: ResultWarning[] = [];
  for (const w of list) {
    if (typeof w === 'string') out.push({ code: 'note', message: w });
    else if (
      w &&
      typeof w === 'object' &&
      typeof (w as ResultWarning).code === 'string' &&
      typeof (w as ResultWarning).message === 'string'
    ) {
      out.push({ code: (w as ResultWarning).code, message: (w as ResultWarning).message });
    }
  }
  return out;
}

/**
 * Travel trial warnings that need the target: an instrument whose step is more than a quarter of
 * the tolerance over the longest move, and a thermal correction bigger than a tenth of it.
 */
export function trialTargetWarnings(p: {
  longestMoveMm: number;
  resolutionMm: number | null;
  thermalPercent: number;
  tolerancePercent: number;
}): ResultWarning[] {
  const out: ResultWarning[] = [];
  if (p.resolutionMm !== null && p.longestMoveMm > 0) {
    const resolutionPercent = (p.resolutionMm / p.longestMoveMm) * 100;
    if (resolutionPercent > p.tolerancePercent / 4) {
      out.push({
        code: 'coarse-instrument',
        message: `The instrument reads in steps of ${p.resolutionMm} mm, ${resolutionPercent.toPrecision(2)} % of the longest move (${p.longestMoveMm} mm): coarser than a quarter of the ±${p.tolerancePercent} % target. Measure a longer move or use a finer instrument.`,
      });
    }
  }
  if (Math.abs(p.thermalPercent) > p.tolerancePercent / 10) {
    out.push({
      code: 'thermal-correction',
      message: `Referred to 20 °C: the temperatures of the machine and the scale change the measured moves by ${p.thermalPercent.toPrecision(2)} %, more than a tenth of the ±${p.tolerancePercent} % target; the correction shown is the referred one.`,
    });
  }
  return out;
}
