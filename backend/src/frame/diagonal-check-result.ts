import { evaluateSquareness, type SquarenessResult } from '../engine/squareness.js';

export interface DiagonalInputMm {
  sideXMm: number;
  sideYMm: number;
  diagonal1Mm: number;
  diagonal2Mm: number;
  gantrySpanMm: number | null;
}

/**
 * How to square a dual-drive gantry riding on the Y rails. Diagonal 1 runs from the X0 Y0 corner
 * to the far corner: when it is the long one the gantry's X-far end runs ahead (towards Y-far) of
 * its X0 end, so that end is brought back towards Y0 (or the X0 end moved forward) by span × tan γ.
 */
export interface SquaringCorrection {
  moveMm: number;
  spanMm: number;
  /** The end of the gantry that runs ahead and is moved back. */
  end: 'x-far' | 'x0' | null;
  towards: 'y0' | null;
  instruction: string;
}

export interface DiagonalCheckResult extends Omit<SquarenessResult, 'correctionMm' | 'spanMm'> {
  correction: SquaringCorrection;
}

export function correctionFor(r: SquarenessResult): SquaringCorrection {
  const moveMm = r.correctionMm;
  if (r.diagonalDifferenceMm === 0) {
    return {
      moveMm: 0,
      spanMm: r.spanMm,
      end: null,
      towards: null,
      instruction: 'The diagonals are equal: the gantry is square; nothing to move.',
    };
  }
  const end = r.longDiagonal === 1 ? 'x-far' : 'x0';
  const other = end === 'x-far' ? 'X0' : 'X-far';
  const name = end === 'x-far' ? 'X-far' : 'X0';
  return {
    moveMm,
    spanMm: r.spanMm,
    end,
    towards: 'y0',
    instruction: `Diagonal ${r.longDiagonal} is long by ${r.diagonalDifferenceMm.toFixed(2)} mm: the ${name} end of the gantry runs ahead. Move the ${name} end back towards Y0 by ${moveMm.toFixed(2)} mm over the ${r.spanMm.toFixed(0)} mm gantry span (or the ${other} end forward by the same), re-home and check again.`,
  };
}

export function diagonalCheckResult(input: DiagonalInputMm): DiagonalCheckResult {
  const r = evaluateSquareness({
    sideXMm: input.sideXMm,
    sideYMm: input.sideYMm,
    diagonal1Mm: input.diagonal1Mm,
    diagonal2Mm: input.diagonal2Mm,
    gantrySpanMm: input.gantrySpanMm ?? undefined,
  });
  const { correctionMm: _c, spanMm: _s, ...rest } = r;
  return { ...rest, correction: correctionFor(r) };
}

/**
 * Diagonals that no parallelogram with these sides can have (each diagonal is the third side of a
 * triangle made with the two sides, so it lies strictly between |a − b| and a + b). Returns the
 * messages naming the field, empty when the lengths are possible.
 */
export function impossibleDiagonals(i: DiagonalInputMm): string[] {
  const out: string[] = [];
  const longest = i.sideXMm + i.sideYMm;
  const shortest = Math.abs(i.sideXMm - i.sideYMm);
  for (const [field, d] of [
    ['diagonal1', i.diagonal1Mm],
    ['diagonal2', i.diagonal2Mm],
  ] as const) {
    if (d >= longest)
      out.push(
        `${field} must be shorter than sideX + sideY (a diagonal is the third side of a triangle with the two sides)`,
      );
    else if (d <= shortest) out.push(`${field} must be longer than the difference of sideX and sideY`);
  }
  return out;
}
