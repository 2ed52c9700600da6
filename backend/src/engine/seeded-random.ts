/**
 * Small deterministic pseudo-random generator (mulberry32) so property checks and benchmarks
 * draw the same data on every run.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Stations along a rail with random spacing and readings that wander like a real rail. */
export function randomRailSweep(count: number, seed: number): { positionsMm: number[]; readingsMm: number[] } {
  const rand = seededRandom(seed);
  const positionsMm = new Array<number>(count);
  const readingsMm = new Array<number>(count);
  let x = 0;
  let drift = 0;
  for (let i = 0; i < count; i++) {
    x += 0.5 + rand() * 10;
    drift += (rand() - 0.5) * 0.004;
    positionsMm[i] = x;
    readingsMm[i] = 5e-6 * x + drift + (rand() - 0.5) * 0.01;
  }
  return { positionsMm, readingsMm };
}
