import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { railKeys, type Rail } from '../types';

export type RailInput = Schemas['CreateRailDto'];

export function useCreateRail(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RailInput) => api.post<Rail>(`/machines/${machineId}/rails`, input),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
