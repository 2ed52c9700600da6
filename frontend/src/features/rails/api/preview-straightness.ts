import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { railKeys, type StraightnessResult } from '../types';

export interface PreviewBody {
  positions: number[];
  readings: number[];
  readingUnit: LengthUnit;
  lengthUnit: LengthUnit;
}

/** Live preview while readings are typed: the calculators route fits them, nothing is saved. */
export const straightnessPreviewQueryOptions = (body: PreviewBody | null) =>
  queryOptions({
    queryKey: railKeys.preview(body),
    queryFn: async () => ({ body: body!, result: await api.post<StraightnessResult>('/calc/straightness?residuals=true', body) }),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export const useStraightnessPreview = (body: PreviewBody | null) => useQuery(straightnessPreviewQueryOptions(body));
