import { toPositioningResponse as positioningResult } from '../calculators/calculators.mapper.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import type { PositioningResult } from '../engine/positioning.js';
import type { TravelTrialResult } from '../engine/travel-trial.js';
import type {
  PositioningRunListRow,
  PositioningRunRow,
  TravelTrialListRow,
  TravelTrialRow,
} from './axis-checks.repository.js';
import { positioningVerdicts, travelTrialStatus } from './drive-status.js';
import type { DriveTargets } from './drive-targets.js';
import { readableResult, UNREADABLE_RESULT } from '../common/stored-result.js';
import { storedWarnings } from './result-warnings.js';
import type { ScaleMaterial, ThermalReference } from '../engine/thermal.js';

/** What a record says about temperature: as recorded, and how the result was referred to 20 °C. */
function temperatureOf(
  row: {
    machineTemperatureC: number | null;
    scaleTemperatureC: number | null;
    scaleMaterial: ScaleMaterial | null;
    instrumentResolution: number | null;
  },
  result: unknown,
) {
  const thermal =
    result && typeof result === 'object' ? ((result as { thermal?: ThermalReference }).thermal ?? null) : null;
  return {
    /** Temperature of the machine while measuring, °C. */
    machineTemperature: row.machineTemperatureC,
    /** Temperature of the scale while measuring, °C. */
    scaleTemperature: row.scaleTemperatureC,
    scaleMaterial: row.scaleMaterial,
    /** Smallest step the instrument reads, in readingUnit. */
    instrumentResolution: row.instrumentResolution,
    thermal,
  };
}

/** The numbers the readers of a stored travel trial and positioning run use. */
export const TRAVEL_TRIAL_SHAPE = [
  'correctedStepsPerMm',
  'errorPercent',
  'scale',
  'offsetMm',
  'residualMaxMm',
  'moves[]',
  'moves[].commandedMm',
  'moves[].measuredMm',
  'moves[].errorMm',
  'moves[].residualMm',
];
export const POSITIONING_SHAPE = [
  'accuracyMm',
  'repeatabilityMm',
  'reversalMm',
  'targets[]',
  'targets[].targetMm',
  'targets[].meanUpMm',
  'targets[].meanDownMm',
];
export const storedTravelTrial = (stored: unknown) => readableResult<TravelTrialResult>(stored, TRAVEL_TRIAL_SHAPE);
export const storedPositioning = (stored: unknown) => readableResult<PositioningResult>(stored, POSITIONING_SHAPE);

/** Engine result (mm) with the calculators' field names. */
export const travelTrialResult = (r: TravelTrialResult) => ({
  correctedStepsPerMm: r.correctedStepsPerMm,
  errorPercent: r.errorPercent,
  /** Measured ÷ commanded, fitted over the moves (no unit). */
  scale: r.scale,
  /** The fit's offset, in mm. */
  offset: r.offsetMm,
  /** Each move's residual about the fit, in mm. */
  residuals: r.moves.map((m) => m.residualMm),
  /** Largest residual, in mm. */
  residualMax: r.residualMaxMm,
  /** Each move commanded and measured, its error and its residual, all in mm. */
  moves: r.moves.map((m) => ({
    /** Commanded move, mm. */
    commanded: m.commandedMm,
    /** Measured move, mm. */
    measured: m.measuredMm,
    /** Measured minus commanded, mm. */
    error: m.errorMm,
    /** Distance from the fitted line, mm. */
    residual: m.residualMm,
  })),
  theoryDifferencePercent: r.theoryDifferencePercent ?? null,
  farFromTheory: r.farFromTheory ?? false,
  thermalCorrectionPercent: r.thermalCorrectionPercent ?? 0,
});

export function toTravelTrialResponse(row: TravelTrialRow, targets: DriveTargets, locked: boolean) {
  const r = storedTravelTrial(row.result);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    readingUnit: row.readingUnit,
    ...temperatureOf(row, row.result),
    /** Steps per mm set in the controller while the moves were made. */
    stepsPerMmUsed: row.stepsPerMmUsed,
    throughOrigin: row.throughOrigin,
    moves: row.moves,
    result: r ? travelTrialResult(r) : null,
    warnings: storedWarnings(row.result),
    status: r ? travelTrialStatus(r.errorPercent, targets) : ('outside-target' as const),
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
    target: targets.stepsPerMmError.target as TargetValue,
    notes: row.notes,
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    appliedAt: row.appliedAt?.toISOString() ?? null,
    appliedBy: row.appliedByName,
    locked,
  };
}

