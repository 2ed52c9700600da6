import { ascendingOrder, requireNumberArray, requireSameLength, requireFiniteResult } from './validate.js';

/**
 * Parallelism of two rails read at the same stations against one datum (all mm): the spread of
 * the differences B − A, and their mean, which is the height (or offset) of B over A.
 */

export interface ParallelismInput {
  positionsMm: readonly number[];
  railAMm: readonly number[];
  railBMm: readonly number[];
}

export interface ParallelismResult {
  parallelismMm: number;
  meanOffsetMm: number;
  /** B − A at each station, in input order. */
  differencesMm: number[];
}

export const MIN_PARALLELISM_POINTS = 2;

export function evaluateParallelism(input: ParallelismInput): ParallelismResult {
  const positions = requireNumberArray('positions', input.positionsMm, MIN_PARALLELISM_POINTS);
  const a = requireNumberArray('railA', input.railAMm, 0);
  const b = requireNumberArray('railB', input.railBMm, 0);
  requireSameLength('positions', positions, 'railA', a);
  requireSameLength('positions', positions, 'railB', b);
  ascendingOrder('positions', positions);

  const differences = new Array<number>(positions.length);
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (let i = 0; i < positions.length; i++) {
    const d = b[i] - a[i];
    differences[i] = d;
    if (d < min) min = d;
    if (d > max) max = d;
    sum += d;
  }
  return requireFiniteResult('railAMm and railBMm', {
    parallelismMm: max - min,
    meanOffsetMm: sum / positions.length,
    differencesMm: differences,
  });
}
