import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { safetyKeys, type SafetyAnswer, type SafetyWalk } from '../types';

export interface AnswerInput {
  itemId: string;
  answer: SafetyAnswer;
  note?: string;
}

export function useAnswerSafetyItem(machineId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, ...body }: AnswerInput) => api.put<SafetyWalk>(`/machines/${machineId}/safety-walk/items/${encodeURIComponent(itemId)}`, body),
    onSuccess: (walk) => qc.setQueryData(safetyKeys.walk(machineId), walk),
  });
}
