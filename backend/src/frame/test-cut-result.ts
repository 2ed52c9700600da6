import {
  evaluateTestCut,
  DEFAULT_OVALITY_TOLERANCE_MM,
  type OvalityCause,
  type TestCutResult as EngineTestCut,
} from '../engine/test-cut.js';
import type { TestCutSizesMm } from '../database/schema/frame.js';
import { iso9013Class2, ISO9013_REFERENCE, ISO9013_THICKNESS_BANDS_MM } from '../engine/iso9013.js';

/**
 * How each part size's ± tolerance is found:
 * - plasma ('iso9013-class-2'): the ISO 9013 class 2 limit deviation of the band the part's nominal
 *   size falls in, for the plate thickness, scaled by target ÷ 0.9 mm (the target is the tolerance of
 *   the 35–125 mm band in 3.15–6.3 mm plate, which the default sets to the standard's 0.9 mm; an
 *   owner who tightens it tightens every band in proportion). Without a plate thickness the
 *   target's own thickness band (3.15–6.3 mm) is taken, and a warning says so.
 * - routers and other machines ('target'): the target as it stands for every size (common
 *   practice: routers are judged in tenths of a millimetre).
 */
export type PartTolerancePolicy =
  | { basis: 'iso9013-class-2'; targetMm: number; plateThicknessMm: number | null }
  | { basis: 'target'; targetMm: number };

/** The thickness assumed when none was recorded: the top of the band the target is stated for. */
export const ASSUMED_THICKNESS_MM = ISO9013_THICKNESS_BANDS_MM[ISO9013_REFERENCE.thicknessBand][1];

export interface PartTolerance {
  toleranceMm: number;
  /** In words: where the tolerance comes from. */
  basis: string;
  sizeBandMm: [number, number] | null;
  thicknessBandMm: [number, number] | null;
  /** Why the ISO 9013 band used is not the part's own, or null. */
  outsideBand: string | null;
}

export function partToleranceFor(nominalMm: number, policy: PartTolerancePolicy): PartTolerance {
  if (policy.basis === 'target') {
    return {
      toleranceMm: policy.targetMm,
      basis: `target ±${policy.targetMm} mm for every size`,
      sizeBandMm: null,
      thicknessBandMm: null,
      outsideBand: null,
    };
  }
  const band = iso9013Class2(nominalMm, policy.plateThicknessMm ?? ASSUMED_THICKNESS_MM);
  const toleranceMm = (band.toleranceMm * policy.targetMm) / ISO9013_REFERENCE.toleranceMm;
  const scaled =
    policy.targetMm === ISO9013_REFERENCE.toleranceMm
      ? ''
      : ` × ${policy.targetMm}/${ISO9013_REFERENCE.toleranceMm} (the target)`;
  return {
    toleranceMm,
    basis: `ISO 9013 class 2, ${band.sizeBandMm[0]}–${band.sizeBandMm[1]} mm parts in ${band.thicknessBandMm[0]}–${band.thicknessBandMm[1]} mm plate: ±${band.toleranceMm} mm${scaled}`,
    sizeBandMm: band.sizeBandMm,
    thicknessBandMm: band.thicknessBandMm,
    outsideBand: band.outside,
  };
}

export interface AxisReading {
  commandedMm: number;
  measuredMm: number;
  /** The measured size with the uncompensated kerf added back (outside contour). */
  afterKerfMm: number;
  errorMm: number;
  errorPercent: number;
  /** Multiply the axis's steps per mm by this: commanded ÷ measured (a ratio). */
  correctionFactor: number;
  suggestedStepsPerMm: number | null;
}

export interface PartSizeCheck {
  part: 'outside-x' | 'outside-y' | 'circle-x' | 'circle-y';
  label: string;
  nominalMm: number;
  afterKerfMm: number;
  deviationMm: number;
  toleranceMm: number;
  toleranceBasis: string;
  sizeBandMm: [number, number] | null;
  thicknessBandMm: [number, number] | null;
  outsideBand: string | null;
  within: boolean;
}

export interface TestCutResult {
  /** Scale error of axis X, % (the test cut's errorPercent along X). */
  scaleErrorX: number;
  /** Scale error of axis Y, % (the test cut's errorPercent along Y). */
  scaleErrorY: number;
  x: AxisReading;
  y: AxisReading;
  outOfSquareArcsec: number;
  squareness: {
    outOfSquareDeg: number;
    mmPerMetre: number;
    /** Which diagonal is the longer: 1 or 2, its number in the request (no unit). */
    longDiagonal: 1 | 2;
    diagonalDifferenceMm: number;
    warnings: string[];
  };
  /** |circleX − circleY| after kerf, mm. */
  ovality: number;
  ovalityPointsTo: OvalityCause;
  ovalityExplanation: string;
  ovalityToleranceMm: number;
  parts: PartSizeCheck[];
  notes: string[];
}

const PART_LABELS: Record<PartSizeCheck['part'], string> = {
  'outside-x': 'Outside size in X',
  'outside-y': 'Outside size in Y',
  'circle-x': 'Circle diameter in X',
  'circle-y': 'Circle diameter in Y',
};

