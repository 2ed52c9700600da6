import { useEffect, useRef, useState } from 'react';
import { useMutation, useQueryClient, type MutateOptions } from '@tanstack/react-query';
import { COMMAND_KEY, isOnline, newCommandKey, type CommandVariables } from './commands';
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
  const mutation = useMutation<TData, Error, CommandVariables>({
    mutationKey: COMMAND_KEY,
    scope: { id: `entries:${ownerId}` },
  });
  const send = (input: CommandInput, options?: MutateOptions<TData, Error, CommandVariables> & { key?: string }) => {
    const { key, ...callbacks } = options ?? {};
    const variables: CommandVariables = {
      ...input,
      key: key ?? newCommandKey(),
      ownerId,
      ownerName: sessionOwnerName(),
    };
    mutation.mutate(variables, callbacks);
    return variables.key;
  };
  return { ...mutation, send };
}

/**
 * A recording form's write, with what the form needs to show: `record` sends the entry; when it
 * has to wait for the connection `onQueued` runs (the form clears for the next entry, which shows
 * as waiting in place), when it is recorded `onRecorded` runs. A refusal while the form is open
 * is the form's to show (`error`) and keeps what was typed; one that comes later, after the form
 * has gone, is shown by the banner. `busy` is true only while an entry is on its way, never while
 * entries wait, so a form is never greyed out for want of a connection.
 */
export function useRecording<TData = unknown>() {
  const client = useQueryClient();
  const command = useCommand<TData>();
  const [error, setError] = useState<Error | null>(null);
  const queued = useRef<(() => void) | null>(null);
  useEffect(() => {
    if (!command.isPaused || !queued.current) return;
    const run = queued.current;
    queued.current = null;
    run();
  }, [command.isPaused, command.variables?.key]);
  const record = (input: CommandInput, on: { onRecorded?: (data: TData) => void; onQueued?: () => void } = {}) => {
    setError(null);
    queued.current = on.onQueued ?? null;
    const offline = !isOnline();
    const key = command.send(input, {
      onSuccess: (data) => {
        queued.current = null;
        on.onRecorded?.(data);
      },
      onError: (err) => {
        queued.current = null;
        setError(err);
        // Shown here, with what was typed still in the form: not again in the banner.
        const m = client
          .getMutationCache()
          .findAll({ mutationKey: COMMAND_KEY })
          .find((x) => (x.state.variables as CommandVariables | undefined)?.key === key);
        if (m) client.getMutationCache().remove(m);
      },
    });
    if (offline && queued.current) {
      queued.current = null;
      on.onQueued?.();
    }
    return key;
  };
  return { record, error, clearError: () => setError(null), busy: command.isPending && !command.isPaused };
}
