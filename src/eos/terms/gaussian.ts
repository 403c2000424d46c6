// Gaussian bell-shaped terms n τ^t δ^d exp(−η(δ−ε)² − β(τ−γ)²), which shape the critical region.
// Scaled derivatives follow from g(δ) = −η(δ−ε)² and h(τ) = −β(τ−γ)² in one pattern (see kernel.ts).
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

export function gaussianTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, eta, eps, beta, gamma] = columns(rows, names, ["n", "t", "d", "eta", "epsilon", "beta", "gamma"]) as Float64Array[] as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  return {
    add(tau, delta, lnTau, lnDelta, acc) {
      let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;
      for (let i = 0; i < count; i++) {
        const di = d[i]!, ti = t[i]!, et = eta[i]!, be = beta[i]!;
        const dd = delta - eps[i]!, dt = tau - gamma[i]!;
        const u = n[i]! * Math.exp(ti * lnTau + di * lnDelta - et * dd * dd - be * dt * dt);
        const A = di - 2 * et * delta * dd;
        const B = ti - 2 * be * tau * dt;
        a += u;
        aD += u * A;
        aT += u * B;
        aDD += u * (A * A - di - 2 * et * delta * delta);
        aTT += u * (B * B - ti - 2 * be * tau * tau);
        aDT += u * A * B;
      }
      acc[R_A]! += a; acc[R_D]! += aD; acc[R_T]! += aT;
      acc[R_DD]! += aDD; acc[R_TT]! += aTT; acc[R_DT]! += aDT;
    },
  };
}
