// Flashes: the state from any supported pair of inputs, with phase identification.
// Single-phase solves are nested one-dimensional Newton iterations, each bracketed and capped.
import { convergenceError, DomeprintError, inputError, rangeError, requireNumber } from "../errors.js";
import { densityTP, liquidFloor, type Branch } from "./density.js";
import type { Fluid } from "./fluid.js";
import { CP, CV, DPDRHO, DPDT, H, P, propertiesTRho, S } from "./properties.js";
import { checkReferenceName, referenceOffset, type ReferenceName, type ReferenceOffset } from "./reference.js";
import { nearCriticalTieLine, tieLineAtP, saturationP, saturationPressureRange, saturationT, type Saturation } from "./saturation.js";
import { singlePhase, singleState, tieLine, twoPhaseState, type State } from "./state.js";

export type InputName = "T" | "p" | "rho" | "v" | "h" | "s" | "x";
export const INPUT_NAMES: readonly InputName[] = ["T", "p", "rho", "v", "h", "s", "x"];
export type Inputs = Partial<Record<InputName, number>>;

/** The pairs the engine solves, in the order they are listed to users. */
export const SUPPORTED_PAIRS = ["T,p", "p,h", "p,s", "T,s", "T,x", "p,x", "T,rho", "T,v"] as const;

const MAX_ITER = 100;

// ---------------------------------------------------------------- range checks

function checkT(f: Fluid, T: number): void {
  requireNumber("T", T, { positive: true });
  if (T < f.Tmin - 1e-9) throw rangeError("T", T, `${f.Tmin} K to ${f.Tmax} K for ${f.id}`, "E_BELOW_TRIPLE");
  if (T > f.Tmax) throw rangeError("T", T, `${f.Tmin} K to ${f.Tmax} K for ${f.id}`);
}

function checkP(f: Fluid, p: number): void {
  requireNumber("p", p, { positive: true });
  if (p > f.pmax) throw rangeError("p", p, `above 0 Pa up to ${f.pmax} Pa for ${f.id}`);
}

function checkX(x: number): void {
  requireNumber("x", x);
  if (x > 1) throw inputError("x", x, "quality above 1", "0 ≤ x ≤ 1");
}

/** Below this temperature the two-phase region exists at T. */
function hasTwoPhaseAtT(f: Fluid, T: number): boolean {
  return T <= f.satTmax;
}

/** Below this pressure the two-phase region exists at p. */
function twoPhasePmax(f: Fluid): number {
  return f.pseudoPure ? f.pc : saturationPressureRange(f)[1];
}

// ---------------------------------------------------------------- single-phase solves at fixed p

/**
 * A lower bound of the liquid root at T on an isobar whose saturated liquid is `sat`: colder liquid is denser
 * (water below 4 °C by less than 1e-3, hence the margin). Well below the saturation temperature the dome at T
 * is wide and may hold stable islands, so the ancillary floor at T is added there; close to it (and near T_c,
 * where ancillaries drift) it is left out.
 */
function liquidLeast(f: Fluid, T: number, sat: Saturation): number {
  const base = sat.rhoL * (1 - 1e-3);
  return T < sat.TL - 2 ? Math.max(base, liquidFloor(f, T)) : base;
}

type Target = "h" | "s";

/**
 * The size against which a residual in h [J/kg] or s [J/(kg K)] is judged: the target plus c_p T (or c_p),
 * with c_p capped at 100 R/M, since near the critical point it diverges and would pass any residual.
 */
export function targetScale(which: Target, target: number, T: number, cp: number, RM: number): number {
  const c = Math.min(cp, 100 * RM);
  return which === "h" ? Math.abs(target) + c * T : Math.abs(target) + c;
}

/**
 * T (and molar ρ) at pressure p where h or s (native reference) equals `target`, searched in [Tlo, Thi].
 * `branchAt` picks the density root for each trial temperature; `capRho` bounds the vapour root.
 */
