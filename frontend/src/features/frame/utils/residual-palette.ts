/**
 * Railwright's own diverging palette for heights about a fitted plane: deep teal for low, through
 * warm paper at zero, to brass and then rust for high. Colours are interpolated in sRGB between stops.
 */
const STOPS: [number, [number, number, number]][] = [
  [-1, [15, 76, 74]], // deep teal
  [-0.5, [92, 153, 144]], // verdigris
  [0, [243, 236, 220]], // warm paper
  [0.5, [206, 150, 52]], // brass
  [1, [150, 58, 30]], // rust
];

/** Colour for t in [−1, 1] (clamped). */
export function residualColour(t: number): string {
  const x = Math.max(-1, Math.min(1, Number.isFinite(t) ? t : 0));
  for (let i = 1; i < STOPS.length; i++) {
    const [t1, c1] = STOPS[i];
    if (x <= t1) {
      const [t0, c0] = STOPS[i - 1];
      const f = (x - t0) / (t1 - t0);
      const c = c0.map((v, k) => Math.round(v + (c1[k] - v) * f));
      return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
    }
  }
  return 'rgb(150, 58, 30)';
}

/** Dark text on the pale middle of the palette, white on its deep ends. */
export const textOn = (t: number) => (Math.abs(t) > 0.55 ? '#ffffff' : '#1e2624');

export const PALETTE_STOPS = STOPS.map(([t]) => t);
