import type { StoredSweepResult } from '../database/schema/rails.js';
import type { SweepRow } from './rails.repository.js';
import type { StraightnessReference, TargetValue } from '../database/schema/target-sets.js';
import { localSlope } from '../engine/rail-slope.js';
import { sweepWarnings } from '../engine/rail-warnings.js';
import { fromMm, isLengthUnit, type LengthUnit } from '../engine/units.js';
import type { ResultWarning } from '../engine/warnings.js';
import { targetInBaseUnit } from '../target-sets/target-keys.js';

/** The reference line the straightness target names; minimum zone (ISO 1101) when it names none. */
export const referenceOf = (t: Pick<TargetValue, 'reference'> | null | undefined): StraightnessReference =>
  t?.reference ?? 'minimum-zone';

export const REFERENCE_WORDS: Record<StraightnessReference, string> = {
  'minimum-zone': 'minimum zone (ISO 1101)',
  'least-squares': 'least squares line',
};

/** The straightness judged against the target: the figure of the line the target names. */
export function judgedStraightnessMm(
  r: Pick<StoredSweepResult, 'leastSquares' | 'minimumZone'>,
  reference: StraightnessReference,
): number {
  return reference === 'least-squares' ? r.leastSquares.straightness : r.minimumZone.straightness;
}

export function judgedFigure(
  s: { leastSquaresStraightness: number; minimumZoneStraightness: number },
  reference: StraightnessReference,
): number {
  return reference === 'least-squares' ? s.leastSquaresStraightness : s.minimumZoneStraightness;
}

/** A length in a unit people read, µm spelled out: "0.0012 in", "3.5 µm". */
export function showIn(mm: number, unit: LengthUnit): string {
  const v = fromMm(mm, unit);
  const digits = unit === 'mm' ? 4 : unit === 'in' ? 5 : unit === 'um' ? 1 : 2;
  return `${Number(v.toFixed(digits))} ${unit === 'um' ? 'µm' : unit}`;
}

export const targetLengthUnit = (t: TargetValue): LengthUnit => (isLengthUnit(t.unit) ? t.unit : 'mm');

/** Local slope of the judged residuals, mm/m (the set-up tilt removed). */
export function slopeOf(positionsMm: number[], result: StoredSweepResult, reference: StraightnessReference) {
  const residuals = reference === 'least-squares' ? result.leastSquares.residuals : result.minimumZone.residuals;
  return localSlope(positionsMm, residuals);
}

/** Warnings of a sweep against a straightness target, in the sweep's reading unit. */
export function warningsForSweep(
  sweep: { stationCount: number; resolutionMm: number | null; readingUnit: LengthUnit; spanMm: number },
  railLengthMm: number | null,
  target: TargetValue,
  lengthUnit: LengthUnit,
): ResultWarning[] {
  return sweepWarnings({
    stationCount: sweep.stationCount,
    resolutionMm: sweep.resolutionMm,
    toleranceMm: targetInBaseUnit(target),
    reference: referenceOf(target),
    spanMm: sweep.spanMm,
    railLengthMm,
    show: (mm) => (mm >= 1 ? showIn(mm, lengthUnit) : showIn(mm, sweep.readingUnit)),
  });
}

/** Resolution of a stored sweep in mm (it is kept in the reading unit). */
export const resolutionMmOf = (row: Pick<SweepRow, 'resolution' | 'readingUnit'>) =>
  row.resolution === null
    ? null
    : fromMm(1, 'mm') *
      row.resolution *
      (row.readingUnit === 'mm' ? 1 : row.readingUnit === 'um' ? 0.001 : row.readingUnit === 'in' ? 25.4 : 0.0254);