function solveAtP(f: Fluid, p: number, which: Target, target: number, Tlo: number, Thi: number, T0: number,
  branchAt: (T: number) => Branch, rho0?: number, capRho?: number, atLow: "triple" | "boundary" = "boundary", leastAt?: (T: number) => number): { T: number; rho: number; evaluated: boolean } {
  const o = f.tmp;
  let lo = Tlo, hi = Thi;
  let T = Math.min(Math.max(T0, lo), hi);
  let rho = rho0;
  for (let k = 0; k < MAX_ITER; k++) {
    const br = branchAt(T);
    rho = densityTP(f, T, p, br, rho, br === "vapour" ? capRho : undefined, br === "liquid" ? leastAt?.(T) : undefined);
    propertiesTRho(f.model, f.M, T, rho, o);
    const F = (which === "h" ? o[H]! : o[S]!) - target;
    const slope = which === "h" ? o[CP]! : o[CP]! / T;
    const scale = targetScale(which, target, T, o[CP]!, f.R / f.M);
    if (Math.abs(F) <= 1e-13 * scale) return { T, rho, evaluated: true };
    if (F > 0) hi = T; else lo = T;
    let next = T - F / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    // A tiny Newton step is convergence only where F is small too: near the critical point c_p is huge and
    // F / c_p can be tiny while h is still far off. Then bisect.
    if (Math.abs(next - T) <= 1e-13 * T && Math.abs(F) > 1e-9 * scale && hi - lo > 1e-12 * T) next = 0.5 * (lo + hi);
    if (Math.abs(next - T) <= 1e-13 * T) {
      // The bracket has closed on an end of the range: the target lies outside it.
      const outside = Math.abs(F) > 1e-10 * scale;
      if (T - Tlo <= 1e-9 * T && F > 0 && outside) {
        const code = atLow === "triple" ? "E_BELOW_TRIPLE" : "E_RANGE";
        throw rangeError(which, target, `${which} at p = ${p} Pa between its values at ${Tlo} K and ${Thi} K for ${f.id}`, code);
      }
      if (Thi - T <= 1e-9 * T && F < 0 && outside) throw rangeError(which, target, `${which} at p = ${p} Pa up to its value at T_max = ${Thi} K for ${f.id}`);
      return { T: next, rho: densityTP(f, next, p, branchAt(next), rho, br === "vapour" ? capRho : undefined, br === "liquid" ? leastAt?.(next) : undefined), evaluated: false };
    }
    T = next;
  }
  throw convergenceError(`${which} at fixed pressure`, `p = ${p} Pa, ${which} = ${target} of ${f.id}`);
}

/**
 * Fast path for single-phase (p, h) and (p, s): Newton in (T, ln ρ) on p(T, ρ) = p and h or s = target,
 * one property evaluation per step. Accepted only if it converges inside [Tlo, Thi] on a stable branch
 * with ρ in [rhoMin, rhoMax]; otherwise undefined, and the caller uses the bracketed nested solver.
 */
