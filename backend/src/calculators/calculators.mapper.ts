import type { GuideStep } from '../engine/bolt-down.js';
import type { FlatnessResult } from '../engine/flatness.js';
import type { ParallelismResult } from '../engine/parallelism.js';
import type { PositioningResult, TargetResult } from '../engine/positioning.js';
import type { ScrewSpeedResult } from '../engine/screw-speed.js';
import type { SquarenessResult } from '../engine/squareness.js';
import type { DriveResult } from '../engine/steps-per-mm.js';
import type { ReferenceLineResult, StraightnessResult } from '../engine/straightness.js';
import type { TestCutResult } from '../engine/test-cut.js';
import type { TravelEnvelopeResult } from '../engine/travel-envelope.js';
import type { TravelTrialResult } from '../engine/travel-trial.js';
import { toMm } from '../engine/units.js';
import type { ResultWarning } from '../engine/warnings.js';
import {
  correctionWarning,
  engineWarnings,
  inUnit,
  mergeWarnings,
  positioningWarnings,
} from './calculator-warnings.js';
import type { UnitFamilies } from './units-of.js';

// Responses of the calculators API. Each echoes the request's lengthUnit and readingUnit, gives
// every result in mm whatever unit came in, and names the unit of each result field in `units`
// (slopes mm/mm, speeds rpm, feed rates mm/min, angles as their names say). `warnings` lists
// what a person should know about the result ({code, message}); empty when nothing.

const MM_PER_IN = toMm(1, 'in');
const echo = (u: UnitFamilies) => ({ lengthUnit: u.lengthUnit, readingUnit: u.readingUnit });
/** Result fields that are not lengths (counts, ratios) are simply not listed. */
const named = (units: Record<string, string>) => ({ units });

// Residuals (one per point) only when asked: see residuals-option.ts.
const line = (r: ReferenceLineResult, residuals: boolean) => ({
  /** Rise of the reference line per unit of position, mm/mm (a ratio of lengths). */
  slope: r.slope,
  /** Height of the reference line at position 0, mm. */
  intercept: r.interceptMm,
  /** Straightness about this reference line, mm. */
  straightness: r.straightnessMm,
  ...(residuals
    ? {
        /** Each station's deviation from the reference line, mm. */
        residuals: r.residualsMm,
      }
    : {}),
});

const LINE_UNITS = { slope: 'mm/mm', intercept: 'mm', straightness: 'mm', residuals: 'mm' };

export const toStraightnessResponse = (r: StraightnessResult, residuals: boolean, u: UnitFamilies) => ({
  ...echo(u),
  leastSquares: line(r.leastSquares, residuals),
  // Centre line of the band; the band is the line ± straightness / 2.
  minimumZone: line(r.minimumZone, residuals),
  endPoint: line(r.endPoint, residuals),
  ...named({
    ...prefixed('leastSquares', LINE_UNITS),
    ...prefixed('minimumZone', LINE_UNITS),
    ...prefixed('endPoint', LINE_UNITS),
  }),
  warnings: engineWarnings((r as { warnings?: unknown }).warnings),
});

function prefixed(prefix: string, units: Record<string, string>) {
  return Object.fromEntries(Object.entries(units).map(([k, v]) => [`${prefix}.${k}`, v]));
}

export const toParallelismResponse = (r: ParallelismResult, u: UnitFamilies) => ({
  ...echo(u),
  /** Parallelism of the two rails, mm. */
  parallelism: r.parallelismMm,
  /** Mean of the differences between the rails, mm. */
  meanOffset: r.meanOffsetMm,
  /** Difference between the rails at each position, mm. */
  differences: r.differencesMm,
  ...named({ parallelism: 'mm', meanOffset: 'mm', differences: 'mm' }),
  warnings: engineWarnings((r as { warnings?: unknown }).warnings),
});

