import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys } from '../types';

/** Removes a trial recorded in error (refused once an approval was based on it). */
export function useDeleteTravelTrial(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (trialId: string) => api.delete<void>(`/axes/${axisId}/travel-trials/${trialId}`),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
