// Flashes of a mixture of fixed composition: the state from two of T, p, h, s and quality, with bubble and
// dew points bounding the two-phase region and a Rachford–Rice split inside it. Every loop is bracketed and capped.
import { attempt, convergenceError, DomeprintError, inputError, rangeError, requireNumber } from "../../errors.js";
import type { Branch } from "../density.js";
import { targetScale } from "../flash.js";
import { CP, H, S } from "../properties.js";
import { checkReferenceName, type ReferenceName, type ReferenceOffset } from "../reference.js";
import type { Phase } from "../state.js";
import { mixtureDensityTP } from "./density.js";
import type { Mixture } from "./mixture.js";
import { splitNewton } from "./split-newton.js";
import { mixturePropertiesTRho } from "./properties.js";
import { mixtureReferenceOffset } from "./reference.js";
import { estimatedSaturationPoint, saturationPoint, type SaturationPoint } from "./saturation.js";
import { mixtureSingleState, mixtureTwoPhaseState, phaseComposition, type MixtureState } from "./state.js";

export type MixtureInputName = "T" | "p" | "rho" | "v" | "h" | "s" | "x";
export type MixtureInputs = Partial<Record<MixtureInputName, number>>;
const NAMES: readonly MixtureInputName[] = ["T", "p", "rho", "v", "h", "s", "x"];
export const MIXTURE_PAIRS = ["T,p", "p,h", "p,s", "p,x", "T,x", "T,rho", "T,v"] as const;

const MAX_ITER = 100;
/** Widening [K] of the bubble–dew temperature bounds when they come from the envelope's interpolation. */
const ESTIMATE_MARGIN = 2;
/** Fraction of the bubble-to-dew span kept clear at each end before a Newton starts from the envelope alone. */
const ENVELOPE_INSIDE = 0.1;
const out = new Float64Array(10);

function checkT(mix: Mixture, T: number): void {
  requireNumber("T", T, { positive: true });
  if (T < mix.Tmin - 1e-9) throw rangeError("T", T, `${mix.Tmin} K to ${mix.Tmax} K for ${mix.id} (the narrowest of its components' ranges)`, "E_BELOW_TRIPLE");
  if (T > mix.Tmax) throw rangeError("T", T, `${mix.Tmin} K to ${mix.Tmax} K for ${mix.id}`);
}

function checkP(mix: Mixture, p: number): void {
  requireNumber("p", p, { positive: true });
  if (p > mix.pmax) throw rangeError("p", p, `above 0 Pa up to ${mix.pmax} Pa for ${mix.id}`);
}

function phaseOf(mix: Mixture, T: number, p: number, liquidSide: boolean): Phase {
  const c = mix.envelope().critical;
  if (T >= c.T && p >= c.p) return "supercritical";
  if (T >= c.T) return "vapour";
  if (p >= c.p) return "liquid";
  return liquidSide ? "liquid" : "vapour";
}

/** ln K (vapour over liquid) of a bubble point (feed liquid) or a dew point (feed vapour). */
function lnKVapourLiquid(sat: SaturationPoint, k: number): number {
  return sat.kind === "bubble" ? sat.lnK[k]! : -sat.lnK[k]!;
}

/**
 * A split interpolated between the dew point (f = 0) and the bubble point (f = 1): ln K (vapour over liquid)
 * written into lnK, and the liquid and vapour molar densities returned. The start of every two-phase solve.
 */
function interpolatedSplit(mix: Mixture, bub: SaturationPoint, dew: SaturationPoint, f: number, lnK: Float64Array): { rhoL: number; rhoV: number } {
  for (let k = 0; k < mix.N; k++) lnK[k] = lnKVapourLiquid(dew, k) + f * (lnKVapourLiquid(bub, k) - lnKVapourLiquid(dew, k));
  return { rhoL: f * bub.rhoFeed + (1 - f) * dew.rhoIncipient, rhoV: f * bub.rhoIncipient + (1 - f) * dew.rhoFeed };
}