function newtonAtP(f: Fluid, p: number, which: Target, target: number, T0: number, rho0: number,
  Tlo: number, Thi: number, rhoMin: number, rhoMax: number, leastAt?: (T: number) => number): { T: number; rho: number; evaluated: true } | undefined {
  const o = f.tmp, M = f.M;
  let T = Math.min(Math.max(T0, Tlo), Thi), rho = rho0;
  for (let k = 0; k < 25; k++) {
    propertiesTRho(f.model, M, T, rho, o);
    const dpdr = o[DPDRHO]!, dpdT = o[DPDT]!;
    if (!(dpdr > 0)) return undefined;
    const F1 = o[P]! - p;
    const y = which === "h" ? o[H]! : o[S]!;
    const F2 = y - target;
    const scale = targetScale(which, target, T, o[CP]!, f.R / f.M);
    // In a liquid at low pressure one rounding step of ρ moves p by more than 1e-12 p: the pressure test
    // allows those few roundings, or Newton would dither at the last digit and hand over to the slow path.
    const pTol = 1e-12 * p + 4 * Number.EPSILON * rho * dpdr;
    if (Math.abs(F1) <= pTol && Math.abs(F2) <= 1e-13 * scale) {
      const ok = T >= Tlo - 1e-9 * T && T <= Thi + 1e-9 * T && rho >= rhoMin && rho <= rhoMax && (!leastAt || rho >= leastAt(T));
      return ok ? { T, rho, evaluated: true } : undefined; // f.tmp holds the properties at (T, ρ)
    }
    // Jacobian in (T, ln ρ), ρ molar; h and s per unit mass.
    const a = dpdT, b = dpdr * rho;
    const c = which === "h" ? o[CV]! + dpdT / (rho * M) : o[CV]! / T;
    const d = which === "h" ? (dpdr - (T * dpdT) / rho) / M : -dpdT / (rho * M);
    const det = a * d - b * c;
    if (!(Math.abs(det) > 0)) return undefined;
    let dT = (F1 * d - b * F2) / det;
    let dl = (a * F2 - c * F1) / det;
    const g = Math.min(1, (0.2 * T) / Math.max(Math.abs(dT), 1e-300), 0.5 / Math.max(Math.abs(dl), 1e-300));
    dT *= g;
    dl *= g;
    T -= dT;
    rho *= Math.exp(-dl);
    if (!(T > 0.5 * Tlo && T < 1.5 * Thi)) return undefined;
  }
  return undefined;
}

/** The density branch for a single-phase state at pressure p above every saturation pressure. */
function branchAbove(f: Fluid) {
  return (T: number): Branch => (T < Math.min(f.satTmax, f.Tc) ? "liquid" : "single");
}

function flashPTarget(f: Fluid, p: number, which: Target, value: number, ref: ReferenceName, off: ReferenceOffset): State {
  const st = flashPTargetUnchecked(f, p, which, value, ref, off);
  // Guard: a state whose h (or s) misses the request is a solver failure, never a result.
  const got = which === "h" ? st.h : st.s;
  const scale = which === "h" ? Math.abs(value) + 1e3 * Math.abs(st.T) : Math.abs(value) + 1e3;
  if (!(Math.abs(got - value) <= 1e-8 * scale)) throw convergenceError(`the (p, ${which}) flash`, `p = ${p} Pa, ${which} = ${value} of ${f.id} (reached ${got})`);
  return st;
}

