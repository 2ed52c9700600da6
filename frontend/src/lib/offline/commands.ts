import { onlineManager, type QueryClient, type QueryKey } from '@tanstack/react-query';
import { ApiError, onNoAnswer, sendTo } from '../api/fetch-json';
import { noteNoAnswer } from './connection';
import { newClientId } from '../client-id';
import { setSessionOwner, whenSignedInAs } from './session-owner';
import type { CommandForm } from './send-form';

/**
 * A recording made at the machine, as a mutation that survives a lost connection and a reload:
 * plain data only (so TanStack Query can keep it in IndexedDB while paused), a key made in the
 * browser that the server uses to record it once however often it is sent (Idempotency-Key), and
 * the person who typed it, whose session alone may send it.
 */
export interface CommandVariables {
  method: 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** API path without /api, e.g. /rails/…/sweeps. */
  path: string;
  body?: unknown;
  /** A multipart body instead (a photo and its fields; only with POST): the file is kept on the device as it is. */
  form?: CommandForm;
  /** Client-made, one per entry (a UUID). */
  key: string;
  /** The person who typed it: their id (only their session may send it) and name (for the banner). */
  ownerId: string;
  ownerName: string;
  /** What it is, in words, for the list of waiting entries: "Sweep of rail Y1 (left)". */
  label: string;
  /** Queries to refresh once it is recorded (kept with it, so a resumed entry refreshes them too). */
  refresh: QueryKey[];
}

export const COMMAND_KEY = ['command'] as const;

/**
 * Sends once the entry's author is the one signed in. A lapsed session (401) is not a refusal:
 * the entry waits for its author to sign in again and then goes out with the same key.
 */
export async function sendCommand<T>(v: CommandVariables): Promise<T> {
  for (;;) {
    await whenSignedInAs(v.ownerId);
    try {
      // Photos and files are the rare entry: their sender is loaded when one is sent, keeping
      // it off the sign-in page's download.
      if (v.form) return await (await import('./send-form')).sendForm<T>(v.path, v.key, v.form, noteNoAnswer);
      return await sendTo<T>(v.method, v.path, v.body ?? (v.method === 'DELETE' ? undefined : {}), {
        'Idempotency-Key': v.key,
      });
    } catch (err) {
      if (!(err instanceof ApiError) || err.status !== 401) throw err;
      setSessionOwner(null);
    }
  }
}

/** Lost connections, server faults and a lapsed session are worth another try; a refusal (4xx) is not. */
export function worthRetrying(error: unknown): boolean {
  if (!(error instanceof ApiError)) return true;
  return error.status === 0 || error.status >= 500 || error.status === 408 || error.status === 429;
}

/**
 * Registers how a command is sent and what it refreshes. Registered once on the client, so a
 * command restored from IndexedDB after a reload knows how to send itself (its closures are gone).
 */
export function registerCommands(client: QueryClient): void {
  // TanStack Query assumes a connection until the browser says otherwise; a page opened without
  // one (from the service worker) must start offline, or its entries would be tried and retried.
  if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);
  onNoAnswer(noteNoAnswer);
  client.setMutationDefaults(COMMAND_KEY, {
    mutationFn: (v: CommandVariables) => sendCommand(v),
    // Paused while offline (networkMode 'online'), resumed when the connection returns.
    networkMode: 'online',
    retry: (count, error) => worthRetrying(error) && count < 20,
    retryDelay: (attempt) => Math.min(1000 * 2 ** attempt, 30_000),
    onSuccess: async (_data, v: CommandVariables) => {
      await Promise.all(v.refresh.map((queryKey) => client.invalidateQueries({ queryKey })));
    },
  });
}

/** A fresh key for one entry. */
export const newCommandKey = (): string => newClientId();

export const isOnline = () => onlineManager.isOnline();

/**
 * After a reload, entries kept from the last visit go out again: those paused for want of a
 * connection and those that were waiting for their author's session (which TanStack Query's own
 * resume leaves alone, as they were not paused). Each still waits for its own author.
 */
export function resumeKeptCommands(client: QueryClient): void {
  for (const m of client.getMutationCache().findAll({ mutationKey: COMMAND_KEY, status: 'pending' }))
    void m.continue().catch(() => undefined);
}
