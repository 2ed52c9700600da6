import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateMachine } from './invalidate';

export interface ApprovalResult {
  id: string;
  approvedAt: string;
  approvedBy: string;
  recordHash: string;
  recheckDueAt: string;
}

export function useApproveMachine(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { password: string; statement: string }) => api.post<ApprovalResult>(`/machines/${machineId}/approvals`, input),
    onSuccess: () => invalidateMachine(qc, machineId),
  });
}
