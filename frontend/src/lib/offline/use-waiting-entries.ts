import { useMutationState } from '@tanstack/react-query';
import { COMMAND_KEY, type CommandVariables } from './commands';
import { sessionOwner } from './session-owner';

/**
 * The signed-in person's entries not yet recorded (waiting for a connection, or on their way)
 * whose path starts with `pathPrefix`, oldest first: a form shows them in place as "waiting".
 */
export function useWaitingEntries(pathPrefix: string): CommandVariables[] {
  const me = sessionOwner();
  return useMutationState({
    filters: {
      mutationKey: COMMAND_KEY,
      status: 'pending',
      predicate: (m) => {
        const v = m.state.variables as CommandVariables | undefined;
        return !!v && v.ownerId === me && v.path.startsWith(pathPrefix);
      },
    },
    select: (m) => m.state.variables as CommandVariables,
  });
}
