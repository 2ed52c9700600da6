import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateMachine } from './invalidate';

export function useWaiveCheck(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ checkKey, reason }: { checkKey: string; reason: string }) =>
      api.post<{ id: string }>(`/machines/${machineId}/checks/${encodeURIComponent(checkKey)}/waiver`, { reason }),
    onSuccess: () => invalidateMachine(qc, machineId),
  });
}