function flashPTargetUnchecked(f: Fluid, p: number, which: Target, value: number, ref: ReferenceName, off: ReferenceOffset): State {
  checkP(f, p);
  requireNumber(which, value, { allowNegative: true });
  const target = value - (which === "h" ? off.dh : off.ds);
  const pLowest = saturationPressureRange(f)[0];
  if (p < pLowest) return lowPressureVapour(f, p, which, value, target, ref, off);
  // Pure fluids: a pressure a hair above the top of the solved range is taken as its top.
  const top = twoPhasePmax(f);
  const tie = f.pseudoPure ? (p < top ? tieLineAtP(f, p) : undefined)
    : p <= top * (1 + 1e-9) ? tieLineAtP(f, Math.min(p, top)) : nearCriticalTieLine(f, p);
  if (tie) {
    const sat = tie;
    const t = tieLine(f, sat);
    const yL = which === "h" ? t.hL : t.sL, yV = which === "h" ? t.hV : t.sV;
    if (target >= yL && target <= yV) return twoPhaseState(f, sat, (target - yL) / (yV - yL), ref, off);
    // Within rounding of a saturated end (near T_c a kelvin's billionth moves h visibly) the state is that end.
    const snap = 1e-9 * (Math.abs(target) + Math.abs(yV - yL));
    if (Math.abs(yL - target) <= snap) return twoPhaseState(f, sat, 0, ref, off);
    if (Math.abs(target - yV) <= snap) return twoPhaseState(f, sat, 1, ref, off);
    if (target > yV) {
      const cp = t.cpV;
      const T0 = sat.TV + (which === "h" ? (target - yV) / cp : sat.TV * (Math.exp((target - yV) / cp) - 1));
      if (sat.TV >= f.Tmax) throw rangeError(which, value, `at most the saturated vapour value at p = ${p} Pa for ${f.id} (T_max reached)`);
      const T0c = Math.min(Math.max(T0, sat.TV), f.Tmax);
      const r = newtonAtP(f, p, which, target, T0c, sat.rhoV * (sat.TV / T0c), sat.TV, f.Tmax, 0, sat.rhoV * (1 + 1e-9))
        ?? solveAtP(f, p, which, target, sat.TV, f.Tmax, T0, (T) => (T < f.Tc ? "vapour" : "single"), sat.rhoV, sat.rhoV);
      return singleState(f, r.T, r.rho, singlePhase(f, r.T, p, false), ref, off, r.evaluated);
    }
    const cp = t.cpL;
    const T0 = sat.TL - (which === "h" ? (yL - target) / cp : sat.TL * (1 - Math.exp((target - yL) / cp)));
    const least = (T: number) => liquidLeast(f, T, sat);
    // Start on the liquid at T0: the saturated liquid density there (ancillary) is within a fraction of a
    // per cent of the compressed liquid's, where sat.rhoL would be a stretched, unstable state far below TL.
    const Ts = Math.max(T0, f.Tmin);
    const rho0 = Ts < sat.TL ? Math.max(sat.rhoL, f.rhoLiquid.value(Ts)) : sat.rhoL;
    const r = newtonAtP(f, p, which, target, Ts, rho0, f.Tmin, sat.TL, 0, Infinity, least)
      ?? solveAtP(f, p, which, target, f.Tmin, sat.TL, T0, () => "liquid", sat.rhoL, undefined, "triple", least);
    return singleState(f, r.T, r.rho, singlePhase(f, r.T, p, true), ref, off, r.evaluated);
  }
  // Above every saturation pressure there is one stable root at each T; start from the critical isotherm.
  // Above p_c the critical isotherm's root is denser than ρ_c, where p(ρ) is convex: Newton from the dense side
  // converges without overshoot, where a start from the ideal-gas density crosses the flat stretch at ρ_c.
  const rc = densityTP(f, Math.min(f.Tc, f.Tmax), p, "single", p >= f.pc ? f.data.triple.rhoLiquid : undefined);
  const r = newtonAtP(f, p, which, target, f.Tc, rc, f.Tmin, f.Tmax, 0, Infinity, (T) => (T < f.Tc - 2 ? liquidFloor(f, T) : 0))
    ?? solveAtP(f, p, which, target, f.Tmin, f.Tmax, f.Tc, branchAbove(f), undefined, undefined, "triple");
  return singleState(f, r.T, r.rho, singlePhase(f, r.T, p, true), ref, off, r.evaluated);
}

/**
 * Below the lowest saturation pressure only vapour exists inside the range: for pure fluids below the triple
 * point; for blends between the dew and bubble pressures at the lower limit, above the dew temperature.
 */
function lowPressureVapour(f: Fluid, p: number, which: Target, value: number, target: number, ref: ReferenceName, off: ReferenceOffset): State {
  let Tlo = f.Tmin;
  if (f.pseudoPure && p >= f.pDew!.value(f.Tmin)) Tlo = f.pDew!.invert(p);
  const rhoLo = densityTP(f, Tlo, p, "vapour");
  const o = f.tmp;
  propertiesTRho(f.model, f.M, Tlo, rhoLo, o);
  const yLo = which === "h" ? o[H]! : o[S]!;
  if (target < yLo)
    throw rangeError(which, value, `at p = ${p} Pa, values from ${+(yLo + (which === "h" ? off.dh : off.ds)).toPrecision(8)} (vapour at ${+Tlo.toFixed(3)} K; lower states are solid or below the equation's range) for ${f.id}`, "E_BELOW_TRIPLE");
  const cp = o[CP]!;
  const T0 = Math.min(Tlo + (which === "h" ? (target - yLo) / cp : Tlo * (Math.exp((target - yLo) / cp) - 1)), f.Tmax);
  const r = newtonAtP(f, p, which, target, T0, rhoLo * (Tlo / T0), Tlo, f.Tmax, 0, rhoLo * (1 + 1e-9))
    ?? solveAtP(f, p, which, target, Tlo, f.Tmax, Tlo + 10, (T) => (T < f.Tc ? "vapour" : "single"), rhoLo, rhoLo);
  return singleState(f, r.T, r.rho, singlePhase(f, r.T, p, false), ref, off, r.evaluated);
}

