import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sendTo } from '../../../lib/api/fetch-json';
import type { AnswerOf, Schemas } from '../../../lib/api/schemas';
import { authKeys } from '../../../lib/session/get-me';

export type LoginInput = Schemas['LoginDto'];

// Through the plain transport, typed from the description: the sign-in page loads without the typed client.
export const login = (input: LoginInput) => sendTo<AnswerOf<'/api/auth/login', 'post'>>('POST', '/auth/login', input);

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: ({ user }) => {
      // What the last person saw goes; entries still waiting to be sent stay (each with its author).
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.me[0] || q.queryKey[1] !== authKeys.me[1] });
      qc.setQueryData(authKeys.me, user);
    },
  });
}
