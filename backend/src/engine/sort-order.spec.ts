import { seededRandom } from './seeded-random.js';
import { sortedOrder } from './sort-order.js';

describe('sorted order', () => {
  // Checked against the JavaScript runtime's own numeric sort.
  it('matches a comparator sort on large mixed-sign inputs', () => {
    const rand = seededRandom(101);
    for (const n of [1500, 20_000]) {
      const values = Array.from({ length: n }, () => (rand() - 0.3) * 10 ** Math.floor(rand() * 8 - 3));
      const order = sortedOrder(values);
      const expected = values.map((v, i) => [v, i] as const).sort((a, b) => a[0] - b[0]);
      expect(Array.from(order, (i) => values[i])).toEqual(expected.map(([v]) => v));
      expect(new Set(order).size).toBe(n);
    }
  });

  it('orders small inputs and exact integers', () => {
    expect(Array.from(sortedOrder([3, -1, 2, 0]))).toEqual([1, 3, 2, 0]);
    const ints = Array.from({ length: 5000 }, (_, i) => (i * 7919) % 5000);
    const order = sortedOrder(ints);
    expect(Array.from(order, (i) => ints[i])).toEqual(Array.from({ length: 5000 }, (_, i) => i));
  });
});
