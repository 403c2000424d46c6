// Which lines a chart carries: round values in the display unit for each family, spaced by a step the
// window's span sets (or the caller's), with 5 K (5 °F) isotherms added where the page has room for them.
import { flashPH, flashTP, H, propertiesTRho, referenceOffset, S, saturationT, type Fluid, type ReferenceName } from "../eos/index.js";
import { attempt } from "./context.js";
import { fromDisplay, toDisplay } from "./display.js";
import { clean, multiplesBetween, niceAtLeast, ONE_TWO_FIVE, seriesBetween, stepFor } from "./nice.js";
import type { PageMapping } from "./page.js";
import type { Quantity, UnitSystem } from "./types.js";

export interface FamilyValue {
  /** SI value. */
  si: number;
  /** The round number the chart prints, in the display unit. */
  display: number;
  rank: "major" | "minor";
}

/** Line spacing of each family; steps are in the display unit of the chosen unit system. */
export interface Densities {
  /** Isotherm step [K in si, °F in ip]; default 10, 20, 50 … whichever keeps 36 lines or fewer. */
  isotherm?: number;
  /** Page distance [mm] 5 K (5 °F) isotherms need from their neighbours to be added between 10-step lines; 0 adds none. */
  minorIsothermSpacingMm?: number;
  /** Isentrope step [kJ/(kg K) in si, Btu/(lb °R) in ip]. */
  isentrope?: number;
  /** Mantissas of the isochore series [m³/kg in si, ft³/lb in ip]; default 1–2–5. */
  isochore?: readonly number[];
  /** Quality step (0 < step < 1). */
  quality?: number;
  /** Enthalpy grid step [kJ/kg in si, Btu/lb in ip]. */
  isenthalp?: number;
}

const T_STEPS = [10, 20, 50, 100, 200];
/** Finer steps for charts whose temperature span is a few kelvin or tens of kelvin (cryogens). */
const FINE_T_STEPS = [5, 2, 1, 0.5, 0.2, 0.1];
const MIN_ISOTHERMS = 8;
const S_STEPS: Record<UnitSystem, number[]> = { si: [0.05, 0.1, 0.2, 0.5, 1, 2], ip: [0.01, 0.02, 0.05, 0.1, 0.2, 0.5] };
const MAX_ISOTHERMS = 36, MAX_ISENTROPES = 26, MAX_ISENTHALPS = 30;
export const DEFAULT_MINOR_SPACING_MM = 5;

/** The window's extent in T, s and v, read at its corners (where a corner lies outside the equation, its limit). */
export interface WindowRanges {
  Tlo: number;
  Thi: number;
  sLo: number;
  sHi: number;
  vHi: number;
  /** Entropy at the critical point [J/(kg K), chosen reference]. */
  sCritical: number;
}

export function windowRanges(f: Fluid, mapping: PageMapping, reference: ReferenceName): WindowRanges {
  const w = mapping.window;
  // A corner beyond the equation's range stands in for the nearest state it has: T_max on the right, T_min on the left.
  const at = (h: number, p: number, T: number) => {
    const pp = Math.min(p, f.pmax);
    return attempt(() => flashPH(f, pp, h, reference)) ?? attempt(() => flashTP(f, T, pp, reference));
  };
  const bl = at(w.hMin, w.pMin, f.Tmin), tl = at(w.hMin, w.pMax, f.Tmin);
  const br = at(w.hMax, w.pMin, f.Tmax), tr = at(w.hMax, w.pMax, f.Tmax);
  const o = new Float64Array(f.tmp.length);
  propertiesTRho(f.model, f.M, f.Tc, f.rhoc, o);
  const sCritical = o[S]! + referenceOffset(f, reference).ds;
  return {
    Tlo: Math.max(f.Tmin, Math.min(bl?.T ?? f.Tmin, tl?.T ?? f.Tmin)),
    Thi: Math.min(f.Tmax, Math.max(br?.T ?? f.Tmax, tr?.T ?? f.Tmax)),
    sLo: tl?.s ?? bl?.s ?? sCritical,
    sHi: br?.s ?? sCritical,
    vHi: br?.v ?? 1 / (f.rhoc * f.M),
    sCritical,
  };
}

function family(units: UnitSystem, q: Quantity, displays: number[], rank: "major" | "minor" = "major"): FamilyValue[] {
  return displays.map((d) => ({ si: fromDisplay(units, q, d), display: d, rank }));
}

