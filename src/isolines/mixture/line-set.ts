// The chart lines of a real mixture: bubble and dew lines, isotherms sloped across the dome between them,
// quality lines and isentropes through the two-phase region, traced to the same page tolerance as pure fluids.
import { H, P, mixtureFlash, mixtureReferenceOffset, mixtureSaturationT, type Mixture, type MixtureState, type ReferenceName } from "../../eos/index.js";
import { mixtureDensityTP, mixturePropertiesTRho, saturationPoint } from "../../eos/mixture/index.js";
import { inputError } from "../../errors.js";
import { attempt } from "../context.js";
import { roundEnthalpyWindow } from "../window.js";
import { displayUnit, fromDisplay, SI_UNIT, toDisplay } from "../display.js";
import { multiplesBetween, niceAtLeast, niceAtMost, stepFor, WINDOW_MANTISSAS } from "../nice.js";
import type { CheckedOptions } from "../options.js";
import { pageMapping, type PageMapping } from "../page.js";
import { joinParts, traceCurve, type TraceSettings } from "../trace.js";
import type { ChartWindow, Line, LineSet, Point, Quantity, TraceStats, UnitSystem } from "../types.js";
import { givenValues, isenthalpValues, isentropeValues, isochoreValues, qualityValues, type FamilyValue, type WindowRanges } from "../values.js";

interface MixBuild {
  mix: Mixture;
  ref: ReferenceName;
  off: { dh: number; ds: number };
  opts: CheckedOptions;
  mapping: PageMapping;
  trace: TraceSettings;
  stats: TraceStats;
  /** Critical point of the envelope, and the range of pressures with a bubble and a dew point. */
  Tc: number;
  pc: number;
  pFloor: number;
  /** Highest pressure a line may reach [Pa]. */
  pTop: number;
  /** The critical point on the page, where the dome and the quality lines close. */
  apex: Point;
  /** Top of the traced part of the dome and quality lines [Pa] (see closingPressure). */
  pClose: number;
}

const T_STEPS = [10, 20, 50, 100];
const MAX_ISOTHERMS = 36;
/** Bubble and dew points are solved up to at most this fraction of the critical pressure. */
const NEAR_CRITICAL = 1 - 1e-4;
/** The closing stretch never starts below this fraction of the critical pressure. */
const CLOSE_FLOOR = 0.99;

/**
 * The pressure up to which the dome and quality lines are traced. Above it lies a stretch less high on the page
 * than the trace tolerance (up to the cricondenbar, the envelope's highest pressure); every line there runs
 * from its traced end to the critical point, so the chord that closes it keeps within the tolerance. Close to
 * the critical point the phase-equilibrium solvers slow down and may fail, which this stretch avoids.
 */
function closingPressure(mapping: PageMapping, toleranceMm: number, pc: number, pBar: number): number {
  const mmPerLnP = mapping.frame.heightMm / Math.log(mapping.window.pMax / mapping.window.pMin);
  return Math.min(pc * NEAR_CRITICAL, Math.max(CLOSE_FLOOR * pc, Math.max(pc, pBar) * Math.exp(-toleranceMm / mmPerLnP)));
}

/** Closes the last piece at the critical point where it ends at the top of the traced range. */
function closeAtApex(b: MixBuild, pieces: Point[][]): Point[][] {
  const last = pieces[pieces.length - 1];
  const end = last?.[last.length - 1];
  if (end && end[1] >= b.pClose * (1 - 1e-9) && b.apex[1] <= b.mapping.window.pMax) last!.push(b.apex);
  return pieces;
}

function point(st: MixtureState | null): Point | null {
  return st ? [st.h, st.p] : null;
}

/** The default window: as for pure fluids, the dome from a practical low temperature to 1.5 p_c and hot vapour. */
export function mixtureAutoWindow(mix: Mixture, ref: ReferenceName, units: UnitSystem): ChartWindow {
  const env = mix.envelope();
  const Tlow = Math.max(mix.Tmin, env.bubble[0]!.T, Math.min(0.57 * env.critical.T, 213.15));
  const sat = mixtureSaturationT(mix, Tlow, ref);
  const floor = Math.max(env.bubble[0]!.p, env.dew[0]!.p);
  const pRound = niceAtMost(sat.dew.p, WINDOW_MANTISSAS);
  const pMin = pRound >= floor ? pRound : floor;
  const pMax = Math.min(niceAtLeast(1.5 * env.critical.p, WINDOW_MANTISSAS), mix.pmax);
  const hCold = sat.bubble.h;
  const hHot = mixtureFlash(mix, { T: Math.min(mix.Tmax, 1.3 * env.critical.T), p: pMin }, ref).h;
  const margin = 0.03 * (hHot - hCold);
  return { ...roundEnthalpyWindow(units, hCold - margin, hHot), pMin, pMax };
}

