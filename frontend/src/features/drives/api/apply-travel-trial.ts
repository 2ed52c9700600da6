import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { driveKeys } from '../types';

/**
 * Makes the trial's corrected steps per mm the axis's value; answers with the axis. A correction
 * far from the drive's theoretical value needs `confirmFarCorrection`.
 */
export function useApplyTravelTrial(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ trialId, confirmFarCorrection }: { trialId: string; confirmFarCorrection?: boolean }) =>
      answer(
        client.POST('/api/axes/{id}/travel-trials/{trialId}/apply', {
          params: { path: { id: axisId, trialId } },
          body: confirmFarCorrection ? { confirmFarCorrection: true } : {},
        }),
      ),
    onSuccess: (axis) => {
      qc.setQueryData(driveKeys.axis(axisId), axis);
      return Promise.all([
        qc.invalidateQueries({ queryKey: driveKeys.all }),
        ...MACHINE_STATE_KEYS.map((queryKey) => qc.invalidateQueries({ queryKey })),
      ]);
    },
  });
}
