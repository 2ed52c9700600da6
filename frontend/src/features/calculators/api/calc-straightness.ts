import { answer, client } from '../../../lib/api-client';
import { useCalculation } from './run-calculation';
import type { StraightnessRequest } from '../types';
import { withResiduals } from '../with-residuals';

/** POST /api/calc/straightness?residuals=true */
export const useStraightnessCalculation = (body: StraightnessRequest | null) =>
  useCalculation('straightness', body, (b) =>
    answer(client.POST('/api/calc/straightness', { params: { query: { residuals: 'true' } }, body: b })).then(
      withResiduals,
    ),
  );
