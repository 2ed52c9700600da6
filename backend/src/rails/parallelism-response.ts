import type { TargetValue } from '../database/schema/target-sets.js';
import type { ResultWarning } from '../engine/warnings.js';
import type { SweepRow } from './rails.repository.js';

/** A target as the parallelism answer shows it: value and unit only. */
export interface ParallelismTargetShown {
  /** In the `unit` beside it. */
  value: number;
  unit: TargetValue['unit'];
}

/** The two targets a rail pair is judged against. */
export interface ParallelismTargets {
  parallelism: ParallelismTargetShown;
  heightDifference: ParallelismTargetShown & { source: string };
}

/** The height difference of the pair, from top-face sweeps; every length in mm. */
export interface RailHeightDifference {
  measured: boolean;
  /** Why there is no height (when not measured). */
  reason: string | null;
  datum: string | null;
  /** Largest height difference, mm. */
  worst: number | null;
  /** The same with its sign, mm. */
  worstSigned: number | null;
  /** Where along the rail the largest difference is, mm. */
  at: number | null;
  /** Difference at each station, mm. */
  differences: number[] | null;
  /** Rail spacing, mm. */
  spacing: number | null;
  kUmPerMm: number | null;
  /** Permissible height difference, mm (null when the spacing is missing). */
  permissible: number | null;
  targetText: string | null;
  within: boolean | null;
  unit: string;
}

/** A rail without a partner: nothing to compare. */
export interface ParallelismWithoutPartner {
  railId: string;
  partnerRailId: null;
  status: 'not-comparable';
  reason: string;
  targets: ParallelismTargets;
  warnings: ResultWarning[];
}

interface ParallelismOfPair {
  railId: string;
  partnerRailId: string;
  targets: ParallelismTargets;
  /** The sweeps of this rail (a) and its partner (b) the comparison used. */
  sweeps: { a: string | null; b: string | null };
  height: RailHeightDifference;
  warnings: ResultWarning[];
}

/** A pair whose sweeps cannot be compared yet (or whose latest sweep cannot be read: `unreadable`). */
export interface ParallelismNotComparable extends ParallelismOfPair {
  status: 'not-comparable';
  reason: string;
  unreadable?: string;
}

/** A pair judged on its parallelism (and its height difference when measured); lengths in mm. */
export interface ParallelismMeasured extends ParallelismOfPair {
  status: 'within-target' | 'outside-target';
  datum: string;
  face: NonNullable<SweepRow['face']>;
  /** Parallelism of the pair, mm. */
  parallelism: number;
  /** Mean offset between the rails, mm. */
  meanOffset: number;
  /** Stations compared, mm along the rail. */
  positions: number[];
  /** Difference at each station, mm. */
  differences: number[];
  parallelismWithin: boolean | null;
  heightDifferenceWithin: boolean | null;
}

/** A pair judged on its height difference alone: the side-face sweeps cannot be compared (`reason`). */
export interface ParallelismByHeightOnly extends ParallelismOfPair {
  status: 'within-target' | 'outside-target';
  reason: string;
  parallelism: null;
  parallelismWithin: null;
  heightDifferenceWithin: boolean | null;
}

/** GET /api/rails/:id/parallelism: this rail is A, its partner B. */
export type ParallelismResponse =
  ParallelismWithoutPartner | ParallelismNotComparable | ParallelismMeasured | ParallelismByHeightOnly;
