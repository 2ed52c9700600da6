import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { railKeys } from '../types';

export function useUpdateRail(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: Schemas['UpdateRailDto']) =>
      answer(client.PATCH('/api/rails/{id}', { params: { path: { id } }, body })),
    // A partner change touches the other rail too: refresh every rail query.
    onSuccess: () => qc.invalidateQueries({ queryKey: railKeys.all }),
  });
}
