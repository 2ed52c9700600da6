import { EngineInputError } from './engine-input-error.js';
import { sortedOrder } from './sort-order.js';

/** Largest point count any computation accepts; keeps one request bounded in time and memory. */
export const MAX_POINTS = 200_000;

/**
 * Largest size any single input number may have. Far beyond any length, speed or count on a
 * gantry machine, and small enough that sums of squares of 200 000 such values stay finite,
 * so no computation can overflow into a result that cannot be shown or stored.
 */
export const MAX_MAGNITUDE = 1e9;

export function requireFinite(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new EngineInputError(`${field} must be a finite number`, field);
  }
  if (Math.abs(value) > MAX_MAGNITUDE) throw outOfRange(field, value);
  return value;
}

function outOfRange(field: string, value: number): EngineInputError {
  return new EngineInputError(
    `${field} is out of range (${value}); at most ${MAX_MAGNITUDE} in size is accepted`,
    field,
  );
}

export function requirePositive(field: string, value: unknown): number {
  const v = requireFinite(field, value);
  if (v <= 0) throw new EngineInputError(`${field} must be greater than zero`, field);
  return v;
}

export function requireNonNegative(field: string, value: unknown): number {
  const v = requireFinite(field, value);
  if (v < 0) throw new EngineInputError(`${field} must not be negative`, field);
  return v;
}

export function requirePositiveInteger(field: string, value: unknown): number {
  const v = requirePositive(field, value);
  if (!Number.isInteger(v)) throw new EngineInputError(`${field} must be a whole number`, field);
  return v;
}

/** Checks an array of finite numbers with a minimum (and the global maximum) length. */
export function requireNumberArray(
  field: string,
  values: unknown,
  minLength: number,
  maxLength = MAX_POINTS,
): number[] {
  if (!Array.isArray(values)) throw new EngineInputError(`${field} must be a list of numbers`, field);
  requireCount(field, values.length, minLength, maxLength);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new EngineInputError(`${field}[${i}] must be a finite number`, field);
    }
    if (Math.abs(v) > MAX_MAGNITUDE) throw outOfRange(`${field}[${i}]`, v);
  }
  return values as number[];
}

/**
 * The last check of every computation: a result holding NaN or ±Infinity (an overflow, or a
 * division by a vanishing fit) would be stored and then break every page that reads it, so the
 * inputs are refused instead. `field` names the input the caller should change.
 */
export function requireFiniteResult<T>(field: string, result: T): T {
  const bad = firstNonFinite(result, '');
  if (bad !== null) {
    throw new EngineInputError(
      `${field} give a result that cannot be computed (${bad || 'result'} is not a finite number); check the values entered`,
      field,
    );
  }
  return result;
}

function firstNonFinite(value: unknown, path: string): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path;
  if (value === null || typeof value !== 'object') return null;
  if (ArrayBuffer.isView(value)) {
    const arr = value as unknown as ArrayLike<number>;
    for (let i = 0; i < arr.length; i++)
      if (typeof arr[i] === 'number' && !Number.isFinite(arr[i])) return `${path}[${i}]`;
    return null;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = firstNonFinite(value[i], `${path}[${i}]`);
      if (found !== null) return found;
    }
    return null;
  }
  for (const [key, v] of Object.entries(value)) {
    const found = firstNonFinite(v, path ? `${path}.${key}` : key);
    if (found !== null) return found;
  }
  return null;
}

export function requireCount(field: string, count: number, minLength: number, maxLength = MAX_POINTS): void {
  if (count < minLength) {
    throw new EngineInputError(
      `${field} needs at least ${minLength} value${minLength === 1 ? '' : 's'} (got ${count})`,
      field,
    );
  }
  if (count > maxLength) {
    throw new EngineInputError(`${field} has ${count} values; at most ${maxLength} are accepted`, field);
  }
}

export function requireSameLength(fieldA: string, a: ArrayLike<unknown>, fieldB: string, b: ArrayLike<unknown>): void {
  if (a.length !== b.length) {
    throw new EngineInputError(
      `${fieldA} and ${fieldB} must have the same length (${a.length} and ${b.length})`,
      fieldB,
    );
  }
}

/**
 * Returns the indices of `positions` in ascending order, or null when they already are ascending
 * (the usual case for stations read along a rail, which then costs one pass and no sort).
 * Throws on a repeated position.
 */
export function ascendingOrder(field: string, positions: ArrayLike<number>): Uint32Array | null {
  const n = positions.length;
  let ascending = true;
  for (let i = 1; i < n; i++) {
    if (positions[i] <= positions[i - 1]) {
      ascending = false;
      break;
    }
  }
  if (ascending) return null;
  const order = sortedOrder(positions);
  let previous = positions[order[0]];
  for (let k = 1; k < n; k++) {
    const v = positions[order[k]];
    if (v === previous) throw repeatedValue(field, positions, v);
    previous = v;
  }
  return order;
}

function repeatedValue(field: string, positions: ArrayLike<number>, value: number): EngineInputError {
  const at: number[] = [];
  for (let i = 0; i < positions.length && at.length < 2; i++) if (positions[i] === value) at.push(i);
  return new EngineInputError(
    `${field} repeats the value ${value} (at ${field}[${at[0]}] and ${field}[${at[1]}])`,
    field,
  );
}
