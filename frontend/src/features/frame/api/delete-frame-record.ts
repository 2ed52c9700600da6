import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { frameKeys } from '../types';

export type FrameRecordKind = 'diagonal-checks' | 'bed-grids' | 'test-cuts';

const KEYS = {
  'diagonal-checks': frameKeys.diagonalChecks,
  'bed-grids': frameKeys.bedGrids,
  'test-cuts': frameKeys.testCuts,
} as const;

/** Deletes a diagonal check, bed grid or test cut entered by mistake (approved ones answer 409). */
export function useDeleteFrameRecord(machineId: string, kind: FrameRecordKind) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/machines/${machineId}/${kind}/${id}`),
    onSettled: () =>
      Promise.all([KEYS[kind](machineId), ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}
