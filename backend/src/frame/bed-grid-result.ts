import { evaluateFlatness, type FlatnessResult } from '../engine/flatness.js';
import { minimumZonePlane } from '../engine/flatness-zone.js';
import type { BedGridPointMm } from '../database/schema/frame.js';

export interface BedGridPointResult {
  /** The point's place in the request's list, index from 0. */
  index: number;
  /** Row by position along Y, Y0 first: index from 1. */
  row: number;
  /** Column by position along X, X0 first: index from 1. */
  column: number;
  xMm: number;
  yMm: number;
  zMm: number;
  /** Height minus the least-squares plane, mm. */
  residualMm: number;
  /** Height minus the middle plane of the minimum zone, mm. */
  zoneResidualMm: number;
  /** Height above the lower bound of the judged zone, mm (0 … judged value): what the bed map draws. */
  judgedHeightMm: number;
}

/**
 * Which value is judged against the bed target, by machine kind:
 * - plasma: the range of the heights as read from a gauge carried by the gantry, tilt left in.
 *   The torch rides the gantry, so what matters is the bed parallel to the plane of the gantry's
 *   travel, not level to earth nor flat after a best-fit tilt is taken out (TRADE.md: "what matters
 *   is the bed parallel to the torch plane"); the target is the torch-height tolerance.
 * - router and other machines: minimum-zone flatness (ISO 1101's definition of flatness), the
 *   spoilboard's or bed's own form; a tilt is surfaced away or shimmed separately.
 * Least squares is shown beside both.
 */
export type BedJudgedBasis = 'height-range' | 'minimum-zone';

export const JUDGED_LABEL: Record<BedJudgedBasis, string> = {
  'height-range': 'Height range to the gantry’s plane of travel (tilt left in)',
  'minimum-zone': 'Minimum-zone flatness (ISO 1101)',
};

export const judgedBasisFor = (machineKind: string): BedJudgedBasis =>
  machineKind === 'plasma' ? 'height-range' : 'minimum-zone';

export interface BedGridResult {
  leastSquares: {
    /** Slopes of the plane z = a·x + b·y + c (mm per mm) and its height at X0 Y0 (mm). */
    a: number;
    /** Slope of the plane along Y, mm per mm (a ratio of lengths). */
    b: number;
    /** Height of the plane at X0 Y0, mm. */
    c: number;
    /** Max − min residual about the plane, mm. */
    flatness: number;
    flatnessMm: number;
  };
  /** The ISO 1101 zone: middle plane z = a·x + b·y + c and the zone's width along the height axis. */
  minimumZone: {
    /** Slope of the middle plane along X, mm per mm (a ratio of lengths). */
    a: number;
    /** Slope of the middle plane along Y, mm per mm (a ratio of lengths). */
    b: number;
    /** Height of the middle plane at X0 Y0, mm. */
    c: number;
    flatnessMm: number;
  };
  /** Highest minus lowest height as read, tilt left in. */
  heightRange: { rangeMm: number };
  /** The value this machine's bed is judged on (see BedJudgedBasis). */
  judged: { basis: BedJudgedBasis; label: string; valueMm: number };
  tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
  points: BedGridPointResult[];
  highest: BedGridPointResult;
  lowest: BedGridPointResult;
  /** The points furthest from the middle of the judged zone, largest first (up to five). */
  worstPoints: BedGridPointResult[];
  /** Count of rows (distinct positions along Y). */
  rows: number;
  /** Count of columns (distinct positions along X). */
  columns: number;
}

const WORST_COUNT = 5;

function rankOf(values: number[]): Map<number, number> {
  const distinct = [...new Set(values)].sort((p, q) => p - q);
  return new Map(distinct.map((v, i) => [v, i + 1]));
}

export function bedGridResult(points: BedGridPointMm[], basis: BedJudgedBasis): BedGridResult {
  const f: FlatnessResult = evaluateFlatness(points);
  const zone = minimumZonePlane(points);
  const zs = points.map((p) => p.zMm);
  const lowestZ = Math.min(...zs);
  const rangeMm = Math.max(...zs) - lowestZ;
  const judgedValue = basis === 'height-range' ? rangeMm : zone.flatnessMm;
  const judgedHeight = (i: number) =>
    basis === 'height-range' ? zs[i] - lowestZ : zone.residualsMm[i] + zone.flatnessMm / 2;
  const rowOf = rankOf(points.map((p) => p.yMm));
  const columnOf = rankOf(points.map((p) => p.xMm));
  const rows = rowOf.size;
  const columns = columnOf.size;
  const out: BedGridPointResult[] = points.map((p, i) => ({
    index: i,
    row: rowOf.get(p.yMm)!,
    column: columnOf.get(p.xMm)!,
    xMm: p.xMm,
    yMm: p.yMm,
    zMm: p.zMm,
    residualMm: f.residualsMm[i],
    zoneResidualMm: zone.residualsMm[i],
    judgedHeightMm: judgedHeight(i),
  }));
  const off = (p: BedGridPointResult) => p.judgedHeightMm - judgedValue / 2;
  const byHeight = [...out].sort((p, q) => q.judgedHeightMm - p.judgedHeightMm);
  const worst = [...out].sort((p, q) => Math.abs(off(q)) - Math.abs(off(p))).slice(0, WORST_COUNT);
  return {
    leastSquares: { a: f.a, b: f.b, c: f.cMm, flatness: f.flatnessMm, flatnessMm: f.flatnessMm },
    minimumZone: { a: zone.a, b: zone.b, c: zone.cMm, flatnessMm: zone.flatnessMm },
    heightRange: { rangeMm },
    judged: { basis, label: JUDGED_LABEL[basis], valueMm: judgedValue },
    tilt: {
      xMmPerMetre: f.tiltXMmPerMetre,
      yMmPerMetre: f.tiltYMmPerMetre,
      mmPerMetre: f.tiltMmPerMetre,
      directionDeg: f.tiltDirectionDeg,
    },
    points: out,
    highest: byHeight[0],
    lowest: byHeight[byHeight.length - 1],
    worstPoints: worst,
    rows,
    columns,
  };
}
