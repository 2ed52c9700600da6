import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface PasswordLink {
  email: string;
  name: string;
  workshop: string;
  expiresAt: string;
}

export const passwordLinkQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['auth', 'password-link', token], queryFn: () => api.get<PasswordLink>(`/auth/password-reset/${encodeURIComponent(token)}`), retry: false });

export const usePasswordLink = (token: string) => useQuery({ ...passwordLinkQueryOptions(token), enabled: !!token });

export const useSetPassword = () =>
  useMutation({ mutationFn: (input: { token: string; password: string }) => api.post<{ email: string; signedIn: boolean }>('/auth/password-reset', input) });

/** "Forgot my password": the answer is the same whether or not the address has an account. */
export const useRequestPasswordLink = () =>
  useMutation({ mutationFn: (input: { email: string }) => api.post<{ message: string }>('/auth/password-reset/request', input) });
