// Density at given temperature and pressure: the root of p(T, ρ) = p on the branch asked for.
// The root is first bracketed on a stable stretch of the isotherm, then found by Newton steps kept inside the bracket.
import { convergenceError, rangeError } from "../errors.js";
import type { Fluid } from "./fluid.js";
import { pressureAndSlope } from "./properties.js";

/** Which root of p(T, ρ) = p: the gas branch, the liquid branch, or the only one (above T_c). */
export type Branch = "vapour" | "liquid" | "single";

const MAX_ITER = 200;
/** Steps of the bracket search along the isotherm (factor on ρ per step, and how many). */
const STEP_UP = 1.05, STEP_DOWN = 1 / 1.25, MAX_STEPS = 400;
/** Density, as a multiple of the triple-point liquid density, past which a falling isotherm is the equation turning over. */
const TURNOVER = 1.05;

/**
 * A density [mol/m³] safely below the saturated liquid at T (the ancillary less 1.5 × its stated error);
 * 0 above T_c. Liquid roots lie above it; roots below it at T < T_c are in-dome wiggles of the equation.
 */
export function liquidFloor(f: Fluid, T: number): number {
  return T >= f.Tmin && T < f.Tc ? f.rhoLiquid.value(T) * (1 - 0.015 * f.data.ancillaries.rhoLiquid.maxErrorPercent) : 0;
}

/**
 * Molar density [mol/m³] at T [K], p [Pa] on the given branch, starting from `guess` (mol/m³, optional).
 * `cap` bounds the vapour branch from above (e.g. the saturated vapour density), `least` the liquid branch
 * from below (e.g. the saturated liquid density when p ≥ p_sat), when the caller knows them.
 */
export function densityTP(f: Fluid, T: number, p: number, branch: Branch, guess?: number, cap?: number, least?: number): number {
  return branch === "vapour" ? vapourRoot(f, T, p, guess, cap) : denseRoot(f, T, p, branch, guess, least);
}

/**
 * The gas-branch root: from the ideal-gas side p(ρ) is concave, so Newton steps approach the root from below;
 * any point past the spinodal or above p bounds the root from above.
 */
function vapourRoot(f: Fluid, T: number, p: number, guess?: number, cap?: number): number {
  const out = f.tmp2;
  let lo = 0;
  let hi = cap !== undefined && cap > 0 ? cap * (1 + 1e-9) : 2 * f.data.triple.rhoLiquid;
  let rho = guess !== undefined && guess > 0 && guess < hi ? guess : Math.min(p / (f.R * T), 0.999 * hi);
  for (let k = 0; k < MAX_ITER; k++) {
    pressureAndSlope(f.model, T, rho, out);
    const pr = out[0]!, dp = out[1]!;
    const stable = dp > 0;
    if (!stable || pr > p) hi = rho; else lo = rho;
    const resid = pr - p;
    if (stable && Math.abs(resid) <= 1e-13 * p) return rho;
    let next = stable ? rho - resid / dp : NaN;
    if (next > 2 * rho) next = 2 * rho;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (stable && Math.abs(next - rho) <= 1e-15 * rho) return next;
    if (hi - lo <= 1e-15 * hi) {
      if (stable) return rho;
      break;
    }
    rho = next;
  }
  throw convergenceError("density", `T = ${T} K, p = ${p} Pa (vapour branch) of ${f.id}`);
}

/**
 * The liquid-branch root (or the only root above T_c): walk along the isotherm from the starting density
 * until p is bracketed between two stable points, then Newton inside the bracket. An isotherm that turns
 * over before reaching p (the equation's polynomial terms at extreme density) is a range error, not a root.
 */
function denseRoot(f: Fluid, T: number, p: number, branch: Branch, guess?: number, least?: number): number {
  const out = f.tmp2;
  // Below T_c the liquid root lies above the saturated liquid density; starting there keeps the search
  // out of the dome, where an isotherm can have stable islands with roots that are not the liquid.
  const floor = least !== undefined && least > 0 ? least : branch === "liquid" ? liquidFloor(f, T) : 0;
  let rho = guess !== undefined && guess > 0 ? Math.max(guess, floor)
    : floor > 0 ? floor : Math.min(p / (f.R * T), f.data.triple.rhoLiquid);
  if (!(rho > 0) || !Number.isFinite(rho)) rho = f.rhoc;
  // First plain Newton from the start (a good start converges in a few steps); it gives up at the
  // first sign of trouble (an unstable point, a step below the floor) and leaves it to the bracketed search.
  {
    let x = rho;
    for (let k = 0; k < 12; k++) {
      pressureAndSlope(f.model, T, x, out);
      const dp = out[1]!, resid = out[0]! - p;
      if (!(dp > 0)) break;
      if (Math.abs(resid) <= 1e-13 * p) return x;
      const next = x - resid / dp;
      if (!(next > floor) || next > 2 * x) break;
      if (Math.abs(next - x) <= 1e-15 * x) return next;
      x = next;
    }
  }
  pressureAndSlope(f.model, T, rho, out);
  let lo = 0, hi = 0;
  // Find a stable point first (a liquid guess can sit inside the spinodal near T_c).
  for (let k = 0; k < MAX_STEPS && !(out[1]! > 0); k++) {
    rho *= STEP_UP;
    pressureAndSlope(f.model, T, rho, out);
  }
  if (!(out[1]! > 0)) throw convergenceError("density", `T = ${T} K, p = ${p} Pa (${branch} branch) of ${f.id}: no stable liquid branch`);
  if (out[0]! > p) {
    hi = rho;
    lo = rho;
    for (let k = 0; k < MAX_STEPS; k++) {
      lo = lo * STEP_DOWN > floor || hi <= floor ? lo * STEP_DOWN : floor;
      pressureAndSlope(f.model, T, lo, out);
      if (!(out[1]! > 0) || out[0]! < p) break;
      hi = lo;
    }
  } else {
    // Walk up. Inside the dome an isotherm of a multiparameter equation can wiggle (unstable stretches,
    // small stable islands): walk through them. Beyond the triple-point liquid density a falling
    // pressure means the equation itself has turned over.
    lo = rho;
    let peak = out[0]!;
    const turnover = TURNOVER * f.data.triple.rhoLiquid;
    for (let k = 0; ; k++) {
      if (k >= MAX_STEPS) throw convergenceError("density", `T = ${T} K, p = ${p} Pa (${branch} branch) of ${f.id}`);
      hi = lo * STEP_UP;
      pressureAndSlope(f.model, T, hi, out);
      if (out[1]! > 0 && out[0]! > p) break;
      if (hi > turnover && !(out[1]! > 0))
        throw rangeError("p", p, `pressures the equation of ${f.id} reaches on its liquid branch at T = ${T} K (at most about ${+peak.toPrecision(4)} Pa)`);
      peak = Math.max(peak, out[0]!);
      lo = hi;
    }
  }
  // Newton inside [lo, hi]; bisection when a step leaves the bracket.
  rho = 0.5 * (lo + hi);
  for (let k = 0; k < MAX_ITER; k++) {
    pressureAndSlope(f.model, T, rho, out);
    const pr = out[0]!, dp = out[1]!;
    const resid = pr - p;
    if (dp > 0 && Math.abs(resid) <= 1e-13 * p) return rho;
    if (dp > 0 && pr > p) hi = rho; else lo = rho;
    let next = dp > 0 ? rho - resid / dp : NaN;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - rho) <= 1e-15 * rho || hi - lo <= 1e-15 * hi) return next;
    rho = next;
  }
  throw convergenceError("density", `T = ${T} K, p = ${p} Pa (${branch} branch) of ${f.id}`);
}