/** ln p a fraction f of the way from the dew pressure (f = 0) to the bubble pressure (f = 1). */
function interpolatedLnP(bub: SaturationPoint, dew: SaturationPoint, f: number): number {
  return Math.log(dew.p) + f * (Math.log(bub.p) - Math.log(dew.p));
}

/**
 * Splits the feed at (T, p) inside the dome, K-factors interpolated between the dew point (f = 0) and the
 * bubble point (f = 1) unless `warm` keeps those of the previous split. Null if the split finds one phase.
 */
function split(mix: Mixture, T: number, p: number, bub: SaturationPoint, dew: SaturationPoint, f: number, warm: boolean): boolean {
  const sp = mix.split;
  if (!warm) {
    const { rhoL, rhoV } = interpolatedSplit(mix, bub, dew, f, sp.lnK);
    sp.liquid.rho = rhoL;
    sp.vapour.rho = rhoV;
  }
  return sp.flash(mix.z, T, p);
}

function splitState(mix: Mixture, T: number, p: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  const sp = mix.split;
  return mixtureTwoPhaseState(mix, T, p, sp.beta, sp.x, sp.liquid.rho, sp.y, sp.vapour.rho, ref, off);
}

/** The bubble-point liquid or dew-point vapour of the feed, with its incipient phase. */
function saturatedState(mix: Mixture, sat: SaturationPoint, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  const st = mixtureSingleState(mix, sat.T, sat.rhoFeed, sat.kind === "bubble" ? "liquid" : "vapour", ref, off);
  st.p = sat.p;
  st.phase = "two-phase";
  st.x = sat.kind === "bubble" ? 0 : 1;
  const inc = phaseComposition(mix, sat.incipient, sat.rhoIncipient);
  const feed = phaseComposition(mix, mix.z, sat.rhoFeed);
  if (sat.kind === "bubble") { st.liquid = feed; st.vapour = inc; } else { st.liquid = inc; st.vapour = feed; }
  return st;
}

// ---------------------------------------------------------------- single phase at fixed p

type Target = "h" | "s";

function solveSingleAtP(mix: Mixture, p: number, which: Target, target: number, Tlo: number, Thi: number, T0: number, branchAt: (T: number) => Branch): { T: number; rho: number } {
  let lo = Tlo, hi = Thi, T = Math.min(Math.max(T0, lo), hi), rho: number | undefined;
  for (let k = 0; k < MAX_ITER; k++) {
    rho = mixtureDensityTP(mix.model, T, p, mix.z, branchAt(T), rho);
    mixturePropertiesTRho(mix.model, T, rho, mix.z, out);
    const F = (which === "h" ? out[H]! : out[S]!) - target;
    const slope = which === "h" ? out[CP]! : out[CP]! / T;
    const scale = targetScale(which, target, T, out[CP]!, mix.model.R / mix.M);
    if (Math.abs(F) <= 1e-12 * scale) return { T, rho };
    if (F > 0) hi = T; else lo = T;
    let next = T - F / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - T) <= 1e-13 * T) {
      if (T - Tlo <= 1e-9 * T && F > 0) throw rangeError(which, target, `${which} at p = ${p} Pa above its value at ${Tlo} K for ${mix.id}`, "E_BELOW_TRIPLE");
      if (Thi - T <= 1e-9 * T && F < 0) throw rangeError(which, target, `${which} at p = ${p} Pa below its value at T_max = ${Thi} K for ${mix.id}`);
      return { T: next, rho };
    }
    T = next;
  }
  throw convergenceError(`${which} at fixed pressure`, `p = ${p} Pa, ${which} = ${target} of ${mix.id}`);
}

// ---------------------------------------------------------------- two-phase one-dimensional solves

/**
 * Finds u in [a, b] where g(u) = 0 (g(a), g(b) of opposite signs) by the Illinois variant of regula falsi,
 * warm-starting each split from the previous one. Returns the state of the last split.
 */
