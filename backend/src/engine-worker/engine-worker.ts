import sjson from 'secure-json-parse';
import { isMainThread } from 'node:worker_threads';
import { lowerThreadPriority } from './thread-priority.js';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';
import { EngineInputError } from '../engine/engine-input-error.js';
import { runEngineTask, type EngineTask } from './engine-tasks.js';
import { packNumberArrays, unpackNumberArrays } from './number-arrays.js';

/** A large JSON body to parse off the event loop, as Fastify's own parser would (prototype poisoning refused). */
export interface ParseJsonTask {
  kind: 'parse-json';
  body: Uint8Array;
}

/** A large response to write as JSON (and compress, when the client takes it) off the event loop. */
export interface StringifyJsonTask {
  kind: 'stringify-json';
  value: unknown;
  encoding: 'br' | 'gzip' | null;
}

export type WorkerTask = EngineTask | ParseJsonTask | StringifyJsonTask;

export type WorkerAnswer =
  { ok: true; result: unknown } | { ok: false; message: string; field?: string; badJson?: boolean };

function compress(bytes: Buffer, encoding: StringifyJsonTask['encoding']): Uint8Array {
  if (encoding === 'gzip') return gzipSync(bytes, { level: 6 });
  // Quality 4 is brotli's fast end, about gzip's speed at a smaller size; 11 would take seconds for megabytes.
  if (encoding === 'br')
    return brotliCompressSync(bytes, {
      params: { [zlib.BROTLI_PARAM_QUALITY]: 4, [zlib.BROTLI_PARAM_SIZE_HINT]: bytes.length },
    });
  return bytes;
}

/**
 * The worker thread's entry (piscina): runs one engine task, parses one large JSON body or writes
 * one large response. Long lists of numbers travel as Float64Array both ways (number-arrays.ts).
 * Errors the client caused cross the thread boundary as plain data, so the request still answers
 * 400 with the engine's (or the parser's) message.
 */
// Only in the pool's thread (tests load this module on their own main thread too): bulk work
// here yields the CPU to the event loop (thread-priority.ts).
if (!isMainThread) lowerThreadPriority();

export default function run(task: WorkerTask): WorkerAnswer {
  try {
    if (task.kind === 'parse-json') {
      const text = Buffer.from(task.body.buffer, task.body.byteOffset, task.body.byteLength).toString('utf8');
      return {
        ok: true,
        result: packNumberArrays(sjson.parse(text, null, { protoAction: 'error', constructorAction: 'error' })),
      };
    }
    if (task.kind === 'stringify-json') {
      const bytes = Buffer.from(JSON.stringify(unpackNumberArrays(task.value)), 'utf8');
      return { ok: true, result: compress(bytes, task.encoding) };
    }
    return { ok: true, result: packNumberArrays(runEngineTask(unpackNumberArrays(task) as EngineTask)) };
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, message: err.message, field: err.field };
    if (task.kind === 'parse-json') return { ok: false, message: (err as Error).message, badJson: true };
    throw err;
  }
}
