/**
 * Ascending sort order of an array of finite numbers, as a permutation of indices.
 *
 * Large inputs use a least-significant-digit radix sort on the IEEE-754 bit patterns (mapped so
 * unsigned order equals numeric order): four 16-bit passes, linear in n, with passes skipped when
 * every key shares the digit. Sorting indices with a comparator costs about a second for a
 * million stations; this takes a few tens of milliseconds.
 */

const SMALL = 1024;
const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

function comparatorOrder(values: ArrayLike<number>): Uint32Array {
  const order = new Uint32Array(values.length);
  for (let i = 0; i < order.length; i++) order[i] = i;
  return order.sort((a, b) => values[a] - values[b] || a - b);
}

export function sortedOrder(values: ArrayLike<number>): Uint32Array {
  const n = values.length;
  if (n < SMALL || !LITTLE_ENDIAN) return comparatorOrder(values);

  const bits = new Uint32Array(Float64Array.from(values as ArrayLike<number>).buffer);
  let hi = new Uint32Array(n);
  let lo = new Uint32Array(n);
  let idx = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    let h = bits[2 * i + 1];
    let l = bits[2 * i];
    // Negative numbers: flip every bit (larger magnitude sorts first); positive: set the sign bit.
    if (h & 0x80000000) {
      h = ~h >>> 0;
      l = ~l >>> 0;
    } else {
      h = (h | 0x80000000) >>> 0;
    }
    hi[i] = h;
    lo[i] = l;
    idx[i] = i;
  }

  let hi2 = new Uint32Array(n);
  let lo2 = new Uint32Array(n);
  let idx2 = new Uint32Array(n);
  const count = new Uint32Array(65536);
  for (let pass = 0; pass < 4; pass++) {
    const word = pass < 2 ? lo : hi;
    const shift = pass % 2 === 0 ? 0 : 16;
    count.fill(0);
    for (let i = 0; i < n; i++) count[(word[i] >>> shift) & 0xffff]++;
    if (count[(word[0] >>> shift) & 0xffff] === n) continue; // every key has this digit
    let sum = 0;
    for (let d = 0; d < 65536; d++) {
      const c = count[d];
      count[d] = sum;
      sum += c;
    }
    const moveLo = pass < 1; // after the low word's passes only hi and idx still matter
    for (let i = 0; i < n; i++) {
      const pos = count[(word[i] >>> shift) & 0xffff]++;
      hi2[pos] = hi[i];
      if (moveLo) lo2[pos] = lo[i];
      idx2[pos] = idx[i];
    }
    [hi, hi2] = [hi2, hi];
    if (moveLo) [lo, lo2] = [lo2, lo];
    [idx, idx2] = [idx2, idx];
  }
  return idx;
}
