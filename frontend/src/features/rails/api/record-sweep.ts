import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type NewSweep, type Sweep } from '../types';

/** The id is made in the browser, so a retried save is the same sweep on the server. */
export function useRecordSweep(railId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (sweep: NewSweep) => api.post<Sweep>(`/rails/${railId}/sweeps`, sweep),
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: railKeys.all }), qc.invalidateQueries({ queryKey: ['machines'] })]),
  });
}
