// Gaussian terms with a rational temperature factor, n τ^t δ^d exp(−η(δ−ε)² + 1/(β(τ−γ)² + b)),
// the associating-fluid terms of the ammonia equation.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

export function gaussianRationalTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, eta, eps, beta, gamma, b] = columns(rows, names, ["n", "t", "d", "eta", "epsilon", "beta", "gamma", "b"]) as Float64Array[] as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  return {
    add(tau, delta, lnTau, lnDelta, acc) {
      let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;
      for (let i = 0; i < count; i++) {
        const di = d[i]!, ti = t[i]!, et = eta[i]!, be = beta[i]!;
        const dd = delta - eps[i]!, dt = tau - gamma[i]!;
        const q = be * dt * dt + b[i]!;
        const h1 = (-2 * be * dt) / (q * q); // dh/dτ with h = 1/q
        const h2 = (-2 * be) / (q * q) + (8 * be * be * dt * dt) / (q * q * q);
        const u = n[i]! * Math.exp(ti * lnTau + di * lnDelta - et * dd * dd + 1 / q);
        const A = di - 2 * et * delta * dd;
        const B = ti + tau * h1;
        a += u;
        aD += u * A;
        aT += u * B;
        aDD += u * (A * A - di - 2 * et * delta * delta);
        aTT += u * (B * B - ti + tau * tau * h2);
        aDT += u * A * B;
      }
      acc[R_A]! += a; acc[R_D]! += aD; acc[R_T]! += aT;
      acc[R_DD]! += aDD; acc[R_TT]! += aTT; acc[R_DT]! += aDT;
    },
  };
}
