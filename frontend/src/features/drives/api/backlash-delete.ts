import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { driveKeys } from '../types';

/** Removes a check recorded in error (refused once an approval was based on it). */
export function useDeleteBacklash(axisId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (checkId: string) => api.delete<void>(`/axes/${axisId}/backlash-checks/${checkId}`),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: driveKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
