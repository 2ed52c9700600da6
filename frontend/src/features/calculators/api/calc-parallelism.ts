import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { ParallelismRequest } from '../types';

/** POST /api/calc/parallelism */
export const useParallelismCalculation = (body: ParallelismRequest | null) =>
  useCalculation('parallelism', body, (b) => answer(client.POST('/api/calc/parallelism', { body: b })));
