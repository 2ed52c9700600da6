import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { targetSetKeys } from '../types';

/** The fields to change; each target sent replaces that target (value, unit, source, reference). */
export type TargetSetPatch = Schemas['UpdateTargetSetDto'];

export function useUpdateTargetSet(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: TargetSetPatch) =>
      answer(client.PATCH('/api/target-sets/{id}', { params: { path: { id } }, body })),
    // Machines are judged against these targets: their counts change too.
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: targetSetKeys.all }),
        qc.invalidateQueries({ queryKey: ['machines'] }),
      ]),
  });
}
