// What every cycle model is given besides its own inputs, and the checks and notes they share:
// fluid and reference state, the evaporating level, superheat, line pressure drops, capacity.
import { DomeprintError } from "../errors.js";
import { checkReferenceName, resolveSubstance, type Fluid, type ReferenceName } from "../eos/index.js";
import { cycleInputError, pressureText, requireCapacity, requireDifference, requireDrop, temperatureText } from "./check.js";
import type { GlidePoint, Level, ResolvedLevel } from "./level.js";
import { isMixture, type WorkingFluid } from "./working-fluid.js";

export interface CommonSpec {
  /** A fluid name (id, R-number, chemical name, blend id or composition) or a loaded Fluid or Mixture. */
  fluid: string | WorkingFluid;
  /** Reference state for h and s: native (default), iir, ashrae, nbp. */
  reference?: string;
  evaporating: Level;
  /** Where a temperature level sits in a blend's glide, unless the level names its own; default dew. */
  glidePoint?: GlidePoint;
  /** Superheat at the evaporator outlet [K]; default 0. */
  superheat?: number;
  /** Pressure drops of the suction and discharge lines [Pa]; default 0. */
  suctionDrop?: number;
  dischargeDrop?: number;
  /** Cooling capacity [W], for mass and volume flows. */
  capacity?: number;
}

export interface CommonInputs {
  f: Fluid;
  ref: ReferenceName;
  superheat: number;
  capacity?: number;
}

/** The common inputs of a model that runs on any working fluid, real mixtures included (single-stage). */
export function workingInputs(spec: CommonSpec): Omit<CommonInputs, "f"> & { f: WorkingFluid } {
  let f: WorkingFluid;
  if (typeof spec.fluid !== "string") f = spec.fluid;
  else {
    const sub = resolveSubstance(spec.fluid);
    f = sub.kind === "pure" ? sub.fluid : sub.mixture;
  }
  const out: Omit<CommonInputs, "f"> & { f: WorkingFluid } = { f, ref: checkReferenceName(spec.reference ?? "native"), superheat: requireDifference("superheat", spec.superheat ?? 0) };
  if (spec.capacity !== undefined) out.capacity = requireCapacity("capacity", spec.capacity);
  return out;
}

/** The common inputs of a model that needs a pure or pseudo-pure fluid (two-stage, transcritical). */
export function commonInputs(spec: CommonSpec, model = "this cycle model"): CommonInputs {
  const w = workingInputs(spec);
  if (isMixture(w.f)) {
    throw new DomeprintError("E_UNSUPPORTED", `fluid = ${JSON.stringify(w.f.id)}: ${model} is not available for real mixtures; allowed: a pure fluid or pseudo-pure blend (e.g. R407C), or a single-stage cycle for the mixture`,
      { input: "fluid", value: w.f.id, allowed: "a pure fluid or pseudo-pure blend" });
  }
  return { ...w, f: w.f };
}

/** Line pressure drops, each checked against the pressure it is taken from. */
export function lineDrops(spec: CommonSpec, pSuction: number, pDischarge: number): { suction: number; discharge: number } {
  return { suction: requireDrop("suction-drop", spec.suctionDrop ?? 0, pSuction), discharge: requireDrop("discharge-drop", spec.dischargeDrop ?? 0, pDischarge) };
}

export function levelText(l: ResolvedLevel): string {
  return "T" in l.given ? temperatureText(l.given.T) : pressureText(l.given.p);
}

/** The lower level must lie below the higher one; compared by pressure, which orders levels read at any glide point. */
export function requireBelow(low: ResolvedLevel, high: ResolvedLevel): void {
  if (low.p < high.p) return;
  const value = "T" in low.given ? low.given.T : low.given.p;
  throw cycleInputError(low.input, value, levelText(low),
    `its pressure ${pressureText(low.p)} is not below the ${high.input} pressure ${pressureText(high.p)} (${high.input} = ${levelText(high)})`,
    `a ${low.input} level below the ${high.input} level`);
}

/** Assumptions every model makes, printed with its results. */
export function commonNotes(f: WorkingFluid): string[] {
  const notes = [
    "steady flow; compressor and lines adiabatic; line pressure drops at constant enthalpy; no pressure drop inside heat exchangers",
  ];
  if (isMixture(f)) {
    notes.push(`${f.id} computed as a real mixture (multi-fluid model) of fixed overall composition; bubble and dew points from its phase equilibrium; superheat counted from the dew point, subcooling from the bubble point`);
    if (f.estimatedPairs.length) notes.push(`binary parameters estimated for ${f.estimatedPairs.map((p) => p.fluids.join("/")).join(", ")}`);
    return notes;
  }
  if (f.pseudoPure) notes.push(`${f.id} treated as a pseudo-pure blend of fixed composition; superheat counted from the dew point, subcooling from the bubble point`);
  return notes;
}
