import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { positioningRunQueryOptions } from './get-positioning-run';
import { driveKeys } from '../types';

/** Removes a run recorded in error (refused once an approval was based on it). */
export function useDeletePositioningRun(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (runId: string) =>
      void (await client.DELETE('/api/axes/{id}/positioning-runs/{runId}', {
        params: { path: { id: axisId, runId } },
      })),
    onSuccess: (_: void, runId: string) => {
      // Gone: nothing should ask for it again while the list catches up.
      qc.removeQueries({ queryKey: positioningRunQueryOptions(axisId, runId).queryKey, exact: true });
      return Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]);
    },
  });
}
