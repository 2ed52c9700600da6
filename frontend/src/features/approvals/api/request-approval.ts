import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateMachine } from './invalidate';

export function useRequestApproval(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ id: string; state: string }>(`/machines/${machineId}/approval-requests`),
    // A refusal lists the blocking checks; the board is refreshed either way.
    onSettled: () => invalidateMachine(qc, machineId),
  });
}
