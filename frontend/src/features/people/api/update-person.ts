import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { peopleKeys, type Person } from '../types';

export function useUpdatePerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...patch }: { id: string } & Schemas['UpdatePersonDto']) => api.patch<Person>(`/people/${id}`, patch),
    onSettled: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
