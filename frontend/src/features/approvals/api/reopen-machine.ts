import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Approval } from '../types';
import { invalidateMachine } from './invalidate';

export function useReopenMachine(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { reason: string }) => api.post<{ state: 'reopened'; approval: Approval }>(`/machines/${machineId}/reopen`, input),
    // A refusal (someone reopened it first) changes the board too.
    onSettled: () => invalidateMachine(qc, machineId),
  });
}
