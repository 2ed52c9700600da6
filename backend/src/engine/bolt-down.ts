import { EngineInputError } from './engine-input-error.js';
import { MAX_POINTS, requireFinite, requireNonNegative, requirePositive, requireFiniteResult } from './validate.js';

/**
 * Bolt-down guide for a rail fixed hole by hole: where the holes are, the order to fix them
 * (one end, the far end, then the middles of the gaps, halving them breadth first, so each new
 * hole is set between two that are already fixed), and the indicator reading to aim for at a hole.
 */

export interface HolePlanInput {
  lengthMm: number;
  pitchMm: number;
  /** Distance from the rail's start to the centre of its first hole. */
  firstHoleOffsetMm: number;
}

export interface HolePlan {
  /** Hole centres from the rail's start, ascending. */
  positionsMm: number[];
  /** Hole indices (into positionsMm) in the order they should be fixed. */
  fixingOrder: number[];
}

/** How the target reading is referred: to the first fixed hole, or to the line through fixed holes. */
export type TargetMode = 'face' | 'line';
export const TARGET_MODES: readonly TargetMode[] = ['face', 'line'];

export interface FixedHole {
  positionMm: number;
  readingMm: number;
}

// Rounding slack so a last hole lying exactly at the end of the rail is not lost to binary error.
const END_SLACK_MM = 1e-9;

export function holePositions(input: HolePlanInput): number[] {
  const length = requirePositive('length', input.lengthMm);
  const pitch = requirePositive('pitch', input.pitchMm);
  const offset = requireNonNegative('firstHoleOffset', input.firstHoleOffsetMm);
  if (offset > length) {
    throw new EngineInputError('firstHoleOffset must not be larger than the rail length', 'firstHoleOffset');
  }
  const count = Math.floor((length - offset + END_SLACK_MM) / pitch) + 1;
  if (count > MAX_POINTS) {
    throw new EngineInputError(`the rail would have ${count} holes; at most ${MAX_POINTS} are accepted`, 'pitch');
  }
  // Multiplying instead of accumulating keeps hole k exactly at offset + k·pitch.
  return Array.from({ length: count }, (_, k) => offset + k * pitch);
}

/** Fixing order for holeCount holes: 0, last, then breadth-first midpoints of the open gaps. */
export function fixingOrder(holeCount: number): number[] {
  if (!Number.isInteger(holeCount) || holeCount < 0) {
    throw new EngineInputError('holeCount must be a whole number', 'holeCount');
  }
  if (holeCount === 0) return [];
  if (holeCount === 1) return [0];
  const order = [0, holeCount - 1];
  const gaps: [number, number][] = [[0, holeCount - 1]];
  for (let head = 0; head < gaps.length; head++) {
    const [a, b] = gaps[head];
    if (b - a < 2) continue;
    const mid = Math.floor((a + b) / 2);
    order.push(mid);
    gaps.push([a, mid], [mid, b]);
  }
  return order;
}

export function planHoles(input: HolePlanInput): HolePlan {
  const positionsMm = holePositions(input);
  return { positionsMm, fixingOrder: fixingOrder(positionsMm.length) };
}

/**
 * Reading to aim for at `positionMm`, given the holes fixed so far in the order they were fixed.
 * "face": the reading at the first fixed hole (the rail is brought to one flat reference).
 * "line": the straight line through the nearest fixed holes on either side; beyond the outermost
 * fixed hole, that hole's reading. Returns null when nothing is fixed yet (any reading will do:
 * the first hole sets the datum).
 */
export function targetReading(mode: TargetMode, positionMm: number, fixed: readonly FixedHole[]): number | null {
  if (!TARGET_MODES.includes(mode)) {
    throw new EngineInputError(`mode must be one of ${TARGET_MODES.join(', ')}`, 'mode');
  }
  const at = requireFinite('position', positionMm);
  fixed.forEach((h, i) => {
    requireFinite(`fixed[${i}].position`, h.positionMm);
    requireFinite(`fixed[${i}].reading`, h.readingMm);
  });
  if (fixed.length === 0) return null;
  if (mode === 'face') return fixed[0].readingMm;

  let left: FixedHole | null = null;
  let right: FixedHole | null = null;
  for (const h of fixed) {
    if (h.positionMm === at) return h.readingMm;
    if (h.positionMm < at && (!left || h.positionMm > left.positionMm)) left = h;
    if (h.positionMm > at && (!right || h.positionMm < right.positionMm)) right = h;
  }
  if (left && right) {
    const t = (at - left.positionMm) / (right.positionMm - left.positionMm);
    return left.readingMm + t * (right.readingMm - left.readingMm);
  }
  return (left ?? right)!.readingMm;
}

export interface GuideStep {
  hole: number;
  positionMm: number;
  /** Reading to aim for when this hole is tightened, from the holes fixed before it. */
  targetMm: number | null;
  /** Reading recorded at this hole once fixed, if any. */
  readingMm: number | null;
}

/**
 * Walks the fixing order with the readings recorded so far (by hole index) and gives each hole's
 * target from the holes fixed before it; the first hole without a reading is the next to fix.
 */
export function boltDownGuide(
  plan: HolePlan,
  mode: TargetMode,
  readingsByHole: ReadonlyMap<number, number>,
): { steps: GuideStep[]; nextHole: number | null } {
  const fixed: FixedHole[] = [];
  const steps: GuideStep[] = [];
  let nextHole: number | null = null;
  for (const hole of plan.fixingOrder) {
    const positionMm = plan.positionsMm[hole];
    const reading = readingsByHole.get(hole);
    const targetMm = targetReading(mode, positionMm, fixed);
    steps.push({ hole, positionMm, targetMm, readingMm: reading ?? null });
    if (reading === undefined) {
      if (nextHole === null) nextHole = hole;
    } else {
      fixed.push({ positionMm, readingMm: requireFinite(`reading at hole ${hole}`, reading) });
    }
  }
  return requireFiniteResult('readings', { steps, nextHole });
}
