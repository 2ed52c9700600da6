import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type HolePattern, type PatternInput } from '../types';

export function useUpdateHolePattern(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PatternInput) => api.put<HolePattern>(`/hole-patterns/${id}`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
