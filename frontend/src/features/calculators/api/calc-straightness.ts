import { useCalculation } from './run-calculation';
import type { StraightnessRequest, StraightnessResult } from '../types';

/** POST /api/calc/straightness */
export const useStraightnessCalculation = (body: StraightnessRequest | null) =>
  useCalculation<StraightnessRequest, StraightnessResult>('straightness?residuals=true', body);
