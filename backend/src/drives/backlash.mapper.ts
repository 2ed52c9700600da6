import type { TargetValue } from '../database/schema/target-sets.js';
import { backlashWarnings, type BacklashResult } from '../engine/backlash.js';
import { fromMm, isLengthUnit, toMm, type LengthUnit } from '../engine/units.js';
import type { ResultWarning } from '../engine/warnings.js';
import { readableResult, UNREADABLE_RESULT } from '../common/stored-result.js';
import type { BacklashCheckRow } from './backlash.service.js';
import type { Target } from './drive-targets.js';

/** The definition, said the same way on every screen and in every response. */
export const BACKLASH_DEFINITION =
  'Backlash at a position = |mean of the readings approached moving + − mean of the readings approached moving −| (ISO 230-2 reversal value for one target); the check reports the largest over the positions.';

export const BACKLASH_SHAPE = [
  'backlashMm',
  'worstPositionMm',
  'meanBacklashMm',
  'positions[]',
  'positions[].positionMm',
  'positions[].meanUpMm',
  'positions[].meanDownMm',
  'positions[].reversalMm',
  'positions[].backlashMm',
  'positions[].rangeUpMm',
  'positions[].rangeDownMm',
  'positions[].approachesUp',
  'positions[].approachesDown',
];
export const storedBacklash = (stored: unknown) => readableResult<BacklashResult>(stored, BACKLASH_SHAPE);

const unitOf = (value: string): LengthUnit => (isLengthUnit(value) ? value : 'mm');

export type BacklashStatus = 'within-target' | 'outside-target';
export const backlashStatus = (backlashMm: number, target: Target): BacklashStatus =>
  backlashMm <= target.base ? 'within-target' : 'outside-target';

/** Warnings of a stored result against the target in force now. */
export function warningsOf(
  r: BacklashResult,
  resolution: number | null,
  readingUnit: string,
  target: Target,
): ResultWarning[] {
  const resolutionMm = resolution === null ? null : toMm(resolution, unitOf(readingUnit));
  return backlashWarnings(r.positions, resolutionMm, target.base);
}

export function toBacklashResponse(row: BacklashCheckRow, target: Target, locked: boolean) {
  const r = storedBacklash(row.result);
  const lu = unitOf(row.lengthUnit);
  const ru = unitOf(row.readingUnit);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    lengthUnit: lu,
    readingUnit: ru,
    positions: row.positions,
    /** Smallest step the indicator shows, in the record's `readingUnit`. */
    resolution: row.resolution,
    definition: BACKLASH_DEFINITION,
    result: r
      ? {
          /** The largest, in readingUnit and in mm. */
          backlash: fromMm(r.backlashMm, ru),
          backlashMm: r.backlashMm,
          /** Where the largest was read, in the record's `lengthUnit`. */
          worstPosition: fromMm(r.worstPositionMm, lu),
          worstPositionMm: r.worstPositionMm,
          /** Mean over the positions, in the record's `readingUnit`. */
          meanBacklash: fromMm(r.meanBacklashMm, ru),
          meanBacklashMm: r.meanBacklashMm,
          positions: r.positions.map((p) => ({
            /** Where the axis was brought, in the record's `lengthUnit`. */
            position: fromMm(p.positionMm, lu),
            positionMm: p.positionMm,
            /** Mean of the readings approached moving +, in the record's `readingUnit`. */
            meanUp: fromMm(p.meanUpMm, ru),
            /** Mean of the readings approached moving −, in the record's `readingUnit`. */
            meanDown: fromMm(p.meanDownMm, ru),
            /** Signed mean up − mean down, in the record's `readingUnit`. */
            reversal: fromMm(p.reversalMm, ru),
            /** Size of the reversal, in the record's `readingUnit`. */
            backlash: fromMm(p.backlashMm, ru),
            backlashMm: p.backlashMm,
            /** Count of readings approached moving +. */
            approachesUp: p.approachesUp,
            /** Count of readings approached moving −. */
            approachesDown: p.approachesDown,
          })),
        }
      : null,
    status: r ? backlashStatus(r.backlashMm, target) : ('outside-target' as const),
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
    warnings: r ? warningsOf(r, row.resolution, ru, target) : [],
    target: { ...(target.target as TargetValue), valueMm: target.base },
    notes: row.notes,
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    locked,
  };
}
