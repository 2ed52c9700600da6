import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';
import { peopleKeys, type Person } from '../types';
import type { InvitationResult } from './resend-invitation';

export type AddPersonInput = Schemas['CreatePersonDto'];

export function useAddPerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AddPersonInput) => api.post<{ person: Person } & InvitationResult>('/people', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
