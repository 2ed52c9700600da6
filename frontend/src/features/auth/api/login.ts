import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { User } from '../types';
import { authKeys } from './get-me';

export interface LoginInput {
  email: string;
  password: string;
}

export const login = (input: LoginInput) => api.post<{ user: User }>('/auth/login', input);

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ user }) => {
      qc.clear();
      qc.setQueryData(authKeys.me, user);
    },
  });
}
