import { EngineInputError } from '../engine/engine-input-error.js';
import { runEngineTask, type EngineTask } from './engine-tasks.js';

/**
 * The worker thread's entry (piscina): runs one engine task. An engine input error crosses the
 * thread boundary as plain data so the request still answers 400 with the engine's message.
 */
export default function run(task: EngineTask): { ok: true; result: unknown } | { ok: false; message: string; field?: string } {
  try {
    return { ok: true, result: runEngineTask(task) };
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, message: err.message, field: err.field };
    throw err;
  }
}
