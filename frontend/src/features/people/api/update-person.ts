import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Role } from '../../../lib/session/user';
import { peopleKeys, type Person } from '../types';

export function useUpdatePerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...patch }: { id: string; role?: Role; active?: boolean }) => api.patch<Person>(`/people/${id}`, patch),
    onSettled: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