function resolveMixtureWindow(auto: ChartWindow, o: Partial<ChartWindow> | undefined, mix: Mixture): ChartWindow {
  const w = { ...auto, ...Object.fromEntries(Object.entries(o ?? {}).filter(([, v]) => v !== undefined)) } as ChartWindow;
  for (const k of ["hMin", "hMax", "pMin", "pMax"] as const) {
    if (typeof w[k] !== "number" || !Number.isFinite(w[k])) throw inputError(`window.${k}`, w[k], "not a finite number", "a finite number in SI (J/kg for h, Pa for p)");
  }
  if (!(w.hMax > w.hMin)) throw inputError("window.hMax", w.hMax, `not above window.hMin = ${w.hMin} J/kg`, "hMax > hMin");
  if (!(w.pMin > 0)) throw inputError("window.pMin", w.pMin, "must be positive (the pressure axis is logarithmic)", "pMin > 0 Pa");
  if (!(w.pMax > w.pMin)) throw inputError("window.pMax", w.pMax, `not above window.pMin = ${w.pMin} Pa`, "pMax > pMin");
  if (w.pMin >= mix.pmax) throw inputError("window.pMin", w.pMin, `at or above p_max for ${mix.id}`, `pMin < ${mix.pmax} Pa`);
  return w;
}

/** Traces t ↦ point over [t0, t1] to the page tolerance. */
function trace(b: MixBuild, evaluate: (t: number) => Point | null, t0: number, t1: number): Point[][] {
  return t1 > t0 ? traceCurve(evaluate, t0, t1, b.trace, b.stats) : [];
}

function lnRange(b: MixBuild, lo: number, hi: number): [number, number] {
  return [Math.log(Math.max(lo, b.mapping.window.pMin * 0.999)), Math.log(Math.min(hi, b.pTop))];
}

/** A line of constant quality (0 and 1: the two sides of the dome) from the window's floor to the critical point. */
function qualityLine(b: MixBuild, x: number): Point[][] {
  const [t0, t1] = lnRange(b, b.pFloor, b.pClose);
  return closeAtApex(b, trace(b, (t) => point(attempt(() => mixtureFlash(b.mix, { p: Math.exp(t), x }, b.ref))), t0, t1));
}

/** The explicit point at T [K] and molar density ρ [mol/m³] of the overall composition: (h, p), or null outside the model. */
function pointTRho(b: MixBuild, T: number, rho: number, o: Float64Array): Point | null {
  mixturePropertiesTRho(b.mix.model, T, rho, b.mix.z, o);
  const p = o[P]!;
  if (!(p > 0) || p > b.mix.pmax || !Number.isFinite(o[H]!)) return null;
  return [o[H]! + b.off.dh, p];
}

/**
 * An isotherm below the critical temperature runs as vapour up to its dew pressure, through the dome on a
 * slope to its bubble pressure (the glide), and as liquid above. The one-phase parts are explicit in (T, ρ)
 * between the saturated densities and those at the window's edges; the two-phase part is traced in ln p by
 * (T, p) flashes. Above the critical temperature the whole line is traced by (T, p) flashes.
 */
function isotherm(b: MixBuild, T: number): Point[][] {
  const at = (t: number) => point(attempt(() => mixtureFlash(b.mix, { T, p: Math.exp(t) }, b.ref)));
  const [lo, hi] = lnRange(b, b.mapping.window.pMin * 0.999, b.pTop);
  const sat = T < b.Tc ? attempt(() => mixtureSaturationT(b.mix, T, b.ref)) : null;
  if (!sat) return trace(b, at, lo, hi);
  const lnDew = Math.log(sat.dew.p), lnBub = Math.log(sat.bubble.p);
  const o = new Float64Array(12), M = b.mix.M;
  const parts: Point[][][] = [];
  // Vapour: ln ρ from the window's lowest pressure up to the dew point's density (its end is the dew state itself).
  if (lnDew > lo) {
    const rhoLow = attempt(() => mixtureDensityTP(b.mix.model, T, Math.exp(lo), b.mix.z, "vapour"));
    const rhoDew = sat.dew.rho / M;
    if (rhoLow !== null && rhoLow < rhoDew) {
      const t0 = Math.log(rhoLow), t1 = Math.log(rhoDew);
      parts.push(trace(b, (t) => (t >= t1 ? point(sat.dew) : pointTRho(b, T, Math.exp(t), o)), t0, t1));
    }
  }
  // The ends of the two-phase part are the saturated states themselves, so the parts meet exactly.
  const inDome = (t: number) => (t <= lnDew ? point(sat.dew) : t >= lnBub ? point(sat.bubble) : at(t));
  parts.push(trace(b, inDome, Math.max(lnDew, lo), Math.min(lnBub, hi)));
  // Liquid: ρ from the bubble point's density up to the density at the top pressure.
  if (lnBub < hi) {
    const rhoBub = sat.bubble.rho / M;
    const rhoTop = attempt(() => mixtureDensityTP(b.mix.model, T, Math.exp(hi), b.mix.z, "liquid", rhoBub));
    if (rhoTop !== null && rhoTop > rhoBub) parts.push(trace(b, (t) => (t <= rhoBub ? point(sat.bubble) : pointTRho(b, T, t, o)), rhoBub, rhoTop));
  }
  return joinParts(b.mapping, parts);
}

