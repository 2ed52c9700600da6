import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { answer, client } from '../../../lib/api-client';
import type { Schemas } from '../../../lib/api/schemas';

export const passwordLinkQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['auth', 'password-link', token],
    queryFn: () => answer(client.GET('/api/auth/password-reset/{token}', { params: { path: { token } } })),
    retry: false,
  });

export const usePasswordLink = (token: string) => useQuery({ ...passwordLinkQueryOptions(token), enabled: !!token });

export const useSetPassword = () =>
  useMutation({
    mutationFn: (body: Schemas['PasswordResetDto']) => answer(client.POST('/api/auth/password-reset', { body })),
  });

/** "Forgot my password": the answer is the same whether or not the address has an account. */
export const useRequestPasswordLink = () =>
  useMutation({
    mutationFn: (body: Schemas['ForgotPasswordDto']) =>
      answer(client.POST('/api/auth/password-reset/request', { body })),
  });
