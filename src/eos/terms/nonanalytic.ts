// Nonanalytic terms n Δ^b δ ψ of the water (IAPWS-95) and CO2 equations, which reproduce the
// critical-point behaviour; derivatives as given in the IAPWS-95 release (Table 5), scaled on output.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

/** Distance from δ = 1 below which δ is nudged: the derivatives hold (δ−1)^negative powers there. */
const SINGULAR_GAP = 1e-10;

export function nonanalyticTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, a, b, beta, A, B, C, D] = columns(rows, names, ["n", "a", "b", "beta", "A", "B", "C", "D"]) as Float64Array[] as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  const betaSet = Float64Array.from(new Set(beta)), aSet = Float64Array.from(new Set(a));
  const betaIdx = Uint8Array.from(beta, (x) => betaSet.indexOf(x)), aIdx = Uint8Array.from(a, (x) => aSet.indexOf(x));
  const pBeta = new Float64Array(betaSet.length), pA = new Float64Array(aSet.length);
  return {
    add(tau, deltaIn, _lnTau, _lnDelta, acc) {
      let delta = deltaIn;
      if (Math.abs(delta - 1) < SINGULAR_GAP) delta = 1 + SINGULAR_GAP;
      const dm1 = delta - 1, tm1 = tau - 1;
      const d2 = dm1 * dm1;
      let f = 0, fD = 0, fT = 0, fDD = 0, fTT = 0, fDT = 0;
      // Powers of (δ−1)² shared by terms with the same β or a: one pow per distinct exponent per call.
      // Each term carries ψ = exp(−C(δ−1)² − D(τ−1)²); where that exponent passes 50 the term is below
      // 1e-21 of its size near the critical point, far under rounding, and is skipped with its powers.
      let lastDelta = NaN, lastLnDelta = 0, lastPsiArg = NaN, lastPsi = 0;
      let active = false;
      for (let i = 0; i < count; i++) if (C[i]! * d2 + D[i]! * tm1 * tm1 < 50) active = true;
      if (!active) return;
      // exp(k·ln x) is several times faster than Math.pow in V8 and as exact for these arguments.
      const lnD2 = Math.log(d2);
      for (let j = 0; j < betaSet.length; j++) pBeta[j] = Math.exp((1 / (2 * betaSet[j]!) - 1) * lnD2);
      for (let j = 0; j < aSet.length; j++) pA[j] = Math.exp((aSet[j]! - 1) * lnD2);
      for (let i = 0; i < count; i++) {
        const ai = a[i]!, bi = b[i]!, bei = beta[i]!, Ai = A[i]!, Bi = B[i]!, Ci = C[i]!, Di = D[i]!;
        if (Ci * d2 + Di * tm1 * tm1 >= 50) continue;
        const p1 = pBeta[betaIdx[i]!]!; // ((δ−1)²)^(1/(2β) − 1)
        const theta = 1 - tau + Ai * p1 * d2;
        const pa1 = pA[aIdx[i]!]!; // ((δ−1)²)^(a − 1)
        let Delta = theta * theta + Bi * pa1 * d2;
        if (Delta < 1e-300) Delta = 1e-300;
        // Terms often share Δ (same a, β, A, B) or ψ (same C, D): their logs and exps are taken once.
        if (Delta !== lastDelta) { lastDelta = Delta; lastLnDelta = Math.log(Delta); }
        const psiArg = -Ci * d2 - Di * tm1 * tm1;
        if (psiArg !== lastPsiArg) { lastPsiArg = psiArg; lastPsi = Math.exp(psiArg); }
        const psi = lastPsi;
        // Δ and its derivatives; (1/(δ−1))·∂Δ/∂δ is kept as `r` to avoid a 0/0 at δ = 1.
        const r = Ai * theta * (2 / bei) * p1 + 2 * Bi * ai * pa1;
        const dDelta = dm1 * r;
        const ddDelta = r + d2 * (4 * Bi * ai * (ai - 1) * (pa1 / d2)
          + 2 * Ai * Ai * (1 / (bei * bei)) * p1 * p1
          + Ai * theta * (4 / bei) * (1 / (2 * bei) - 1) * (p1 / d2));
        const Db = Math.exp(bi * lastLnDelta);
        const Db1 = Db / Delta; // Δ^(b−1)
        const Db2 = Db1 / Delta; // Δ^(b−2)
        const dDb = bi * Db1 * dDelta;
        const ddDb = bi * (Db1 * ddDelta + (bi - 1) * Db2 * dDelta * dDelta);
        const tDb = -2 * theta * bi * Db1;
        const ttDb = 2 * bi * Db1 + 4 * theta * theta * bi * (bi - 1) * Db2;
        const dtDb = -Ai * bi * (2 / bei) * Db1 * dm1 * p1 - 2 * theta * bi * (bi - 1) * Db2 * dDelta;
        const dPsi = -2 * Ci * dm1 * psi;
        const ddPsi = (2 * Ci * d2 - 1) * 2 * Ci * psi;
        const tPsi = -2 * Di * tm1 * psi;
        const ttPsi = (2 * Di * tm1 * tm1 - 1) * 2 * Di * psi;
        const dtPsi = 4 * Ci * Di * dm1 * tm1 * psi;
        const ni = n[i]!;
        f += ni * Db * delta * psi;
        fD += ni * (Db * (psi + delta * dPsi) + dDb * delta * psi);
        fDD += ni * (Db * (2 * dPsi + delta * ddPsi) + 2 * dDb * (psi + delta * dPsi) + ddDb * delta * psi);
        fT += ni * delta * (tDb * psi + Db * tPsi);
        fTT += ni * delta * (ttDb * psi + 2 * tDb * tPsi + Db * ttPsi);
        fDT += ni * (Db * (tPsi + delta * dtPsi) + delta * dDb * tPsi + tDb * (psi + delta * dPsi) + dtDb * delta * psi);
      }
      acc[R_A]! += f;
      acc[R_D]! += delta * fD;
      acc[R_T]! += tau * fT;
      acc[R_DD]! += delta * delta * fDD;
      acc[R_TT]! += tau * tau * fTT;
      acc[R_DT]! += delta * tau * fDT;
    },
  };
}