/**
 * The temperature where the feed's bubble (liquid side) or dew (vapour side) density equals ρ [mol/m³]:
 * bracketed on the traced envelope side, then refined by secant steps on solved saturation points.
 * Undefined where the isochore does not meet that side of the envelope.
 */
function crossingTemperature(b: MixBuild, rho: number): number | undefined {
  const env = b.mix.envelope();
  const kind = rho < env.critical.rho ? "dew" : "bubble";
  const side = kind === "dew" ? env.dew : env.bubble;
  let k = 0;
  while (k + 1 < side.length && (side[k]!.rhoFeed - rho) * (side[k + 1]!.rhoFeed - rho) > 0) k++;
  if (k + 1 >= side.length) return undefined;
  const a = side[k]!, c = side[k + 1]!;
  let T0 = a.T, T1 = c.T;
  let g0 = Math.log(a.rhoFeed / rho), g1 = Math.log(c.rhoFeed / rho);
  for (let it = 0; it < 12 && Math.abs(T1 - T0) > 1e-9 * T1 && g1 !== g0; it++) {
    const T = Math.min(Math.max(T1 - g1 * (T1 - T0) / (g1 - g0), b.mix.Tmin), b.Tc);
    // Only the one side's feed density is needed: no second point, no property states.
    const sat = attempt(() => saturationPoint(b.mix, kind, "T", T));
    if (!sat) break;
    T0 = T1; g0 = g1;
    T1 = T; g1 = Math.log(sat.rhoFeed / rho);
  }
  return T1;
}

/**
 * An isochore of specific volume v [m³/kg]: explicit in (T, ρ) above the temperature where it meets the
 * envelope, and by (T, ρ) two-phase flashes below it, where the split's overall volume is v.
 */
function isochore(b: MixBuild, r: WindowRanges, v: number): Point[][] {
  const rho = 1 / (v * b.mix.M);
  const o = new Float64Array(12);
  const Tx = crossingTemperature(b, rho);
  const lo = r.Tlo, hi = r.Thi;
  const parts: Point[][][] = [];
  // Inside the dome only from the envelope's lowest traced temperature, where bubble and dew points exist.
  const env = b.mix.envelope();
  const lo2 = Math.max(lo, env.bubble[0]!.T, env.dew[0]!.T);
  if (Tx !== undefined && Tx > lo2) {
    parts.push(trace(b, (T) => point(attempt(() => mixtureFlash(b.mix, { T, v }, b.ref))), lo2, Math.min(Tx, hi)));
  }
  const from = Tx !== undefined ? Math.max(lo, Tx) : lo;
  parts.push(trace(b, (T) => pointTRho(b, T, rho, o), from, hi));
  return joinParts(b.mapping, parts.filter((q) => q.length > 0));
}

function isentrope(b: MixBuild, s: number): Point[][] {
  const [lo, hi] = lnRange(b, b.mapping.window.pMin * 0.999, b.pTop);
  return trace(b, (t) => point(attempt(() => mixtureFlash(b.mix, { p: Math.exp(t), s }, b.ref))), lo, hi);
}

function ranges(b: MixBuild): WindowRanges {
  const w = b.mapping.window, mix = b.mix;
  // A corner beyond the model's range stands in for the nearest state it has: T_max on the right, T_min on the left.
  const at = (h: number, p: number, T: number) => {
    const pp = Math.min(p, mix.pmax);
    return attempt(() => mixtureFlash(mix, { p: pp, h }, b.ref)) ?? attempt(() => mixtureFlash(mix, { T, p: pp }, b.ref));
  };
  const bl = at(w.hMin, w.pMin, mix.Tmin), tl = at(w.hMin, w.pMax, mix.Tmin), br = at(w.hMax, w.pMin, mix.Tmax), tr = at(w.hMax, w.pMax, mix.Tmax);
  const crit = mixtureFlash(mix, { T: b.Tc, p: b.pc }, b.ref);
  return {
    Tlo: Math.max(mix.Tmin, Math.min(bl?.T ?? mix.Tmin, tl?.T ?? mix.Tmin)),
    Thi: Math.min(mix.Tmax, Math.max(br?.T ?? mix.Tmax, tr?.T ?? mix.Tmax)),
    sLo: tl?.s ?? bl?.s ?? crit.s,
    sHi: br?.s ?? crit.s,
    vHi: br?.v ?? crit.v,
    sCritical: crit.s,
  };
}