const squarenessFields = (r: SquarenessResult) => ({
  outOfSquareDeg: r.outOfSquareDeg,
  outOfSquareArcsec: r.outOfSquareArcsec,
  mmPerMetre: r.mmPerMetre,
  /** Which diagonal is the longer: 1 or 2, its number in the request (no unit). */
  longDiagonal: r.longDiagonal,
  /** Longer diagonal minus the shorter, mm. */
  diagonalDifference: r.diagonalDifferenceMm,
  /** How far to move one side of the gantry over the span to square it, mm. */
  correction: r.correctionMm,
  /** The span the correction is worked out over, mm. */
  span: r.spanMm,
});
const SQUARENESS_UNITS = {
  outOfSquareDeg: '°',
  outOfSquareArcsec: '″',
  mmPerMetre: 'mm/m',
  diagonalDifference: 'mm',
  correction: 'mm',
  span: 'mm',
};

/** Without a span the correction is worked out over side X, which is rarely where the gantry is moved. */
function spanWarning(r: SquarenessResult, u: UnitFamilies): ResultWarning {
  return {
    code: 'gantry-span-assumed',
    message: `No gantry span was given, so the correction of ${inUnit(r.correctionMm, u.lengthUnit)} is worked out over side X (${inUnit(r.spanMm, u.lengthUnit)}); give the distance between the gantry's two driven sides (or home switches) for the move that squares it.`,
  };
}

export const toSquarenessResponse = (r: SquarenessResult, u: UnitFamilies, spanAssumed: boolean) => ({
  ...echo(u),
  ...squarenessFields(r),
  ...named(SQUARENESS_UNITS),
  warnings: mergeWarnings(engineWarnings(r.warnings), spanAssumed ? [spanWarning(r, u)] : []),
});

export const toFlatnessResponse = (r: FlatnessResult, residuals: boolean, u: UnitFamilies) => ({
  ...echo(u),
  leastSquares: {
    /** Slope of the plane along x, mm/mm (a ratio of lengths). */
    a: r.a,
    /** Slope of the plane along y, mm/mm (a ratio of lengths). */
    b: r.b,
    /** Height of the plane at x = 0, y = 0, mm. */
    c: r.cMm,
    /** Flatness about the least-squares plane, mm. */
    flatness: r.flatnessMm,
    ...(residuals
      ? {
          /** Each point's height above the plane, mm. */
          residuals: r.residualsMm,
        }
      : {}),
  },
  tilt: {
    xMmPerMetre: r.tiltXMmPerMetre,
    yMmPerMetre: r.tiltYMmPerMetre,
    mmPerMetre: r.tiltMmPerMetre,
    directionDeg: r.tiltDirectionDeg,
  },
  ...named({
    'leastSquares.a': 'mm/mm',
    'leastSquares.b': 'mm/mm',
    'leastSquares.c': 'mm',
    'leastSquares.flatness': 'mm',
    'leastSquares.residuals': 'mm',
    tilt: 'mm/m',
    'tilt.directionDeg': '°',
  }),
  warnings: engineWarnings((r as { warnings?: unknown }).warnings),
});

export const toDriveResponse = (r: DriveResult, u: UnitFamilies) => ({
  ...echo(u),
  /** Travel per turn of the screw, pulley or pinion, mm. */
  travelPerRev: r.travelPerRevMm,
  /** Travel per motor revolution (after the gearing), mm. */
  travelPerMotorRev: r.travelPerMotorRevMm,
  stepsPerMm: r.stepsPerMm,
  // Steps per inch, for controllers set up in inches: 25.4 mm to the inch exactly.
  /** In steps per inch. */
  stepsPerIn: r.stepsPerMm * MM_PER_IN,
  /** Travel of one microstep, mm. */
  resolution: r.resolutionMm,
  ...named({
    travelPerRev: 'mm',
    travelPerMotorRev: 'mm',
    stepsPerMm: 'steps/mm',
    stepsPerIn: 'steps/in',
    resolution: 'mm',
  }),
  warnings: engineWarnings((r as { warnings?: unknown }).warnings),
});

