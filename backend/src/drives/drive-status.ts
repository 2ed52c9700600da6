import type { ScrewSpeedResult } from '../engine/screw-speed.js';
import type { DriveTargets } from './drive-targets.js';

export type DriveCheckStatus = 'within-target' | 'outside-target';

/** Travel trial: the scale error of the axis, in %, against the steps-per-mm error target. */
export function travelTrialStatus(errorPercent: number, targets: DriveTargets): DriveCheckStatus {
  return Math.abs(errorPercent) <= targets.stepsPerMmError.base ? 'within-target' : 'outside-target';
}

export interface PositioningFigures {
  accuracy: number;
  repeatability: number;
  reversal: number;
}

/** Each of the three figures (mm) against its target; the run passes only when all three do. */
export function positioningVerdicts(r: PositioningFigures, targets: DriveTargets) {
  const one = (value: number, key: 'positioningAccuracy' | 'repeatability' | 'reversal') => ({
    /** The figure, mm. */
    value,
    target: targets[key].target,
    targetMm: targets[key].base,
    pass: value <= targets[key].base,
  });
  const checks = {
    accuracy: one(r.accuracy, 'positioningAccuracy'),
    repeatability: one(r.repeatability, 'repeatability'),
    reversal: one(r.reversal, 'reversal'),
  };
  const status: DriveCheckStatus =
    checks.accuracy.pass && checks.repeatability.pass && checks.reversal.pass ? 'within-target' : 'outside-target';
  return { checks, status };
}

/**
 * Speed check: the screw speed at the fastest feed must stay the headroom below the lower of the
 * permissible (whirling) speed and the d·n limit speed, so the headroom shown and the verdict
 * always read the same limit. Returns the speed allowed and the feed it gives.
 */
export function speedVerdict(r: ScrewSpeedResult, leadMm: number, targets: DriveTargets) {
  const headroomPercent = targets.screwSpeedHeadroom.base;
  const allowedSpeedRpm = r.limitSpeedRpm * (1 - headroomPercent / 100);
  const status: DriveCheckStatus = r.rpm <= allowedSpeedRpm ? 'within-target' : 'outside-target';
  return { headroomPercent, allowedSpeedRpm, safeFeedRateMmPerMin: leadMm * allowedSpeedRpm, status };
}
