import { readlinkSync } from 'node:fs';
import { setPriority } from 'node:os';

/** Nice value of the engine's worker thread: below the event loop's (0), so bulk work yields the core to it. */
export const WORKER_NICE = 10;

/** The kernel's id of the calling thread (Linux), or null where /proc/thread-self does not exist. */
export function currentThreadId(): number | null {
  try {
    const tid = Number(readlinkSync('/proc/thread-self').split('/').pop());
    return Number.isInteger(tid) && tid > 0 ? tid : null;
  } catch {
    return null;
  }
}

/**
 * Linux keeps a scheduling priority per thread: lowering the worker thread's leaves the event loop
 * first in line for the CPU, so a 200 000-point fit or a 10 MB answer being written there does not
 * hold up the requests the main thread answers meanwhile on a two-core server. Elsewhere the
 * thread keeps the process's priority. Returns the thread lowered, or null.
 */
export function lowerThreadPriority(tid: number | null = currentThreadId()): number | null {
  if (tid === null) return null;
  try {
    setPriority(tid, WORKER_NICE);
    return tid;
  } catch {
    return null;
  }
}
