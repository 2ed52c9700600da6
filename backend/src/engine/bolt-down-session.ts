import { fixingOrder, targetReading, TARGET_MODES, type FixedHole, type TargetMode } from './bolt-down.js';
import { EngineInputError } from './engine-input-error.js';
import { requireFinite, requireFiniteResult } from './validate.js';

/**
 * A bolt-down in progress, as recorded at the machine: the builder may fix holes out of the
 * proposed order, type a reading without fixing yet, or loosen a hole again. Targets follow the
 * holes actually fixed, in the order they were fixed (the first one fixed sets the face datum),
 * rather than the proposed order.
 */

export interface SessionHoleInput {
  /** Reading typed at the hole (mm), fixed or not; null when nothing was typed. */
  readingMm: number | null;
  fixed: boolean;
  /** Increasing number saying when the hole was fixed, relative to the others; null when not fixed. */
  fixSeq: number | null;
}

export interface SessionHoleState {
  index: number;
  positionMm: number;
  /** Rank in the proposed fixing order (0 = fix first). */
  order: number;
  /**
   * Reading to aim for: for a fixed hole, what it was aimed at when it was fixed (from the holes
   * fixed before it); for an open hole, from every hole fixed so far. Null before any hole is fixed.
   */
  targetMm: number | null;
  readingMm: number | null;
  /** reading − target, when both exist. */
  differenceMm: number | null;
  fixed: boolean;
}

export interface SessionState {
  holes: SessionHoleState[];
  /** The first hole of the proposed order not yet fixed; null when every hole is fixed. */
  nextHole: number | null;
  fixedCount: number;
  complete: boolean;
}

export function boltDownSession(
  positionsMm: readonly number[],
  mode: TargetMode,
  holes: ReadonlyMap<number, SessionHoleInput>,
): SessionState {
  if (!TARGET_MODES.includes(mode)) {
    throw new EngineInputError(`mode must be one of ${TARGET_MODES.join(', ')}`, 'mode');
  }
  positionsMm.forEach((p, i) => requireFinite(`position of hole ${i}`, p));
  for (const [index, h] of holes) {
    if (!Number.isInteger(index) || index < 0 || index >= positionsMm.length) {
      throw new EngineInputError(`hole ${index} is not on this rail (holes 0 to ${positionsMm.length - 1})`, 'index');
    }
    if (h.readingMm !== null) requireFinite(`reading at hole ${index}`, h.readingMm);
    if (h.fixed && h.readingMm === null)
      throw new EngineInputError(`hole ${index} is fixed without a reading`, 'reading');
  }

  const order = fixingOrder(positionsMm.length);
  const rank = new Map(order.map((hole, r) => [hole, r]));
  // Chronological fixing sequence; ties (should not happen) fall back to the proposed order.
  const fixedInSequence = [...holes.entries()]
    .filter(([, h]) => h.fixed)
    .sort(([a, ha], [b, hb]) => (ha.fixSeq ?? Infinity) - (hb.fixSeq ?? Infinity) || rank.get(a)! - rank.get(b)!);
  const sequence: FixedHole[] = fixedInSequence.map(([index, h]) => ({
    positionMm: positionsMm[index],
    readingMm: h.readingMm!,
  }));
  const seqOf = new Map(fixedInSequence.map(([index], k) => [index, k]));

  const states = positionsMm.map((positionMm, index): SessionHoleState => {
    const h = holes.get(index);
    const fixed = h?.fixed ?? false;
    const before = fixed ? sequence.slice(0, seqOf.get(index)) : sequence;
    const targetMm = targetReading(mode, positionMm, before);
    const readingMm = h?.readingMm ?? null;
    return {
      index,
      positionMm,
      order: rank.get(index)!,
      targetMm,
      readingMm,
      differenceMm: readingMm !== null && targetMm !== null ? readingMm - targetMm : null,
      fixed,
    };
  });
  const nextHole = order.find((hole) => !states[hole].fixed) ?? null;
  return requireFiniteResult('readings', {
    holes: states,
    nextHole,
    fixedCount: sequence.length,
    complete: positionsMm.length > 0 && nextHole === null,
  });
}
