// The Rachford–Rice equation Σ zᵢ(Kᵢ − 1)/(1 + β(Kᵢ − 1)) = 0 for the vapour mole fraction β of a flash.
// Newton on a bracket that keeps every denominator positive, falling back to bisection; capped.

const MAX_ITER = 100;

/** Vapour mole fraction β for feed z and K-factors K; below 0 or above 1 when the feed is single-phase at these K. */
export function rachfordRice(z: ArrayLike<number>, K: ArrayLike<number>, N: number): number {
  let Kmin = Infinity, Kmax = -Infinity;
  for (let i = 0; i < N; i++) {
    if (z[i]! <= 0) continue;
    Kmin = Math.min(Kmin, K[i]!);
    Kmax = Math.max(Kmax, K[i]!);
  }
  const g = (b: number) => {
    let s = 0;
    for (let i = 0; i < N; i++) s += (z[i]! * (K[i]! - 1)) / (1 + b * (K[i]! - 1));
    return s;
  };
  // All K on one side of 1: the feed cannot split.
  if (Kmax <= 1) return -1;
  if (Kmin >= 1) return 2;
  if (g(0) <= 0) return 0 - Number.EPSILON;
  if (g(1) >= 0) return 1 + Number.EPSILON;
  let lo = 0, hi = 1, b = 0.5;
  for (let k = 0; k < MAX_ITER; k++) {
    let s = 0, ds = 0;
    for (let i = 0; i < N; i++) {
      const d = K[i]! - 1, q = 1 + b * d;
      s += (z[i]! * d) / q;
      ds -= (z[i]! * d * d) / (q * q);
    }
    if (s > 0) lo = b; else hi = b;
    let next = b - s / ds;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - b) <= 1e-15 || hi - lo <= 1e-15) return next;
    b = next;
  }
  return b;
}

