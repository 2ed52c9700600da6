import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type Rail } from '../types';

export interface RailInput {
  label: string;
  axis: string;
  lengthMm: number;
  profileSize?: number;
  holePitchMm: number;
  firstHoleMm: number;
  partnerRailId?: string | null;
}

export function useCreateRail(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RailInput) => api.post<Rail>(`/machines/${machineId}/rails`, input),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
