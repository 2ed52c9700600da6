import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { safetyKeys, type SafetyWalk } from '../types';

/** A fresh walk, for a re-check or once the approved one is locked. */
export function useStartSafetyWalk(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<SafetyWalk>(`/machines/${machineId}/safety-walk/rounds`),
    onSuccess: (walk) => {
      qc.setQueryData(safetyKeys.walk(machineId), walk);
      return Promise.all(MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })));
    },
  });
}
