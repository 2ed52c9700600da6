import { BadRequestException } from '@nestjs/common';

/** Below this many points the residuals come along unless refused: they cost next to nothing there. */
export const RESIDUALS_BY_DEFAULT_MAX = 2_000;

/**
 * `?residuals=true` sends the residual of every point (what a chart of the fit draws);
 * `?residuals=false` leaves them out. Without it, small calculations send them and large ones
 * do not, so a 200 000-point fit answers a few hundred bytes rather than megabytes.
 */
export function residualsWanted(query: string | undefined, points: number): boolean {
  if (query === undefined || query === '') return points <= RESIDUALS_BY_DEFAULT_MAX;
  if (query === 'true' || query === '1') return true;
  if (query === 'false' || query === '0') return false;
  throw new BadRequestException(['residuals must be true or false']);
}