function regulaFalsi(a: number, ga: number, b: number, gb: number, g: (u: number, warm: boolean) => number, tol: number, what: string): void {
  const looseTol = 1e3 * tol;
  let side = 0, warm = false;
  for (let k = 0; k < MAX_ITER; k++) {
    let u = b - (gb * (b - a)) / (gb - ga);
    if (!(u > Math.min(a, b) && u < Math.max(a, b))) u = 0.5 * (a + b);
    const gu = g(u, warm);
    warm = true;
    if (Math.abs(gu) <= tol) return;
    // A bracket narrowed to rounding: the target may change faster than u can resolve (almost no glide).
    if (Math.abs(b - a) <= 1e-14 * Math.abs(u)) {
      if (Math.abs(gu) <= looseTol) return;
      throw convergenceError(what, `the two-phase region (the bracket closed with a residual of ${+Math.abs(gu).toPrecision(3)}, allowed ${+looseTol.toPrecision(3)})`);
    }
    if ((gu > 0) === (gb > 0)) {
      b = u; gb = gu;
      if (side === 1) ga *= 0.5;
      side = 1;
    } else {
      a = u; ga = gu;
      if (side === -1) gb *= 0.5;
      side = -1;
    }
  }
  throw convergenceError(what, "the two-phase region");
}

/** Two-phase state at pressure p where measure (h, s or quality, rising with T) equals target. */
function twoPhaseAtP(mix: Mixture, p: number, bub: SaturationPoint, dew: SaturationPoint, yL: number, yV: number, measure: (st: MixtureState) => number,
  target: number, ref: ReferenceName, off: ReferenceOffset, scale: number, what: string): MixtureState {
  let st: MixtureState | undefined;
  const g = (T: number, warm: boolean) => {
    const f = (dew.T - T) / (dew.T - bub.T);
    if (!split(mix, T, p, bub, dew, f, warm) && !split(mix, T, p, bub, dew, f, false))
      throw convergenceError(what, `T = ${T} K, p = ${p} Pa of ${mix.id} (the split found one phase inside the dome)`);
    st = splitState(mix, T, p, ref, off);
    return measure(st) - target;
  };
  regulaFalsi(bub.T, yL - target, dew.T, yV - target, g, 1e-12 * scale, what);
  return st!;
}

/**
 * The two-phase (p, h), (p, s) or (p, x) state by Newton on (ln K, T, β) together (split-newton.ts), started
 * a fraction fT of the way from the bubble to the dew point (where the target falls linearly between them);
 * `target` is molar for h and s, a mass fraction for x. Null when it does not converge (the caller then
 * brackets in T).
 */
function newtonTwoPhase(mix: Mixture, p: number, bub: SaturationPoint, dew: SaturationPoint, fT: number, which: Target | "x", target: number,
  stallTolerance: number, ref: ReferenceName, off: ReferenceOffset, margin = 0): MixtureState | null {
  const lnK = new Float64Array(mix.N);
  const r = splitNewton(mix, { fixed: "p", p, which, target }, {
    free: bub.T + fT * (dew.T - bub.T), lo: bub.T - margin, hi: dew.T + margin, lnK, beta: fT, ...interpolatedSplit(mix, bub, dew, 1 - fT, lnK), stallTolerance,
  });
  if (!r) return null;
  return mixtureTwoPhaseState(mix, r.T, p, r.beta, r.x, r.rhoL, r.y, r.rhoV, ref, off);
}

// ---------------------------------------------------------------- the flashes

function flashTP(mix: Mixture, T: number, p: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  checkT(mix, T);
  checkP(mix, p);
  const c = mix.envelope().critical;
  if (T < c.T && p < c.p * 1.5) {
    const bub = saturationPoint(mix, "bubble", "T", T), dew = saturationPoint(mix, "dew", "T", T);
    if (p >= bub.p) return mixtureSingleState(mix, T, mixtureDensityTP(mix.model, T, p, mix.z, "liquid", bub.rhoFeed), "liquid", ref, off);
    if (p <= dew.p) return mixtureSingleState(mix, T, mixtureDensityTP(mix.model, T, p, mix.z, "vapour", dew.rhoFeed), "vapour", ref, off);
    const f = (Math.log(p) - Math.log(dew.p)) / (Math.log(bub.p) - Math.log(dew.p));
    if (!split(mix, T, p, bub, dew, f, false)) throw convergenceError("two-phase flash", `T = ${T} K, p = ${p} Pa of ${mix.id}`);
    return splitState(mix, T, p, ref, off);
  }
  const br: Branch = T < c.T ? "liquid" : "single";
  return mixtureSingleState(mix, T, mixtureDensityTP(mix.model, T, p, mix.z, br), phaseOf(mix, T, p, true), ref, off);
}