function lines(b: MixBuild, q: Quantity, v: FamilyValue, pieces: Point[][]): Line[] {
  const display = { value: v.display, unit: displayUnit(b.opts.units, q).symbol };
  return pieces.map((points) => ({ quantity: q, value: v.si, unit: SI_UNIT[q], display: { ...display }, rank: v.rank, points }));
}

function values(b: MixBuild, family: "isotherms" | "isentropes" | "isochores" | "qualities" | "isenthalps", q: Quantity, auto: () => FamilyValue[]): FamilyValue[] {
  const given = b.opts.values[family];
  return given ? givenValues(b.opts.units, q, given) : auto();
}

function isothermValues(b: MixBuild, r: WindowRanges): FamilyValue[] {
  const u = b.opts.units;
  const lo = toDisplay(u, "temperature", r.Tlo), hi = toDisplay(u, "temperature", r.Thi);
  const step = b.opts.densities.isotherm ?? stepFor(hi - lo, T_STEPS, MAX_ISOTHERMS);
  return multiplesBetween(lo, hi, step).map((d) => ({ si: fromDisplay(u, "temperature", d), display: d, rank: "major" as const }));
}

/** The line set of a real mixture: dome, quality lines, isotherms, isentropes, isochores and isenthalps. */
export function buildMixtureLineSet(mix: Mixture, opts: CheckedOptions): LineSet {
  const ref = opts.reference;
  const window = resolveMixtureWindow(mixtureAutoWindow(mix, ref, opts.units), opts.window, mix);
  const mapping = pageMapping(window, opts.frame);
  const env = mix.envelope();
  const stats: TraceStats = { evaluations: 0, capped: 0, breaks: 0, bridges: 0, longestBridgeMm: 0 };
  // The critical point's enthalpy explicitly at the envelope's (T, ρ): no flash so close to it.
  const o = new Float64Array(12);
  mixturePropertiesTRho(mix.model, env.critical.T, env.critical.rho, mix.z, o);
  const off = mixtureReferenceOffset(mix, ref);
  const apex: Point = [o[H]! + off.dh, env.critical.p];
  const b: MixBuild = {
    mix, ref, off, opts, mapping, trace: { mapping, toleranceMm: opts.toleranceMm }, stats,
    Tc: env.critical.T, pc: env.critical.p, pFloor: Math.max(env.bubble[0]!.p, env.dew[0]!.p), pTop: Math.min(window.pMax, mix.pmax),
    apex, pClose: closingPressure(mapping, opts.toleranceMm, env.critical.p, env.cricondenbar.p),
  };
  const r = ranges(b);
  const on = opts.families, d = opts.densities;
  const out: Line[] = [];
  if (on.dome) {
    out.push(...lines(b, "saturation-liquid", { si: 0, display: 0, rank: "major" }, qualityLine(b, 0)));
    out.push(...lines(b, "saturation-vapour", { si: 1, display: 1, rank: "major" }, qualityLine(b, 1)));
  }
  if (on.qualities) for (const v of values(b, "qualities", "quality", () => qualityValues(d))) out.push(...lines(b, "quality", v, qualityLine(b, v.si)));
  if (on.isotherms) {
    for (const v of values(b, "isotherms", "temperature", () => isothermValues(b, r)).filter((v) => v.si >= mix.Tmin && v.si <= mix.Tmax))
      out.push(...lines(b, "temperature", v, isotherm(b, v.si)));
  }
  if (on.isentropes) for (const v of values(b, "isentropes", "entropy", () => isentropeValues(opts.units, r, d))) out.push(...lines(b, "entropy", v, isentrope(b, v.si)));
  if (on.isochores) {
    const vCritical = 1 / (env.critical.rho * mix.M);
    for (const v of values(b, "isochores", "specific-volume", () => isochoreValues(vCritical, opts.units, r, d))) out.push(...lines(b, "specific-volume", v, isochore(b, r, v.si)));
  }
  if (on.isenthalps) {
    for (const v of values(b, "isenthalps", "enthalpy", () => isenthalpValues(opts.units, mapping, d)).filter((v) => v.si >= window.hMin && v.si <= window.hMax))
      out.push(...lines(b, "enthalpy", v, [[[v.si, window.pMin], [v.si, window.pMax]]]));
  }
  return {
    fluid: mix.id, units: opts.units, reference: ref, window, frame: opts.frame, toleranceMm: opts.toleranceMm,
    critical: { T: env.critical.T, p: env.critical.p, h: apex[0] },
    lines: out, stats,
  };
}
