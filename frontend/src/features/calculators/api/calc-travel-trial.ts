import { useCalculation } from './run-calculation';
import type { TravelTrialRequest, TravelTrialResult } from '../types';

/** POST /api/calc/travel-trial */
export const useTravelTrialCalculation = (body: TravelTrialRequest | null) =>
  useCalculation<TravelTrialRequest, TravelTrialResult>('travel-trial', body);