export const toTravelTrialResponse = (
  r: TravelTrialResult,
  u: UnitFamilies,
  check: { expected: number; expectedLabel: string },
) => {
  const fromEngine = engineWarnings((r as { warnings?: unknown }).warnings);
  // A correction the engine already calls impossible needs no second warning about its size.
  const far = fromEngine.some((w) => w.code === 'correction-cannot-be-right')
    ? null
    : correctionWarning('Travel trial', r.correctedStepsPerMm, check.expected, check.expectedLabel);
  return {
    ...echo(u),
    /** Measured distance over commanded distance (a ratio; 1 is exact). */
    scale: r.scale,
    /** Offset of the fitted line at a commanded 0, mm. */
    offset: r.offsetMm,
    correctedStepsPerMm: r.correctedStepsPerMm,
    /** In steps per inch. */
    correctedStepsPerIn: r.correctedStepsPerMm * MM_PER_IN,
    errorPercent: r.errorPercent,
    /** The largest distance of a move from the fitted line, mm. */
    residualMax: r.residualMaxMm,
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
    ...named({
      offset: 'mm',
      correctedStepsPerMm: 'steps/mm',
      correctedStepsPerIn: 'steps/in',
      errorPercent: '%',
      residualMax: 'mm',
      moves: 'mm',
    }),
    warnings: mergeWarnings(fromEngine, far ? [far] : []),
  };
};

const target = (t: TargetResult) => ({
  /** The target position, mm. */
  target: t.targetMm,
  /** Mean positional deviation approached moving +, mm. */
  meanUp: t.meanUpMm,
  /** Mean positional deviation approached moving −, mm. */
  meanDown: t.meanDownMm,
  /** Mean of the two, mm. */
  mean: t.meanMm,
  /** Reversal value at this target (mean up − mean down), mm. */
  reversal: t.reversalMm,
  /** Sample standard deviation of the approaches moving +, mm. */
  sUp: t.sUpMm,
  /** Sample standard deviation of the approaches moving −, mm. */
  sDown: t.sDownMm,
  /** Repeatability moving + (4 s), mm. */
  repeatabilityUp: t.repeatabilityUpMm,
  /** Repeatability moving − (4 s), mm. */
  repeatabilityDown: t.repeatabilityDownMm,
  /** Bidirectional repeatability at this target, mm. */
  repeatability: t.repeatabilityMm,
});

/** Also the shape of a stored repeat-and-reverse run's result (drives records), where `u` is the record's own. */
export const toPositioningResponse = (r: PositioningResult, u?: UnitFamilies) => ({
  ...(u ? echo(u) : {}),
  targets: r.targets.map(target),
  /** Reversal value of the axis (the largest size over the targets), mm. */
  reversal: r.reversalMm,
  /** Mean of the signed reversal values over the targets, mm. */
  reversalMean: r.reversalMeanMm,
  /** Repeatability moving +, mm. */
  repeatabilityUp: r.repeatabilityUpMm,
  /** Repeatability moving −, mm. */
  repeatabilityDown: r.repeatabilityDownMm,
  /** Bidirectional repeatability, mm. */
  repeatability: r.repeatabilityMm,
  /** Range of the mean deviations moving +, mm. */
  systematicUp: r.systematicUpMm,
  /** Range of the mean deviations moving −, mm. */
  systematicDown: r.systematicDownMm,
  /** Range of the mean deviations in both directions, mm. */
  systematic: r.systematicMm,
  /** Range of the mean bidirectional deviations over the targets, mm. */
  meanRange: r.meanRangeMm,
  /** Accuracy moving +, mm. */
  accuracyUp: r.accuracyUpMm,
  /** Accuracy moving −, mm. */
  accuracyDown: r.accuracyDownMm,
  /** Bidirectional accuracy, mm. */
  accuracy: r.accuracyMm,
  /** Count of runs approaching moving +. */
  runsUp: r.runsUp,
  /** Count of runs approaching moving −. */
  runsDown: r.runsDown,
  ...named({
    targets: 'mm',
    reversal: 'mm',
    reversalMean: 'mm',
    repeatability: 'mm',
    systematic: 'mm',
    meanRange: 'mm',
    accuracy: 'mm',
  }),
  warnings: mergeWarnings(engineWarnings(r.warnings), positioningWarnings(r.runsUp, r.runsDown, r.targets.length)),
});

