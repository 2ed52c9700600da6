import { ApiError, apiFetch } from './api-client';
import { newClientId } from './client-id';

/**
 * Writes typed at the machine must survive workshop wifi dropping out. Every write carries an id
 * made here in the browser (the server treats a repeat of the same id as the same write), so a
 * write that could not be sent is kept in localStorage and simply sent again, in order, when the
 * connection returns: on the browser's `online` event, when the tab becomes visible, and by a
 * retry timer that backs off from 1 s to 15 s.
 *
 * Use from any feature:
 *   const id = newWriteId();
 *   const outcome = await sendWrite({ id, method: 'PUT', path: `/x/${x}`, body: { ...fields, writeId: id }, label: 'Reading at 120 mm' });
 *   // outcome.status === 'sent' → outcome.result is the server's answer
 *   // outcome.status === 'queued' → it is waiting; onWriteSent() reports it when it goes through
 *   // a 4xx answer is thrown as ApiError (nothing is queued: show it beside the field)
 *   // sendWriteWithin(write, 2500) is the same but stops waiting on a hanging link (then 'queued')
 *   const { pending, refused } = useOfflineQueue(); // from ./use-offline-queue, for "waiting" marks and a banner
 */

export type WriteMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface QueuedWrite {
  /** Browser-made id; also sent in the body so the server can recognise a repeat. */
  id: string;
  method: WriteMethod;
  /** API path without the /api prefix, e.g. /bolt-downs/…/holes/3. */
  path: string;
  body: unknown;
  /** Short human description for lists of waiting writes. */
  label?: string;
  queuedAt: string;
  attempts: number;
  lastError?: string;
}

/** A queued write the server later refused (4xx); kept so what was typed is not silently lost. */
export interface RefusedWrite extends QueuedWrite {
  status: number;
  message: string;
}

export type WriteOutcome<T> = { status: 'sent'; result: T } | { status: 'queued' };

export interface QueueSnapshot {
  pending: readonly QueuedWrite[];
  refused: readonly RefusedWrite[];
  /** False after a send failed for want of a connection, until one succeeds again. */
  reachable: boolean;
}

const STORAGE_KEY = 'railwright.waiting-writes.v1';
const MIN_BACKOFF_MS = 1000;
const MAX_BACKOFF_MS = 15_000;
// A request on a wifi link that dropped can hang for minutes; give up on it and try again later.
const REQUEST_TIMEOUT_MS = 12_000;

/** A uuid v4 made in the browser. */
export const newWriteId = (): string => newClientId();

/** No answer, a server fault, or a lapsed session: worth sending again later. */
export function isRetryable(error: unknown): boolean {
  if (!(error instanceof ApiError)) return true;
  return error.status === 0 || error.status >= 500 || error.status === 401 || error.status === 408 || error.status === 429;
}

type Waiter = { resolve: (o: WriteOutcome<unknown>) => void; reject: (e: unknown) => void };
type SentListener = (write: QueuedWrite, result: unknown) => void;

class OfflineQueue {
  private snapshot: QueueSnapshot = { pending: [], refused: [], reachable: true };
  private readonly listeners = new Set<() => void>();
  private readonly sentListeners = new Set<SentListener>();
  private readonly waiters = new Map<string, Waiter>();
  private flushing: Promise<void> | null = null;
  private again = false;
  private backoffMs = MIN_BACKOFF_MS;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private started = false;

  /** Loads what an earlier visit left waiting and listens for the connection coming back. */
  start(): void {
    if (this.started || typeof window === 'undefined') return;
    this.started = true;
    this.load();
    window.addEventListener('online', () => this.retryNow());
    document.addEventListener('visibilitychange', () => document.visibilityState === 'visible' && this.retryNow());
    // Another tab of the same browser changed the list (it may have sent some of ours).
    window.addEventListener('storage', (e) => e.key === STORAGE_KEY && this.load());
    if (this.snapshot.pending.length) void this.flush();
  }

  getSnapshot = (): QueueSnapshot => this.snapshot;

