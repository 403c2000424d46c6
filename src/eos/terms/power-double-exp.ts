// Power terms with exponentials in both variables, n τ^t δ^d exp(−δ^l − τ^m), as in the R-125 equation.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

export function powerDoubleExpTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, l, m] = columns(rows, names, ["n", "t", "d", "l", "m"]) as Float64Array[] as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  return {
    add(tau, delta, lnTau, lnDelta, acc) {
      let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;
      for (let i = 0; i < count; i++) {
        const di = d[i]!, ti = t[i]!, li = l[i]!, mi = m[i]!;
        const dl = Math.exp(li * lnDelta), tm = Math.exp(mi * lnTau);
        const u = n[i]! * Math.exp(ti * lnTau + di * lnDelta - dl - tm);
        const A = di - li * dl;
        const B = ti - mi * tm;
        a += u;
        aD += u * A;
        aT += u * B;
        aDD += u * (A * A - di - li * (li - 1) * dl);
        aTT += u * (B * B - ti - mi * (mi - 1) * tm);
        aDT += u * A * B;
      }
      acc[R_A]! += a; acc[R_D]! += aD; acc[R_T]! += aT;
      acc[R_DD]! += aDD; acc[R_TT]! += aTT; acc[R_DT]! += aDT;
    },
  };
}
