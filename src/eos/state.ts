// The state object every flash returns (mass-based SI), and the two ways to build one:
// from a single-phase (T, ρ) and from a tie line with a quality.
import type { Fluid } from "./fluid.js";
import { CP, CV, G, H, P, propertiesTRho, S, U, W } from "./properties.js";
import type { ReferenceName, ReferenceOffset } from "./reference.js";
import type { Saturation } from "./saturation.js";

export type Phase = "liquid" | "vapour" | "two-phase" | "supercritical";

export interface State {
  fluid: string;
  reference: ReferenceName;
  /** Temperature [K]. */
  T: number;
  /** Absolute pressure [Pa]. */
  p: number;
  /** Density [kg/m³] and specific volume [m³/kg]. */
  rho: number;
  v: number;
  /** Specific enthalpy, internal energy and Gibbs energy [J/kg]; entropy [J/(kg K)]. */
  h: number;
  s: number;
  u: number;
  g: number;
  /** Isochoric and isobaric heat capacity [J/(kg K)] and speed of sound [m/s]; null in the two-phase region. */
  cv: number | null;
  cp: number | null;
  w: number | null;
  /** Vapour mass fraction in the two-phase region, null elsewhere. */
  x: number | null;
  phase: Phase;
}

/** Phase of a single-phase state, given the branch the solver used. */
export function singlePhase(f: Fluid, T: number, p: number, liquidSide: boolean): Phase {
  if (T >= f.Tc && p >= f.pc) return "supercritical";
  if (T >= f.Tc) return "vapour";
  if (p >= f.pc) return "liquid";
  return liquidSide ? "liquid" : "vapour";
}

/**
 * The state at T [K] and molar ρ. `evaluated` says that f.tmp already holds the property set at exactly
 * this (T, ρ) (a solver's last, converged evaluation), which is then not computed a second time.
 */
export function singleState(f: Fluid, T: number, rhoMolar: number, phase: Phase, ref: ReferenceName, off: ReferenceOffset, evaluated = false): State {
  const o = f.tmp;
  if (!evaluated) propertiesTRho(f.model, f.M, T, rhoMolar, o);
  const rho = rhoMolar * f.M;
  return {
    fluid: f.id, reference: ref, T, p: o[P]!, rho, v: 1 / rho,
    h: o[H]! + off.dh, s: o[S]! + off.ds, u: o[U]! + off.dh, g: o[G]! + off.dh - T * off.ds,
    cv: o[CV]!, cp: o[CP]!, w: o[W]!, x: null, phase,
  };
}

/** Mass-based h, s, u, g, v and c_p of both ends of a tie line (native reference). */
export function tieLine(f: Fluid, sat: Saturation): { hL: number; hV: number; sL: number; sV: number; uL: number; uV: number; gL: number; gV: number; vL: number; vV: number; cpL: number; cpV: number } {
  const o = f.tmp;
  propertiesTRho(f.model, f.M, sat.TL, sat.rhoL, o);
  const hL = o[H]!, sL = o[S]!, uL = o[U]!, gL = o[G]!, cpL = o[CP]!;
  propertiesTRho(f.model, f.M, sat.TV, sat.rhoV, o);
  return { hL, sL, uL, gL, cpL, hV: o[H]!, sV: o[S]!, uV: o[U]!, gV: o[G]!, cpV: o[CP]!, vL: 1 / (sat.rhoL * f.M), vV: 1 / (sat.rhoV * f.M) };
}

/**
 * A two-phase state at quality x on a tie line. For pseudo-pure blends T (and p along an isotherm)
 * run linearly in x between the bubble and dew ends: the convention domeprint uses for their glide.
 */
export function twoPhaseState(f: Fluid, sat: Saturation, x: number, ref: ReferenceName, off: ReferenceOffset): State {
  const t = tieLine(f, sat);
  const mix = (a: number, b: number) => a + x * (b - a);
  const v = mix(t.vL, t.vV);
  const T = mix(sat.TL, sat.TV);
  const h = mix(t.hL, t.hV) + off.dh, s = mix(t.sL, t.sV) + off.ds;
  return {
    fluid: f.id, reference: ref, T, p: mix(sat.pL, sat.pV), rho: 1 / v, v,
    h, s, u: mix(t.uL, t.uV) + off.dh, g: h - T * s,
    cv: null, cp: null, w: null, x, phase: "two-phase",
  };
}
