import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { safetyKeys } from '../types';

/** A fresh walk, for a re-check or once the approved one is locked. */
export function useStartSafetyWalk(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () =>
      answer(client.POST('/api/machines/{id}/safety-walk/rounds', { params: { path: { id: machineId } } })),
    onSuccess: (walk) => {
      qc.setQueryData(safetyKeys.walk(machineId), walk);
      return Promise.all(MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })));
    },
  });
}
