import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys } from '../types';

/** Removes a run recorded in error (refused once an approval was based on it). */
export function useDeletePositioningRun(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (runId: string) => api.delete<void>(`/axes/${axisId}/positioning-runs/${runId}`),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
