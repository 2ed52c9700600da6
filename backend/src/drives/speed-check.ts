import type { TargetValue } from '../database/schema/target-sets.js';
import { evaluateScrewSpeed, SCREW_SPEED_SOURCE } from '../engine/screw-speed.js';
import type { AxisRow } from './axes.repository.js';
import { missingForSpeedCheck, toEngineScrew } from './drive-record.js';
import { speedVerdict } from './drive-status.js';
import type { DriveTargets } from './drive-targets.js';

export interface SpeedCheckResponse {
  axisId: string;
  applicable: boolean;
  status: 'within-target' | 'outside-target' | 'not-started' | 'not-applicable';
  /** Why the check cannot run (or does not apply), in words. */
  reason: string | null;
  missing: string[];
  /** The fastest feed the axis will be asked for, mm/min. */
  feedRate: number | null;
  rpm: number | null;
  criticalSpeed: number | null;
  permissibleSpeed: number | null;
  dnLimitSpeed: number | null;
  dnLimit: number | null;
  mountingFactor: number | null;
  limitedBy: 'critical-speed' | 'dn-limit' | null;
  /** Highest feed at the permissible speed or the d·n limit (no headroom), mm/min. */
  maxFeedRate: number | null;
  /** Permissible speed less the target set's headroom, rpm. */
  allowedSpeed: number | null;
  /** Highest feed within the headroom and the d·n limit, mm/min. */
  safeFeedRate: number | null;
  headroom: TargetValue;
  withinLimits: boolean | null;
  source: string;
}

/** The speed check of one axis from its drive record and fastest feed (screw drives only). */
export function speedCheckOf(axis: AxisRow, targets: DriveTargets): SpeedCheckResponse {
  const base = {
    axisId: axis.id,
    feedRate: axis.maxFeedRateMmPerMin,
    rpm: null,
    criticalSpeed: null,
    permissibleSpeed: null,
    dnLimitSpeed: null,
    dnLimit: null,
    mountingFactor: null,
    limitedBy: null,
    maxFeedRate: null,
    allowedSpeed: null,
    safeFeedRate: null,
    headroom: targets.screwSpeedHeadroom.target,
    withinLimits: null,
    source: SCREW_SPEED_SOURCE,
    missing: [] as string[],
  };
  if (axis.drive.type !== 'screw') {
    const what = axis.drive.type === 'belt' ? 'A belt drive' : 'A rack-and-pinion drive';
    return { ...base, applicable: false, status: 'not-applicable', reason: `${what} has no screw to whirl: the speed check does not apply. Follow the belt, rack and motor makers' speed limits.` };
  }
  const missing = missingForSpeedCheck(axis.drive, axis.maxFeedRateMmPerMin);
  if (missing.length) {
    return { ...base, applicable: true, status: 'not-started', missing, reason: `The speed check needs ${missing.join(', ')}.` };
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
    maxFeedRate: r.maxFeedRateMmPerMin,
    allowedSpeed: v.allowedSpeedRpm,
    safeFeedRate: v.safeFeedRateMmPerMin,
    withinLimits: r.withinLimits,
    source: r.source,
  };
}
