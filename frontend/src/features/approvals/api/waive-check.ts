import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import { invalidateMachine } from './invalidate';

export function useWaiveCheck(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ checkKey, reason }: { checkKey: string; reason: string }) =>
      answer(
        client.POST('/api/machines/{id}/checks/{checkId}/waiver', {
          params: { path: { id: machineId, checkId: checkKey } },
          body: { reason },
        }),
      ),
    onSuccess: () => invalidateMachine(qc, machineId),
  });
}
