// Two-phase boundary. Pure fluids: equal pressure and Gibbs energy of both phases (Newton in the two
// densities, after Akasaka 2008). Pseudo-pure blends: bubble and dew pressure ancillaries, roots of the equation.
import { convergenceError, DomeprintError, rangeError } from "../errors.js";
import { densityTP } from "./density.js";
import type { Fluid } from "./fluid.js";

/** Both ends of a tie line: for pure fluids TL = TV and pL = pV; for pseudo-pure blends they differ by the glide. */
export interface Saturation {
  TL: number;
  TV: number;
  pL: number;
  pV: number;
  /** Molar densities [mol/m³] of the saturated (bubble) liquid and the saturated (dew) vapour. */
  rhoL: number;
  rhoV: number;
}

const MAX_ITER = 100;

function checkT(f: Fluid, T: number): void {
  if (T < f.Tmin - 1e-9) throw rangeError("T", T, `${f.Tmin} K (triple point) to ${f.Tc} K (critical point) for saturation of ${f.id}`, "E_BELOW_TRIPLE");
  if (T > f.Tc) throw rangeError("T", T, `${f.Tmin} K to ${f.Tc} K (critical point) for saturation of ${f.id}`);
}

/** The tie line at T from reduced densities; the pressure is taken on the vapour side, which is exact to rounding at low T. */
function satState(f: Fluid, T: number, dL: number, dV: number): Saturation {
  const m = f.model;
  // Equal densities solve the equations trivially; they are not a tie line.
  if (!(dL > dV * (1 + 1e-9))) throw convergenceError("saturation", `T = ${T} K of ${f.id} (the phases merged)`);
  m.evalResidual(m.Tr / T, dV);
  const p = dV * m.rhor * m.R * T * (1 + m.r[1]!);
  return { TL: T, TV: T, pL: p, pV: p, rhoL: dL * m.rhor, rhoV: dV * m.rhor };
}

/** Width of the band below the equation's critical temperature where starting values come from critical scaling [K]. */
const NEAR_CRITICAL_BAND = 2;

/**
 * Starting densities at T: the ancillaries, except close to the critical point, where ancillaries
 * (often fitted to a slightly different T_c) can meet or cross. There the coexistence curve is scaled
 * from a solved state 2 K below: half-width ∝ (T_c − T)^0.325, rectilinear diameter.
 */
function startingDensities(f: Fluid, T: number): [number, number] {
  const Tc = f.TcEquation;
  if (T < Tc - NEAR_CRITICAL_BAND) return [f.rhoLiquid.value(T), f.rhoVapour.value(T)];
  if (!f.nearCriticalAnchor) {
    const Ta = Tc - NEAR_CRITICAL_BAND;
    const s = pureSaturationT(f, Ta, f.rhoLiquid.value(Ta), f.rhoVapour.value(Ta));
    f.nearCriticalAnchor = { T: Ta, rhoL: s.rhoL, rhoV: s.rhoV };
  }
  const a = f.nearCriticalAnchor;
  const t = Math.max(Tc - T, 0) / (Tc - a.T);
  const half = 0.5 * (a.rhoL - a.rhoV) * Math.pow(t, 0.325);
  const mid = f.rhocEquation + (0.5 * (a.rhoL + a.rhoV) - f.rhocEquation) * t;
  return [mid + half, mid - half];
}

