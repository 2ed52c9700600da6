import { toPositioningResponse as positioningResult } from '../calculators/calculators.mapper.js';
import type { TargetValue } from '../database/schema/target-sets.js';
import type { PositioningResult } from '../engine/positioning.js';
import type { TravelTrialResult } from '../engine/travel-trial.js';
import type { PositioningRunRow, TravelTrialRow } from './axis-checks.repository.js';
import { positioningVerdicts, travelTrialStatus } from './drive-status.js';
import type { DriveTargets } from './drive-targets.js';

/** Engine result (mm) with the calculators' field names. */
export const travelTrialResult = (r: TravelTrialResult) => ({
  correctedStepsPerMm: r.correctedStepsPerMm,
  errorPercent: r.errorPercent,
  scale: r.scale,
  offset: r.offsetMm,
  residuals: r.moves.map((m) => m.residualMm),
  residualMax: r.residualMaxMm,
  moves: r.moves.map((m) => ({ commanded: m.commandedMm, measured: m.measuredMm, error: m.errorMm, residual: m.residualMm })),
});

export function toTravelTrialResponse(row: TravelTrialRow, targets: DriveTargets, locked: boolean) {
  const r = row.result as unknown as TravelTrialResult;
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    unit: row.unit,
    stepsPerMmUsed: row.stepsPerMmUsed,
    throughOrigin: row.throughOrigin,
    moves: row.moves,
    result: travelTrialResult(r),
    status: travelTrialStatus(r.errorPercent, targets),
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
  const r = row.result as unknown as PositioningResult;
  const { checks, status } = positioningVerdicts({ accuracy: r.accuracyMm, repeatability: r.repeatabilityMm, reversal: r.reversalMm }, targets);
  return {
    id: row.id,
    axisId: row.axisId,
    machineId: row.machineId,
    unit: row.unit,
    targets: row.targets,
    runs: row.runs,
    result: positioningResult(r),
    checks,
    status,
    notes: row.notes,
    recordedBy: row.recordedByName,
    recordedAt: row.createdAt.toISOString(),
    locked,
  };
}
