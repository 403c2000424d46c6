// Molar density of a mixture at given temperature, pressure and composition, on the branch asked for.
// Safeguarded Newton as for pure fluids: a bracket on the stable branch, bisection when a step leaves it.
import { convergenceError } from "../../errors.js";
import type { Branch } from "../density.js";
import type { MixtureModel } from "./model.js";
import { mixturePressureAndSlope } from "./properties.js";

const MAX_ITER = 200;
const out = new Float64Array(2);

/** A liquid-like starting density [mol/m³]: 2.6 times the reducing density, near the liquid at low reduced T. */
function liquidStart(m: MixtureModel, x: ArrayLike<number>, T: number): number {
  m.reduce(x);
  const t = Math.min(T / m.Tr, 0.98);
  // Rackett-like shape: dense at low T, towards 1.3 ρ_r close to T_r.
  return (1 / m.vr) * (1 + 1.75 * Math.pow(1 - t, 0.35));
}

/** Molar density [mol/m³] at T [K], p [Pa], composition x on the branch, from `guess` when given. */
export function mixtureDensityTP(m: MixtureModel, T: number, p: number, x: ArrayLike<number>, branch: Branch, guess?: number): number {
  let lo = 0, hi = Infinity;
  let rho: number;
  if (guess !== undefined && guess > 0 && Number.isFinite(guess)) rho = guess;
  else if (branch === "liquid") rho = liquidStart(m, x, T);
  else rho = p / (m.R * T);
  for (let k = 0; k < MAX_ITER; k++) {
    mixturePressureAndSlope(m, T, rho, x, out);
    const pr = out[0]!, dp = out[1]!;
    const stable = dp > 0;
    if (branch === "vapour") {
      if (!stable || pr > p) hi = rho; else lo = rho;
    } else if (branch === "liquid") {
      if (stable && pr > p) hi = rho; else lo = rho;
    } else if (pr > p) hi = rho; else lo = rho;
    const resid = pr - p;
    // In a dense liquid p is a near-cancelling sum whose rounding exceeds 1e-13·p: accept a root whose
    // Newton correction is below 1e-13 in density as well.
    if (stable && (Math.abs(resid) <= 1e-13 * p || Math.abs(resid) <= 1e-13 * rho * dp)) return rho;
    let next = stable ? rho - resid / dp : NaN;
    if (!(next > lo && next < hi)) next = Number.isFinite(hi) ? 0.5 * (lo + hi) : Math.max(rho * 1.5, lo * 1.5);
    if (stable && Math.abs(next - rho) <= 1e-15 * rho) return next;
    // A closed bracket without a root: p lies beyond this branch's spinodal at (T, x).
    if (Number.isFinite(hi) && hi - lo <= 1e-15 * hi) {
      if (stable && Math.abs(resid) <= 1e-9 * p) return rho;
      break;
    }
    rho = next;
  }
  throw convergenceError("mixture density", `T = ${T} K, p = ${p} Pa (${branch} branch)`);
}