/** Saturated liquid and vapour of a pure fluid at T, from ancillary or given starting densities. */
function pureSaturationT(f: Fluid, T: number, guessL?: number, guessV?: number): Saturation {
  const m = f.model, r = m.r, rr = m.rhor;
  if (guessL === undefined || guessV === undefined) [guessL, guessV] = startingDensities(f, T);
  let dL = guessL / rr;
  let dV = guessV / rr;
  const tau = m.Tr / T;
  let best = Infinity, bestL = dL, bestV = dV;
  for (let k = 0; k < MAX_ITER; k++) {
    m.evalResidual(tau, dL);
    const JL = dL * (1 + r[1]!), KL = r[1]! + r[0]! + Math.log(dL);
    const JdL = 1 + 2 * r[1]! + r[3]!, KdL = (2 * r[1]! + r[3]! + 1) / dL;
    m.evalResidual(tau, dV);
    const JV = dV * (1 + r[1]!), KV = r[1]! + r[0]! + Math.log(dV);
    const JdV = 1 + 2 * r[1]! + r[3]!, KdV = (2 * r[1]! + r[3]! + 1) / dV;
    const dJ = JV - JL, dK = KV - KL;
    // J of the liquid is a near-cancelling difference at low T; its rounding (≈1e-15·δL) bounds what can be reached.
    const resid = Math.abs(dJ) / (Math.abs(JV) + 1e-15 * dL) + Math.abs(dK);
    if (resid < best) { best = resid; bestL = dL; bestV = dV; }
    if (resid <= 1e-14) return satState(f, T, dL, dV);
    const det = JdV * KdL - JdL * KdV;
    const stepL = (dK * JdV - dJ * KdV) / det;
    const stepV = (dK * JdL - dJ * KdL) / det;
    // Near the critical point a full step can carry both densities onto the trivial solution δL = δV:
    // no step may close more than a third of the gap between them.
    const gap = dL - dV;
    let gamma = Math.min(1, gap / (3 * Math.max(Math.abs(stepL), Math.abs(stepV), 1e-300)));
    let nL = dL + gamma * stepL, nV = dV + gamma * stepV;
    // Keep both densities positive and ordered: halve the step rather than jump to the trivial solution.
    for (let j = 0; j < 60 && !(nV > 0 && nL > nV && Number.isFinite(nL) && Number.isFinite(nV)); j++) {
      gamma *= 0.5;
      nL = dL + gamma * stepL;
      nV = dV + gamma * stepV;
    }
    if (!(nV > 0 && nL > nV)) break;
    // Newton converges quadratically: after a step this small the error left is far below rounding.
    if (Math.abs(nL - dL) <= 1e-11 * dL && Math.abs(nV - dV) <= 1e-11 * dV) return satState(f, T, nL, nV);
    dL = nL;
    dV = nV;
  }
  if (best <= 1e-10) return satState(f, T, bestL, bestV);
  throw convergenceError("saturation", `T = ${T} K of ${f.id}`);
}

/**
 * A pseudo-pure blend's tie line from its bubble (TL, pL) and dew (TV, pV) ends: the equation's liquid root,
 * searched above the critical density, and its vapour root. Close to p_c a pseudo-pure equation can lack a
 * liquid root at the ancillary's bubble pressure; that is a range error, not a vapour-like "liquid".
 */
function blendTieLine(f: Fluid, TL: number, TV: number, pL: number, pV: number): Saturation {
  const rhoL = densityTP(f, TL, pL, "liquid", Math.max(f.rhoLiquid.value(TL), f.rhoc), undefined, f.rhoc);
  const rhoV = densityTP(f, TV, pV, "vapour");
  if (!(rhoL > f.rhoc && rhoL > rhoV * (1 + 1e-6)))
    throw rangeError("p", pL, `pressures where the pseudo-pure equation of ${f.id} has a liquid root at the bubble point (it has none this close to p_c = ${f.pc} Pa)`);
  return { TL, TV, pL, pV, rhoL, rhoV };
}

/** Saturation at temperature T [K]. */
export function saturationT(f: Fluid, T: number): Saturation {
  checkT(f, T);
  if (f.pseudoPure) {
    const pL = f.pBubble!.value(T), pV = f.pDew!.value(T);
    return blendTieLine(f, T, T, pL, pV);
  }
  if (T > f.satTmax) throw rangeError("T", T, `${f.Tmin} K to ${f.satTmax} K (the saturation solver stops ${+(f.Tc - f.satTmax).toPrecision(3)} K below the critical point) for ${f.id}`);
  try {
    return pureSaturationT(f, T);
  } catch (e) {
    if (!(e instanceof DomeprintError) || T < f.TcEquation - NEAR_CRITICAL_BAND) throw e;
    return nearCriticalContinuation(f, T);
  }
}

/**
 * Fallback within the near-critical band: walk from the anchor 2 K below T_c towards T, halving the distance
 * to T_c each step and scaling the last solution's densities by the critical law to start the next.
 */
function nearCriticalContinuation(f: Fluid, T: number): Saturation {
  const Tc = f.TcEquation;
  let Tk = Tc - NEAR_CRITICAL_BAND;
  let s = pureSaturationT(f, Tk, f.rhoLiquid.value(Tk), f.rhoVapour.value(Tk));
  for (let k = 0; k < 40 && Tk < T; k++) {
    const next = Math.min(T, Tc - 0.5 * (Tc - Tk));
    const scale = Math.pow((Tc - next) / (Tc - Tk), 0.325);
    const mid = 0.5 * (s.rhoL + s.rhoV), half = 0.5 * (s.rhoL - s.rhoV) * scale;
    s = pureSaturationT(f, next, mid + half, mid - half);
    Tk = next;
  }
  if (Tk !== T) s = pureSaturationT(f, T, s.rhoL, s.rhoV);
  return s;
}

