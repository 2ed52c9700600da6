import { paths } from '../../config/paths';
import type { CheckPlace } from './types';

/** The screen a check's record is shown on: the server names the place, the app makes the link. */
export function checkPath(place: CheckPlace): string {
  if ('railId' in place) return paths.rail(place.machineId, place.railId);
  if ('axisId' in place) return paths.axis(place.machineId, place.axisId);
  return `${paths.machine(place.machineId)}?tab=${place.tab}`;
}
