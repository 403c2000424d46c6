// Small helpers shared by the tests: relative deviation and a seeded random generator.
export function rel(actual: number, expected: number): number {
  return Math.abs(actual / expected - 1);
}

/** Deviation of a quantity that may cross zero, relative to max(|expected|, scale). */
export function relScaled(actual: number, expected: number, scale: number): number {
  return Math.abs(actual - expected) / Math.max(Math.abs(expected), scale);
}

/** Mulberry32: a small seeded generator, so sweeps are reproducible from their seed. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
