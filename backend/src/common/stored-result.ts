/**
 * Results are stored as JSON computed by the engine. A row written before the engine refused
 * non-finite numbers (JSON keeps NaN and Infinity as null), or damaged by hand, must not take a
 * whole page down: readers check the fields they use and show that one record as unreadable.
 *
 * A shape lists the numeric fields a reader relies on: 'errorPercent' (a finite number),
 * 'moves[]' (a list), 'moves[].errorMm' (a finite number in every element).
 */
export type ResultShape = readonly string[];

export const UNREADABLE_RESULT =
  'The stored result of this record cannot be read (a number in it is missing or not finite); record the check again and delete this one.';

/** null when every listed field holds what the readers expect, otherwise the path of the first that does not. */
export function unreadablePath(stored: unknown, shape: ResultShape): string | null {
  if (stored === null || typeof stored !== 'object') return '(result)';
  for (const path of shape) {
    if (!pathHolds(stored, path.split('.'))) return path;
  }
  return null;
}

/** The result when readable, otherwise null (the caller then shows UNREADABLE_RESULT). */
export function readableResult<T>(stored: unknown, shape: ResultShape): T | null {
  return unreadablePath(stored, shape) === null ? (stored as T) : null;
}

/** A stored double column read back as NaN or ±Infinity cannot be shown. */
export const finiteOrNull = (v: number | null | undefined): number | null =>
  typeof v === 'number' && Number.isFinite(v) ? v : null;

function pathHolds(value: unknown, parts: string[]): boolean {
  if (parts.length === 0) return typeof value === 'number' && Number.isFinite(value);
  if (value === null || typeof value !== 'object') return false;
  const [head, ...rest] = parts;
  if (head.endsWith('[]')) {
    const list = (value as Record<string, unknown>)[head.slice(0, -2)];
    if (!Array.isArray(list)) return false;
    return rest.length === 0 || list.every((item) => pathHolds(item, rest));
  }
  return pathHolds((value as Record<string, unknown>)[head], rest);
}

/** A stored list of numbers (readings, positions) holds only finite numbers. */
export const finiteList = (v: unknown): v is number[] =>
  Array.isArray(v) && v.every((x) => typeof x === 'number' && Number.isFinite(x));

/**
 * Some results are computed again from the stored input on every read (frame checks, bolt-downs).
 * Input that the engine now refuses, or that is missing a field, makes that one record unreadable
 * rather than failing the whole page, so anything thrown here is read as "cannot be read".
 */
export function readableComputation<T>(compute: () => T, shape: ResultShape): T | null {
  try {
    return readableResult<T>(compute(), shape);
  } catch {
    return null;
  }
}

export const UNREADABLE_INPUT =
  'The stored measurements of this record cannot be read (a number in them is missing or not finite); record the check again and delete this one.';
