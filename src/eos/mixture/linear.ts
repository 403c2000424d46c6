// Small dense linear solves for the Newton iterations of phase equilibrium (at most a dozen unknowns).
// Gaussian elimination with partial pivoting, in place, no allocation.

/** Solves A·x = b for an n×n row-major A (overwritten); b is overwritten with x. Returns false if A is singular. */
export function solveLinear(A: Float64Array, b: Float64Array, n: number): boolean {
  for (let c = 0; c < n; c++) {
    let piv = c, big = Math.abs(A[c * n + c]!);
    for (let r = c + 1; r < n; r++) {
      const v = Math.abs(A[r * n + c]!);
      if (v > big) { big = v; piv = r; }
    }
    if (!(big > 0) || !Number.isFinite(big)) return false;
    if (piv !== c) {
      for (let k = 0; k < n; k++) {
        const t = A[c * n + k]!; A[c * n + k] = A[piv * n + k]!; A[piv * n + k] = t;
      }
      const t = b[c]!; b[c] = b[piv]!; b[piv] = t;
    }
    const d = A[c * n + c]!;
    for (let r = c + 1; r < n; r++) {
      const f = A[r * n + c]! / d;
      if (f === 0) continue;
      for (let k = c; k < n; k++) A[r * n + k]! -= f * A[c * n + k]!;
      b[r]! -= f * b[c]!;
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r]!;
    for (let k = r + 1; k < n; k++) s -= A[r * n + k]! * b[k]!;
    b[r] = s / A[r * n + r]!;
  }
  for (let k = 0; k < n; k++) if (!Number.isFinite(b[k]!)) return false;
  return true;
}
