// What every line of one line-set build shares: the fluid, its reference offsets, the page mapping and
// tolerance, scratch space for explicit (T, ρ) evaluations, and the counters of the trace.
import { type Fluid, type ReferenceName, type ReferenceOffset, H, P, propertiesTRho, PROP_SLOTS, referenceOffset } from "../eos/index.js";
import { attempt as tryTyped } from "../errors.js";
import type { PageMapping } from "./page.js";
import type { TraceSettings } from "./trace.js";
import type { Point, TraceStats } from "./types.js";

export interface Context {
  readonly f: Fluid;
  readonly reference: ReferenceName;
  readonly off: ReferenceOffset;
  readonly mapping: PageMapping;
  readonly trace: TraceSettings;
  readonly stats: TraceStats;
  /** Highest pressure a line may reach: the window's top, capped by the equation's p_max [Pa]. */
  readonly pTop: number;
  /** Highest temperature a line is followed to: the window's hottest corner, capped by the equation's T_max [K]. */
  readonly tTop: number;
  readonly scratch: Float64Array;
}

export function makeContext(f: Fluid, reference: ReferenceName, mapping: PageMapping, toleranceMm: number, tTop: number): Context {
  return {
    f,
    reference,
    off: referenceOffset(f, reference),
    mapping,
    trace: { mapping, toleranceMm },
    stats: { evaluations: 0, capped: 0, breaks: 0, bridges: 0, longestBridgeMm: 0 },
    pTop: Math.min(mapping.window.pMax, f.pmax),
    tTop: Math.min(tTop, f.Tmax),
    scratch: new Float64Array(PROP_SLOTS),
  };
}

/** The explicit evaluation at T [K] and molar density ρ [mol/m³]: (h, p), or null above the equation's p_max. */
export function pointTRho(ctx: Context, T: number, rho: number): Point | null {
  const o = ctx.scratch;
  propertiesTRho(ctx.f.model, ctx.f.M, T, rho, o);
  const p = o[P]!;
  if (!(p > 0) || p > ctx.f.pmax) return null;
  return [o[H]! + ctx.off.dh, p];
}

/** Runs an engine call, turning its typed errors into "not defined here"; anything else is a bug and propagates. */
/** The shared attempt (src/errors.ts), with null for "no state here" as the tracer's callers expect. */
export function attempt<T>(fn: () => T): T | null {
  return tryTyped(fn) ?? null;
}
