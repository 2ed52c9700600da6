import { createHash } from 'node:crypto';
import { canonicalJson, sha256Hex } from './canonical-json.js';

describe('canonicalJson', () => {
  it('sorts keys at every level and drops undefined members', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { z: 1, y: 2 }], c: undefined } })).toBe(
      '{"a":{"d":[1,{"y":2,"z":1}]},"b":1}',
    );
  });

  it('gives the same text whatever order the object was built in', () => {
    const one = { key: 'k', result: { value: 0.012, unit: 'mm' }, status: 'within-target' };
    const two = { status: 'within-target', result: { unit: 'mm', value: 0.012 }, key: 'k' };
    expect(canonicalJson(one)).toBe(canonicalJson(two));
  });

  it('refuses numbers JSON cannot carry', () => {
    expect(() => canonicalJson({ v: Number.NaN })).toThrow(/finite/);
  });
});

describe('sha256Hex', () => {
  // FIPS 180-2 appendix B.1 example: SHA-256("abc").
  it('matches the published digest of "abc"', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('agrees with node:crypto over UTF-8 text with µ and ≤', () => {
    const text = '{"unit":"µm","target":"≤ 20"}';
    expect(sha256Hex(text)).toBe(createHash('sha256').update(Buffer.from(text, 'utf8')).digest('hex'));
  });
});
