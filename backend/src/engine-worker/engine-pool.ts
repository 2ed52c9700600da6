import { Injectable, Logger, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import type { FastifyInstance, FastifyRequest } from 'fastify';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { EngineInputError } from '../engine/engine-input-error.js';
import { runEngineTask, taskSize, type EngineTask, type EngineTaskResult } from './engine-tasks.js';
import type { StringifyJsonTask, WorkerAnswer, WorkerTask } from './engine-worker.js';
import { markPackedBody, packNumberArrays, unpackNumberArrays } from './number-arrays.js';

/** Up to this many points a computation stays on the event loop: a thread hand-off costs more than it. */
export const INLINE_MAX_POINTS = 5_000;
/** JSON bodies above this size are parsed in the worker thread (a 200 000-point body is about 4 MB). */
export const LARGE_BODY_BYTES = 256 * 1024;

/**
 * Runs engine computations, the large ones in a worker thread so a 200 000-point fit does not hold
 * up the requests that arrive meanwhile; large JSON bodies are parsed there too, parsing being the
 * main cost such a request puts on the event loop. One thread: on a small server the other core
 * keeps answering. The pool starts on the first large task. When the compiled worker is not there
 * (the server running from TypeScript sources, as in the API tests) everything runs inline.
 */
@Injectable()
export class EnginePool implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger(EnginePool.name);
  private readonly workerFile = fileURLToPath(new URL('./engine-worker.js', import.meta.url));
  private pool: Piscina | null = null;

  constructor(private readonly adapterHost: HttpAdapterHost) {}

  /**
   * Whether large tasks leave the event loop in this process: asked once, as every response asks
   * it (a file-system call per request showed in profiles of short reads).
   */
  readonly threaded = existsSync(this.workerFile);

  async run<K extends EngineTask['kind']>(task: EngineTask & { kind: K }): Promise<EngineTaskResult<K>> {
    if (taskSize(task) <= INLINE_MAX_POINTS || !this.threaded) return runEngineTask(task) as EngineTaskResult<K>;
    const made: ArrayBuffer[] = [];
    const answer = await this.worker(packNumberArrays(task, made) as WorkerTask, made);
    if (!answer.ok) throw new EngineInputError(answer.message, answer.field);
    return unpackNumberArrays(answer.result) as EngineTaskResult<K>;
  }

  /** A response as JSON bytes, compressed with `encoding` when given, written in the worker thread. */
  async serialize(value: unknown, encoding: StringifyJsonTask['encoding']): Promise<Buffer> {
    const made: ArrayBuffer[] = [];
    const answer = await this.worker({ kind: 'stringify-json', value: packNumberArrays(value, made), encoding }, made);
    if (!answer.ok) throw new Error(answer.message);
    const bytes = answer.result as Uint8Array;
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  /**
   * Nest has registered its JSON parser by now (before module init): large bodies go to the
   * worker, the rest to Fastify's own parser, with the same refusals (bad JSON, prototype keys).
   * A large body comes back with its long number lists as Float64Arrays (markPackedBody); the
   * validation pipe checks them in place and makes plain lists of them only where the DTO does not
   * take them as they are (KeepsNumberListsPacked).
   */
  onModuleInit() {
    if (!this.threaded) return;
    const fastify = this.adapterHost.httpAdapter?.getInstance?.() as FastifyInstance | undefined;
    if (!fastify) return;
    const inline = fastify.getDefaultJsonParser('error', 'error');
    fastify.removeContentTypeParser('application/json');
    fastify.addContentTypeParser(
      'application/json',
      { parseAs: 'buffer' },
      (req: FastifyRequest, body: Buffer | string, done) => {
        if (body.length < LARGE_BODY_BYTES) return inline(req, body as string, done); // it takes a Buffer as well (secure-json-parse reads either)
        this.worker({ kind: 'parse-json', body: body as Buffer }, movableBytes(body as Buffer))
          .then((answer) =>
            answer.ok
              ? done(null, markPackedBody(answer.result))
              : done(
                  Object.assign(new SyntaxError(`Body is not valid JSON: ${answer.message}`), { statusCode: 400 }),
                  undefined,
                ),
          )
          .catch((err: Error) => done(err, undefined));
      },
    );
  }

  private worker(task: WorkerTask, transferList?: ArrayBuffer[]): Promise<WorkerAnswer> {
    if (!this.pool) {
      this.logger.log('Large calculations run in a worker thread');
      this.pool = new Piscina({ filename: this.workerFile, minThreads: 1, maxThreads: 1, idleTimeout: 60_000 });
    }
    return this.pool.run(task, transferList?.length ? { transferList } : {}) as Promise<WorkerAnswer>;
  }

  async onModuleDestroy() {
    await this.pool?.destroy();
  }
}

/**
 * A body's memory handed to the worker instead of copied (a 200 000-point body is about 4 MB),
 * when the body is the whole of it: a small one shares Node's buffer pool with other data.
 */
function movableBytes(body: Buffer): ArrayBuffer[] {
  const memory = body.buffer;
  return memory instanceof ArrayBuffer && body.byteOffset === 0 && body.byteLength === memory.byteLength
    ? [memory]
    : [];
}
