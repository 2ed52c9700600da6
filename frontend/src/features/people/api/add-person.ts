import { useMutation, useQueryClient } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { peopleKeys } from '../types';

export type AddPersonInput = Schemas['CreatePersonDto'];

export function useAddPerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: AddPersonInput) => answer(client.POST('/api/people', { body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
