// Departure functions αʳ_ij(δ, τ) of the multi-fluid mixture model, built from their term tables.
// The GERG-2008 form n τ^t δ^d exp(−η(δ−ε)² − β(δ−γ)) needs its own kernel; the exponential form is the power kernel.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "../terms/kernel.js";
import { powerTerms } from "../terms/power.js";

/**
 * GERG-2008 departure terms n τ^t δ^d exp(−η(δ−ε)² − β(δ−γ)); rows with η = β = 0 are plain power terms.
 * With g(δ) = −η(δ−ε)² − β(δ−γ): δg' = −δ(2η(δ−ε) + β) and δ²g'' = −2ηδ², so the scaled derivatives
 * follow the same pattern as the Gaussian kernel, with the exponent linear as well as quadratic in δ.
 */
export function gergDepartureTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, eta, eps, beta, gamma] = columns(rows, names, ["n", "t", "d", "eta", "epsilon", "beta", "gamma"]) as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  const tt1 = Float64Array.from(t, (x) => x * (x - 1));
  return {
    add(_tau, delta, lnTau, lnDelta, acc) {
      let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;
      for (let i = 0; i < count; i++) {
        const di = d[i]!, ti = t[i]!, et = eta[i]!, be = beta[i]!;
        const dd = delta - eps[i]!;
        const u = n[i]! * Math.exp(ti * lnTau + di * lnDelta - et * dd * dd - be * (delta - gamma[i]!));
        const A = di - delta * (2 * et * dd + be);
        a += u;
        aD += u * A;
        aT += u * ti;
        aDD += u * (A * A - di - 2 * et * delta * delta);
        aTT += u * tt1[i]!;
        aDT += u * A * ti;
      }
      acc[R_A]! += a; acc[R_D]! += aD; acc[R_T]! += aT;
      acc[R_DD]! += aDD; acc[R_TT]! += aTT; acc[R_DT]! += aDT;
    },
  };
}

export interface DepartureData {
  form: "power" | "gerg";
  columns: string[];
  rows: number[][];
}

export function departureKernel(dep: DepartureData): ResidualKernel {
  return dep.form === "power" ? powerTerms(dep.rows, dep.columns) : gergDepartureTerms(dep.rows, dep.columns);
}
