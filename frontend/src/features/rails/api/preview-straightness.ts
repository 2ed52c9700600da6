import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { railKeys, type StraightnessResult } from '../types';

/** The straightness calculator's request; the preview always names both unit families. */
export type PreviewBody = Schemas['StraightnessDto'] &
  Required<Pick<Schemas['StraightnessDto'], 'lengthUnit' | 'readingUnit'>>;

/** Live preview while readings are typed: the calculators route fits them, nothing is saved. */
export const straightnessPreviewQueryOptions = (body: PreviewBody | null) =>
  queryOptions({
    queryKey: railKeys.preview(body),
    queryFn: async () => ({
      body: body!,
      result: await api.post<StraightnessResult>('/calc/straightness?residuals=true', body),
    }),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export const useStraightnessPreview = (body: PreviewBody | null) => useQuery(straightnessPreviewQueryOptions(body));