/**
 * The two-phase (p, h) or (p, s) state by Newton started from the envelope's interpolated bubble and dew
 * points, without solving them, where the target lies well inside their values (ENVELOPE_INSIDE of the span
 * from each end: the interpolation has been seen to miss by up to 5.3 % of it at 0.9 p_c). A converged split
 * with 0 < β < 1 meeting the target is the state whatever its start; null leaves the exact path to the caller.
 */
function twoPhaseFromEnvelope(mix: Mixture, p: number, which: Target, target: number, ref: ReferenceName, off: ReferenceOffset): MixtureState | null {
  const eb = estimatedSaturationPoint(mix, "bubble", "p", p), ed = estimatedSaturationPoint(mix, "dew", "p", p);
  if (!eb || !ed) return null;
  mixturePropertiesTRho(mix.model, eb.T, eb.rhoFeed, mix.z, out);
  const yL = which === "h" ? out[H]! : out[S]!;
  mixturePropertiesTRho(mix.model, ed.T, ed.rhoFeed, mix.z, out);
  const yV = which === "h" ? out[H]! : out[S]!;
  const f = (target - yL) / (yV - yL);
  if (!(f > ENVELOPE_INSIDE && f < 1 - ENVELOPE_INSIDE)) return null;
  return attempt(() => newtonTwoPhase(mix, p, eb, ed, f, which, target * mix.M, 1e-6 * (Math.abs(yV - yL) + Math.abs(target)) * mix.M, ref, off, ESTIMATE_MARGIN)) ?? null;
}

function flashPTarget(mix: Mixture, p: number, which: Target, value: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  checkP(mix, p);
  requireNumber(which, value, { allowNegative: true });
  const target = value - (which === "h" ? off.dh : off.ds);
  const env = mix.envelope();
  const c = env.critical;
  const above = (T: number): Branch => (T < c.T ? "liquid" : "single");
  if (p < c.p) {
    const fast = twoPhaseFromEnvelope(mix, p, which, target, ref, off);
    if (fast) return fast;
    const bub = saturationPoint(mix, "bubble", "p", p), dew = saturationPoint(mix, "dew", "p", p);
    mixturePropertiesTRho(mix.model, bub.T, bub.rhoFeed, mix.z, out);
    const yL = which === "h" ? out[H]! : out[S]!, cpL = out[CP]!;
    mixturePropertiesTRho(mix.model, dew.T, dew.rhoFeed, mix.z, out);
    const yV = which === "h" ? out[H]! : out[S]!, cpV = out[CP]!;
    if (target > yV) {
      const T0 = dew.T + (which === "h" ? (target - yV) / cpV : dew.T * (Math.exp((target - yV) / cpV) - 1));
      const r = solveSingleAtP(mix, p, which, target, dew.T, mix.Tmax, T0, (T) => (T < c.T ? "vapour" : "single"));
      return mixtureSingleState(mix, r.T, r.rho, phaseOf(mix, r.T, p, false), ref, off);
    }
    if (target < yL) {
      const T0 = bub.T - (which === "h" ? (yL - target) / cpL : bub.T * (1 - Math.exp((target - yL) / cpL)));
      const r = solveSingleAtP(mix, p, which, target, mix.Tmin, bub.T, T0, () => "liquid");
      return mixtureSingleState(mix, r.T, r.rho, phaseOf(mix, r.T, p, true), ref, off);
    }
    // Within rounding of a saturated end (as the pure-fluid flash does) the state is that end: a Newton or
    // bracket in T cannot resolve a split whose vapour fraction is a few ulps from 0 or 1.
    const snap = 1e-9 * (Math.abs(target) + Math.abs(yV - yL));
    if (Math.abs(target - yL) <= snap) return saturatedState(mix, bub, ref, off);
    if (Math.abs(target - yV) <= snap) return saturatedState(mix, dew, ref, off);
    const newton = newtonTwoPhase(mix, p, bub, dew, (target - yL) / (yV - yL), which, target * mix.M, 1e-6 * (Math.abs(yV - yL) + Math.abs(target)) * mix.M, ref, off);
    if (newton) return newton;
    const scale = Math.abs(yV - yL) + Math.abs(target);
    return twoPhaseAtP(mix, p, bub, dew, yL, yV, (st) => (which === "h" ? st.h : st.s) - (which === "h" ? off.dh : off.ds), target, ref, off, scale, `${which} at fixed pressure (two-phase)`);
  }
  const r = solveSingleAtP(mix, p, which, target, mix.Tmin, mix.Tmax, c.T, above);
  return mixtureSingleState(mix, r.T, r.rho, phaseOf(mix, r.T, p, true), ref, off);
}

