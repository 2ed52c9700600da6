import { useMutation, type MutateOptions } from '@tanstack/react-query';
import { COMMAND_KEY, newCommandKey, type CommandVariables } from './commands';
import { sessionOwner, sessionOwnerName } from './session-owner';

export type CommandInput = Omit<CommandVariables, 'key' | 'ownerId' | 'ownerName'>;

/**
 * A recording form's write: sent at once when there is a connection, kept on the device and sent
 * once when it returns when there is not (see commands.ts). Entries of one person go out in the
 * order they were typed. `send` makes the entry's key; a form that lets its user send the same
 * entry again (a retry button) passes the key it got the first time.
 */
export function useCommand<TData = unknown>() {
  const ownerId = sessionOwner() ?? '';
  const mutation = useMutation<TData, Error, CommandVariables>({ mutationKey: COMMAND_KEY, scope: { id: `entries:${ownerId}` } });
  const send = (input: CommandInput, options?: MutateOptions<TData, Error, CommandVariables> & { key?: string }) => {
    const { key, ...callbacks } = options ?? {};
    const variables: CommandVariables = { ...input, key: key ?? newCommandKey(), ownerId, ownerName: sessionOwnerName() };
    mutation.mutate(variables, callbacks);
    return variables.key;
  };
  return { ...mutation, send };
}
