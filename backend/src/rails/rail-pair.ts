import type { TargetValue } from '../database/schema/target-sets.js';
import { heightDifference, permissibleHeightDifferenceMm } from '../engine/rail-height.js';
import type { ResultWarning } from '../engine/warnings.js';
import { targetInBaseUnit } from '../target-sets/target-keys.js';
import { partnerParallelism, type ComparedSweep, type PairOutcome } from './rail-parallelism.js';
import type { RailRow } from './rails.repository.js';
import { showIn, targetLengthUnit } from './sweep-judgement.js';

export const HEIGHT_SOURCE =
  "S = a × K, K from one maker's catalogue (about 130 µm at 500 mm rail spacing for light preload)";

export interface HeightJudgement {
  measured: boolean;
  /** Why there is no height (when not measured). */
  reason?: string;
  datum?: string;
  worstMm?: number;
  worstSignedMm?: number;
  atMm?: number;
  positionsMm?: number[];
  differencesMm?: number[];
  /** Rail spacing a, mm, and K (µm per mm of spacing) when the target scales with spacing. */
  spacingMm?: number | null;
  kUmPerMm?: number | null;
  /** Permissible S in mm; null when the spacing is missing. */
  permissibleMm?: number | null;
  /** "S = a × K = 0.130 mm for a = 500 mm" */
  targetText?: string;
  within?: boolean;
}

export interface PairJudgement {
  parallelism: PairOutcome;
  height: HeightJudgement;
  status: 'not-started' | 'within-target' | 'outside-target';
  parallelismWithin: boolean | null;
  warnings: ResultWarning[];
}

/** Side-face sweeps give the parallelism (top-face ones when there are no side ones); only top-face sweeps give a height. */
export function judgePair(
  a: RailRow,
  b: RailRow,
  sweepsA: ComparedSweep[],
  sweepsB: ComparedSweep[],
  t: { parallelism: TargetValue; height: TargetValue },
): PairJudgement {
  const labels = { a: a.label, b: b.label };
  const face = (f: 'side' | 'top') => (s: ComparedSweep) =>
    (s.face ?? 'side') === f || (s.datum === null && s.positionsMm.length === 0);
  const side = partnerParallelism(sweepsA.filter(face('side')), sweepsB.filter(face('side')), labels);
  const top = partnerParallelism(sweepsA.filter(face('top')), sweepsB.filter(face('top')), labels);
  // The parallelism target is the sideways one; top-face sweeps are read for the height only.
  const parallelism = side;
  const warnings: ResultWarning[] = [];

  const height = judgeHeight(a, b, top, t.height, warnings);
  if (!parallelism.comparable && parallelism.unreadable)
    return { parallelism, height, status: 'outside-target', parallelismWithin: null, warnings };
  if (!parallelism.comparable && !height.measured)
    return { parallelism, height, status: 'not-started', parallelismWithin: null, warnings };
  const parallelismWithin = parallelism.comparable
    ? parallelism.parallelismMm <= targetInBaseUnit(t.parallelism)
    : null;
  const heightOk = height.measured ? height.within !== false : true;
  const status = (parallelismWithin ?? true) && heightOk ? 'within-target' : 'outside-target';
  return { parallelism, height, status, parallelismWithin, warnings };
}

function judgeHeight(
  a: RailRow,
  b: RailRow,
  top: PairOutcome,
  target: TargetValue,
  warnings: ResultWarning[],
): HeightJudgement {
  const spacingMm = a.spacingMm ?? b.spacingMm ?? null;
  if (a.spacingMm !== null && b.spacingMm !== null && Math.abs(a.spacingMm - b.spacingMm) > 0.5) {
    warnings.push({
      code: 'spacing-differs',
      message: `Rails ${a.label} and ${b.label} name different spacings (${showIn(a.spacingMm, a.lengthUnit)} and ${showIn(b.spacingMm, b.lengthUnit)}); ${showIn(spacingMm!, a.lengthUnit)} is used.`,
    });
  }
  if (!top.comparable) {
    const reason =
      top.a && top.b
        ? `top-face sweeps of rails ${a.label} and ${b.label}: ${top.reason}`
        : `no top-face sweeps of both rails against one common datum yet`;
    warnings.push({
      code: 'height-not-measured',
      message: `No height difference: it needs top-face sweeps of both rails read against one common datum (${reason}); side-face sweeps and sweeps zeroed on each rail give no height.`,
    });
    return { measured: false, reason, spacingMm };
  }
  const h = heightDifference(
    top.positionsMm,
    top.differencesMm.map(() => 0),
    top.differencesMm,
  );
  const base = {
    measured: true,
    datum: top.datum,
    worstMm: h.worstMm,
    worstSignedMm: h.worstSignedMm,
    atMm: h.atMm,
    positionsMm: top.positionsMm,
    differencesMm: top.differencesMm,
    spacingMm,
  };
  if (target.unit === 'um/mm') {
    if (spacingMm === null) {
      warnings.push({
        code: 'spacing-missing',
        message: `The height target scales with rail spacing (S = a × ${target.value} µm/mm); enter the spacing of rails ${a.label} and ${b.label} to judge the ${showIn(h.worstMm, 'mm')} height difference.`,
      });
      return {
        ...base,
        kUmPerMm: target.value,
        permissibleMm: null,
        within: false,
        targetText: `S = a × ${target.value} µm/mm (rail spacing a not entered)`,
      };
    }
    const permissibleMm = permissibleHeightDifferenceMm(spacingMm, target.value);
    const unit = a.lengthUnit;
    return {
      ...base,
      kUmPerMm: target.value,
      permissibleMm,
      within: h.worstMm <= permissibleMm,
      targetText: `S = a × K = ${showIn(permissibleMm, 'mm')} for a = ${showIn(spacingMm, unit)}${unit === 'mm' ? '' : ` (${showIn(spacingMm, 'mm')})`}, K = ${target.value} µm/mm`,
    };
  }
  // A set still holding a plain length: judged against it as stored.
  const permissibleMm = targetInBaseUnit(target);
  return {
    ...base,
    kUmPerMm: null,
    permissibleMm,
    within: h.worstMm <= permissibleMm,
    targetText: `${showIn(permissibleMm, targetLengthUnit(target))} (a fixed length, not scaled by spacing)`,
  };
}