function checkQuality(x: number): void {
  requireNumber("x", x);
  if (x > 1) throw inputError("x", x, "quality above 1", "0 ≤ x ≤ 1 (vapour mass fraction)");
}

function flashPX(mix: Mixture, p: number, q: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  checkP(mix, p);
  checkQuality(q);
  // The saturated ends need only their own point.
  if (q === 0) return saturatedState(mix, saturationPoint(mix, "bubble", "p", p), ref, off);
  if (q === 1) return saturatedState(mix, saturationPoint(mix, "dew", "p", p), ref, off);
  // Newton from the envelope's interpolated bubble and dew points first (the solution does not depend on
  // the start; its T bounds are widened by the interpolation's possible error), then from solved ones.
  const eb = estimatedSaturationPoint(mix, "bubble", "p", p), ed = estimatedSaturationPoint(mix, "dew", "p", p);
  const fromEnvelope = eb && ed ? newtonTwoPhase(mix, p, eb, ed, q, "x", q, 1e-10, ref, off, ESTIMATE_MARGIN) : null;
  if (fromEnvelope) return fromEnvelope;
  const bub = saturationPoint(mix, "bubble", "p", p), dew = saturationPoint(mix, "dew", "p", p);
  return newtonTwoPhase(mix, p, bub, dew, q, "x", q, 1e-10, ref, off)
    ?? twoPhaseAtP(mix, p, bub, dew, 0, 1, (st) => st.x!, q, ref, off, 1, "quality at fixed pressure");
}

function flashTX(mix: Mixture, T: number, q: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  checkT(mix, T);
  checkQuality(q);
  const bub = saturationPoint(mix, "bubble", "T", T), dew = saturationPoint(mix, "dew", "T", T);
  if (q === 0) return saturatedState(mix, bub, ref, off);
  if (q === 1) return saturatedState(mix, dew, ref, off);
  // Newton on (ln K, ln p, β) from the split interpolated at the quality, then the bracketed search.
  const lnK = new Float64Array(mix.N);
  const r = attempt(() => splitNewton(mix, { fixed: "T", T, which: "x", target: q }, {
    free: Math.exp(interpolatedLnP(bub, dew, 1 - q)), lo: dew.p, hi: bub.p, lnK, beta: q, ...interpolatedSplit(mix, bub, dew, 1 - q, lnK), stallTolerance: 1e-10,
  }));
  if (r) return mixtureTwoPhaseState(mix, T, r.p, r.beta, r.x, r.rhoL, r.y, r.rhoV, ref, off);
  // Quality falls as p rises from the dew to the bubble pressure.
  return twoPhaseAtT(mix, T, bub, dew, (st) => q - st.x!, q - 1, q, ref, off, "quality at fixed temperature");
}

