import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { railKeys } from '../types';

export function useDeleteRail(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async () => void (await client.DELETE('/api/rails/{id}', { params: { path: { id } } })),
    onSuccess: () =>
      Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
