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

// Responses of the calculators API. Every length is in mm whatever unit the readings came in;
// slopes are mm/mm, speeds rpm, feed rates mm/min, angles in the unit their name says.

// Residuals (one per point) only when asked: see residuals-option.ts.
const line = (r: ReferenceLineResult, residuals: boolean) => ({
  slope: r.slope,
  intercept: r.interceptMm,
  straightness: r.straightnessMm,
  ...(residuals ? { residuals: r.residualsMm } : {}),
});

export const toStraightnessResponse = (r: StraightnessResult, residuals = true) => ({
  leastSquares: line(r.leastSquares, residuals),
  // Centre line of the band; the band is the line ± straightness / 2.
  minimumZone: line(r.minimumZone, residuals),
  endPoint: line(r.endPoint, residuals),
});

export const toParallelismResponse = (r: ParallelismResult) => ({
  parallelism: r.parallelismMm,
  meanOffset: r.meanOffsetMm,
  differences: r.differencesMm,
});

export const toSquarenessResponse = (r: SquarenessResult) => ({
  outOfSquareDeg: r.outOfSquareDeg,
  outOfSquareArcsec: r.outOfSquareArcsec,
  mmPerMetre: r.mmPerMetre,
  longDiagonal: r.longDiagonal,
  diagonalDifference: r.diagonalDifferenceMm,
  correction: r.correctionMm,
  span: r.spanMm,
  warnings: r.warnings,
});

export const toFlatnessResponse = (r: FlatnessResult, residuals = true) => ({
  leastSquares: { a: r.a, b: r.b, c: r.cMm, flatness: r.flatnessMm, ...(residuals ? { residuals: r.residualsMm } : {}) },
  tilt: {
    xMmPerMetre: r.tiltXMmPerMetre,
    yMmPerMetre: r.tiltYMmPerMetre,
    mmPerMetre: r.tiltMmPerMetre,
    directionDeg: r.tiltDirectionDeg,
  },
});

export const toDriveResponse = (r: DriveResult) => ({
  travelPerRev: r.travelPerRevMm,
  travelPerMotorRev: r.travelPerMotorRevMm,
  stepsPerMm: r.stepsPerMm,
  resolution: r.resolutionMm,
});

export const toTravelTrialResponse = (r: TravelTrialResult) => ({
  scale: r.scale,
  offset: r.offsetMm,
  correctedStepsPerMm: r.correctedStepsPerMm,
  errorPercent: r.errorPercent,
  residualMax: r.residualMaxMm,
  moves: r.moves.map((m) => ({ commanded: m.commandedMm, measured: m.measuredMm, error: m.errorMm, residual: m.residualMm })),
});

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

export const toPositioningResponse = (r: PositioningResult) => ({
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
  warnings: r.warnings,
});

export const toScrewSpeedResponse = (r: ScrewSpeedResult) => ({
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
});

export const toBoltDownResponse = (positionsMm: number[], steps: GuideStep[], nextHole: number | null) => ({
  holes: positionsMm.map((position, hole) => ({ hole, position })),
  steps: steps.map((s, i) => ({ step: i + 1, hole: s.hole, position: s.positionMm, target: s.targetMm, reading: s.readingMm })),
  nextHole,
});

export const toTravelEnvelopeResponse = (r: TravelEnvelopeResult) => ({
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
});

export const toTestCutResponse = (r: TestCutResult) => ({
  x: { scale: r.x.scale, error: r.x.errorMm, errorPercent: r.x.errorPercent, correctedStepsPerMm: r.x.correctedStepsPerMm },
  y: { scale: r.y.scale, error: r.y.errorMm, errorPercent: r.y.errorPercent, correctedStepsPerMm: r.y.correctedStepsPerMm },
  squareness: r.squareness ? toSquarenessResponse(r.squareness) : null,
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
});
