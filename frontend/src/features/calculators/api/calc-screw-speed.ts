import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { ScrewSpeedRequest } from '../types';

/** POST /api/calc/screw-speed */
export const useScrewSpeedCalculation = (body: ScrewSpeedRequest | null) =>
  useCalculation('screw-speed', body, (b) => answer(client.POST('/api/calc/screw-speed', { body: b })));
