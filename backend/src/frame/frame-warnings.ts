import type { ResultWarning } from '../engine/warnings.js';
import { fromMm, type LengthUnit } from '../engine/units.js';
import type { BedGridResult } from './bed-grid-result.js';
import type { DiagonalInputMm } from './diagonal-check-result.js';
import type { PartTolerancePolicy, TestCutResult } from './test-cut-result.js';
import { ISO9013_REFERENCE, ISO9013_SIZE_BANDS_MM, ISO9013_THICKNESS_BANDS_MM } from '../engine/iso9013.js';

/** A tape reads to about 1/32 in (TRADE.md: common practice). */
export const TAPE_RESOLUTION_MM = 25.4 / 32;
/** An instrument should resolve a quarter of the tolerance it judges (common practice, the 4:1 rule). */
export const RESOLUTION_SHARE = 4;
/** Fewest points, and rows and columns, that show a bed's form rather than a tilt (common practice). */
export const MIN_GRID_POINTS = 9;
export const MIN_GRID_LINES = 3;
/** A grid narrower than this share of the work area leaves part of the bed unmeasured. */
export const MIN_GRID_COVERAGE = 0.75;

const UNIT_LABEL: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };
const DECIMALS: Record<LengthUnit, number> = { mm: 3, um: 1, in: 4, thou: 2 };
export const show = (mm: number, unit: LengthUnit) =>
  `${Number(fromMm(mm, unit).toFixed(DECIMALS[unit]))} ${UNIT_LABEL[unit]}`;

/**
 * The diagonal difference a squareness target allows on this rectangle. From the parallelogram
 * relation sin γ = (q² − p²)/(4ab) (squareness_diagonals.json), q − p = 4ab·sin γ/(q + p) with
 * q + p ≈ 2·√(a² + b²).
 */
export function allowedDiagonalDifferenceMm(sideXMm: number, sideYMm: number, targetMmPerMetre: number): number {
  const gamma = Math.atan(targetMmPerMetre / 1000);
  return (2 * sideXMm * sideYMm * Math.sin(gamma)) / Math.hypot(sideXMm, sideYMm);
}

export function diagonalWarnings(
  input: DiagonalInputMm,
  engineWarnings: string[],
  targetMmPerMetre: number,
  resolutionMm: number | null,
  unit: LengthUnit,
): ResultWarning[] {
  const out: ResultWarning[] = engineWarnings.map((m) => ({
    code: 'diagonals-do-not-match-sides',
    message: `${m.charAt(0).toUpperCase()}${m.slice(1)}.`,
  }));
  const allowed = allowedDiagonalDifferenceMm(input.sideXMm, input.sideYMm, targetMmPerMetre);
  const size = `${show(input.sideXMm, unit)} × ${show(input.sideYMm, unit)}`;
  if (resolutionMm != null && resolutionMm > allowed / RESOLUTION_SHARE) {
    out.push({
      code: 'coarse-instrument',
      message: `The diagonals were read to ${show(resolutionMm, unit)}, coarser than a quarter of the ${show(allowed, unit)} diagonal difference the ${targetMmPerMetre} mm/m target allows on this ${size} rectangle: read them with a finer rule or trammel, or use a larger rectangle.`,
    });
  } else if (resolutionMm == null && TAPE_RESOLUTION_MM > allowed / RESOLUTION_SHARE) {
    out.push({
      code: 'tape-resolution',
      message: `No resolution was recorded. A tape reads to about 1/32 in (${show(TAPE_RESOLUTION_MM, unit)}), coarser than a quarter of the ${show(allowed, unit)} diagonal difference the ${targetMmPerMetre} mm/m target allows on this ${size} rectangle: read the diagonals with trammel points or a finer rule and record its resolution.`,
    });
  }
  return out;
}

export interface GridContext {
  workAreaXMm: number;
  workAreaYMm: number;
  targetMm: number;
  resolutionMm: number | null;
  lengthUnit: LengthUnit;
  readingUnit: LengthUnit;
}

