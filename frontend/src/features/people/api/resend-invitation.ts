import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface InvitationResult {
  invitationSent: boolean;
  invitationExpiresAt: string;
}

export const useResendInvitation = () => useMutation({ mutationFn: (id: string) => api.post<InvitationResult>(`/people/${id}/invitation`) });
