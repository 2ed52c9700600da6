import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { MACHINE_STATE_KEYS } from '../../../lib/machine-state-keys';
import { railKeys } from '../types';

/** A correction of a sweep's details: only the fields sent change; null clears one. */
export type SweepDetailsPatch = Schemas['UpdateSweepDetailsDto'];

/** Needs the connection: a correction is checked against the approval at once, not later. */
export function useUpdateSweepDetails(sweepId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SweepDetailsPatch) =>
      answer(client.PATCH('/api/sweeps/{id}', { params: { path: { id: sweepId } }, body })),
    onSuccess: async (sweep) => {
      qc.setQueryData([...railKeys.all, 'sweep', sweepId], sweep);
      // The rail's list, its partner's parallelism (the datum) and the machine's state.
      await Promise.all(
        [railKeys.all, ['bolt-downs'], ...MACHINE_STATE_KEYS].map((queryKey) => qc.invalidateQueries({ queryKey })),
      );
    },
  });
}
