import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { holePatternKeys, type PatternInput } from '../types';

export function useCreateHolePattern(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: PatternInput) =>
      answer(client.POST('/api/machines/{id}/hole-patterns', { params: { path: { id: machineId } }, body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: holePatternKeys.all }),
  });
}