// ---------------------------------------------------------------- pseudo-pure two-phase at fixed T

/** Quality at which a pseudo-pure blend at pressure p reaches temperature T (T linear in x across the glide). */
function pseudoQuality(sat: Saturation, T: number): number {
  const span = sat.TV - sat.TL;
  return span > 0 ? Math.min(1, Math.max(0, (T - sat.TL) / span)) : 0;
}

/**
 * A pseudo-pure two-phase state at temperature T where `measure` (monotone in p) equals target:
 * bisection in p between the dew and bubble pressures at T.
 */
function pseudoTwoPhaseAtT(f: Fluid, T: number, measure: (s: State) => number, target: number, ref: ReferenceName, off: ReferenceOffset): State {
  // Some blends' bubble ancillary passes p_c just below T_c; the tie lines end below p_c.
  let lo = f.pDew!.value(T), hi = Math.min(f.pBubble!.value(T), f.pc * (1 - 1e-9));
  const at = (p: number) => { const sat = saturationP(f, p); return twoPhaseState(f, sat, pseudoQuality(sat, T), ref, off); };
  const mLo = measure(at(lo)), mHi = measure(at(hi));
  const increasing = mHi > mLo;
  let st = at(0.5 * (lo + hi));
  for (let k = 0; k < 200 && hi - lo > 1e-13 * hi; k++) {
    const mid = 0.5 * (lo + hi);
    st = at(mid);
    if ((measure(st) > target) === increasing) hi = mid; else lo = mid;
  }
  return st;
}

// ---------------------------------------------------------------- the flashes

export function flashTP(f: Fluid, T: number, p: number, ref: ReferenceName = "native"): State {
  checkT(f, T);
  checkP(f, p);
  const off = referenceOffset(f, ref);
  // Compared with the top of the solved saturation range, not the file's p_c: an equation's own critical
  // pressure can lie a few hundred pascals above the published one, and there a cold state is still liquid.
  if (T < f.Tc && p < twoPhasePmax(f) && hasTwoPhaseAtT(f, T)) {
    if (f.pseudoPure) {
      const pb = f.pBubble!.value(T), pd = f.pDew!.value(T);
      if (p >= pb) return singleState(f, T, densityTP(f, T, p, "liquid", undefined, undefined, Math.max(liquidFloor(f, T), f.rhoc)), "liquid", ref, off);
      if (p <= pd) return singleState(f, T, densityTP(f, T, p, "vapour"), "vapour", ref, off);
      const sat = saturationP(f, p);
      return twoPhaseState(f, sat, pseudoQuality(sat, T), ref, off);
    }
    const sat = saturationT(f, T);
    // At exactly the saturation pressure the state is reported as saturated liquid.
    if (p >= sat.pL) return singleState(f, T, densityTP(f, T, p, "liquid", sat.rhoL, undefined, sat.rhoL * (1 - 1e-12)), "liquid", ref, off);
    return singleState(f, T, densityTP(f, T, p, "vapour", undefined, sat.rhoV), "vapour", ref, off);
  }
  // No two-phase region at T: above T_c one root; in the sliver between the last tie line and T_c
  // (a millikelvin for pure fluids, more for some blends) the branch follows the pressure.
  if (T >= f.Tc) return singleState(f, T, densityTP(f, T, p, "single"), singlePhase(f, T, p, true), ref, off);
  const dense = p >= twoPhasePmax(f);
  return singleState(f, T, densityTP(f, T, p, dense ? "liquid" : "vapour"), singlePhase(f, T, p, dense), ref, off);
}