// Records answer with exactly the calculators' fields, so both read the same.
export { positioningResult };

export function toPositioningRunResponse(row: PositioningRunRow, targets: DriveTargets, locked: boolean) {
  const r = storedPositioning(row.result);
  const { checks, status } = verdictsOf(r, targets);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    readingUnit: row.readingUnit,
    ...temperatureOf(row, row.result),
    /** Target positions, in the record's `lengthUnit`, as typed. */
    targets: row.targets,
    runs: row.runs,
    result: r
      ? {
          ...positioningResult(r),
          warnings: storedWarnings(row.result),
          /** Largest thermal correction made to a deviation, mm (0 when none). */
          thermalCorrectionMax: r.thermalCorrectionMaxMm ?? 0,
        }
      : null,
    warnings: storedWarnings(row.result),
    checks,
    status,
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
    notes: row.notes,
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    locked,
  };
}

/** The headline figures a list item reads of a stored result (the list query selects only these). */
export const TRAVEL_TRIAL_LIST_SHAPE = ['correctedStepsPerMm', 'errorPercent', 'scale', 'offsetMm', 'residualMaxMm'];
export const POSITIONING_LIST_SHAPE = ['accuracyMm', 'repeatabilityMm', 'reversalMm'];

/** A trial in its axis's list: headline figures and status, no moves (the single trial has them). */
export function toTravelTrialListItem(row: TravelTrialListRow, targets: DriveTargets, locked: boolean) {
  const r = readableResult<
    Pick<TravelTrialResult, 'correctedStepsPerMm' | 'errorPercent' | 'scale' | 'offsetMm' | 'residualMaxMm'>
  >(row.result, TRAVEL_TRIAL_LIST_SHAPE);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    readingUnit: row.readingUnit,
    /** Steps per mm set in the controller while the moves were made. */
    stepsPerMmUsed: row.stepsPerMmUsed,
    throughOrigin: row.throughOrigin,
    /** Count of moves recorded. */
    moveCount: row.moveCount,
    warnings: storedWarnings(row.result),
    result: r
      ? {
          correctedStepsPerMm: r.correctedStepsPerMm,
          errorPercent: r.errorPercent,
          /** Measured ÷ commanded, fitted over the moves (no unit). */
          scale: r.scale,
          /** The fit's offset, mm. */
          offset: r.offsetMm,
          /** Largest residual, mm. */
          residualMax: r.residualMaxMm,
        }
      : null,
    status: r ? travelTrialStatus(r.errorPercent, targets) : ('outside-target' as const),
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
    target: targets.stepsPerMmError.target as TargetValue,
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    appliedAt: row.appliedAt?.toISOString() ?? null,
    appliedBy: row.appliedByName,
    locked,
  };
}

/** A run in its axis's list: the three figures against their targets, no deviations (the single run has them). */
export function toPositioningRunListItem(row: PositioningRunListRow, targets: DriveTargets, locked: boolean) {
  const r = readableResult<Pick<PositioningResult, 'accuracyMm' | 'repeatabilityMm' | 'reversalMm'>>(
    row.result,
    POSITIONING_LIST_SHAPE,
  );
  const { checks, status } = verdictsOf(r, targets);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    lengthUnit: row.lengthUnit,
    readingUnit: row.readingUnit,
    /** Count of target positions. */
    targetCount: row.targetCount,
    warnings: storedWarnings(row.result),
    /** Count of runs, both directions together. */
    runCount: row.runCount,
    result: r
      ? {
          /** Bidirectional accuracy, mm. */
          accuracy: r.accuracyMm,
          /** Bidirectional repeatability, mm. */
          repeatability: r.repeatabilityMm,
          /** Reversal value (the largest over the targets), mm. */
          reversal: r.reversalMm,
        }
      : null,
    checks,
    status,
    ...(r ? {} : { unreadable: UNREADABLE_RESULT }),
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    locked,
  };
}

/** A run's three figures against their targets; a run that cannot be read is outside target. */
function verdictsOf(
  r: Pick<PositioningResult, 'accuracyMm' | 'repeatabilityMm' | 'reversalMm'> | null,
  targets: DriveTargets,
) {
  return r
    ? positioningVerdicts({ accuracy: r.accuracyMm, repeatability: r.repeatabilityMm, reversal: r.reversalMm }, targets)
    : { checks: null, status: 'outside-target' as const };
}