/**
 * Two-phase state at temperature T where residual(state) = 0, by the bracketed search in ln p on (T, p)
 * splits between the dew pressure (residual rDew) and the bubble pressure (rBub), of opposite signs.
 */
function twoPhaseAtT(mix: Mixture, T: number, bub: SaturationPoint, dew: SaturationPoint, residual: (st: MixtureState) => number, rDew: number, rBub: number,
  ref: ReferenceName, off: ReferenceOffset, what: string): MixtureState {
  let st: MixtureState | undefined;
  const g = (lnp: number, warm: boolean) => {
    const p = Math.exp(lnp);
    const f = (lnp - Math.log(dew.p)) / (Math.log(bub.p) - Math.log(dew.p));
    if (!split(mix, T, p, bub, dew, f, warm) && !split(mix, T, p, bub, dew, f, false)) throw convergenceError(what, `T = ${T} K, p = ${p} Pa of ${mix.id}`);
    st = splitState(mix, T, p, ref, off);
    return residual(st);
  };
  regulaFalsi(Math.log(dew.p), rDew, Math.log(bub.p), rBub, g, 1e-12, what);
  return st!;
}

/**
 * The state at T [K] and density ρ [kg/m³] of the feed: one phase outside the bubble and dew densities at T
 * (and above the critical temperature), else the split whose overall volume is 1/ρ, by Newton on (ln K, ln p, β)
 * (split-newton.ts), with a bracketed search in ln p on (T, p) splits as the fallback.
 */
function flashTRho(mix: Mixture, T: number, rhoMass: number, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  checkT(mix, T);
  requireNumber("rho", rhoMass, { positive: true });
  const rho = rhoMass / mix.M, c = mix.envelope().critical;
  const single = (liquidSide: boolean) => {
    const st = mixtureSingleState(mix, T, rho, "liquid", ref, off);
    if (!(st.p > 0) || st.p > mix.pmax) throw rangeError("rho", rhoMass, `densities whose pressure at T = ${T} K lies between 0 and ${mix.pmax} Pa for ${mix.id}`);
    st.phase = phaseOf(mix, T, st.p, liquidSide);
    return st;
  };
  if (T >= c.T) return single(rho > c.rho);
  const v = 1 / rho;
  /** Newton from a split interpolated between bubble and dew points at T; `margin` widens its p range. */
  const newton = (bub: SaturationPoint, dew: SaturationPoint, margin: number) => {
    const vb = 1 / bub.rhoFeed, vd = 1 / dew.rhoFeed;
    const f = 1 - (v - vb) / (vd - vb); // weight of the bubble end
    const lnK = new Float64Array(mix.N);
    const r = attempt(() => splitNewton(mix, { fixed: "T", T, which: "v", target: v }, {
      free: Math.exp(interpolatedLnP(bub, dew, f)), lo: dew.p / margin, hi: bub.p * margin, lnK, beta: 1 - f, ...interpolatedSplit(mix, bub, dew, f, lnK), stallTolerance: 1e-11 * v,
    }));
    return r ? mixtureTwoPhaseState(mix, T, r.p, r.beta, r.x, r.rhoL, r.y, r.rhoV, ref, off) : null;
  };
  // Clearly inside the envelope's interpolated densities: Newton from there first; a converged split with
  // 0 < β < 1 and equal fugacities is the two-phase state whatever the start.
  const eb = estimatedSaturationPoint(mix, "bubble", "T", T), ed = estimatedSaturationPoint(mix, "dew", "T", T);
  if (eb && ed && rho < 0.98 * eb.rhoFeed && rho > 1.02 * ed.rhoFeed) {
    const fast = newton(eb, ed, 1.05);
    if (fast) return fast;
  }
  const bub = saturationPoint(mix, "bubble", "T", T), dew = saturationPoint(mix, "dew", "T", T);
  if (rho >= bub.rhoFeed) return single(true);
  if (rho <= dew.rhoFeed) return single(false);
  const vb = 1 / bub.rhoFeed, vd = 1 / dew.rhoFeed;
  const exact = newton(bub, dew, 1);
  if (exact) return exact;
  // Fallback: the overall volume of the (T, p) split falls as p rises from the dew to the bubble pressure.
  return twoPhaseAtT(mix, T, bub, dew, (st) => st.v / (1 / rhoMass) - 1, vd / v - 1, vb / v - 1, ref, off, "density at fixed temperature");
}

