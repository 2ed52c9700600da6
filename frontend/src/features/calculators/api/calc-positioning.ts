import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { PositioningRequest } from '../types';

/** POST /api/calc/positioning */
export const usePositioningCalculation = (body: PositioningRequest | null) =>
  useCalculation('positioning', body, (b) => answer(client.POST('/api/calc/positioning', { body: b })));
