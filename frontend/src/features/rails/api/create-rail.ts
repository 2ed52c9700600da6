import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { LengthUnit } from '../../../lib/units';
import { railKeys, type Rail } from '../types';

export interface RailInput {
  label: string;
  axis: string;
  lengthUnit: LengthUnit;
  length: number;
  profileSize?: number;
  holePitch: number;
  firstHole: number;
  spacing: number | null;
  endDistance: number | null;
  partnerRailId?: string | null;
}

export function useCreateRail(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: RailInput) => api.post<Rail>(`/machines/${machineId}/rails`, input),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