/** Pressure at the lowest saturation temperature and at the highest the solver reaches. */
export function saturationPressureRange(f: Fluid): [number, number] {
  if (f.pseudoPure) return [f.pBubble!.value(f.Tmin), f.pc];
  // The equation's own saturation pressure at the triple temperature, which may differ a little from the
  // stated triple-point pressure (ammonia: 0.6 %); saturationP must accept what saturationT returns.
  f.satPmin ??= pureSaturationT(f, f.Tmin).pL;
  f.satPmax ??= pureSaturationT(f, f.satTmax).pL;
  return [f.satPmin, f.satPmax];
}

/**
 * Saturation at p by one Newton iteration in (τ, δL, δV) on three equations: equal J = δ(1 + δαʳ_δ) and
 * K = δαʳ_δ + αʳ + ln δ in both phases (equal p and g at one T), and the vapour pressure equal to p.
 * Two residual evaluations per step. Returns undefined where it does not converge, for the caller's fallback.
 */
function newtonSaturationP(f: Fluid, p: number): Saturation | undefined {
  const m = f.model, r = m.r, rr = m.rhor;
  const T0 = Math.min(Math.max(f.pSat!.invert(p), f.Tmin), f.satTmax);
  const [gL, gV] = startingDensities(f, T0);
  let tau = m.Tr / T0, dL = gL / rr, dV = gV / rr;
  const c = p / (rr * m.R * m.Tr); // p/(ρr R T) = c·τ
  for (let k = 0; k < 30; k++) {
    m.evalResidual(tau, dL);
    const JL = dL * (1 + r[1]!), KL = r[1]! + r[0]! + Math.log(dL);
    const JdL = 1 + 2 * r[1]! + r[3]!, KdL = (2 * r[1]! + r[3]! + 1) / dL;
    const JtL = (dL * r[5]!) / tau, KtL = (r[5]! + r[2]!) / tau;
    m.evalResidual(tau, dV);
    const JV = dV * (1 + r[1]!), KV = r[1]! + r[0]! + Math.log(dV);
    const JdV = 1 + 2 * r[1]! + r[3]!, KdV = (2 * r[1]! + r[3]! + 1) / dV;
    const JtV = (dV * r[5]!) / tau, KtV = (r[5]! + r[2]!) / tau;
    // F = [JL − JV, KL − KV, JV − cτ]; unknowns (τ, δL, δV).
    const F0 = JL - JV, F1 = KL - KV, F2 = JV - c * tau;
    const a00 = JtL - JtV, a01 = JdL, a02 = -JdV;
    const a10 = KtL - KtV, a11 = KdL, a12 = -KdV;
    const a20 = JtV - c, a21 = 0, a22 = JdV;
    const det = a00 * (a11 * a22 - a12 * a21) - a01 * (a10 * a22 - a12 * a20) + a02 * (a10 * a21 - a11 * a20);
    if (!Number.isFinite(det) || det === 0) return undefined;
    const x0 = (F0 * (a11 * a22 - a12 * a21) - a01 * (F1 * a22 - a12 * F2) + a02 * (F1 * a21 - a11 * F2)) / det;
    const x1 = (a00 * (F1 * a22 - a12 * F2) - F0 * (a10 * a22 - a12 * a20) + a02 * (a10 * F2 - F1 * a20)) / det;
    const x2 = (a00 * (a11 * F2 - F1 * a21) - a01 * (a10 * F2 - F1 * a20) + F0 * (a10 * a21 - a11 * a20)) / det;
    // Limit the step so neither density closes more than a third of the gap, as in the T-given solver.
    const gap = dL - dV;
    const g = Math.min(1, gap / (3 * Math.max(Math.abs(x1), Math.abs(x2), 1e-300)), 0.05 * tau / Math.max(Math.abs(x0), 1e-300));
    const nt = tau - g * x0, nL = dL - g * x1, nV = dV - g * x2;
    if (!(nV > 0 && nL > nV && nt > 0)) return undefined;
    const done = Math.abs(nt - tau) <= 1e-13 * tau && Math.abs(nL - dL) <= 1e-11 * dL && Math.abs(nV - dV) <= 1e-11 * dV;
    tau = nt; dL = nL; dV = nV;
    if (done) {
      const T = m.Tr / tau;
      if (T < f.Tmin - 1e-9 || T > f.satTmax) return undefined;
      const sat = satState(f, T, dL, dV);
      return Math.abs(sat.pV / p - 1) < 1e-12 ? { ...sat, pL: p, pV: p } : undefined;
    }
  }
  return undefined;
}

/** The equation's critical pressure [Pa] (at its own T_c and ρ_c), computed at first use. */
export function equationCriticalPressure(f: Fluid): number {
  if (f.pcEquation === undefined) {
    const m = f.model;
    m.evalResidual(m.Tr / f.TcEquation, f.rhocEquation / m.rhor);
    f.pcEquation = f.rhocEquation * m.R * f.TcEquation * (1 + m.r[1]!);
  }
  return f.pcEquation;
}

