// The equation's own critical point, where (∂p/∂ρ)_T has a double root; it may differ slightly from the
// critical constants a paper states, and the saturation solver must stop short of the equation's own one.
import type { Fluid } from "./fluid.js";

/** Reduced slope (∂p/∂ρ)_T / RT at (T, ρ) with ρ in mol/m³. */
function slope(f: Fluid, T: number, rho: number): number {
  const m = f.model;
  m.evalResidual(m.Tr / T, rho / m.rhor);
  return 1 + 2 * m.r[1]! + m.r[3]!;
}

/** Smallest slope over densities around ρc at T, by golden-section search. */
function minSlope(f: Fluid, T: number): { value: number; rho: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let a = 0.5 * f.rhoc, b = 1.6 * f.rhoc;
  let c = b - g * (b - a), d = a + g * (b - a);
  let fc = slope(f, T, c), fd = slope(f, T, d);
  for (let k = 0; k < 80 && b - a > 1e-10 * f.rhoc; k++) {
    if (fc < fd) { b = d; d = c; fd = fc; c = b - g * (b - a); fc = slope(f, T, c); }
    else { a = c; c = d; fc = fd; d = a + g * (b - a); fd = slope(f, T, d); }
  }
  const rho = 0.5 * (a + b);
  return { value: slope(f, T, rho), rho };
}

/** Temperature [K] and molar density [mol/m³] of the equation's critical point, by bisection in T. */
export function equationCriticalPoint(f: Fluid): { T: number; rho: number } {
  let lo = f.Tc * 0.97, hi = f.Tc * 1.03;
  for (let k = 0; k < 60 && hi - lo > 1e-9 * f.Tc; k++) {
    const mid = 0.5 * (lo + hi);
    if (minSlope(f, mid).value > 0) hi = mid; else lo = mid;
  }
  return { T: hi, rho: minSlope(f, hi).rho };
}
