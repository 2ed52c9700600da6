import { deserialize, serialize } from 'node:v8';
import { packNumberArrays, sizeOf, unpackNumberArrays } from './number-arrays.js';

/** What a worker thread's message does to a value: V8's serializer, as worker_threads uses it. */
const threadCopy = <T>(value: T): T => deserialize(serialize(value)) as T;

// The check is JSON itself (the format the answers go out in): a value packed, copied across a
// thread by V8’s serializer (as worker_threads does) and unpacked must write the
// same JSON text as the original.
describe('long lists of numbers across the thread boundary', () => {
  const long = Array.from({ length: 5000 }, (_, i) => Math.sin(i) * 1e-3);
  const value = {
    leastSquares: { slope: -4.2e-10, residuals: long, stations: [{ positionMm: 0, readingMm: 1 }] },
    minimumZone: { residuals: long.map((v) => -v), band: [0, 1] },
    nested: [[...long], ['a', 'b'], { deeper: { list: long.map((v) => v * 2) } }],
    short: [1, 2, 3],
    mixed: [...long.slice(0, 2000), 'not a number'],
    nothing: null,
  };

  it('round-trips to the same JSON text through structured clone', () => {
    const copied = unpackNumberArrays(threadCopy(packNumberArrays(value)));
    expect(JSON.stringify(copied) === JSON.stringify(value)).toBe(true);
  });

  it('sends long number lists as Float64Array and leaves short or mixed lists as they are, without changing the input', () => {
    const before = JSON.stringify(value);
    const packed = packNumberArrays(value) as typeof value & Record<string, never>;
    expect((packed.leastSquares as unknown as { residuals: unknown }).residuals).toBeInstanceOf(Float64Array);
    expect((packed.nested as unknown[])[0] as unknown).toBeInstanceOf(Float64Array);
    expect(Array.isArray(packed.short)).toBe(true);
    expect(Array.isArray(packed.mixed)).toBe(true);
    expect(JSON.stringify(value)).toBe(before);
    expect(Array.isArray(value.leastSquares.residuals)).toBe(true);
  });

  it('names the memory of every array it made, which can be handed over instead of copied, the input untouched', () => {
    const before = JSON.stringify(value);
    const made: ArrayBuffer[] = [];
    const packed = packNumberArrays(value, made);
    // Both residual lists, the first nested list and the deeper list: the short and mixed ones stay lists.
    expect(made).toHaveLength(4);
    const moved = structuredClone(packed, { transfer: made });
    expect(made.every((memory) => memory.byteLength === 0)).toBe(true);
    expect(JSON.stringify(unpackNumberArrays(moved))).toBe(before);
    expect(JSON.stringify(value)).toBe(before);
  });

  it('keeps -0, very small and very large numbers exactly (IEEE 754 doubles both ways)', () => {
    const edge = Array.from({ length: 2048 }, (_, i) => [-0, 5e-324, 1.7976931348623157e308, 0.1 + 0.2][i % 4]);
    const back = unpackNumberArrays(threadCopy(packNumberArrays(edge))) as number[];
    expect(back).toHaveLength(edge.length);
    back.forEach((v, i) => expect(Object.is(v, edge[i])).toBe(true));
  });

  it('counts entries up to a limit, long number lists by their length', () => {
    expect(sizeOf(value, 1e9)).toBeGreaterThanOrEqual(5000 * 4);
    expect(sizeOf({ a: [1, 2, 3], b: [{ c: [4, 5] }] }, 1e9)).toBe(3 + 1 + 2);
    expect(sizeOf({ a: long, b: long }, 100)).toBeLessThan(5000 * 2);
  });
});