/** Whether isotherms T0 < T1 stay `spacing` mm apart on the page in liquid, plateau and vapour. */
function hasRoom(f: Fluid, mapping: PageMapping, reference: ReferenceName, T0: number, T1: number, spacing: number): boolean {
  const o = new Float64Array(f.tmp.length);
  const gaps: number[] = [];
  const s0 = T0 <= f.satTmax ? attempt(() => saturationT(f, T0)) : null;
  const s1 = T1 <= f.satTmax ? attempt(() => saturationT(f, T1)) : null;
  if (s0 && s1) {
    const hl = (T: number, rho: number) => { propertiesTRho(f.model, f.M, T, rho, o); return o[H]!; };
    gaps.push(mapping.x(hl(T1, s1.rhoL)) - mapping.x(hl(T0, s0.rhoL)));
    gaps.push(mapping.y(s1.pL) - mapping.y(s0.pL));
  }
  const p = Math.min(s0 ? s0.pV : f.pc, mapping.window.pMax);
  const v0 = attempt(() => flashTP(f, T0, p * (1 - 1e-9), reference)), v1 = attempt(() => flashTP(f, T1, p * (1 - 1e-9), reference));
  if (v0 && v1) gaps.push(mapping.x(v1.h) - mapping.x(v0.h));
  return gaps.length > 0 && Math.min(...gaps) >= spacing;
}

/** 10 or 20 (K or °F) for refrigeration spans, coarser for wide ones, finer where 10 would leave under 8 lines. */
function isothermStep(span: number): number {
  const step = stepFor(span, T_STEPS, MAX_ISOTHERMS);
  if (span / step >= MIN_ISOTHERMS) return step;
  return FINE_T_STEPS.find((s) => span / s >= MIN_ISOTHERMS) ?? FINE_T_STEPS[FINE_T_STEPS.length - 1]!;
}

export function isothermValues(f: Fluid, units: UnitSystem, r: WindowRanges, mapping: PageMapping, reference: ReferenceName, d: Densities): FamilyValue[] {
  const lo = toDisplay(units, "temperature", r.Tlo), hi = toDisplay(units, "temperature", r.Thi);
  const step = d.isotherm ?? isothermStep(hi - lo);
  const inRange = (v: FamilyValue) => v.si >= f.Tmin && v.si <= f.Tmax;
  const majors = family(units, "temperature", multiplesBetween(lo, hi, step)).filter(inRange);
  const spacing = d.minorIsothermSpacingMm ?? DEFAULT_MINOR_SPACING_MM;
  if (step !== 10 || spacing <= 0) return majors;
  const minors = family(units, "temperature", multiplesBetween(lo, hi, step).map((v) => clean(v + step / 2)), "minor")
    .filter(inRange)
    .filter((v) => hasRoom(f, mapping, reference, fromDisplay(units, "temperature", v.display - step / 2), v.si, spacing));
  return [...majors, ...minors].sort((a, b) => a.si - b.si);
}

export function isentropeValues(units: UnitSystem, r: WindowRanges, d: Densities): FamilyValue[] {
  const lo = toDisplay(units, "entropy", Math.max(r.sLo, r.sCritical - 0.1 * (r.sHi - r.sCritical)));
  const hi = toDisplay(units, "entropy", r.sHi);
  const step = d.isentrope ?? stepFor(hi - lo, S_STEPS[units], MAX_ISENTROPES);
  return family(units, "entropy", multiplesBetween(lo, hi, step));
}

/** Isochores from the critical specific volume vCritical [m³/kg] up to the window's largest volume. */
export function isochoreValues(vCritical: number, units: UnitSystem, r: WindowRanges, d: Densities): FamilyValue[] {
  const lo = toDisplay(units, "specific-volume", vCritical), hi = toDisplay(units, "specific-volume", r.vHi);
  return hi > lo ? family(units, "specific-volume", seriesBetween(lo * (1 + 1e-9), hi, d.isochore ?? ONE_TWO_FIVE)) : [];
}

export function qualityValues(d: Densities): FamilyValue[] {
  return multiplesBetween(0, 1, d.quality ?? 0.1)
    .filter((x) => x > 1e-9 && x < 1 - 1e-9)
    .map((x) => ({ si: x, display: x, rank: "major" as const }));
}

export function isenthalpValues(units: UnitSystem, mapping: PageMapping, d: Densities): FamilyValue[] {
  const w = mapping.window;
  const lo = toDisplay(units, "enthalpy", w.hMin), hi = toDisplay(units, "enthalpy", w.hMax);
  const step = d.isenthalp ?? niceAtLeast((hi - lo) / MAX_ISENTHALPS, ONE_TWO_FIVE);
  return family(units, "enthalpy", multiplesBetween(lo, hi, step));
}

/** Values the caller gave in SI, shown in the display unit. */
export function givenValues(units: UnitSystem, q: Quantity, si: readonly number[]): FamilyValue[] {
  return si.map((v) => ({ si: v, display: clean(toDisplay(units, q, v)), rank: "major" as const }));
}
