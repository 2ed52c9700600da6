import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { railKeys } from '../types';

export function useDeleteSweep() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => void (await client.DELETE('/api/sweeps/{id}', { params: { path: { id } } })),
    onSuccess: () =>
      Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
