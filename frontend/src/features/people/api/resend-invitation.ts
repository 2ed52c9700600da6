import { useMutation } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';

export const useResendInvitation = () =>
  useMutation({
    mutationFn: (id: string) => answer(client.POST('/api/people/{id}/invitation', { params: { path: { id } } })),
  });
