import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys, type PatternInput } from '../types';

export function useUpdateHolePattern(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: PatternInput) =>
      answer(client.PUT('/api/hole-patterns/{id}', { params: { path: { id } }, body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
