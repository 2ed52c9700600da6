import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { railKeys } from '../types';

export type RailInput = Schemas['CreateRailDto'];

export function useCreateRail(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: RailInput) =>
      answer(client.POST('/api/machines/{id}/rails', { params: { path: { id: machineId } }, body })),
    onSuccess: () =>
      Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
