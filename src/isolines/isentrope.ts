// Isentropes from compressed liquid or wet vapour into superheated vapour: in one phase ρ(T, s) is a 1-D solve
// at each temperature; inside the dome the quality follows from s on each tie line, x = (s − s') / (s'' − s').
import { flashPS } from "../eos/index.js";
import { attempt, pointTRho, type Context } from "./context.js";
import { twoPhaseStretches, type Boundary } from "./dome-crossings.js";
import { densityTS } from "./entropy-density.js";
import { boundaryTemperature, traceInDome } from "./isochore.js";
import type { TieLine, TieLines } from "./tie-lines.js";
import { joinParts, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/** Molar density of a tie line's end on the given side (for "range", the mean of both). */
function boundaryDensity(t: TieLine, b: Boundary): number {
  return b === "liquid" ? t.rhoL : b === "vapour" ? t.rhoV : 0.5 * (t.rhoL + t.rhoV);
}

/** T [K] and molar ρ where the isentrope meets pressure p, or null where the equation does not reach. */
function endAt(ctx: Context, p: number, s: number): { T: number; rho: number } | null {
  const st = attempt(() => flashPS(ctx.f, p, s, ctx.reference));
  return st ? { T: st.T, rho: st.rho / ctx.f.M } : null;
}

/** One-phase stretch from T0 to T1, each point from ρ(T, s); `guess` seeds the first solve. */
function walkTemperature(ctx: Context, s: number, T0: number, T1: number, guess: number): Point[][] {
  if (!(T1 > T0)) return [];
  let last = guess;
  const evaluate = (T: number): Point | null => {
    const rho = attempt(() => densityTS(ctx, T, s, last));
    if (rho === null) return null;
    last = rho;
    return pointTRho(ctx, T, rho);
  };
  return traceCurve(evaluate, T0, T1, ctx.trace, ctx.stats);
}

/** The isentrope of entropy s [J/(kg K), chosen reference], from the window's floor upwards. */
export function traceIsentrope(ctx: Context, tie: TieLines, s: number): Point[][] {
  const { f } = ctx;
  const stretches = twoPhaseStretches(tie, s, (t) => [t.sL, t.sV]);
  const parts: Point[][][] = [];
  const floor = endAt(ctx, ctx.mapping.window.pMin, s);
  let T = floor ? floor.T : f.Tmin;
  let rho = floor ? floor.rho : f.rhoc;
  for (const st of stretches) {
    const a = tie.at(st.from), b = tie.at(st.to);
    if (!a || !b) continue;
    if (st.fromBoundary !== "range") parts.push(walkTemperature(ctx, s, T, boundaryTemperature(a, st.fromBoundary), rho));
    parts.push(traceInDome(ctx, tie, st.from, st.to, (t) => (s - t.sL) / (t.sV - t.sL)));
    T = boundaryTemperature(b, st.toBoundary);
    rho = boundaryDensity(b, st.toBoundary);
  }
  const ceiling = endAt(ctx, ctx.pTop, s);
  parts.push(walkTemperature(ctx, s, T, Math.min(ceiling ? ceiling.T : f.Tmax, ctx.tTop), rho));
  return joinParts(ctx.mapping, parts.filter((p) => p.length > 0));
}
