import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { targetSetKeys, type Target } from '../types';

export interface TargetSetPatch {
  name?: string;
  description?: string;
  /** The description leaves the targets' values open; they are the set's own. */
  targets?: Record<string, Pick<Target, 'value' | 'unit' | 'source'>>;
}

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
