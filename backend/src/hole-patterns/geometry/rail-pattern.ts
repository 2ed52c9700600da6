import type { Hole } from './pattern-holes.js';

/**
 * A rail's seat as a drilling pattern, derived from the rail every time (never stored): the
 * outline is the rail's length by its width, the holes sit on its centre line at the rail's
 * pitch from the first hole, and the end distance is what is left after the last hole.
 */

/** Rail width by profile size, mm — from memory (usual profile rail catalogues): check the rail drawing. */
export const RAIL_WIDTH_BY_PROFILE_MM: Readonly<Record<number, number>> = {
  15: 15,
  20: 20,
  25: 23,
  30: 28,
  35: 34,
  45: 45,
};
export const DEFAULT_RAIL_WIDTH_MM = 20;

/**
 * Tap drill for the rail bolt into the frame: nominal diameter minus the coarse thread pitch
 * (common practice for ISO metric coarse threads, about 75 % thread).
 */
export const TAP_DRILL_MM: Readonly<Record<string, number>> = { M3: 2.5, M4: 3.3, M5: 4.2, M6: 5, M8: 6.8 };
export const DEFAULT_RAIL_HOLE_MM = 5;

export interface RailGeometry {
  label: string;
  lengthMm: number;
  profileSizeMm: number | null;
  typicalBoltSize: string | null;
  /** Hole centres from the rail's start, mm. */
  holePositionsMm: number[];
  holePitchMm: number;
  firstHoleMm: number;
}

export interface RailPattern {
  widthMm: number;
  heightMm: number;
  holes: Hole[];
  railWidthMm: number;
  endDistanceMm: number;
  holeNote: string;
}

export function railPattern(rail: RailGeometry): RailPattern {
  const railWidthMm =
    (rail.profileSizeMm && RAIL_WIDTH_BY_PROFILE_MM[rail.profileSizeMm]) || rail.profileSizeMm || DEFAULT_RAIL_WIDTH_MM;
  const tap = rail.typicalBoltSize ? TAP_DRILL_MM[rail.typicalBoltSize] : undefined;
  const diameterMm = tap ?? DEFAULT_RAIL_HOLE_MM;
  const last = rail.holePositionsMm[rail.holePositionsMm.length - 1] ?? 0;
  return {
    widthMm: rail.lengthMm,
    heightMm: railWidthMm,
    railWidthMm,
    endDistanceMm: rail.lengthMm - last,
    holes: rail.holePositionsMm.map((x) => ({ xMm: x, yMm: railWidthMm / 2, diameterMm })),
    holeNote: tap
      ? `${rail.typicalBoltSize} tapped: drill Ø ${tap} mm (typical bolt for this rail size — check the rail drawing)`
      : `Ø ${diameterMm} mm marks: check the rail drawing for the bolt size`,
  };
}
