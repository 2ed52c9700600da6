import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys } from '../types';

export function useDeleteRail(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>(`/rails/${id}`),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
