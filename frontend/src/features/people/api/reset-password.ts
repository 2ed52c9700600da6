import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface ResetResult {
  resetSent: boolean;
  resetExpiresAt: string;
}

/** Resets a member's password: they are signed out and a link goes to their own e-mail only. */
export const useResetPassword = () => useMutation({ mutationFn: (id: string) => api.post<ResetResult>(`/people/${id}/password-reset`) });
