import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { travelTrialQueryOptions } from './get-travel-trial';
import { driveKeys } from '../types';

/** Removes a trial recorded in error (refused once an approval was based on it). */
export function useDeleteTravelTrial(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (trialId: string) =>
      void (await client.DELETE('/api/axes/{id}/travel-trials/{trialId}', {
        params: { path: { id: axisId, trialId } },
      })),
    onSuccess: (_: void, trialId: string) => {
      // Gone: nothing should ask for it again while the list catches up.
      qc.removeQueries({ queryKey: travelTrialQueryOptions(axisId, trialId).queryKey, exact: true });
      return Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]);
    },
  });
}