/**
 * Cutting along the programmed path without kerf compensation takes half the kerf off each side
 * of an outside contour (the square, a disc) and adds it to a hole, so sizes are referred back to
 * the path before they are judged: outside + kerf, hole − kerf, each diagonal of the square + √2·kerf.
 */
export function afterKerf(s: TestCutSizesMm) {
  const k = s.kerfMm;
  const circleShift = s.circleKind === 'hole' ? -k : k;
  return {
    xMm: s.measured.xMm + k,
    yMm: s.measured.yMm + k,
    diagonal1Mm: s.measured.diagonal1Mm + Math.SQRT2 * k,
    diagonal2Mm: s.measured.diagonal2Mm + Math.SQRT2 * k,
    circleXMm: s.measured.circleXMm + circleShift,
    circleYMm: s.measured.circleYMm + circleShift,
  };
}

export function engineTestCut(s: TestCutSizesMm): EngineTestCut {
  const m = afterKerf(s);
  return evaluateTestCut({
    x: { commandedMm: s.nominal.xMm, measuredMm: m.xMm },
    y: { commandedMm: s.nominal.yMm, measuredMm: m.yMm },
    stepsPerMmX: s.stepsPerMm.x ?? undefined,
    stepsPerMmY: s.stepsPerMm.y ?? undefined,
    diagonal1Mm: m.diagonal1Mm,
    diagonal2Mm: m.diagonal2Mm,
    circle: { commandedDiameterMm: s.nominal.circleMm, measuredXMm: m.circleXMm, measuredYMm: m.circleYMm },
  });
}

function explainOvality(e: EngineTestCut): string {
  const o = e.ovality!;
  const size = Math.abs(o.ovalityMm).toFixed(2);
  const longer = o.ovalityMm > 0 ? 'X' : 'Y';
  switch (o.pointsTo) {
    case 'round':
      return `The circle is round within ${DEFAULT_OVALITY_TOLERANCE_MM} mm (X and Y diameters differ by ${size} mm).`;
    case 'scale':
      return `The circle is ${size} mm longer in ${longer}, about what the two axes' scale errors account for (${Math.abs(o.fromScaleMm).toFixed(2)} mm): unequal scale. Correct steps per mm and the oval should go with it.`;
    case 'x-backlash':
    case 'y-backlash': {
      const axis = o.pointsTo === 'x-backlash' ? 'X' : 'Y';
      return `The circle is short in ${axis} by about ${o.backlashEstimateMm!.toFixed(2)} mm more than scale explains: that points to lost motion (backlash) on ${axis} at each reversal. Check couplers, set screws, belt tension or pinion mesh on ${axis}, then measure its reversal value.`;
    }
  }
}

function axis(commandedMm: number, measuredMm: number, after: number, e: EngineTestCut['x']): AxisReading {
  return {
    commandedMm,
    measuredMm,
    afterKerfMm: after,
    errorMm: e.errorMm,
    errorPercent: e.errorPercent,
    correctionFactor: commandedMm / after,
    suggestedStepsPerMm: e.correctedStepsPerMm,
  };
}

export function testCutResult(s: TestCutSizesMm, policy: PartTolerancePolicy): TestCutResult {
  const e = engineTestCut(s);
  const m = afterKerf(s);
  const sq = e.squareness!;
  const part = (p: PartSizeCheck['part'], nominalMm: number, afterKerfMm: number): PartSizeCheck => {
    const deviationMm = afterKerfMm - nominalMm;
    const t = partToleranceFor(nominalMm, policy);
    return {
      part: p,
      label: PART_LABELS[p],
      nominalMm,
      afterKerfMm,
      deviationMm,
      toleranceMm: t.toleranceMm,
      toleranceBasis: t.basis,
      sizeBandMm: t.sizeBandMm,
      thicknessBandMm: t.thicknessBandMm,
      outsideBand: t.outsideBand,
      // Rounded to the nanometre so a deviation typed exactly at the limit is within it.
      within: Math.round(Math.abs(deviationMm) * 1e6) <= Math.round(t.toleranceMm * 1e6),
    };
  };
  return {
    scaleErrorX: e.x.errorPercent,
    scaleErrorY: e.y.errorPercent,
    x: axis(s.nominal.xMm, s.measured.xMm, m.xMm, e.x),
    y: axis(s.nominal.yMm, s.measured.yMm, m.yMm, e.y),
    outOfSquareArcsec: sq.outOfSquareArcsec,
    squareness: {
      outOfSquareDeg: sq.outOfSquareDeg,
      mmPerMetre: sq.mmPerMetre,
      longDiagonal: sq.longDiagonal,
      diagonalDifferenceMm: sq.diagonalDifferenceMm,
      warnings: sq.warnings,
    },
    ovality: Math.abs(e.ovality!.ovalityMm),
    ovalityPointsTo: e.ovality!.pointsTo,
    ovalityExplanation: explainOvality(e),
    ovalityToleranceMm: DEFAULT_OVALITY_TOLERANCE_MM,
    parts: [
      part('outside-x', s.nominal.xMm, m.xMm),
      part('outside-y', s.nominal.yMm, m.yMm),
      part('circle-x', s.nominal.circleMm, m.circleXMm),
      part('circle-y', s.nominal.circleMm, m.circleYMm),
    ],
    notes: e.notes,
  };
}
