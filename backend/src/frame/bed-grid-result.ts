import { evaluateFlatness, type FlatnessResult } from '../engine/flatness.js';
import type { BedGridPointMm } from '../database/schema/frame.js';

export interface BedGridPointResult {
  index: number;
  /** 1-based row (by position along Y, Y0 first) and column (by position along X, X0 first). */
  row: number;
  column: number;
  xMm: number;
  yMm: number;
  zMm: number;
  residualMm: number;
}

export interface BedGridResult {
  leastSquares: {
    /** Slopes of the plane z = a·x + b·y + c (mm per mm) and its height at X0 Y0 (mm). */
    a: number;
    b: number;
    c: number;
    /** Max − min residual about the plane, mm. */
    flatness: number;
    flatnessMm: number;
  };
  tilt: { xMmPerMetre: number; yMmPerMetre: number; mmPerMetre: number; directionDeg: number };
  points: BedGridPointResult[];
  highest: BedGridPointResult;
  lowest: BedGridPointResult;
  /** The points furthest from the plane, largest first (up to five). */
  worstPoints: BedGridPointResult[];
  rows: number;
  columns: number;
}

const WORST_COUNT = 5;

function rankOf(values: number[]): Map<number, number> {
  const distinct = [...new Set(values)].sort((p, q) => p - q);
  return new Map(distinct.map((v, i) => [v, i + 1]));
}

export function bedGridResult(points: BedGridPointMm[]): BedGridResult {
  const f: FlatnessResult = evaluateFlatness(points);
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
  }));
  const byResidual = [...out].sort((p, q) => q.residualMm - p.residualMm);
  const worst = [...out].sort((p, q) => Math.abs(q.residualMm) - Math.abs(p.residualMm)).slice(0, WORST_COUNT);
  return {
    leastSquares: { a: f.a, b: f.b, c: f.cMm, flatness: f.flatnessMm, flatnessMm: f.flatnessMm },
    tilt: { xMmPerMetre: f.tiltXMmPerMetre, yMmPerMetre: f.tiltYMmPerMetre, mmPerMetre: f.tiltMmPerMetre, directionDeg: f.tiltDirectionDeg },
    points: out,
    highest: byResidual[0],
    lowest: byResidual[byResidual.length - 1],
    worstPoints: worst,
    rows,
    columns,
  };
}