export function flashPH(f: Fluid, p: number, h: number, ref: ReferenceName = "native"): State {
  return flashPTarget(f, p, "h", h, ref, referenceOffset(f, ref));
}

export function flashPS(f: Fluid, p: number, s: number, ref: ReferenceName = "native"): State {
  return flashPTarget(f, p, "s", s, ref, referenceOffset(f, ref));
}

export function flashPX(f: Fluid, p: number, x: number, ref: ReferenceName = "native"): State {
  checkP(f, p);
  checkX(x);
  if (p > twoPhasePmax(f)) throw rangeError("p", p, `up to ${twoPhasePmax(f)} Pa (the two-phase region) for a quality of ${f.id}`);
  return twoPhaseState(f, saturationP(f, p), x, ref, referenceOffset(f, ref));
}

export function flashTX(f: Fluid, T: number, x: number, ref: ReferenceName = "native"): State {
  checkT(f, T);
  checkX(x);
  const off = referenceOffset(f, ref);
  if (!hasTwoPhaseAtT(f, T)) throw rangeError("T", T, `${f.Tmin} K to ${f.satTmax} K (the two-phase region) for a quality of ${f.id}`);
  if (f.pseudoPure) {
    // T(p, x) rises with p: bisection between the dew and bubble pressures at T.
    let lo = f.pDew!.value(T), hi = f.pBubble!.value(T);
    const Tof = (p: number) => { const TL = f.pBubble!.invert(p), TV = f.pDew!.invert(p); return TL + x * (TV - TL); };
    for (let k = 0; k < 200 && hi - lo > 1e-14 * hi; k++) {
      const mid = 0.5 * (lo + hi);
      if (Tof(mid) > T) hi = mid; else lo = mid;
    }
    return twoPhaseState(f, saturationP(f, 0.5 * (lo + hi)), x, ref, off);
  }
  return twoPhaseState(f, saturationT(f, T), x, ref, off);
}

export function flashTS(f: Fluid, T: number, s: number, ref: ReferenceName = "native"): State {
  checkT(f, T);
  requireNumber("s", s, { allowNegative: true });
  const off = referenceOffset(f, ref);
  const target = s - off.ds;
  let lo = 0, hi = Infinity, rho: number, liquidSide = false;
  if (hasTwoPhaseAtT(f, T) && T < f.Tc) {
    const sat = saturationT(f, T);
    const t = tieLine(f, sat);
    if (target >= t.sL && target <= t.sV) {
      if (f.pseudoPure) return pseudoTwoPhaseAtT(f, T, (st) => -st.s, -s, ref, off);
      return twoPhaseState(f, sat, (target - t.sL) / (t.sV - t.sL), ref, off);
    }
    if (target > t.sV) { hi = sat.rhoV; rho = sat.rhoV * 0.5; }
    else { lo = sat.rhoL; rho = sat.rhoL * 1.01; liquidSide = true; }
  } else {
    rho = f.rhoc;
  }
  // Newton in ln ρ on s(T, ρ) = target, with (∂s/∂ln ρ)_T = −(∂p/∂T)_ρ / (ρ M).
  const o = f.tmp;
  for (let k = 0; k < MAX_ITER; k++) {
    propertiesTRho(f.model, f.M, T, rho, o);
    const F = o[S]! - target;
    if (Math.abs(F) <= 1e-13 * (Math.abs(target) + f.R / f.M)) break;
    const slope = -o[DPDT]! / (rho * f.M);
    if (F > 0 === slope < 0) lo = Math.max(lo, rho); else hi = Math.min(hi, rho);
    let next = slope !== 0 ? rho * Math.exp(-F / slope) : NaN;
    if (!(next > lo && next < hi)) next = Number.isFinite(hi) ? (lo > 0 ? Math.sqrt(lo * hi) : hi * 0.5) : rho * 2;
    if (Math.abs(next - rho) <= 1e-14 * rho) { rho = next; break; }
    rho = next;
    if (k === MAX_ITER - 1) throw convergenceError("entropy at fixed temperature", `T = ${T} K, s = ${s} J/(kg K) of ${f.id}`);
  }
  const st = singleState(f, T, rho, "liquid", ref, off);
  if (st.p > f.pmax) throw rangeError("s", s, `values whose pressure at T = ${T} K stays below ${f.pmax} Pa for ${f.id}`);
  st.phase = singlePhase(f, T, st.p, liquidSide);
  return st;
}

