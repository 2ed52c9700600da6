import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Role } from '../../../lib/session/user';
import { peopleKeys, type Person } from '../types';
import type { InvitationResult } from './resend-invitation';

export interface AddPersonInput {
  name: string;
  email: string;
  role: Role;
}

export function useAddPerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AddPersonInput) => api.post<{ person: Person } & InvitationResult>('/people', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
