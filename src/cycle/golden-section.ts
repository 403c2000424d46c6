// Bounded golden-section search for the maximum of a function of one variable on [lo, hi]:
// no derivatives, a fixed shrink per evaluation, and a cap on evaluations so it always ends.

export interface Maximum {
  x: number;
  value: number;
  evaluations: number;
  /** Width of the last bracket. */
  width: number;
}

const INV_PHI = (Math.sqrt(5) - 1) / 2;

/**
 * Shrinks [lo, hi] around a maximum until it is narrower than `tolerance`. For a unimodal function
 * the result is within `tolerance` of the true maximiser; otherwise it is a local maximum, and the
 * best value seen (bounds included) is returned so a maximum on a bound is found too.
 */
export function goldenSectionMaximum(fn: (x: number) => number, lo: number, hi: number, tolerance: number, maxEvaluations = 200): Maximum {
  let a = lo, b = hi;
  let c = b - INV_PHI * (b - a), d = a + INV_PHI * (b - a);
  let fc = fn(c), fd = fn(d);
  let evaluations = 2;
  while (b - a > tolerance && evaluations < maxEvaluations) {
    if (fc >= fd) {
      b = d; d = c; fd = fc;
      c = b - INV_PHI * (b - a);
      fc = fn(c);
    } else {
      a = c; c = d; fc = fd;
      d = a + INV_PHI * (b - a);
      fd = fn(d);
    }
    evaluations++;
  }
  const candidates: [number, number][] = [[c, fc], [d, fd]];
  // The search never evaluates the bounds themselves; check them when the bracket has closed on one.
  if (a === lo) { candidates.push([lo, fn(lo)]); evaluations++; }
  if (b === hi) { candidates.push([hi, fn(hi)]); evaluations++; }
  const [x, value] = candidates.reduce((best, cur) => (cur[1] > best[1] ? cur : best));
  return { x, value, evaluations, width: b - a };
}
