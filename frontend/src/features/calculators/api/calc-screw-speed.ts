import { useCalculation } from './run-calculation';
import type { ScrewSpeedRequest, ScrewSpeedResult } from '../types';

/** POST /api/calc/screw-speed */
export const useScrewSpeedCalculation = (body: ScrewSpeedRequest | null) =>
  useCalculation<ScrewSpeedRequest, ScrewSpeedResult>('screw-speed', body);
