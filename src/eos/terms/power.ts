// Power terms n τ^t δ^d exp(−δ^l): the polynomial and exponential body of every multiparameter equation.
// One exp per term carries τ^t δ^d exp(−δ^l) together; δ^l is computed once per distinct l.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

export function powerTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, l] = columns(rows, names, ["n", "t", "d", "l"]) as [Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  const lValues = [...new Set(l)].sort((a, b) => a - b);
  const lIndex = Uint8Array.from(l, (x) => lValues.indexOf(x));
  const lv = Float64Array.from(lValues);
  const lIsInt = lValues.every((x) => Number.isInteger(x) && x <= 8);
  const dl = new Float64Array(lValues.length);
  const tt1 = Float64Array.from(t, (x) => x * (x - 1));
  return {
    add(_tau, delta, lnTau, lnDelta, acc) {
      for (let k = 0; k < lv.length; k++) {
        const lk = lv[k]!;
        if (lk === 0) dl[k] = 0;
        else if (lIsInt) {
          let p = delta;
          for (let i = 1; i < lk; i++) p *= delta;
          dl[k] = p;
        } else dl[k] = Math.pow(delta, lk);
      }
      let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;
      for (let i = 0; i < count; i++) {
        const li = lIndex[i]!;
        const dli = dl[li]!;
        const lk = lv[li]!;
        const di = d[i]!, ti = t[i]!;
        const u = n[i]! * Math.exp(ti * lnTau + di * lnDelta - dli);
        const A = di - lk * dli;
        a += u;
        aD += u * A;
        aT += u * ti;
        aDD += u * (A * A - di - lk * (lk - 1) * dli);
        aTT += u * tt1[i]!;
        aDT += u * A * ti;
      }
      acc[R_A]! += a; acc[R_D]! += aD; acc[R_T]! += aT;
      acc[R_DD]! += aDD; acc[R_TT]! += aTT; acc[R_DT]! += aDT;
    },
  };
}
