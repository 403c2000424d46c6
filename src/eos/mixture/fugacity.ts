// Fugacity coefficients of a mixture at (T, ρ, x): ln φᵢ = ∂(nαʳ)/∂nᵢ − ln Z, with the composition derivative
// written through the reducing functions as in Kunz & Wagner 2012 (eq. 7.29 and Table 7.5), all analytic.
import type { MixtureModel } from "./model.js";

/**
 * Writes ∂(nαʳ)/∂nᵢ at constant T, V and the other mole numbers into dn, and returns Z = p/(ρRT).
 * n∂αʳ/∂nᵢ = δαʳ_δ(1 + n∂v_r/∂nᵢ / v_r) + ταʳ_τ (n∂T_r/∂nᵢ / T_r) + αʳ_xᵢ − Σ x_k αʳ_x_k,
 * where n∂Y_r/∂nᵢ = ∂Y_r/∂xᵢ − Σ x_k ∂Y_r/∂x_k.
 */
export function residualChemicalPotentials(m: MixtureModel, T: number, rho: number, x: ArrayLike<number>, dn: Float64Array): number {
  m.reduce(x);
  const Tr = m.Tr, vr = m.vr;
  m.evalResidual(Tr / T, rho * vr, x);
  const r = m.r, ax = m.ax, dT = m.Tred.dx, dv = m.vred.dx, N = m.N;
  let sT = 0, sv = 0, sa = 0;
  for (let k = 0; k < N; k++) {
    const xk = x[k]!;
    sT += xk * dT[k]!;
    sv += xk * dv[k]!;
    sa += xk * ax[k]!;
  }
  const a = r[0]!, da = r[1]!, ta = r[2]!;
  for (let k = 0; k < N; k++) {
    dn[k] = a + da * (1 + (dv[k]! - sv) / vr) + ta * ((dT[k]! - sT) / Tr) + ax[k]! - sa;
  }
  return 1 + da;
}

/** ln φᵢ at T [K], molar density ρ [mol/m³] and composition x into out; returns Z. */
export function lnFugacityCoefficients(m: MixtureModel, T: number, rho: number, x: ArrayLike<number>, out: Float64Array): number {
  const Z = residualChemicalPotentials(m, T, rho, x, out);
  const lnZ = Math.log(Z);
  for (let k = 0; k < m.N; k++) out[k]! -= lnZ;
  return Z;
}