export function bedGridWarnings(
  points: { xMm: number; yMm: number }[],
  r: BedGridResult,
  c: GridContext,
): ResultWarning[] {
  const out: ResultWarning[] = [];
  if (points.length < MIN_GRID_POINTS || r.rows < MIN_GRID_LINES || r.columns < MIN_GRID_LINES) {
    out.push({
      code: 'few-grid-points',
      message: `${r.rows} rows by ${r.columns} columns (${points.length} points) cannot show a sag or twist between them; measure at least ${MIN_GRID_LINES} × ${MIN_GRID_LINES} points, more over a large bed.`,
    });
  }
  const spanX = Math.max(...points.map((p) => p.xMm)) - Math.min(...points.map((p) => p.xMm));
  const spanY = Math.max(...points.map((p) => p.yMm)) - Math.min(...points.map((p) => p.yMm));
  for (const [axis, span, area] of [
    ['X', spanX, c.workAreaXMm],
    ['Y', spanY, c.workAreaYMm],
  ] as const) {
    if (area > 0 && span < MIN_GRID_COVERAGE * area) {
      out.push({
        code: 'grid-coverage',
        message: `The grid spans ${show(span, c.lengthUnit)} of the ${show(area, c.lengthUnit)} work area in ${axis}; the rest of the bed is not measured.`,
      });
    }
  }
  if (c.resolutionMm != null && c.resolutionMm > c.targetMm / RESOLUTION_SHARE) {
    out.push({
      code: 'coarse-instrument',
      message: `The height gauge reads to ${show(c.resolutionMm, c.readingUnit)}, coarser than a quarter of the ${show(c.targetMm, c.readingUnit)} target; use a finer gauge.`,
    });
  }
  // On a plasma table the judged range includes the tilt: say when the tilt alone puts it outside.
  if (
    r.judged.basis === 'height-range' &&
    r.heightRange.rangeMm > c.targetMm &&
    r.minimumZone.flatnessMm <= c.targetMm
  ) {
    out.push({
      code: 'bed-tilted-to-gantry',
      message: `The bed is flat within ${show(r.minimumZone.flatnessMm, c.readingUnit)} but tilted ${r.tilt.mmPerMetre.toFixed(2)} mm/m to the gantry's plane of travel, which makes the torch height vary by ${show(r.heightRange.rangeMm, c.readingUnit)}: shim the bed or slat supports parallel to the gantry.`,
    });
  }
  return out;
}

export interface CutContext {
  policy: PartTolerancePolicy;
  /** The part-size target's source text (a flat target that cites ISO 9013 is checked against its band). */
  targetSource: string | undefined;
  resolutionMm: number | null;
  lengthUnit: LengthUnit;
}

/** The band TRADE.md states the 0.9 mm of ISO 9013 class 2 for. */
const REFERENCE_BAND_MM = ISO9013_SIZE_BANDS_MM[ISO9013_REFERENCE.sizeBand];

export function testCutWarnings(r: TestCutResult, c: CutContext): ResultWarning[] {
  const out: ResultWarning[] = r.squareness.warnings.map((m) => ({
    code: 'diagonals-do-not-match-sides',
    message: `${m.charAt(0).toUpperCase()}${m.slice(1)}.`,
  }));
  if (c.policy.basis === 'iso9013-class-2' && c.policy.plateThicknessMm == null) {
    out.push({
      code: 'plate-thickness-missing',
      message: `No plate thickness was recorded: the ISO 9013 tolerances are taken for ${ISO9013_THICKNESS_BANDS_MM[ISO9013_REFERENCE.thicknessBand].join('–')} mm plate, the band the target is stated for. Record the thickness so each part is judged in its own band.`,
    });
  }
  for (const p of r.parts) {
    if (p.outsideBand)
      out.push({
        code: 'outside-iso9013-band',
        message: `${p.label} (${show(p.nominalMm, c.lengthUnit)}): ${p.outsideBand}.`,
      });
  }
  if (c.policy.basis === 'target' && /ISO 9013/.test(c.targetSource ?? '')) {
    const outside = r.parts.filter((p) => p.nominalMm < REFERENCE_BAND_MM[0] || p.nominalMm >= REFERENCE_BAND_MM[1]);
    if (outside.length) {
      out.push({
        code: 'outside-iso9013-band',
        message: `The ±${c.policy.targetMm} mm target cites ISO 9013 for ${REFERENCE_BAND_MM[0]}–${REFERENCE_BAND_MM[1]} mm parts, but ${outside.map((p) => `${p.label.toLowerCase()} (${show(p.nominalMm, c.lengthUnit)})`).join(', ')} ${outside.length === 1 ? 'lies' : 'lie'} outside that band; the standard gives other tolerances there.`,
      });
    }
  }
  const tightest = Math.min(...r.parts.map((p) => p.toleranceMm));
  if (c.resolutionMm != null && c.resolutionMm > tightest / RESOLUTION_SHARE) {
    out.push({
      code: 'coarse-instrument',
      message: `The sizes were read to ${show(c.resolutionMm, c.lengthUnit)}, coarser than a quarter of the tightest part tolerance (±${show(tightest, c.lengthUnit)}); measure with a caliper.`,
    });
  }
  return out;
}
