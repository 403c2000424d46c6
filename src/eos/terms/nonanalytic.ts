// Nonanalytic terms n Δ^b δ ψ of the water (IAPWS-95) and CO2 equations, which reproduce the
// critical-point behaviour; derivatives as given in the IAPWS-95 release (Table 5), scaled on output.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";

/** Distance from δ = 1 below which δ is nudged: the derivatives hold (δ−1)^negative powers there. */
const SINGULAR_GAP = 1e-10;

/**
 * x^e for x > 0: by square or cube roots and multiplication where e is a multiple of 1/2 or 1/3 (the
 * published exponents are: a − 1 = 2.5 or 2, 1/(2β) − 1 = 2/3), else exp(e ln x), which V8 runs several
 * times faster than Math.pow.
 */
function rationalPower(x: number, e: number): number {
  const n2 = Math.round(2 * e), n3 = Math.round(3 * e);
  if (Math.abs(2 * e - n2) < 1e-12 && n2 >= 0 && n2 <= 16) {
    let r = n2 % 2 ? Math.sqrt(x) : 1;
    for (let k = 0; k < n2 >> 1; k++) r *= x;
    return r;
  }
  if (Math.abs(3 * e - n3) < 1e-12 && n3 >= 0 && n3 <= 12) {
    const c = Math.cbrt(x);
    let r = 1;
    for (let k = 0; k < n3; k++) r *= c;
    return r;
  }
  return Math.exp(e * Math.log(x));
}

export function nonanalyticTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, a, b, beta, A, B, C, D] = columns(rows, names, ["n", "a", "b", "beta", "A", "B", "C", "D"]) as Float64Array[] as [
    Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
  const count = n.length;
  const betaSet = Float64Array.from(new Set(beta)), aSet = Float64Array.from(new Set(a));
  const betaIdx = Uint8Array.from(beta, (x) => betaSet.indexOf(x)), aIdx = Uint8Array.from(a, (x) => aSet.indexOf(x));
  const pBeta = new Float64Array(betaSet.length), pA = new Float64Array(aSet.length);
  const k2b = beta.map((x) => 2 / x), kbb = beta.map((x) => 1 / (x * x)), k4b = beta.map((x) => (4 / x) * (1 / (2 * x) - 1));
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
      for (let j = 0; j < betaSet.length; j++) pBeta[j] = rationalPower(d2, 1 / (2 * betaSet[j]!) - 1);
      for (let j = 0; j < aSet.length; j++) pA[j] = rationalPower(d2, aSet[j]! - 1);
      for (let i = 0; i < count; i++) {
        const ai = a[i]!, bi = b[i]!, Ai = A[i]!, Bi = B[i]!, Ci = C[i]!, Di = D[i]!;
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
        const k1 = k2b[i]!; // 2/β, and the other constants of β below, are precomputed: no divisions per call
        const r = Ai * theta * k1 * p1 + 2 * Bi * ai * pa1;
        const dDelta = dm1 * r;
        const ddDelta = r + 4 * Bi * ai * (ai - 1) * pa1 + 2 * Ai * Ai * kbb[i]! * p1 * p1 * d2 + Ai * theta * k4b[i]! * p1;
        const Db = Math.exp(bi * lastLnDelta);
        const invDelta = 1 / Delta;
        const Db1 = Db * invDelta; // Δ^(b−1)
        const Db2 = Db1 * invDelta; // Δ^(b−2)
        const dDb = bi * Db1 * dDelta;
        const ddDb = bi * (Db1 * ddDelta + (bi - 1) * Db2 * dDelta * dDelta);
        const tDb = -2 * theta * bi * Db1;
        const ttDb = 2 * bi * Db1 + 4 * theta * theta * bi * (bi - 1) * Db2;
        const dtDb = -Ai * bi * k1 * Db1 * dm1 * p1 - 2 * theta * bi * (bi - 1) * Db2 * dDelta;
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
