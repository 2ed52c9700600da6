/**
 * End distance of a rail's holes: a hole centre may not sit on or beyond either end of the rail,
 * nor nearer to an end than the end distance, or the counterbore breaks out of the rail's end and
 * the last bolt cannot hold it down.
 */

// ISO 4762 socket head cap screw head diameters dk (max), mm (from memory): half of the head is
// the least end distance that keeps the counterbore whole (common practice).
const HEAD_DIAMETER_MM: Record<string, number> = { M3: 5.5, M4: 7, M5: 8.5, M6: 10, M8: 13, M10: 16, M12: 18 };
/** Used when the bolt size is not known: half the head of an M5, the usual bolt of 15–20 mm rails. */
export const FALLBACK_END_DISTANCE_MM = HEAD_DIAMETER_MM.M5 / 2;

/** The default end distance for a bolt size ("M5"), or for an unknown bolt. */
export function defaultEndDistanceMm(boltSize: string | null): number {
  const head = boltSize ? HEAD_DIAMETER_MM[boltSize] : undefined;
  return head ? head / 2 : FALLBACK_END_DISTANCE_MM;
}

export interface EndDistanceProblem {
  /** "first" hole near the start, "last" hole near the far end. */
  end: 'start' | 'end';
  positionMm: number;
  /** Distance from the hole centre to that end (0 when on it, negative beyond it). */
  clearanceMm: number;
}

/** The first hole too near an end, or null when every hole keeps the end distance. */
export function endDistanceProblem(
  holePositionsMm: readonly number[],
  lengthMm: number,
  endDistanceMm: number,
): EndDistanceProblem | null {
  if (!holePositionsMm.length) return null;
  const first = Math.min(...holePositionsMm);
  const last = Math.max(...holePositionsMm);
  // A micrometre of slack: 20 + 13 × 60 is 800 in decimal but may not be in binary.
  const slack = 1e-6;
  if (first < endDistanceMm - slack) return { end: 'start', positionMm: first, clearanceMm: first };
  if (lengthMm - last < endDistanceMm - slack) return { end: 'end', positionMm: last, clearanceMm: lengthMm - last };
  return null;
}
