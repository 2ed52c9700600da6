import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type PatternInput, type PatternPreview } from '../types';

/** Live preview while a pattern is typed: the server works out the holes and checks them; nothing is saved. */
export const patternPreviewQueryOptions = (input: PatternInput | null) =>
  queryOptions({
    queryKey: holePatternKeys.preview(input),
    queryFn: () => api.post<PatternPreview>('/hole-patterns/preview', input),
    enabled: input !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export const usePatternPreview = (input: PatternInput | null) => useQuery(patternPreviewQueryOptions(input));
