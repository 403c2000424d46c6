// Properties of a mixture at (T, ρ, x) from the mixture's reduced Helmholtz energy: the pure-fluid relations
// of SCHEMA.md with the mixture's αʳ, α⁰, gas constant and molar mass. Writes into a reusable Float64Array.
import { writeProperties } from "../properties.js";
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
  writeProperties(m.r, m.i[0]!, m.i[1]!, m.i[2]!, m.R, m.molarMass(x), T, rho, out);
}
