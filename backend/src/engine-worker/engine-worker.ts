import sjson from 'secure-json-parse';
import { EngineInputError } from '../engine/engine-input-error.js';
import { runEngineTask, type EngineTask } from './engine-tasks.js';

/** A large JSON body to parse off the event loop, as Fastify's own parser would (prototype poisoning refused). */
export interface ParseJsonTask {
  kind: 'parse-json';
  body: Uint8Array;
}

export type WorkerAnswer = { ok: true; result: unknown } | { ok: false; message: string; field?: string; badJson?: boolean };

/**
 * The worker thread's entry (piscina): runs one engine task, or parses one large JSON body. Errors
 * the client caused cross the thread boundary as plain data, so the request still answers 400
 * with the engine's (or the parser's) message.
 */
export default function run(task: EngineTask | ParseJsonTask): WorkerAnswer {
  try {
    if (task.kind === 'parse-json') {
      const text = Buffer.from(task.body.buffer, task.body.byteOffset, task.body.byteLength).toString('utf8');
      return { ok: true, result: sjson.parse(text, null, { protoAction: 'error', constructorAction: 'error' }) };
    }
    return { ok: true, result: runEngineTask(task) };
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, message: err.message, field: err.field };
    if (task.kind === 'parse-json') return { ok: false, message: (err as Error).message, badJson: true };
    throw err;
  }
}
