// Density at given temperature and entropy in one phase: the one-dimensional solve behind isentropes.
// s falls monotonically with ln ρ at fixed T, so a bracketed secant in ln ρ finds the single root.
import { propertiesTRho, S } from "../eos/index.js";
import { convergenceError } from "../errors.js";
import type { Context } from "./context.js";

/** Molar density [mol/m³] at T [K] where the entropy (chosen reference) equals s [J/(kg K)], from a nearby guess. */
export function densityTS(ctx: Context, T: number, s: number, guess: number): number {
  const { f } = ctx;
  const target = s - ctx.off.ds;
  const tol = 1e-12 * (Math.abs(target) + f.R / f.M);
  const o = ctx.scratch;
  const F = (x: number) => {
    propertiesTRho(f.model, f.M, T, Math.exp(x), o);
    return o[S]! - target;
  };
  // lo: ln ρ where s is still too high (root lies at larger ρ); hi: where s is too low.
  let lo = -Infinity, hi = Infinity;
  let x0 = Math.log(guess), f0 = F(x0);
  if (Math.abs(f0) <= tol) return guess;
  let x1 = x0 + (f0 > 0 ? 0.01 : -0.01), f1 = F(x1);
  for (let k = 0; k < 80; k++) {
    if (Math.abs(f1) <= tol) return Math.exp(x1);
    if (f0 > 0) lo = Math.max(lo, x0); else hi = Math.min(hi, x0);
    if (f1 > 0) lo = Math.max(lo, x1); else hi = Math.min(hi, x1);
    let next = f1 !== f0 ? x1 - (f1 * (x1 - x0)) / (f1 - f0) : NaN;
    if (!(next > lo && next < hi)) {
      if (Number.isFinite(lo) && Number.isFinite(hi)) next = 0.5 * (lo + hi);
      else next = Number.isFinite(lo) ? lo + 0.5 : hi - 0.5;
    }
    if (Math.abs(next - x1) <= 1e-15 * Math.max(1, Math.abs(x1))) return Math.exp(next);
    x0 = x1; f0 = f1;
    x1 = next; f1 = F(x1);
  }
  throw convergenceError("density at fixed entropy", `T = ${T} K, s = ${s} J/(kg K) of ${f.id}`);
}
