import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface InvitationResult {
  invitationSent: boolean;
  invitationExpiresAt: string;
  /** Only when the mail could not be sent: the admin passes the link on. */
  invitationLink?: string;
}

export const useResendInvitation = () => useMutation({ mutationFn: (id: string) => api.post<InvitationResult>(`/people/${id}/invitation`) });
