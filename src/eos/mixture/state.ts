// The state a mixture flash returns: the pure engine's State (mass-based SI) plus the composition of the
// mixture and, in the two-phase region, of each phase, and the estimated pairs behind the numbers.
import { CP, CV, G, H, P, S, U, W } from "../properties.js";
import type { ReferenceName, ReferenceOffset } from "../reference.js";
import type { Phase, State } from "../state.js";
import type { EstimatedPair, Mixture } from "./mixture.js";
import { mixturePropertiesTRho } from "./properties.js";

export interface PhaseComposition {
  moleFractions: number[];
  massFractions: number[];
  /** Density of the phase [kg/m³]. */
  rho: number;
}

export interface MixtureState extends State {
  components: string[];
  /** Overall composition. */
  moleFractions: number[];
  massFractions: number[];
  /** Coexisting phases in the two-phase region, the incipient phase at a bubble or dew point; else null. */
  liquid: PhaseComposition | null;
  vapour: PhaseComposition | null;
  estimatedPairs: readonly EstimatedPair[];
}

const out = new Float64Array(10);

export function phaseComposition(mix: Mixture, x: ArrayLike<number>, rhoMolar: number): PhaseComposition {
  return { moleFractions: Array.from(x as ArrayLike<number>), massFractions: mix.massFromMole(x), rho: rhoMolar * mix.model.molarMass(x) };
}

function base(mix: Mixture, ref: ReferenceName): Pick<MixtureState, "fluid" | "reference" | "components" | "moleFractions" | "massFractions" | "estimatedPairs"> {
  return { fluid: mix.id, reference: ref, components: mix.components.map((f) => f.id), moleFractions: Array.from(mix.z), massFractions: Array.from(mix.massFractions), estimatedPairs: mix.estimatedPairs };
}

/** A single-phase state of the overall composition at T [K] and molar density [mol/m³]. */
export function mixtureSingleState(mix: Mixture, T: number, rhoMolar: number, phase: Phase, ref: ReferenceName, off: ReferenceOffset): MixtureState {
  mixturePropertiesTRho(mix.model, T, rhoMolar, mix.z, out);
  const rho = rhoMolar * mix.M;
  return {
    ...base(mix, ref), T, p: out[P]!, rho, v: 1 / rho,
    h: out[H]! + off.dh, s: out[S]! + off.ds, u: out[U]! + off.dh, g: out[G]! + off.dh - T * off.ds,
    cv: out[CV]!, cp: out[CP]!, w: out[W]!, x: null, phase, liquid: null, vapour: null,
  };
}

/** Mass-based h, s, u and v of one phase of composition x at (T, molar ρ), native reference. */
export function phaseProperties(mix: Mixture, T: number, rhoMolar: number, x: ArrayLike<number>): { h: number; s: number; u: number; v: number; M: number } {
  mixturePropertiesTRho(mix.model, T, rhoMolar, x, out);
  const M = mix.model.molarMass(x);
  return { h: out[H]!, s: out[S]!, u: out[U]!, v: 1 / (rhoMolar * M), M };
}

/** A two-phase state: liquid x and vapour y at (T, p) with vapour mole fraction β. Quality is the vapour mass fraction. */
export function mixtureTwoPhaseState(mix: Mixture, T: number, p: number, beta: number, x: ArrayLike<number>, rhoL: number, y: ArrayLike<number>, rhoV: number,
  ref: ReferenceName, off: ReferenceOffset): MixtureState {
  const L = phaseProperties(mix, T, rhoL, x), V = phaseProperties(mix, T, rhoV, y);
  const q = (beta * V.M) / mix.M;
  const mixv = (a: number, b: number) => a + q * (b - a);
  const v = mixv(L.v, V.v);
  const h = mixv(L.h, V.h) + off.dh, s = mixv(L.s, V.s) + off.ds;
  return {
    ...base(mix, ref), T, p, rho: 1 / v, v, h, s, u: mixv(L.u, V.u) + off.dh, g: h - T * s,
    cv: null, cp: null, w: null, x: q, phase: "two-phase",
    liquid: phaseComposition(mix, x, rhoL), vapour: phaseComposition(mix, y, rhoV),
  };
}
