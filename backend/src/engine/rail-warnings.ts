import type { ResultWarning } from './warnings.js';

/**
 * What a person should know about a rail sweep's straightness beside its number. Lengths in mm;
 * `show` writes a length in the unit the person reads (e.g. "0.5 thou").
 */
export interface SweepWarningInput {
  stationCount: number;
  /** Smallest step of the indicator, mm; null when not given. */
  resolutionMm: number | null;
  toleranceMm: number;
  reference: 'minimum-zone' | 'least-squares';
  /** Distance from the first to the last station, and the rail's length, mm. */
  spanMm: number;
  railLengthMm: number | null;
  show: (mm: number) => string;
}

/** Common practice: an instrument should resolve a quarter of the tolerance or finer (the 4:1 rule). */
export const RESOLUTION_RATIO = 4;
/** Common practice: five stations is the fewest that shows a rail's shape beside its tilt. */
export const MIN_STATIONS: Record<SweepWarningInput['reference'], number> = { 'minimum-zone': 5, 'least-squares': 5 };
/** Common practice: a sweep should cover most of the rail, or the worst stretch may be missed. */
export const MIN_COVERAGE = 0.8;

export function sweepWarnings(input: SweepWarningInput): ResultWarning[] {
  const out: ResultWarning[] = [];
  const { show } = input;
  if (input.resolutionMm !== null && input.resolutionMm > input.toleranceMm / RESOLUTION_RATIO) {
    out.push({
      code: 'coarse-instrument',
      message: `The indicator resolves ${show(input.resolutionMm)}, coarser than a quarter of the ${show(input.toleranceMm)} tolerance (${show(input.toleranceMm / RESOLUTION_RATIO)}); use a finer indicator.`,
    });
  }
  const least = MIN_STATIONS[input.reference];
  if (input.stationCount < least) {
    out.push({
      code: 'few-stations',
      message: `Only ${input.stationCount} stations: ${input.reference === 'minimum-zone' ? 'a minimum zone' : 'a least-squares line'} needs at least ${least} to show the rail's shape rather than its tilt.`,
    });
  }
  if (input.railLengthMm && input.spanMm < MIN_COVERAGE * input.railLengthMm) {
    out.push({
      code: 'short-sweep',
      message: `The stations cover ${show(input.spanMm)} of the ${show(input.railLengthMm)} rail (${Math.round((100 * input.spanMm) / input.railLengthMm)} %); sweep at least ${MIN_COVERAGE * 100} % of its length.`,
    });
  }
  return out;
}
