import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { AnswerOf, Schemas } from '../../../lib/api/schemas';
import { railKeys, type StraightnessResult } from '../types';

/** The straightness calculator's request; the preview always names both unit families. */
export type PreviewBody = Schemas['StraightnessDto'] &
  Required<Pick<Schemas['StraightnessDto'], 'lengthUnit' | 'readingUnit'>>;

type Calculated = AnswerOf<'/api/calc/straightness', 'post'>;

/**
 * Asked with `?residuals=true`, all three fitted lines carry a residual per station (the description
 * leaves them optional, as they come unasked for small inputs only); without them there is nothing to draw.
 */
function fitted(r: Calculated): StraightnessResult {
  const ls = r.leastSquares.residuals;
  const mz = r.minimumZone.residuals;
  const ep = r.endPoint.residuals;
  if (!ls || !mz || !ep) throw new Error('The straightness fit came back without its residuals');
  return {
    ...r,
    leastSquares: { ...r.leastSquares, residuals: ls },
    minimumZone: { ...r.minimumZone, residuals: mz },
    endPoint: { ...r.endPoint, residuals: ep },
  };
}

/** Live preview while readings are typed: the calculators route fits them, nothing is saved. */
export const straightnessPreviewQueryOptions = (body: PreviewBody | null) =>
  queryOptions({
    queryKey: railKeys.preview(body),
    queryFn: async () => ({
      body: body!,
      result: fitted(
        await answer(client.POST('/api/calc/straightness', { params: { query: { residuals: 'true' } }, body: body! })),
      ),
    }),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export const useStraightnessPreview = (body: PreviewBody | null) => useQuery(straightnessPreviewQueryOptions(body));
