import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys, type PatternInput } from '../types';

/** Live preview while a pattern is typed: the server works out the holes and checks them; nothing is saved. */
export const patternPreviewQueryOptions = (input: PatternInput | null) =>
  queryOptions({
    queryKey: holePatternKeys.preview(input),
    queryFn: () => answer(client.POST('/api/hole-patterns/preview', { body: input! })),
    enabled: input !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });

export const usePatternPreview = (input: PatternInput | null) => useQuery(patternPreviewQueryOptions(input));
