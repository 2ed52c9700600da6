import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { holePatternKeys } from '../types';

export function useDeleteHolePattern(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(`/hole-patterns/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
