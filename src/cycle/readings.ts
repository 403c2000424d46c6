// Measured points turned into states: each reading's state from its pressure and temperature, its
// superheat or subcooling, and flags where a reading cannot be what its line should carry.
import { DomeprintError } from "../errors.js";
import { checkReferenceName, type ReferenceName, type State } from "../eos/index.js";
import { cycleInputError } from "./check.js";
import { saturationMargins, type Margins } from "./margins.js";
import type { Reading, ReadingsFile } from "./readings-file.js";
import { criticalPressure, stateTP, workingFluid, type WorkingFluid as Fluid } from "./working-fluid.js";

/** Why a reading looks wrong: the kind, and the limit it crossed [K or Pa] or the engine's message. */
export type Flag =
  | { kind: "above-critical" | "not-supercritical"; limit: number }
  | { kind: "below-dew" | "above-bubble"; limit: number }
  | { kind: "out-of-range"; message: string };

export interface EvaluatedReading extends Reading, Margins {
  /** The state at (T, p); absent when the reading lies outside the equation's range (see flags). */
  state?: State;
  /** Empty when the reading is plausible. */
  flags: Flag[];
}

export interface ReadingsResult {
  fluid: string;
  reference: ReferenceName;
  source: string;
  title?: string;
  gauge: boolean;
  altitude?: number;
  atmosphere?: number;
  readings: EvaluatedReading[];
}

/** Flags for what a reading's line should carry; a subcritical expectation above the critical pressure is flagged too. */
export function plausibilityFlags(f: Fluid, r: Reading, m: Margins): Flag[] {
  const flags: Flag[] = [];
  const pc = criticalPressure(f);
  if (r.expect === "supercritical") {
    if (r.p <= pc) flags.push({ kind: "not-supercritical", limit: pc });
    return flags;
  }
  if (!r.expect) return flags;
  if (r.p >= pc) flags.push({ kind: "above-critical", limit: pc });
  if (r.expect === "vapour" && m.dew !== undefined && r.T < m.dew) flags.push({ kind: "below-dew", limit: m.dew });
  if (r.expect === "liquid" && m.bubble !== undefined && r.T > m.bubble) flags.push({ kind: "above-bubble", limit: m.bubble });
  return flags;
}

function evaluate(f: Fluid, r: Reading, ref: ReferenceName): EvaluatedReading {
  let state: State;
  try {
    state = stateTP(f, r.T, r.p, ref);
  } catch (e) {
    if (!(e instanceof DomeprintError) || e.code === "E_CONVERGENCE") throw e;
    return { ...r, flags: [{ kind: "out-of-range", message: e.message }] };
  }
  const m = saturationMargins(f, state);
  return { ...r, ...m, state, flags: plausibilityFlags(f, r, m) };
}

/** Evaluates every reading of a file; a file naming another fluid than the one given is refused. */
export function evaluateReadings(fluid: string | Fluid, file: ReadingsFile, reference: string = "native"): ReadingsResult {
  const f = typeof fluid === "string" ? workingFluid(fluid) : fluid;
  if (file.fluid !== undefined && workingFluid(file.fluid).id !== f.id) {
    throw cycleInputError("fluid", f.id, f.id, `the readings file ${file.source} names ${file.fluid}`, `the fluid the file names (${workingFluid(file.fluid).id}), or a file without @fluid`);
  }
  const ref = checkReferenceName(reference);
  const out: ReadingsResult = { fluid: f.id, reference: ref, source: file.source, gauge: file.gauge, readings: file.readings.map((r) => evaluate(f, r, ref)) };
  if (file.title !== undefined) out.title = file.title;
  if (file.altitude !== undefined) out.altitude = file.altitude;
  if (file.atmosphere !== undefined) out.atmosphere = file.atmosphere;
  return out;
}
