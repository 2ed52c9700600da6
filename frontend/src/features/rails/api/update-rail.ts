import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { railKeys, type Rail } from '../types';
import type { RailInput } from './create-rail';

export function useUpdateRail(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: Partial<RailInput>) => api.patch<Rail>(`/rails/${id}`, patch),
    // A partner change touches the other rail too: refresh every rail query.
    onSuccess: () => qc.invalidateQueries({ queryKey: railKeys.all }),
  });
}
