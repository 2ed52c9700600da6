import { useCalculation } from './run-calculation';
import type { PositioningRequest, PositioningResult } from '../types';

/** POST /api/calc/positioning */
export const usePositioningCalculation = (body: PositioningRequest | null) =>
  useCalculation<PositioningRequest, PositioningResult>('positioning', body);
