import { scaleLinear } from 'd3-scale';

export interface NiceAxis {
  /** Domain widened to round ends. */
  domain: [number, number];
  /** Round ticks inside it: multiples of 1, 2 or 5 × 10^k. */
  ticks: number[];
}

/**
 * Round ends and ticks for an axis through the given values, from d3-scale's `nice()` and
 * `ticks()`, so an axis reads 0, 0.5, 1, 1.5 and never −0.44, 1.56, 3.56. Every chart takes its
 * axes from here. Non-finite values are left out; with none (or one) a unit-wide span is drawn.
 */
export function niceAxis(values: readonly number[], count = 6): NiceAxis {
  const finite = values.filter((v) => Number.isFinite(v));
  let lo = finite.length ? Math.min(...finite) : 0;
  let hi = finite.length ? Math.max(...finite) : 1;
  if (hi - lo < 1e-12) {
    // A flat line still needs a span: one step of its own size around it.
    const pad = lo === 0 ? 1 : Math.abs(lo) / 10;
    lo -= pad;
    hi += pad;
  }
  const scale = scaleLinear().domain([lo, hi]).nice(count);
  const [a, b] = scale.domain() as [number, number];
  // Float steps (0.1 × 3) print as 0.30000000000000004 otherwise.
  const ticks = scale.ticks(count).map(tidy);
  return { domain: [tidy(a), tidy(b)], ticks };
}

const tidy = (v: number) => (v === 0 ? 0 : Number(v.toPrecision(12)));

/** A tick's label: as short as the value allows. */
export const tickText = (v: number) => Number(Number(v).toPrecision(6)).toString();
