import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { evidenceKeys } from '../types';

export function useDeleteEvidence() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/evidence/${id}`),
    onSettled: () => qc.invalidateQueries({ queryKey: evidenceKeys.all }),
  });
}
