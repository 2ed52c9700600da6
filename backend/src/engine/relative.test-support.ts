/** Asserts |actual − expected| ≤ rel·|expected| (or ≤ rel when expected is zero). */
export function expectRelative(actual: number, expected: number, rel: number): void {
  const tol = expected === 0 ? rel : rel * Math.abs(expected);
  if (!(Math.abs(actual - expected) <= tol)) {
    throw new Error(`expected ${actual} to be within ${rel} (relative) of ${expected}`);
  }
}
