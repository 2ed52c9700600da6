import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys } from '../types';

/** Removes a check recorded in error (refused once an approval was based on it). */
export function useDeleteBacklash(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (checkId: string) =>
      void (await client.DELETE('/api/axes/{id}/backlash-checks/{checkId}', {
        params: { path: { id: axisId, checkId } },
      })),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]),
  });
}
