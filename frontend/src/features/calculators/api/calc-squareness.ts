import { useCalculation } from './run-calculation';
import type { SquarenessRequest, SquarenessResult } from '../types';

/** POST /api/calc/squareness */
export const useSquarenessCalculation = (body: SquarenessRequest | null) =>
  useCalculation<SquarenessRequest, SquarenessResult>('squareness', body);
