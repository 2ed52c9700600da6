import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { evidenceKeys } from '../types';

export function useDeleteEvidence() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => void (await client.DELETE('/api/evidence/{id}', { params: { path: { id } } })),
    onSettled: () => qc.invalidateQueries({ queryKey: evidenceKeys.all }),
  });
}
