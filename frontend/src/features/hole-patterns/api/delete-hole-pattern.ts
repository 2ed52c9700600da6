import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { holePatternKeys } from '../types';

export function useDeleteHolePattern(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async () => void (await client.DELETE('/api/hole-patterns/{id}', { params: { path: { id } } })),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
