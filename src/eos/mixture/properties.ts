// Properties of a mixture at (T, ρ, x) from the mixture's reduced Helmholtz energy: the pure-fluid relations
// of SCHEMA.md with the mixture's αʳ, α⁰, gas constant and molar mass. Writes into a reusable Float64Array.
import { CP, CV, DPDRHO, DPDT, G, H, P, S, U, W } from "../properties.js";
import type { MixtureModel } from "./model.js";

/** Pressure [Pa] and (∂p/∂ρ)_T,x [Pa m³/mol] at T [K], molar density ρ [mol/m³]; into out[0], out[1]. */
export function mixturePressureAndSlope(m: MixtureModel, T: number, rho: number, x: ArrayLike<number>, out: Float64Array): void {
  m.reduce(x);
  m.evalResidual(m.Tr / T, rho * m.vr, x);
  const r = m.r, RT = m.R * T;
  out[0] = rho * RT * (1 + r[1]!);
  out[1] = RT * (1 + 2 * r[1]! + r[3]!);
}

/** The full property set (mass-based SI, slots of ../properties.ts) at T [K], molar density ρ [mol/m³], composition x. */
export function mixturePropertiesTRho(m: MixtureModel, T: number, rho: number, x: ArrayLike<number>, out: Float64Array): void {
  m.reduce(x);
  const tau = m.Tr / T, delta = rho * m.vr;
  m.evalResidual(tau, delta, x);
  m.evalIdeal(T, rho, x);
  const r = m.r, i = m.i, R = m.R, M = m.molarMass(x);
  const ar = r[0]!, dar = r[1]!, tar = r[2]!, ddar = r[3]!, ttar = r[4]!, dtar = r[5]!;
  const a0 = i[0]!, ta0 = i[1]!, tta0 = i[2]!;
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
