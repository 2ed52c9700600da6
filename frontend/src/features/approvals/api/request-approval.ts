import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { invalidateMachine } from './invalidate';

export function useRequestApproval(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () =>
      answer(client.POST('/api/machines/{id}/approval-requests', { params: { path: { id: machineId } } })),
    // A refusal lists the blocking checks; the board is refreshed either way.
    onSettled: () => invalidateMachine(qc, machineId),
  });
}
