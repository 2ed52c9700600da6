import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { railKeys, type Sweep } from '../types';

/** A correction of a sweep's details: only the fields sent change; null clears one. */
export interface SweepDetailsPatch {
  instrument?: string;
  temperatureC?: number | null;
  takenBy?: string;
  boltSize?: string | null;
  torqueNm?: number | null;
  datum?: string | null;
  notes?: string;
}

/** Needs the connection: a correction is checked against the approval at once, not later. */
export function useUpdateSweepDetails(sweepId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: SweepDetailsPatch) => api.patch<Sweep>(`/sweeps/${sweepId}`, patch),
    onSuccess: async (sweep) => {
      qc.setQueryData([...railKeys.all, 'sweep', sweepId], sweep);
      // The rail's list, its partner's parallelism (the datum) and the machine's state.
      await Promise.all([railKeys.all, ['bolt-downs'], ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey })));
    },
  });
}