/**
 * A tie line for pressures between the top of the solved saturation range (1 mK below T_c) and the
 * equation's critical pressure, a band of a few hundred pascals: T_sat is interpolated linearly in p
 * between satTmax and T_c and both roots are taken there. Undefined where the two roots merge.
 */
export function nearCriticalTieLine(f: Fluid, p: number): Saturation | undefined {
  if (f.pseudoPure) return undefined;
  const [, pTop] = saturationPressureRange(f);
  const pc = equationCriticalPressure(f);
  if (!(p > pTop && p < pc)) return undefined;
  const T = f.satTmax + ((f.TcEquation - f.satTmax) * (p - pTop)) / (pc - pTop);
  const top = pureSaturationT(f, f.satTmax);
  try {
    const rhoL = densityTP(f, T, p, "liquid", top.rhoL, undefined, f.rhocEquation);
    const rhoV = densityTP(f, T, p, "vapour", top.rhoV, f.rhocEquation);
    return rhoL > rhoV * (1 + 1e-9) ? { TL: T, TV: T, pL: p, pV: p, rhoL, rhoV } : undefined;
  } catch (e) {
    if (e instanceof DomeprintError) return undefined;
    throw e;
  }
}

/**
 * The tie line at p for flashes: as saturationP, but undefined where a pseudo-pure blend has no liquid root
 * at its bubble point (a band just below p_c), so that states there are treated as single-phase.
 */
export function tieLineAtP(f: Fluid, p: number): Saturation | undefined {
  if (!f.pseudoPure) return saturationP(f, p);
  try {
    return saturationP(f, p);
  } catch (e) {
    if (e instanceof DomeprintError && e.code === "E_RANGE" && p > 0.9 * f.pc) return undefined;
    throw e;
  }
}

/** Saturation at pressure p [Pa]: for blends, bubble liquid at T_bubble(p) and dew vapour at T_dew(p). */
export function saturationP(f: Fluid, p: number): Saturation {
  if (f.pseudoPure) {
    if (p > f.pc) throw rangeError("p", p, `up to ${f.pc} Pa (critical pressure) for the two-phase region of ${f.id}`);
    const TL = f.pBubble!.invert(p), TV = f.pDew!.invert(p);
    if (TL < f.Tmin - 1e-9) throw rangeError("p", p, `from ${f.pBubble!.value(f.Tmin)} Pa (bubble pressure at ${f.Tmin} K) for ${f.id}`, "E_BELOW_TRIPLE");
    return blendTieLine(f, TL, TV, p, p);
  }
  const [pmin, pmaxSat] = saturationPressureRange(f);
  if (p < pmin * (1 - 1e-9)) throw rangeError("p", p, `${pmin} Pa (triple point) to ${pmaxSat} Pa for saturation of ${f.id}`, "E_BELOW_TRIPLE");
  if (p > pmaxSat) throw rangeError("p", p, `${pmin} Pa to ${pmaxSat} Pa for saturation of ${f.id} (close to the critical point the two phases merge)`);
  const fast = newtonSaturationP(f, p);
  if (fast) return fast;
  // Fallback: Newton on T with the Clausius–Clapeyron slope; the saturation densities carry over between steps.
  let T = Math.min(Math.max(f.pSat!.invert(p), f.Tmin), f.satTmax);
  let lo = f.Tmin, hi = f.satTmax;
  let sat = pureSaturationT(f, T);
  const m = f.model, r = m.r;
  for (let k = 0; k < MAX_ITER; k++) {
    const err = Math.log(sat.pL / p);
    if (Math.abs(err) <= 2e-15) return sat;
    if (err > 0) hi = T; else lo = T;
    const tau = m.Tr / T;
    m.evalResidual(tau, sat.rhoL / m.rhor);
    const hL = r[2]! + r[1]!;
    m.evalResidual(tau, sat.rhoV / m.rhor);
    const hV = r[2]! + r[1]!;
    // d ln p / dT = Δh / (T Δv p); the ideal-gas parts of h cancel between the phases.
    const dh = m.R * T * (hV - hL);
    const dv = 1 / sat.rhoV - 1 / sat.rhoL;
    const slope = dh / (T * dv * sat.pL);
    let next = T - err / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - T) <= 1e-14 * T) return sat;
    const prev = sat;
    T = next;
    try {
      sat = pureSaturationT(f, T, prev.rhoL, prev.rhoV);
    } catch (e) {
      if (!(e instanceof DomeprintError)) throw e;
      sat = pureSaturationT(f, T);
    }
  }
  throw convergenceError("saturation", `p = ${p} Pa of ${f.id}`);
}
