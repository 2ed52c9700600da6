import { getPriority } from 'node:os';
import { Worker } from 'node:worker_threads';
import { currentThreadId, lowerThreadPriority, WORKER_NICE } from './thread-priority.js';

// Linux only (per-thread nice values and /proc/thread-self), as the server runs.
const linux = process.platform === 'linux' ? describe : describe.skip;

linux('the engine thread’s priority', () => {
  it('is lowered for that thread alone; the event loop’s thread keeps its own (as the kernel reports them)', async () => {
    // A plain worker thread that tells its kernel thread id and then waits to be told to stop.
    const worker = new Worker(
      `const { parentPort } = require('node:worker_threads'); const fs = require('node:fs');
       parentPort.postMessage(Number(fs.readlinkSync('/proc/thread-self').split('/').pop()));
       parentPort.once('message', () => process.exit(0));`,
      { eval: true },
    );
    try {
      const tid = await new Promise<number>((resolve) => worker.once('message', resolve));
      const own = currentThreadId()!;
      expect(own).toBeGreaterThan(0);
      expect(tid).not.toBe(own);
      const before = getPriority(own);
      expect(lowerThreadPriority(tid)).toBe(tid);
      expect(getPriority(tid)).toBe(WORKER_NICE);
      expect(getPriority(own)).toBe(before);
    } finally {
      worker.postMessage('stop');
      await new Promise((resolve) => worker.once('exit', resolve));
    }
  });
});
