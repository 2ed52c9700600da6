import type { AnswerOf, Schemas } from '../../lib/api/schemas';
import { driveKeys } from './types';

/** A backlash check as the server answers it: entries as typed, results in their units and in mm. */
export type BacklashCheck = AnswerOf<'/api/axes/{id}/backlash-checks/{checkId}', 'get'>;
export type BacklashPosition = Schemas['BacklashPositionDto'];

export const backlashKeys = {
  list: (axisId: string) => [...driveKeys.all, 'axis', axisId, 'backlash'] as const,
};
