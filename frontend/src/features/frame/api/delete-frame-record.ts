import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { frameKeys } from '../types';

export type FrameRecordKind = 'diagonal-checks' | 'bed-grids' | 'test-cuts';

const KEYS = {
  'diagonal-checks': frameKeys.diagonalChecks,
  'bed-grids': frameKeys.bedGrids,
  'test-cuts': frameKeys.testCuts,
} as const;

/** One route per kind, each with its own path in the description. */
const remove = (kind: FrameRecordKind, id: string, recordId: string) => {
  const params = { params: { path: { id, recordId } } };
  switch (kind) {
    case 'diagonal-checks':
      return client.DELETE('/api/machines/{id}/diagonal-checks/{recordId}', params);
    case 'bed-grids':
      return client.DELETE('/api/machines/{id}/bed-grids/{recordId}', params);
    case 'test-cuts':
      return client.DELETE('/api/machines/{id}/test-cuts/{recordId}', params);
  }
};

/** Deletes a diagonal check, bed grid or test cut entered by mistake (approved ones answer 409). */
export function useDeleteFrameRecord(machineId: string, kind: FrameRecordKind) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => void (await remove(kind, machineId, id)),
    onSettled: () =>
      Promise.all([KEYS[kind](machineId), ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}
