import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { FlatnessRequest } from '../types';
import { withResiduals } from '../with-residuals';

/** POST /api/calc/flatness?residuals=true */
export const useFlatnessCalculation = (body: FlatnessRequest | null) =>
  useCalculation('flatness', body, (b) =>
    answer(client.POST('/api/calc/flatness', { params: { query: { residuals: 'true' } }, body: b })).then(
      withResiduals,
    ),
  );
