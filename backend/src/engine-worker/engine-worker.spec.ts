import { deserialize, serialize } from 'node:v8';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import run from './engine-worker.js';
import { packNumberArrays } from './number-arrays.js';

/** What a worker thread's message does to a value: V8's serializer, as worker_threads uses it. */
const threadCopy = <T>(value: T): T => deserialize(serialize(value)) as T;

// The worker's answers are checked against Node's own JSON.stringify and zlib, run here on the
// original value: the bytes a large answer goes out as must decode to exactly that JSON.
describe('the worker writes large answers', () => {
  const residuals = Array.from({ length: 3000 }, (_, i) => Math.cos(i / 7) / 1000);
  const answer = { leastSquares: { straightness: 0.002, residuals }, warnings: [] };

  it.each([
    ['gzip', (b: Uint8Array) => gunzipSync(b)],
    ['br', (b: Uint8Array) => brotliDecompressSync(b)],
    [null, (b: Uint8Array) => Buffer.from(b)],
  ] as const)('as JSON, encoded %s', (encoding, decode) => {
    const out = run({ kind: 'stringify-json', value: threadCopy(packNumberArrays(answer)), encoding });
    expect(out.ok).toBe(true);
    const bytes = (out as { result: Uint8Array }).result;
    expect(decode(bytes).toString('utf8') === JSON.stringify(answer)).toBe(true);
  });

  it('parses a large body with long lists packed, and refuses prototype keys as the inline parser does', () => {
    const body = JSON.stringify({ positions: residuals, readings: residuals });
    const parsed = run({ kind: 'parse-json', body: Buffer.from(body) });
    expect(parsed.ok).toBe(true);
    expect((parsed as { result: { positions: unknown } }).result.positions).toBeInstanceOf(Float64Array);
    const poisoned = run({ kind: 'parse-json', body: Buffer.from('{"__proto__": {"admin": true}}') });
    expect(poisoned).toMatchObject({ ok: false, badJson: true });
  });
});
