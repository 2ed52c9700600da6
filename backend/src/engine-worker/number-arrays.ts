import { types } from 'node:util';

/**
 * Long lists of numbers cross the thread boundary as Float64Array: structured clone copies a
 * typed array as one block of memory, where a plain array is walked element by element (about
 * 50 ms on the event loop for 400 000 numbers). JSON never yields a typed array, so one found in
 * a value coming back is always one of these.
 */
const PACK_FROM = 1024;

// A plain object's prototype is a realm's Object.prototype (the root of its chain) or null; asked
// this way, it holds for objects another realm made too (a test runner's, another context's).
function isPlainObject(value: object): value is Record<string, unknown> {
  const proto = Object.getPrototypeOf(value) as object | null;
  return (
    proto === null ||
    (Object.getPrototypeOf(proto) === null && Object.prototype.toString.call(value) === '[object Object]')
  );
}

function isNumberList(list: unknown[]): list is number[] {
  for (let i = 0; i < list.length; i++) if (typeof list[i] !== 'number') return false;
  return true;
}

/**
 * The value with every long list of numbers (at any depth) as a Float64Array; the input is not
 * changed. The memory of each array made is added to `made`, when given, so it can be handed to
 * the other thread rather than copied.
 */
export function packNumberArrays(value: unknown, made?: ArrayBuffer[]): unknown {
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) {
    if (value.length >= PACK_FROM && isNumberList(value)) {
      const packed = toFloat64Array(value);
      made?.push(packed.buffer as ArrayBuffer);
      return packed;
    }
    let copy: unknown[] | null = null;
    for (let i = 0; i < value.length; i++) {
      const packed = packNumberArrays(value[i], made);
      if (packed !== value[i]) (copy ??= value.slice())[i] = packed;
    }
    return copy ?? value;
  }
  if (!isPlainObject(value)) return value;
  let copy: Record<string, unknown> | null = null;
  for (const key of Object.keys(value)) {
    const packed = packNumberArrays(value[key], made);
    if (packed !== value[key]) (copy ??= { ...value })[key] = packed;
  }
  return copy ?? value;
}

// Array.from and Float64Array.from walk an iterator, several times slower than indexing. A list
// made by `new Array(n)` alone starts with holes (for a long one, as a dictionary) and took twice
// as long to fill as one filled with zeros first.
function plainArrayOf(length: number): number[] {
  return new Array<number>(length).fill(0);
}

export function toPlainArray(values: Float64Array): number[] {
  const out = plainArrayOf(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i];
  return out;
}

function toFloat64Array(values: number[]): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i];
  return out;
}

/** The reverse of packNumberArrays: every Float64Array back to a plain array of numbers. */
export function unpackNumberArrays(value: unknown): unknown {
  if (types.isFloat64Array(value)) return toPlainArray(value);
  if (value === null || typeof value !== 'object' || ArrayBuffer.isView(value)) return value;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) value[i] = unpackNumberArrays(value[i]);
    return value;
  }
  if (!isPlainObject(value)) return value;
  for (const key of Object.keys(value)) value[key] = unpackNumberArrays(value[key]);
  return value;
}

/** How many numbers and entries a value holds, counted up to `limit` (lists of numbers by their length). */
export function sizeOf(value: unknown, limit: number): number {
  let count = 0;
  const visit = (v: unknown): void => {
    if (count >= limit || v === null || typeof v !== 'object') return;
    if (Array.isArray(v)) {
      if (v.length > 0 && typeof v[0] === 'number') {
        count += v.length;
        return;
      }
      count += v.length;
      for (let i = 0; i < v.length && count < limit; i++) visit(v[i]);
      return;
    }
    if (ArrayBuffer.isView(v) || !isPlainObject(v)) return;
    for (const key of Object.keys(v)) visit(v[key]);
  };
  visit(value);
  return count;
}

// Bodies parsed in the worker thread, whose long number lists are still Float64Arrays.
const packedBodies = new WeakSet<object>();

/**
 * A body parsed in the worker thread, its long number lists left as Float64Arrays: a plain array
 * of 200 000 numbers costs the event loop 5–15 ms to make in one piece, and the calculation sends
 * the list back to the worker anyway. The validation pipe knows such a body by this mark.
 */
export function markPackedBody<T>(body: T): T {
  if (body !== null && typeof body === 'object') packedBodies.add(body);
  return body;
}

export function isPackedBody(body: unknown): boolean {
  return body !== null && typeof body === 'object' && packedBodies.has(body);
}
