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
  slope: r.slope,
  intercept: r.interceptMm,
  straightness: r.straightnessMm,
  ...(residuals ? { residuals: r.residualsMm } : {}),
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
  parallelism: r.parallelismMm,
  meanOffset: r.meanOffsetMm,
  differences: r.differencesMm,
  ...named({ parallelism: 'mm', meanOffset: 'mm', differences: 'mm' }),
  warnings: engineWarnings((r as { warnings?: unknown }).warnings),
});

const squarenessFields = (r: SquarenessResult) => ({
  outOfSquareDeg: r.outOfSquareDeg,
  outOfSquareArcsec: r.outOfSquareArcsec,
  mmPerMetre: r.mmPerMetre,
  longDiagonal: r.longDiagonal,
  diagonalDifference: r.diagonalDifferenceMm,
  correction: r.correctionMm,
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
    a: r.a,
    b: r.b,
    c: r.cMm,
    flatness: r.flatnessMm,
    ...(residuals ? { residuals: r.residualsMm } : {}),
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
  travelPerRev: r.travelPerRevMm,
  travelPerMotorRev: r.travelPerMotorRevMm,
  stepsPerMm: r.stepsPerMm,
  // Steps per inch, for controllers set up in inches: 25.4 mm to the inch exactly.
  stepsPerIn: r.stepsPerMm * MM_PER_IN,
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
    scale: r.scale,
    offset: r.offsetMm,
    correctedStepsPerMm: r.correctedStepsPerMm,
    correctedStepsPerIn: r.correctedStepsPerMm * MM_PER_IN,
    errorPercent: r.errorPercent,
    residualMax: r.residualMaxMm,
    moves: r.moves.map((m) => ({
      commanded: m.commandedMm,
      measured: m.measuredMm,
      error: m.errorMm,
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
  target: t.targetMm,
  meanUp: t.meanUpMm,
  meanDown: t.meanDownMm,
  mean: t.meanMm,
  reversal: t.reversalMm,
  sUp: t.sUpMm,
  sDown: t.sDownMm,
  repeatabilityUp: t.repeatabilityUpMm,
  repeatabilityDown: t.repeatabilityDownMm,
  repeatability: t.repeatabilityMm,
});

/** Also the shape of a stored repeat-and-reverse run's result (drives records), where `u` is the record's own. */
export const toPositioningResponse = (r: PositioningResult, u?: UnitFamilies) => ({
  ...(u ? echo(u) : {}),
  targets: r.targets.map(target),
  reversal: r.reversalMm,
  reversalMean: r.reversalMeanMm,
  repeatabilityUp: r.repeatabilityUpMm,
  repeatabilityDown: r.repeatabilityDownMm,
  repeatability: r.repeatabilityMm,
  systematicUp: r.systematicUpMm,
  systematicDown: r.systematicDownMm,
  systematic: r.systematicMm,
  meanRange: r.meanRangeMm,
  accuracyUp: r.accuracyUpMm,
  accuracyDown: r.accuracyDownMm,
  accuracy: r.accuracyMm,
  runsUp: r.runsUp,
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
  rpm: r.rpm,
  criticalSpeed: r.criticalSpeedRpm,
  permissibleSpeed: r.permissibleSpeedRpm,
  dnLimitSpeed: r.dnLimitSpeedRpm,
  maxFeedRate: r.maxFeedRateMmPerMin,
  withinLimits: r.withinLimits,
  limitedBy: r.limitedBy,
  mountingFactor: r.mountingFactor,
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
  holes: positionsMm.map((position, hole) => ({ hole, position })),
  steps: steps.map((s, i) => ({
    step: i + 1,
    hole: s.hole,
    position: s.positionMm,
    target: s.targetMm,
    reading: s.readingMm,
  })),
  nextHole,
  ...named({ 'holes.position': 'mm', 'steps.position': 'mm', 'steps.target': 'mm', 'steps.reading': 'mm' }),
  warnings: [] as ResultWarning[],
});

export const toTravelEnvelopeResponse = (r: TravelEnvelopeResult, u: UnitFamilies) => ({
  ...echo(u),
  axes: r.axes.map((a) => ({
    axis: a.axis,
    measuredTravel: a.measuredTravelMm,
    workSize: a.workSizeMm,
    requiredTravel: a.requiredTravelMm,
    spare: a.spareMm,
    covers: a.covers,
  })),
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
  scale: a.scale,
  error: a.errorMm,
  errorPercent: a.errorPercent,
  correctedStepsPerMm: a.correctedStepsPerMm,
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
          ovality: r.ovality.ovalityMm,
          fromScale: r.ovality.fromScaleMm,
          unexplained: r.ovality.unexplainedMm,
          pointsTo: r.ovality.pointsTo,
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