/** Checks a reference name for a mixture and returns its offset. */
function offsetFor(mix: Mixture, reference: string): [ReferenceName, ReferenceOffset] {
  const ref = checkReferenceName(reference);
  return [ref, mixtureReferenceOffset(mix, ref)];
}

/**
 * The state of mixture `mix` from exactly two of T [K], p [Pa], ρ [kg/m³], v [m³/kg], h [J/kg], s [J/(kg K)],
 * x (vapour mass fraction). Reference states are defined on the bubble-point liquid (see reference.ts).
 * Pairs: T,p; p,h; p,s; p,x; T,x; T,rho; T,v.
 */
export function mixtureFlash(mix: Mixture, inputs: MixtureInputs, reference: ReferenceName | string = "native"): MixtureState {
  for (const k of Object.keys(inputs)) {
    if (!(NAMES as readonly string[]).includes(k))
      throw new DomeprintError("E_UNKNOWN_QUANTITY", `${k}: unknown quantity for a mixture; allowed: ${NAMES.join(", ")}`, { input: k, allowed: NAMES.join(", ") });
  }
  const given = NAMES.filter((k) => inputs[k] !== undefined);
  if (given.length !== 2)
    throw new DomeprintError("E_INPUT", `inputs = ${given.join(", ") || "none"}: exactly two are needed; allowed pairs: ${MIXTURE_PAIRS.join("; ")}`, { input: "inputs", value: given, allowed: MIXTURE_PAIRS.join("; ") });
  const key = given.join(",");
  const g = (k: MixtureInputName) => inputs[k]!;
  const [ref, off] = offsetFor(mix, reference);
  switch (key) {
    case "T,p": return flashTP(mix, g("T"), g("p"), ref, off);
    case "p,h": return flashPTarget(mix, g("p"), "h", g("h"), ref, off);
    case "p,s": return flashPTarget(mix, g("p"), "s", g("s"), ref, off);
    case "p,x": return flashPX(mix, g("p"), g("x"), ref, off);
    case "T,x": return flashTX(mix, g("T"), g("x"), ref, off);
    case "T,rho": return flashTRho(mix, g("T"), g("rho"), ref, off);
    case "T,v": return flashTRho(mix, g("T"), 1 / requireNumber("v", g("v"), { positive: true }), ref, off);
    default:
      throw new DomeprintError("E_UNSUPPORTED", `inputs = ${key}: this pair is not supported for mixtures; allowed pairs: ${MIXTURE_PAIRS.join("; ")}`, { input: "inputs", value: key, allowed: MIXTURE_PAIRS.join("; ") });
  }
}

/** Bubble-point liquid and dew-point vapour at temperature T [K] (each with its incipient phase). */
export function mixtureSaturationT(mix: Mixture, T: number, reference: ReferenceName | string = "native"): { bubble: MixtureState; dew: MixtureState } {
  checkT(mix, T);
  const [ref, off] = offsetFor(mix, reference);
  const bub = saturatedState(mix, saturationPoint(mix, "bubble", "T", T), ref, off);
  const dew = saturatedState(mix, saturationPoint(mix, "dew", "T", T), ref, off);
  return { bubble: bub, dew };
}

/** Bubble-point liquid and dew-point vapour at pressure p [Pa] (each with its incipient phase). */
export function mixtureSaturationP(mix: Mixture, p: number, reference: ReferenceName | string = "native"): { bubble: MixtureState; dew: MixtureState } {
  checkP(mix, p);
  const [ref, off] = offsetFor(mix, reference);
  const bub = saturatedState(mix, saturationPoint(mix, "bubble", "p", p), ref, off);
  const dew = saturatedState(mix, saturationPoint(mix, "dew", "p", p), ref, off);
  return { bubble: bub, dew };
}
