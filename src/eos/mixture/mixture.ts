// A mixture of fixed composition: its components, mass and mole fractions, model, flagged estimates and the
// lazily traced phase envelope. getMixture resolves a blend id or a composition string to one.
import { DomeprintError } from "../../errors.js";
import type { Fluid } from "../fluid.js";
import { getFluid } from "../registry.js";
import { blendFiles, findBlend, parseComposition } from "./blend-file.js";
import { traceEnvelope, type Envelope } from "./envelope.js";
import { TwoPhaseSplit } from "./flash-tp.js";
import { IncipientSolver } from "./incipient.js";
import { MixtureModel } from "./model.js";

/** A pair whose parameters are (partly) estimated, and why: to be shown wherever results use it. */
export interface EstimatedPair {
  fluids: [string, string];
  reason: string;
}

export class Mixture {
  readonly id: string;
  readonly designation: string;
  readonly components: readonly Fluid[];
  readonly N: number;
  readonly massFractions: Float64Array;
  /** Overall mole fractions. */
  readonly z: Float64Array;
  /** Molar mass [kg/mol]. */
  readonly M: number;
  readonly model: MixtureModel;
  readonly estimatedPairs: readonly EstimatedPair[];
  /** Where the standard composition comes from (blend files), or null for a composition given by the user. */
  readonly compositionSource: string | null;
  /** ISO 817 class of a standard blend and its source; null for a user composition, which nobody has classified. */
  safety: { class: string; source: string } | null = null;
  /** Range of the model: the narrowest of the components' ranges. */
  readonly Tmin: number;
  readonly Tmax: number;
  readonly pmax: number;
  /** Reused solver state (not for callers). */
  readonly solver: IncipientSolver;
  readonly split: TwoPhaseSplit;
  private env: Envelope | undefined;
  private envError: DomeprintError | undefined;

  constructor(id: string, designation: string, components: Fluid[], massFractions: number[], compositionSource: string | null) {
    this.id = id;
    this.designation = designation;
    this.components = components;
    const N = (this.N = components.length);
    this.massFractions = Float64Array.from(massFractions);
    const n = massFractions.map((w, k) => w / components[k]!.M);
    const total = n.reduce((a, b) => a + b, 0);
    this.z = Float64Array.from(n, (v) => v / total);
    let M = 0;
    for (let k = 0; k < N; k++) M += this.z[k]! * components[k]!.M;
    this.M = M;
    this.model = new MixtureModel(components, this.z);
    this.estimatedPairs = this.model.pairs.filter((p) => p.estimated !== null).map((p) => ({ fluids: [components[p.i]!.id, components[p.j]!.id] as [string, string], reason: p.estimated! }));
    this.compositionSource = compositionSource;
    this.Tmin = Math.max(...components.map((f) => f.Tmin));
    this.Tmax = Math.min(...components.map((f) => f.Tmax));
    this.pmax = Math.min(...components.map((f) => f.pmax));
    this.solver = new IncipientSolver(this.model);
    this.split = new TwoPhaseSplit(this.model);
  }

  /**
   * The phase envelope, traced at first use from the bubble point at max(Tmin, T_r/2): further down the
   * pressures fall below a few pascals, where nothing is charted and Wilson's start is poor.
   */
  envelope(): Envelope {
    if (this.env) return this.env;
    if (this.envError) throw this.envError;
    try {
      this.model.reduce(this.z);
      const T0 = Math.max(this.Tmin, 0.5 * this.model.Tr);
      // Wilson's start can fail at the lowest temperatures; two warmer starts before giving up.
      for (let k = 0; ; k++) {
        try {
          this.env = traceEnvelope(this.model, this.z, T0 + 15 * k, this.Tmax, this.pmax);
          break;
        } catch (e) {
          if (!(e instanceof DomeprintError) || k === 2) throw e;
        }
      }
    } catch (e) {
      if (!(e instanceof DomeprintError)) throw e;
      this.envError = new DomeprintError("E_CONVERGENCE", `phase envelope of ${this.id}: ${e.message}`, { input: "fluid", value: this.id, allowed: "a mixture whose two-phase boundary can be traced" });
      throw this.envError;
    }
    return this.env!;
  }

  /** Mole fractions from mass fractions w of the components. */
  moleFromMass(w: ArrayLike<number>): number[] {
    const n = Array.from({ length: this.N }, (_, k) => w[k]! / this.components[k]!.M);
    const s = n.reduce((a, b) => a + b, 0);
    return n.map((v) => v / s);
  }

  /** Mass fractions from mole fractions x. */
  massFromMole(x: ArrayLike<number>): number[] {
    const m = Array.from({ length: this.N }, (_, k) => x[k]! * this.components[k]!.M);
    const s = m.reduce((a, b) => a + b, 0);
    return m.map((v) => v / s);
  }
}

const cache = new Map<string, Mixture>();

/** Ids of the blends shipped in fluids/blends. */
export function blendIds(): string[] {
  return blendFiles().map((b) => b.id);
}

function fromComposition(spec: string): Mixture {
  const { names, massFractions } = parseComposition(spec);
  const fluids = names.map((n) => getFluid(n));
  const ids = fluids.map((f) => f.id);
  if (new Set(ids).size !== ids.length) throw new DomeprintError("E_INPUT", `composition = ${JSON.stringify(spec)}: a fluid is listed twice; allowed: each component once`, { input: "composition", value: spec, allowed: "each component once" });
  const pseudo = fluids.find((f) => f.pseudoPure);
  if (pseudo) throw new DomeprintError("E_INPUT", `composition = ${JSON.stringify(spec)}: ${pseudo.id} is a pseudo-pure blend equation, not a component; allowed: pure fluids (use the blend's mixture id, e.g. ${pseudo.id}-mix)`, { input: "composition", value: spec, allowed: "pure fluids" });
  const id = ids.map((f, k) => `${f}:${+massFractions[k]!.toPrecision(6)}`).join("+");
  return new Mixture(id, `mixture ${id} (mass fractions)`, fluids, massFractions, null);
}

/** A mixture from a blend id or alias (e.g. "R410A-mix") or a composition string ("R32:0.5+R125:0.5", mass fractions). */
export function getMixture(spec: string): Mixture {
  if (typeof spec !== "string" || spec.trim() === "")
    throw new DomeprintError("E_UNKNOWN_FLUID", `fluid = ${JSON.stringify(spec)}: missing; allowed: a blend id (${blendIds().join(", ")}) or a composition such as "R32:0.5+R125:0.5"`, { input: "fluid", value: spec });
  const key = spec.trim();
  let m = cache.get(key);
  if (m) return m;
  if (key.includes(":")) m = fromComposition(key);
  else {
    const b = findBlend(key);
    if (!b) throw new DomeprintError("E_UNKNOWN_FLUID", `fluid = ${JSON.stringify(spec)}: unknown blend; allowed: ${blendIds().join(", ")} or a composition such as "R32:0.5+R125:0.5"`, { input: "fluid", value: spec, allowed: blendIds().join(", ") });
    m = new Mixture(b.id, b.designation, b.components.map((c) => getFluid(c.fluid)), b.components.map((c) => c.massFraction), b.compositionSource);
    m.safety = b.safety ?? null;
  }
  cache.set(key, m);
  return m;
}
