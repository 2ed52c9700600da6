import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys, type HolePattern, type PatternInput } from '../types';

export function useCreateHolePattern(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PatternInput) => api.post<HolePattern>(`/machines/${machineId}/hole-patterns`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
