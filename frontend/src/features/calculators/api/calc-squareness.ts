import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { SquarenessRequest } from '../types';

/** POST /api/calc/squareness */
export const useSquarenessCalculation = (body: SquarenessRequest | null) =>
  useCalculation('squareness', body, (b) => answer(client.POST('/api/calc/squareness', { body: b })));
