// The high-side pressure that maximises the cooling COP of a transcritical cycle, found by a bounded
// golden-section search; the COP curve has one flat peak for a given gas-cooler outlet temperature.
import { DomeprintError } from "../errors.js";
import type { Fluid } from "../eos/index.js";
import { cycleInputError, pressureText } from "./check.js";
import { goldenSectionMaximum } from "./golden-section.js";
import type { CycleResult } from "./result.js";
import { checkTranscriticalInputs, requireHighPressure, transcriticalCycle, type TranscriticalSpec } from "./transcritical.js";

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

/**
 * The COP at a high-side pressure, or −∞ where no cycle exists there: too close to the critical pressure
 * the gas leaves the gas cooler with more enthalpy than the evaporator's vapour (no refrigerating effect),
 * and far above it the discharge can pass the equation's limit. Such pressures are inputs the search
 * chose, not errors of the user's; failures of the engine itself still surface.
 */
function copAt(spec: Omit<TranscriticalSpec, "highPressure">, f: Fluid) {
  return (p: number): number => {
    try {
      return transcriticalCycle({ ...spec, fluid: f, highPressure: p }).performance.copCooling;
    } catch (e) {
      if (e instanceof DomeprintError && (e.code === "E_INPUT" || e.code === "E_RANGE")) return -Infinity;
      throw e;
    }
  };
}

/**
 * The lowest pressure in [lo, hi] where the cycle exists, by bisection on existence (it exists from some
 * pressure upwards); undefined when it exists nowhere up to hi.
 */
function lowestComputable(cop: (p: number) => number, lo: number, hi: number, tolerance: number): number | undefined {
  if (Number.isFinite(cop(lo))) return lo;
  if (!Number.isFinite(cop(hi))) return undefined;
  let a = lo, b = hi;
  while (b - a > tolerance) {
    const mid = 0.5 * (a + b);
    if (Number.isFinite(cop(mid))) b = mid; else a = mid;
  }
  return b;
}

/** Computes the transcritical cycle at the high-side pressure of greatest COP (the spec's highPressure is ignored). */
export function optimiseHighPressure(spec: Omit<TranscriticalSpec, "highPressure">, opts: OptimiseOptions = {}): CycleResult {
  const { f } = checkTranscriticalInputs(spec);
  const bounds = checkBounds(f, opts.bounds ?? defaultHighPressureBounds(f));
  const tolerance = opts.tolerance ?? 1e3;
  const cop = copAt(spec, f);
  const lo = lowestComputable(cop, bounds[0], bounds[1], tolerance);
  if (lo === undefined) {
    throw cycleInputError("high-pressure-bounds", bounds[1], `${pressureText(bounds[0])} to ${pressureText(bounds[1])}`, "no pressure in the bounds gives a cycle with a refrigerating effect",
      "bounds reaching higher pressures, or a lower gas-cooler outlet temperature");
  }
  const best = goldenSectionMaximum(cop, lo, bounds[1], tolerance);
  const result = transcriticalCycle({ ...spec, fluid: f, highPressure: best.x });
  const edge = 2 * tolerance;
  result.optimum = {
    pressure: best.x, cop: best.value, bounds, tolerance, evaluations: best.evaluations,
    atBound: best.x - lo <= edge || bounds[1] - best.x <= edge,
  };
  if (lo > bounds[0]) result.optimum.lowestComputable = lo;
  result.notes.push("high-side pressure chosen by a golden-section search for the greatest cooling COP within the bounds");
  return result;
}