export const toScrewSpeedResponse = (r: ScrewSpeedResult, u: UnitFamilies) => ({
  ...echo(u),
  /** Screw speed at the feed rate asked about, rpm. */
  rpm: r.rpm,
  /** Critical (whirling) speed of the screw, rpm. */
  criticalSpeed: r.criticalSpeedRpm,
  /** Permissible speed (the critical speed with its safety factor), rpm. */
  permissibleSpeed: r.permissibleSpeedRpm,
  /** Speed the nut's d·n limit allows, rpm. */
  dnLimitSpeed: r.dnLimitSpeedRpm,
  /** Fastest feed within both limits, mm/min. */
  maxFeedRate: r.maxFeedRateMmPerMin,
  withinLimits: r.withinLimits,
  limitedBy: r.limitedBy,
  /** Factor of the end mountings in the critical speed formula (no unit). */
  mountingFactor: r.mountingFactor,
  /** The nut's d·n limit used, mm·rpm (nominal diameter in mm times rpm). */
  dnLimit: r.dnLimit,
  source: r.source,
  ...named({
    rpm: 'rpm',
    criticalSpeed: 'rpm',
    permissibleSpeed: 'rpm',
    dnLimitSpeed: 'rpm',
    maxFeedRate: 'mm/min',
    dnLimit: 'mm·rpm',
  }),
  warnings: mergeWarnings(
    engineWarnings((r as { warnings?: unknown }).warnings),
    r.withinLimits ? [] : [overSpeed(r, u)],
  ),
});

function overSpeed(r: ScrewSpeedResult, u: UnitFamilies): ResultWarning {
  const limit = Math.min(r.permissibleSpeedRpm, r.dnLimitSpeedRpm);
  const which = r.limitedBy === 'dn-limit' ? 'the nut’s d·n limit' : 'the permissible (whirling) speed';
  return {
    code: 'over-speed-limit',
    message: `${Math.round(r.rpm)} rpm is above ${which} of ${Math.round(limit)} rpm; keep the feed at or below ${inUnit(r.maxFeedRateMmPerMin, u.lengthUnit, 4)}/min.`,
  };
}

export const toBoltDownResponse = (
  positionsMm: number[],
  steps: GuideStep[],
  nextHole: number | null,
  u: UnitFamilies,
) => ({
  ...echo(u),
  holes: positionsMm.map((position, hole) => ({
    /** The hole, index from 0 along the rail. */
    hole,
    /** Position of the hole along the rail, mm. */
    position,
  })),
  steps: steps.map((s, i) => ({
    /** The step's place in the guide, index from 1. */
    step: i + 1,
    /** The hole to fix at this step, index from 0. */
    hole: s.hole,
    /** Position of that hole along the rail, mm. */
    position: s.positionMm,
    /** Indicator reading to aim for when this hole is tightened, mm; null before any hole is fixed. */
    target: s.targetMm,
    /** Reading recorded at this hole once fixed, mm; null until then. */
    reading: s.readingMm,
  })),
  /** The next hole to fix, index from 0; null when every hole is fixed. */
  nextHole,
  ...named({ 'holes.position': 'mm', 'steps.position': 'mm', 'steps.target': 'mm', 'steps.reading': 'mm' }),
  warnings: [] as ResultWarning[],
});

