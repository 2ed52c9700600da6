/**
 * How much to exaggerate an out-of-square angle so a drawing shows the lean: a round factor
 * (1, 2, 5 × 10ⁿ) that brings the drawn lean to about 4° but never shrinks it.
 */
export function exaggerationFor(angleRad: number, drawnRad = 0.07): number {
  if (!(angleRad > 0)) return 1;
  const wanted = drawnRad / angleRad;
  if (wanted <= 1) return 1;
  const power = 10 ** Math.floor(Math.log10(wanted));
  const step = [1, 2, 5, 10].reverse().find((s) => s * power <= wanted) ?? 1;
  return step * power;
}
