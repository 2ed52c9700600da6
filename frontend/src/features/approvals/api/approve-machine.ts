import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { invalidateMachine } from './invalidate';

export function useApproveMachine(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: Schemas['ApproveDto']) =>
      answer(client.POST('/api/machines/{id}/approvals', { params: { path: { id: machineId } }, body })),
    onSuccess: () => invalidateMachine(qc, machineId),
  });
}
