// The property calls a cycle makes, for a pure (or pseudo-pure) Fluid or a real Mixture alike, so the
// cycle's processes are written once. Mixtures give bubble and dew points from their own phase equilibrium.
import {
  flashPH, flashPS, flashPX, flashTP, flashTX, Mixture, mixtureFlash, mixtureSaturationP, resolveSubstance, saturationP, saturationPressureRange,
  type Fluid, type ReferenceName, type State,
} from "../eos/index.js";

/** What a cycle runs on: a pure or pseudo-pure fluid, or a real mixture. */
export type WorkingFluid = Fluid | Mixture;

export function isMixture(f: WorkingFluid): f is Mixture {
  return f instanceof Mixture;
}

/** True when the fluid glides: a pseudo-pure blend or a real mixture (levels are read at a glide point). */
export function glides(f: WorkingFluid): boolean {
  return isMixture(f) || f.pseudoPure;
}

export function stateTP(f: WorkingFluid, T: number, p: number, ref: ReferenceName): State {
  return isMixture(f) ? mixtureFlash(f, { T, p }, ref) : flashTP(f, T, p, ref);
}

export function statePH(f: WorkingFluid, p: number, h: number, ref: ReferenceName): State {
  return isMixture(f) ? mixtureFlash(f, { p, h }, ref) : flashPH(f, p, h, ref);
}

export function statePS(f: WorkingFluid, p: number, s: number, ref: ReferenceName): State {
  return isMixture(f) ? mixtureFlash(f, { p, s }, ref) : flashPS(f, p, s, ref);
}

export function statePX(f: WorkingFluid, p: number, x: number, ref: ReferenceName): State {
  return isMixture(f) ? mixtureFlash(f, { p, x }, ref) : flashPX(f, p, x, ref);
}

export function stateTX(f: WorkingFluid, T: number, x: number, ref: ReferenceName = "native"): State {
  return isMixture(f) ? mixtureFlash(f, { T, x }, ref) : flashTX(f, T, x, ref);
}

/** Bubble (TL) and dew (TV) temperatures at pressure p [K]. */
export function bubbleDewAtP(f: WorkingFluid, p: number): { TL: number; TV: number } {
  if (!isMixture(f)) {
    const s = saturationP(f, p);
    return { TL: s.TL, TV: s.TV };
  }
  const s = mixtureSaturationP(f, p);
  return { TL: s.bubble.T, TV: s.dew.T };
}

/** The lowest and highest pressures at which the engine solves a bubble and a dew point [Pa]. */
export function twoPhasePressureSpan(f: WorkingFluid): [number, number] {
  if (!isMixture(f)) return f.pseudoPure ? [f.pBubble!.value(f.Tmin), f.pc] : saturationPressureRange(f);
  const env = f.envelope();
  return [Math.max(env.bubble[0]!.p, env.dew[0]!.p), env.critical.p];
}

/** The critical pressure [Pa]: the equation's, or where a mixture's bubble and dew lines meet. */
export function criticalPressure(f: WorkingFluid): number {
  return isMixture(f) ? f.envelope().critical.p : f.pc;
}

/** A fluid, blend or composition by name (as resolveSubstance reads it). */
export function workingFluid(name: string): WorkingFluid {
  const sub = resolveSubstance(name);
  return sub.kind === "pure" ? sub.fluid : sub.mixture;
}

/** The highest saturation temperature the engine solves [K]. */
export function twoPhaseTemperatureTop(f: WorkingFluid): number {
  return isMixture(f) ? f.envelope().critical.T : f.satTmax;
}