export const toTravelEnvelopeResponse = (r: TravelEnvelopeResult, u: UnitFamilies) => ({
  ...echo(u),
  axes: r.axes.map((a) => ({
    axis: a.axis,
    /** Travel measured on the axis, mm. */
    measuredTravel: a.measuredTravelMm,
    /** Size of the work along the axis, mm. */
    workSize: a.workSizeMm,
    /** Travel the work needs with its margins, mm. */
    requiredTravel: a.requiredTravelMm,
    /** Measured travel minus required travel (negative when short), mm. */
    spare: a.spareMm,
    covers: a.covers,
  })),
  /** Margin kept beyond the work at each end, mm. */
  marginPerSide: r.marginPerSideMm,
  coversAll: r.coversAll,
  ...named({
    'axes.measuredTravel': 'mm',
    'axes.workSize': 'mm',
    'axes.requiredTravel': 'mm',
    'axes.spare': 'mm',
    marginPerSide: 'mm',
  }),
  warnings: r.axes
    .filter((a) => !a.covers)
    .map((a): ResultWarning => ({
      code: 'travel-short',
      message: `Axis ${a.axis} travels ${inUnit(a.measuredTravelMm, u.lengthUnit)} but needs ${inUnit(a.requiredTravelMm, u.lengthUnit)} to cover the work with its margins (${inUnit(-a.spareMm, u.lengthUnit)} short).`,
    })),
});

const axisScale = (a: TestCutResult['x']) => ({
  /** Measured size over nominal size (a ratio; 1 is exact). */
  scale: a.scale,
  /** Measured size minus nominal, mm. */
  error: a.errorMm,
  errorPercent: a.errorPercent,
  correctedStepsPerMm: a.correctedStepsPerMm,
  /** In steps per inch. */
  correctedStepsPerIn: a.correctedStepsPerMm == null ? null : a.correctedStepsPerMm * MM_PER_IN,
});

export const toTestCutResponse = (
  r: TestCutResult,
  u: UnitFamilies,
  used: { stepsPerMmX?: number; stepsPerMmY?: number; spanAssumed: boolean },
) => {
  const far = [
    r.x.correctedStepsPerMm != null && used.stepsPerMmX != null
      ? correctionWarning('Axis X', r.x.correctedStepsPerMm, used.stepsPerMmX, 'in use')
      : null,
    r.y.correctedStepsPerMm != null && used.stepsPerMmY != null
      ? correctionWarning('Axis Y', r.y.correctedStepsPerMm, used.stepsPerMmY, 'in use')
      : null,
  ].filter((w): w is ResultWarning => w !== null);
  const squareness = r.squareness
    ? {
        ...squarenessFields(r.squareness),
        warnings: mergeWarnings(
          engineWarnings(r.squareness.warnings),
          used.spanAssumed ? [spanWarning(r.squareness, u)] : [],
        ),
      }
    : null;
  return {
    ...echo(u),
    x: axisScale(r.x),
    y: axisScale(r.y),
    squareness,
    ovality: r.ovality
      ? {
          /** Circle's diameter along X minus along Y, mm. */
          ovality: r.ovality.ovalityMm,
          /** The part of the ovality the two axes' scale errors explain, mm. */
          fromScale: r.ovality.fromScaleMm,
          /** The rest of the ovality, mm. */
          unexplained: r.ovality.unexplainedMm,
          pointsTo: r.ovality.pointsTo,
          /** Backlash the unexplained ovality suggests, mm. */
          backlashEstimate: r.ovality.backlashEstimateMm,
        }
      : null,
    notes: r.notes,
    ...named({
      'x.error': 'mm',
      'y.error': 'mm',
      'x.errorPercent': '%',
      'y.errorPercent': '%',
      'x.correctedStepsPerMm': 'steps/mm',
      'x.correctedStepsPerIn': 'steps/in',
      'y.correctedStepsPerMm': 'steps/mm',
      'y.correctedStepsPerIn': 'steps/in',
      ...prefixed('squareness', SQUARENESS_UNITS),
      ovality: 'mm',
    }),
    warnings: mergeWarnings(engineWarnings([...r.notes, ...engineWarningsRaw(r)]), [
      ...far,
      ...(squareness?.warnings ?? []),
    ]),
  };
};

const engineWarningsRaw = (r: TestCutResult) => {
  const w = (r as { warnings?: unknown }).warnings;
  return Array.isArray(w) ? w : [];
};
