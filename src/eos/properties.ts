// Thermodynamic properties at (T, ρ) from the reduced Helmholtz energy (SCHEMA.md relations).
// Works in molar units internally and writes mass-based SI into a reusable Float64Array.
import type { Helmholtz } from "./helmholtz.js";

/** Slots of a property vector (mass-based SI unless noted). */
export const P = 0, H = 1, S = 2, U = 3, G = 4, CV = 5, CP = 6, W = 7,
  /** (∂p/∂ρ)_T per molar density [Pa·m³/mol]. */
  DPDRHO = 8,
  /** (∂p/∂T)_ρ [Pa/K]. */
  DPDT = 9;
export const PROP_SLOTS = 10;

/** Pressure [Pa] and (∂p/∂ρ)_T [Pa m³/mol] at T [K], molar density ρ [mol/m³]; writes both into out[0], out[1]. */
export function pressureAndSlope(m: Helmholtz, T: number, rho: number, out: Float64Array): void {
  m.evalResidual(m.Tr / T, rho / m.rhor);
  const r = m.r;
  const RT = m.R * T;
  out[0] = rho * RT * (1 + r[1]!);
  out[1] = RT * (1 + 2 * r[1]! + r[3]!);
}

/** The full property set at T [K] and molar density ρ [mol/m³]; M is the molar mass [kg/mol]. */
export function propertiesTRho(m: Helmholtz, M: number, T: number, rho: number, out: Float64Array): void {
  const tau = m.Tr / T, delta = rho / m.rhor;
  m.evalAll(tau, delta);
  writeProperties(m.r, m.i[0]! + m.i[3]!, m.i[1]!, m.i[2]!, m.R, M, T, rho, out);
}

/**
 * The property set from the scaled residual derivatives r (see terms/kernel.ts), the ideal part
 * α⁰ (ln δ included), τα⁰_τ, τ²α⁰_ττ, the gas constant R, molar mass M [kg/mol], T [K] and molar ρ.
 * Shared by pure fluids and mixtures, so both use one set of relations (SCHEMA.md).
 */
export function writeProperties(r: Float64Array, a0: number, ta0: number, tta0: number, R: number, M: number, T: number, rho: number, out: Float64Array): void {
  const ar = r[0]!, dar = r[1]!, tar = r[2]!, ddar = r[3]!, ttar = r[4]!, dtar = r[5]!;
  const RT = R * T;
  const num = 1 + dar - dtar;
  const den = 1 + 2 * dar + ddar;
  const tt = tta0 + ttar;
  const cv = -R * tt;
  out[P] = rho * RT * (1 + dar);
  out[H] = (RT * (1 + ta0 + tar + dar)) / M;
  out[S] = (R * (ta0 + tar - a0 - ar)) / M;
  out[U] = (RT * (ta0 + tar)) / M;
  out[G] = (RT * (1 + a0 + ar + dar)) / M;
  out[CV] = cv / M;
  out[CP] = (cv + (R * num * num) / den) / M;
  const w2 = (RT / M) * (den - (num * num) / tt);
  out[W] = w2 > 0 ? Math.sqrt(w2) : 0;
  out[DPDRHO] = RT * den;
  out[DPDT] = rho * R * num;
}

/** Molar Gibbs energy over RT and pressure at (T, ρ), the two quantities equal in coexisting phases. */
export function gibbsAndPressure(m: Helmholtz, T: number, rho: number, out: Float64Array): void {
  const delta = rho / m.rhor;
  m.evalResidual(m.Tr / T, delta);
  const r = m.r;
  out[0] = rho * m.R * T * (1 + r[1]!);
  out[1] = r[0]! + r[1]! + Math.log(delta); // g/RT less the ideal τ-only part, equal for both phases at one T
}