  subscribe = (listener: () => void): (() => void) => {
    this.start();
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  onSent(listener: SentListener): () => void {
    this.sentListeners.add(listener);
    return () => this.sentListeners.delete(listener);
  }

  /** Sends now if nothing is waiting ahead of it, else keeps order behind the waiting writes. */
  send<T>(write: Omit<QueuedWrite, 'queuedAt' | 'attempts'>): Promise<WriteOutcome<T>> {
    this.start();
    if (this.snapshot.pending.some((w) => w.id === write.id)) return Promise.resolve({ status: 'queued' });
    const queued: QueuedWrite = { ...write, queuedAt: new Date().toISOString(), attempts: 0 };
    const outcome = new Promise<WriteOutcome<T>>((resolve, reject) => this.waiters.set(write.id, { resolve: resolve as Waiter['resolve'], reject }));
    this.update({ pending: [...this.snapshot.pending, queued] });
    void this.flush();
    return outcome;
  }

  /**
   * Stops waiting for the outcome of a write (it stays queued if it is not sent yet); a later
   * refusal then goes to the refused list instead of the caller.
   */
  detach(id: string): void {
    this.waiters.get(id)?.resolve({ status: 'queued' });
    this.waiters.delete(id);
  }

  retryNow(): void {
    this.backoffMs = MIN_BACKOFF_MS;
    void this.flush();
  }

  dismissRefused(id?: string): void {
    this.update({ refused: id ? this.snapshot.refused.filter((w) => w.id !== id) : [] });
  }

  private flush(): Promise<void> {
    if (this.flushing) {
      this.again = true;
      return this.flushing;
    }
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.flushing = this.drain().finally(() => {
      this.flushing = null;
      if (this.again) {
        this.again = false;
        void this.flush();
      }
    });
    return this.flushing;
  }

  private async drain(): Promise<void> {
    while (this.snapshot.pending.length) {
      const write = this.snapshot.pending[0];
      try {
        const result = await apiFetch<unknown>(write.path, { method: write.method, json: write.body, signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS) });
        this.remove(write.id);
        this.backoffMs = MIN_BACKOFF_MS;
        this.update({ reachable: true });
        this.sentListeners.forEach((l) => l(write, result));
        this.settle(write.id, { status: 'sent', result });
      } catch (error) {
        if (isRetryable(error)) {
          const message = error instanceof Error ? error.message : String(error);
          this.update({
            reachable: false,
            pending: this.snapshot.pending.map((w) => (w.id === write.id ? { ...w, attempts: w.attempts + 1, lastError: message } : w)),
          });
          // Everyone waiting now knows their write is kept for later.
          for (const id of [...this.waiters.keys()]) this.settle(id, { status: 'queued' });
          this.schedule();
          return;
        }
        this.remove(write.id);
        const waiter = this.waiters.get(write.id);
        if (waiter) {
          this.waiters.delete(write.id);
          waiter.reject(error);
        } else {
          const e = error as ApiError;
          this.update({ refused: [...this.snapshot.refused, { ...write, status: e.status, message: e.message }] });
        }
      }
    }
  }

  private schedule(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), this.backoffMs);
    this.backoffMs = Math.min(this.backoffMs * 2, MAX_BACKOFF_MS);
  }

  private settle(id: string, outcome: WriteOutcome<unknown>): void {
    const waiter = this.waiters.get(id);
    if (!waiter) return;
    this.waiters.delete(id);
    waiter.resolve(outcome);
  }

  private remove(id: string): void {
    this.update({ pending: this.snapshot.pending.filter((w) => w.id !== id) });
  }

  private update(patch: Partial<QueueSnapshot>): void {
    this.snapshot = { ...this.snapshot, ...patch };
    if (patch.pending || patch.refused) this.persist();
    this.listeners.forEach((l) => l());
  }

  private persist(): void {
    try {
      localStorage.setItem(STORAGE_KEY, JSON.stringify({ pending: this.snapshot.pending, refused: this.snapshot.refused }));
    } catch {
      // Storage full or blocked: the writes stay in memory for this visit.
    }
  }

  private load(): void {
    try {
      const stored = JSON.parse(localStorage.getItem(STORAGE_KEY) ?? 'null') as Partial<QueueSnapshot> | null;
      this.snapshot = { ...this.snapshot, pending: stored?.pending ?? [], refused: stored?.refused ?? [] };
      this.listeners.forEach((l) => l());
    } catch {
      // Unreadable entry: start with nothing waiting rather than break the app.
    }
  }
}

export const offlineQueue = new OfflineQueue();

export const sendWrite = <T>(write: Omit<QueuedWrite, 'queuedAt' | 'attempts'>) => offlineQueue.send<T>(write);

/**
 * Sends a write but waits at most `patienceMs` for the answer: on a slow or hanging link the
 * caller carries on with the write kept as waiting (shown as such) instead of holding the person up.
 */
export async function sendWriteWithin<T>(write: Omit<QueuedWrite, 'queuedAt' | 'attempts'>, patienceMs: number): Promise<WriteOutcome<T>> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const slow = new Promise<WriteOutcome<T>>((resolve) => {
    timer = setTimeout(() => {
      offlineQueue.detach(write.id);
      resolve({ status: 'queued' });
    }, patienceMs);
  });
  try {
    return await Promise.race([offlineQueue.send<T>(write), slow]);
  } finally {
    clearTimeout(timer);
  }
}

/** Called with each write once the server has taken it, whether sent at once or later. */
export const onWriteSent = (listener: SentListener) => offlineQueue.onSent(listener);
