import { evaluateFlatness, type GridPoint } from '../engine/flatness.js';
import { evaluateParallelism, type ParallelismInput } from '../engine/parallelism.js';
import { evaluateStraightness, type StraightnessInput } from '../engine/straightness.js';

/**
 * The engine computations a request may make large enough to run off the event loop. Plain data
 * in, the engine's plain result out: this module is what the worker thread loads, so it imports
 * the engine only (no NestJS, no database).
 */
export type EngineTask =
  /** `residuals: false` leaves the residuals out of the answer (none is sent back across the threads). */
  | { kind: 'straightness'; input: StraightnessInput; residuals?: boolean }
  | { kind: 'parallelism'; input: ParallelismInput }
  | { kind: 'flatness'; input: GridPoint[] };

export type EngineTaskResult<K extends EngineTask['kind']> = K extends 'straightness'
  ? ReturnType<typeof evaluateStraightness>
  : K extends 'parallelism'
    ? ReturnType<typeof evaluateParallelism>
    : ReturnType<typeof evaluateFlatness>;

export function runEngineTask(task: EngineTask): unknown {
  switch (task.kind) {
    case 'straightness': {
      const result = evaluateStraightness(task.input);
      if (task.residuals !== false) return result;
      // Three lists as long as the input, copied back to the event loop for nothing when the
      // request did not ask for them.
      const none = (line: (typeof result)['leastSquares']) => ({ ...line, residualsMm: [] });
      return {
        ...result,
        leastSquares: none(result.leastSquares),
        minimumZone: none(result.minimumZone),
        endPoint: none(result.endPoint),
      };
    }
    case 'parallelism':
      return evaluateParallelism(task.input);
    case 'flatness':
      return evaluateFlatness(task.input);
  }
}

/** How many numbers a task carries: what decides whether it leaves the event loop. */
export function taskSize(task: EngineTask): number {
  switch (task.kind) {
    case 'straightness':
      return task.input.positionsMm.length;
    case 'parallelism':
      return task.input.positionsMm.length;
    case 'flatness':
      return task.input.length;
  }
}
