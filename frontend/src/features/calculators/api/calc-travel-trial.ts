import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { TravelTrialRequest } from '../types';

/** POST /api/calc/travel-trial */
export const useTravelTrialCalculation = (body: TravelTrialRequest | null) =>
  useCalculation('travel-trial', body, (b) => answer(client.POST('/api/calc/travel-trial', { body: b })));
