import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { safetyKeys, type SafetySection } from '../types';

export interface SafetyItemInput {
  section: SafetySection;
  text: string;
}

/** Adds a workshop item, asked on every machine's walk. */
export function useAddSafetyItem() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SafetyItemInput) => api.post<{ id: string }>('/safety-items', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: safetyKeys.all }),
  });
}
