import { evaluateFlatness, type GridPoint } from '../engine/flatness.js';
import { evaluateParallelism, type ParallelismInput } from '../engine/parallelism.js';
import { evaluateStraightness, type StraightnessInput } from '../engine/straightness.js';

/**
 * The engine computations a request may make large enough to run off the event loop. Plain data
 * in, the engine's plain result out: this module is what the worker thread loads, so it imports
 * the engine only (no NestJS, no database).
 */
export type EngineTask =
  | { kind: 'straightness'; input: StraightnessInput }
  | { kind: 'parallelism'; input: ParallelismInput }
  | { kind: 'flatness'; input: GridPoint[] };

export type EngineTaskResult<K extends EngineTask['kind']> = K extends 'straightness'
  ? ReturnType<typeof evaluateStraightness>
  : K extends 'parallelism'
    ? ReturnType<typeof evaluateParallelism>
    : ReturnType<typeof evaluateFlatness>;

export function runEngineTask(task: EngineTask): unknown {
  switch (task.kind) {
    case 'straightness':
      return evaluateStraightness(task.input);
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
