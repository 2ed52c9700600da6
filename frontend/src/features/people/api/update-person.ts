import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { peopleKeys } from '../types';

export function useUpdatePerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: string } & Schemas['UpdatePersonDto']) =>
      answer(client.PATCH('/api/people/{id}', { params: { path: { id } }, body })),
    onSettled: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
