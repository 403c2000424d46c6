// The high-side pressure that maximises the cooling COP of a transcritical cycle, found by a bounded
// golden-section search; the COP curve has one flat peak for a given gas-cooler outlet temperature.
import { DomeprintError } from "../errors.js";
import { getFluid, type Fluid } from "../eos/index.js";
import { cycleInputError, pressureText } from "./check.js";
import { goldenSectionMaximum } from "./golden-section.js";
import type { CycleResult } from "./result.js";
import { requireHighPressure, transcriticalCycle, type TranscriticalSpec } from "./transcritical.js";

export interface OptimiseOptions {
  /** Search bounds [Pa]; default from 1 % above the critical pressure to twice the critical pressure (or the equation's limit). */
  bounds?: [number, number];
  /** Width of the final bracket [Pa]; default 1 kPa (0.01 bar), far finer than a gauge reads. */
  tolerance?: number;
}

export function defaultHighPressureBounds(f: Fluid): [number, number] {
  return [1.01 * f.pc, Math.min(2 * f.pc, f.pmax)];
}

function checkBounds(f: Fluid, bounds: [number, number]): [number, number] {
  const [lo, hi] = bounds;
  requireHighPressure(f, lo, "high-pressure-bounds");
  requireHighPressure(f, hi, "high-pressure-bounds");
  if (!(hi > lo)) throw cycleInputError("high-pressure-bounds", hi, `${pressureText(lo)} to ${pressureText(hi)}`, "the upper bound is not above the lower", "two pressures above the critical pressure, the second higher");
  return [lo, hi];
}

/** Computes the transcritical cycle at the high-side pressure of greatest COP (the spec's highPressure is ignored). */
export function optimiseHighPressure(spec: Omit<TranscriticalSpec, "highPressure">, opts: OptimiseOptions = {}): CycleResult {
  const f = typeof spec.fluid === "string" ? getFluid(spec.fluid) : spec.fluid;
  const bounds = checkBounds(f, opts.bounds ?? defaultHighPressureBounds(f));
  const tolerance = opts.tolerance ?? 1e3;
  // Inputs are checked once at a bound; a pressure where the cycle cannot be computed (a discharge past the
  // equation's limit) simply scores worst, so the search moves away from it.
  transcriticalCycle({ ...spec, fluid: f, highPressure: bounds[0] });
  const cop = (p: number): number => {
    try {
      return transcriticalCycle({ ...spec, fluid: f, highPressure: p }).performance.copCooling;
    } catch (e) {
      if (e instanceof DomeprintError && e.code !== "E_UNKNOWN_FLUID") return -Infinity;
      throw e;
    }
  };
  const best = goldenSectionMaximum(cop, bounds[0], bounds[1], tolerance);
  if (!Number.isFinite(best.value)) throw cycleInputError("high-pressure-bounds", bounds[0], `${pressureText(bounds[0])} to ${pressureText(bounds[1])}`, "no pressure in the bounds gives a computable cycle", "bounds where the cycle can be computed");
  const result = transcriticalCycle({ ...spec, fluid: f, highPressure: best.x });
  const edge = 2 * tolerance;
  result.optimum = {
    pressure: best.x, cop: best.value, bounds, tolerance, evaluations: best.evaluations,
    atBound: best.x - bounds[0] <= edge || bounds[1] - best.x <= edge,
  };
  result.notes.push("high-side pressure chosen by a golden-section search for the greatest cooling COP within the bounds");
  return result;
}
