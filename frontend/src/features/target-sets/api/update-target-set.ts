import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { targetSetKeys, type TargetSet, type TargetUnit } from '../types';

export interface TargetSetPatch {
  name?: string;
  description?: string;
  targets?: Record<string, { value: number; unit: TargetUnit; source?: string }>;
}

export function useUpdateTargetSet(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: TargetSetPatch) => api.patch<TargetSet>(`/target-sets/${id}`, patch),
    // Machines are judged against these targets: their counts change too.
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: targetSetKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
