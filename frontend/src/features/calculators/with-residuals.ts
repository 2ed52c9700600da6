/**
 * Asked with `?residuals=true`, a fit's least-squares line or plane carries one residual per point
 * (the description leaves them optional, as they are sent unasked for small inputs only). An answer
 * without them cannot be drawn, so it is refused here rather than drawn empty.
 */
export function withResiduals<R extends { leastSquares: { residuals?: number[] } }>(
  result: R,
): R & { leastSquares: { residuals: number[] } } {
  const residuals = result.leastSquares.residuals;
  if (!residuals) throw new Error('The calculation came back without the residuals it was asked for');
  return { ...result, leastSquares: { ...result.leastSquares, residuals } };
}
