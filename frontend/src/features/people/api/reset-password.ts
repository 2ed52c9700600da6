import { useMutation } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';

/** Resets a member's password: they are signed out and a link goes to their own e-mail only. */
export const useResetPassword = () =>
  useMutation({
    mutationFn: (id: string) => answer(client.POST('/api/people/{id}/password-reset', { params: { path: { id } } })),
  });
