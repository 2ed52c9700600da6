import { Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { EngineInputError } from '../engine/engine-input-error.js';
import { runEngineTask, taskSize, type EngineTask, type EngineTaskResult } from './engine-tasks.js';
import type run from './engine-worker.js';

/** Up to this many points a computation stays on the event loop: a thread hand-off costs more than it. */
export const INLINE_MAX_POINTS = 5_000;

/**
 * Runs engine computations, the large ones in a worker thread so a 200 000-point fit does not hold
 * up the requests that arrive meanwhile. One thread: on a small server the other core keeps
 * answering. The pool starts on the first large task. When the compiled worker is not there
 * (the server running from TypeScript sources, as in the API tests) everything runs inline.
 */
@Injectable()
export class EnginePool implements OnModuleDestroy {
  private readonly logger = new Logger(EnginePool.name);
  private readonly workerFile = fileURLToPath(new URL('./engine-worker.js', import.meta.url));
  private pool: Piscina | null = null;

  /** Whether large tasks leave the event loop in this process. */
  get threaded(): boolean {
    return existsSync(this.workerFile);
  }

  async run<K extends EngineTask['kind']>(task: EngineTask & { kind: K }): Promise<EngineTaskResult<K>> {
    if (taskSize(task) <= INLINE_MAX_POINTS || !this.threaded) return runEngineTask(task) as EngineTaskResult<K>;
    this.pool ??= this.start();
    const answer = (await this.pool.run(task)) as ReturnType<typeof run>;
    if (!answer.ok) throw new EngineInputError(answer.message, answer.field);
    return answer.result as EngineTaskResult<K>;
  }

  private start(): Piscina {
    this.logger.log('Large calculations run in a worker thread');
    return new Piscina({ filename: this.workerFile, minThreads: 1, maxThreads: 1, idleTimeout: 60_000 });
  }

  async onModuleDestroy() {
    await this.pool?.destroy();
  }
}
