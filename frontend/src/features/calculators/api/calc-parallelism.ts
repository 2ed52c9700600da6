import { useCalculation } from './run-calculation';
import type { ParallelismRequest, ParallelismResult } from '../types';

/** POST /api/calc/parallelism */
export const useParallelismCalculation = (body: ParallelismRequest | null) =>
  useCalculation<ParallelismRequest, ParallelismResult>('parallelism', body);
