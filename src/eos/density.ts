// Density at given temperature and pressure: the root of p(T, ρ) = p on the branch asked for.
// Safeguarded Newton: every step keeps a bracket on the stable branch and falls back to bisection.
import { convergenceError } from "../errors.js";
import type { Fluid } from "./fluid.js";
import { pressureAndSlope } from "./properties.js";

/** Which root of p(T, ρ) = p: the gas branch, the liquid branch, or the only one (above T_c). */
export type Branch = "vapour" | "liquid" | "single";

const MAX_ITER = 200;

/**
 * Molar density [mol/m³] at T [K], p [Pa] on the given branch, starting from `guess` (mol/m³, optional).
 * `cap` bounds the vapour branch from above (e.g. the saturated vapour density), when known.
 */
export function densityTP(f: Fluid, T: number, p: number, branch: Branch, guess?: number, cap?: number): number {
  const out = f.tmp2;
  let lo = 0;
  let hi = cap !== undefined && cap > 0 ? cap * (1 + 1e-9) : Infinity;
  let rho: number;
  if (guess !== undefined && guess > 0 && guess < hi) rho = guess;
  else if (branch === "liquid") rho = f.Tmin <= T && T < f.Tc ? f.rhoLiquid.value(T) * 1.02 : 3 * f.rhoc;
  else rho = Math.min(p / (f.R * T), hi * 0.999);
  if (!(rho > 0) || !Number.isFinite(rho)) rho = branch === "liquid" ? 3 * f.rhoc : p / (f.R * T);
  for (let k = 0; k < MAX_ITER; k++) {
    pressureAndSlope(f.model, T, rho, out);
    const pr = out[0]!, dp = out[1]!;
    const stable = dp > 0;
    if (branch === "vapour") {
      // On the gas side, a point past the spinodal or above p lies beyond the root.
      if (!stable || pr > p) hi = rho; else lo = rho;
    } else if (branch === "liquid") {
      if (stable && pr > p) hi = rho; else lo = rho;
    } else {
      if (pr > p) hi = rho; else lo = rho;
    }
    const resid = pr - p;
    if (stable && Math.abs(resid) <= 1e-13 * p) return rho;
    let next = stable ? rho - resid / dp : NaN;
    if (!(next > lo && next < hi)) next = Number.isFinite(hi) ? 0.5 * (lo + hi) : Math.max(rho * 1.5, lo * 1.5);
    if (stable && Math.abs(next - rho) <= 1e-15 * rho) return next;
    if (Number.isFinite(hi) && hi - lo <= 1e-15 * hi) {
      if (stable) return rho;
      break;
    }
    rho = next;
  }
  throw convergenceError("density", `T = ${T} K, p = ${p} Pa (${branch} branch) of ${f.id}`);
}
