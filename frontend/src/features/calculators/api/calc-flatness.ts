import { useCalculation } from './run-calculation';
import type { FlatnessRequest, FlatnessResult } from '../types';

/** POST /api/calc/flatness */
export const useFlatnessCalculation = (body: FlatnessRequest | null) =>
  useCalculation<FlatnessRequest, FlatnessResult>('flatness?residuals=true', body);
