import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { invalidateMachine } from './invalidate';

export function useReopenMachine(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: Schemas['ReopenDto']) =>
      answer(client.POST('/api/machines/{id}/reopen', { params: { path: { id: machineId } }, body })),
    // A refusal (someone reopened it first) changes the board too.
    onSettled: () => invalidateMachine(qc, machineId),
  });
}