export function flashTRho(f: Fluid, T: number, rhoMass: number, ref: ReferenceName = "native"): State {
  checkT(f, T);
  requireNumber("rho", rhoMass, { positive: true });
  const off = referenceOffset(f, ref);
  const rho = rhoMass / f.M;
  if (hasTwoPhaseAtT(f, T) && T < f.Tc) {
    const sat = saturationT(f, T);
    if (rho < sat.rhoL && rho > sat.rhoV) {
      if (f.pseudoPure) return pseudoTwoPhaseAtT(f, T, (st) => st.v, 1 / rhoMass, ref, off);
      const x = (1 / rho - 1 / sat.rhoL) / (1 / sat.rhoV - 1 / sat.rhoL);
      return twoPhaseState(f, sat, x, ref, off);
    }
    const st = singleState(f, T, rho, rho >= sat.rhoL ? "liquid" : "vapour", ref, off);
    if (st.p > f.pmax) throw rangeError("rho", rhoMass, `densities whose pressure at T = ${T} K stays below ${f.pmax} Pa for ${f.id}`);
    return st;
  }
  const st = singleState(f, T, rho, "vapour", ref, off);
  if (!(st.p > 0) || st.p > f.pmax) throw rangeError("rho", rhoMass, `densities whose pressure at T = ${T} K lies between 0 and ${f.pmax} Pa for ${f.id}`);
  st.phase = singlePhase(f, T, st.p, rho > f.rhoc);
  return st;
}

/** The state from exactly two inputs in SI (T K, p Pa, rho kg/m³, v m³/kg, h J/kg, s J/(kg K), x). */
export function flash(f: Fluid, inputs: Inputs, reference: ReferenceName | string = "native"): State {
  const ref = checkReferenceName(reference);
  const given = INPUT_NAMES.filter((k) => inputs[k] !== undefined);
  for (const k of Object.keys(inputs)) {
    if (!(INPUT_NAMES as readonly string[]).includes(k))
      throw new DomeprintError("E_UNKNOWN_QUANTITY", `${k}: unknown quantity; allowed: ${INPUT_NAMES.join(", ")}`, { input: k, allowed: INPUT_NAMES.join(", ") });
  }
  if (given.length !== 2)
    throw new DomeprintError("E_INPUT", `inputs = ${given.join(", ") || "none"}: exactly two are needed; allowed pairs: ${SUPPORTED_PAIRS.join("; ")}`, { input: "inputs", value: given, allowed: SUPPORTED_PAIRS.join("; ") });
  const key = given.join(",");
  const g = (k: InputName) => inputs[k]!;
  switch (key) {
    case "T,p": return flashTP(f, g("T"), g("p"), ref);
    case "p,h": return flashPH(f, g("p"), g("h"), ref);
    case "p,s": return flashPS(f, g("p"), g("s"), ref);
    case "T,s": return flashTS(f, g("T"), g("s"), ref);
    case "T,x": return flashTX(f, g("T"), g("x"), ref);
    case "p,x": return flashPX(f, g("p"), g("x"), ref);
    case "T,rho": return flashTRho(f, g("T"), g("rho"), ref);
    case "T,v": {
      const v = requireNumber("v", g("v"), { positive: true });
      return flashTRho(f, g("T"), 1 / v, ref);
    }
    default:
      throw new DomeprintError("E_UNSUPPORTED", `inputs = ${key}: this pair is not supported; allowed pairs: ${SUPPORTED_PAIRS.join("; ")}`, { input: "inputs", value: key, allowed: SUPPORTED_PAIRS.join("; ") });
  }
}
