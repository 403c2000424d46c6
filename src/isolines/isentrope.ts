// Isentropes from compressed liquid or wet vapour into superheated vapour: in one phase ρ(T, s) is a 1-D solve
// at each temperature; inside the dome the quality follows from s on each tie line, x = (s − s') / (s'' − s').
import { flashPS } from "../eos/index.js";
import { attempt, pointTRho, type Context } from "./context.js";
import { twoPhaseStretches, type Boundary } from "./dome-crossings.js";
import { densityTS } from "./entropy-density.js";
import { aboveDome, MERGE_MM, OVER_TOP_MM, traceInDome } from "./in-dome.js";
import type { TieLine, TieLines } from "./tie-lines.js";
import { bridge, joinParts, traceCurve } from "./trace.js";
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

/**
 * One-phase stretch from T0 to T1, each point from ρ(T, s); `guess` seeds the first solve. Points below pFloor
 * count as undefined: above the traced dome's top the stretch starts no lower than the dome left off.
 */
function walkTemperature(ctx: Context, s: number, T0: number, T1: number, guess: number, pFloor = 0): Point[][] {
  if (!(T1 > T0)) return [];
  let last = guess;
  const evaluate = (T: number): Point | null => {
    const rho = attempt(() => densityTS(ctx, T, s, last));
    if (rho === null) return null;
    last = rho;
    const q = pointTRho(ctx, T, rho);
    return q && q[1] >= pFloor ? q : null;
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
  let pFloor = 0, overTop = false;
  const quality = (t: TieLine) => (s - t.sL) / (t.sV - t.sL);
  for (const st of stretches) {
    const a = tie.at(st.from), b = tie.at(st.to);
    if (!a || !b) continue;
    if (st.fromBoundary !== "range") parts.push(walkTemperature(ctx, s, T, st.fromBoundary === "liquid" ? a.TL : a.TV, rho));
    parts.push(traceInDome(ctx, tie, st.from, st.to, quality));
    overTop = st.toBoundary === "range";
    ({ T, pFloor } = overTop ? aboveDome(ctx, b, quality(b)) : { T: st.toBoundary === "liquid" ? b.TL : b.TV, pFloor: 0 });
    rho = boundaryDensity(b, st.toBoundary);
  }
  const ceiling = endAt(ctx, ctx.pTop, s);
  const last = walkTemperature(ctx, s, T, Math.min(ceiling ? ceiling.T : f.Tmax, ctx.tTop), rho, pFloor);
  if (overTop && parts.length) bridge(ctx.mapping, parts[parts.length - 1]!, last, OVER_TOP_MM, ctx.stats, MERGE_MM);
  parts.push(last);
  return joinParts(ctx.mapping, parts.filter((p) => p.length > 0));
}
