import type { TargetValue } from '../database/schema/target-sets.js';
import { evaluateScrewSpeed, SCREW_SPEED_SOURCE } from '../engine/screw-speed.js';
import type { AxisRow } from './axes.repository.js';
import { missingForSpeedCheck, toEngineScrew } from './drive-record.js';
import { speedVerdict } from './drive-status.js';
import type { DriveTargets } from './drive-targets.js';
import { tidy } from './drive-record.js';
import type { LengthUnit } from '../engine/units.js';

export interface SpeedCheckResponse {
  axisId: string;
  applicable: boolean;
  status: 'within-target' | 'outside-target' | 'not-started' | 'not-applicable';
  /** Why the check cannot run (or does not apply), in words. */
  reason: string | null;
  missing: string[];
  /** The axis's unit: feed rates below are in it per minute. */
  lengthUnit: LengthUnit;
  /** The fastest feed the axis will be asked for, lengthUnit per minute. */
  feedRate: number | null;
  feedRateMmPerMin: number | null;
  /** Screw speed at that feed, rpm. */
  rpm: number | null;
  /** Speed at which the screw whirls, rpm. */
  criticalSpeed: number | null;
  /** The critical speed less its safety factor, rpm. */
  permissibleSpeed: number | null;
  /** Speed the nut's d·n rating allows at this diameter, rpm. */
  dnLimitSpeed: number | null;
  /** Nominal diameter (mm) × rpm the nut is rated for. */
  dnLimit: number | null;
  /** End-fixing factor of the critical-speed formula for the screw's mounting (no unit). */
  mountingFactor: number | null;
  limitedBy: 'critical-speed' | 'dn-limit' | null;
  /** The lower of the permissible speed and the d·n limit speed, rpm: headroom is measured from it. */
  limitSpeed: number | null;
  /** How far the speed stays below that limit, % (negative above it). */
  headroomPercent: number | null;
  /** Highest feed at the lower limit (no headroom), lengthUnit per minute. */
  maxFeedRate: number | null;
  /** The lower limit less the target set's headroom, rpm. */
  allowedSpeed: number | null;
  /** Highest feed within the headroom, lengthUnit per minute. */
  safeFeedRate: number | null;
  safeFeedRateMmPerMin: number | null;
  /** The target set's speed headroom, as stored with its unit (%). */
  headroom: TargetValue;
  withinLimits: boolean | null;
  source: string;
}

/** The speed check of one axis from its drive record and fastest feed (screw drives only). */
export function speedCheckOf(axis: AxisRow, targets: DriveTargets): SpeedCheckResponse {
  const unit = axis.lengthUnit as LengthUnit;
  const base = {
    axisId: axis.id,
    lengthUnit: unit,
    feedRate: axis.maxFeedRateMmPerMin === null ? null : tidy(axis.maxFeedRateMmPerMin, unit),
    feedRateMmPerMin: axis.maxFeedRateMmPerMin,
    rpm: null,
    criticalSpeed: null,
    permissibleSpeed: null,
    dnLimitSpeed: null,
    dnLimit: null,
    mountingFactor: null,
    limitedBy: null,
    limitSpeed: null,
    headroomPercent: null,
    maxFeedRate: null,
    allowedSpeed: null,
    safeFeedRate: null,
    safeFeedRateMmPerMin: null,
    headroom: targets.screwSpeedHeadroom.target,
    withinLimits: null,
    source: SCREW_SPEED_SOURCE,
    missing: [] as string[],
  };
  if (axis.drive.type !== 'screw') {
    const what = axis.drive.type === 'belt' ? 'A belt drive' : 'A rack-and-pinion drive';
    return {
      ...base,
      applicable: false,
      status: 'not-applicable',
      reason: `${what} has no screw to whirl: the speed check does not apply. Follow the belt, rack and motor makers' speed limits.`,
    };
  }
  const missing = missingForSpeedCheck(axis.drive, axis.maxFeedRateMmPerMin);
  if (missing.length) {
    return {
      ...base,
      applicable: true,
      status: 'not-started',
      missing,
      reason: `The speed check needs ${missing.join(', ')}.`,
    };
  }
  const r = evaluateScrewSpeed(toEngineScrew(axis.drive, axis.maxFeedRateMmPerMin!));
  const v = speedVerdict(r, axis.drive.lead!, targets);
  return {
    ...base,
    applicable: true,
    status: v.status,
    reason: null,
    rpm: r.rpm,
    criticalSpeed: r.criticalSpeedRpm,
    permissibleSpeed: r.permissibleSpeedRpm,
    dnLimitSpeed: r.dnLimitSpeedRpm,
    dnLimit: r.dnLimit,
    mountingFactor: r.mountingFactor,
    limitedBy: r.limitedBy,
    limitSpeed: r.limitSpeedRpm,
    headroomPercent: r.headroomPercent,
    maxFeedRate: tidy(r.maxFeedRateMmPerMin, unit),
    allowedSpeed: v.allowedSpeedRpm,
    safeFeedRate: tidy(v.safeFeedRateMmPerMin, unit),
    safeFeedRateMmPerMin: v.safeFeedRateMmPerMin,
    withinLimits: r.withinLimits,
    source: r.source,
  };
}
