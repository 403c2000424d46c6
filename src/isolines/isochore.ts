// Isochores (lines of constant specific volume): explicit in (T, ρ) in one phase (walk T at fixed ρ); inside
// the dome the quality follows from v on each tie line, x = (v − v') / (v'' − v').
import { pointTRho, type Context } from "./context.js";
import { twoPhaseStretches, type Boundary } from "./dome-crossings.js";
import { aboveDome, MERGE_MM, OVER_TOP_MM, traceInDome } from "./in-dome.js";
import type { TieLine, TieLines } from "./tie-lines.js";
import { bridge, joinParts, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/** Temperature where a line leaves a tie line on the liquid or vapour side. */
function sideTemperature(t: TieLine, b: Boundary): number {
  return b === "liquid" ? t.TL : t.TV;
}

/** The isochore of specific volume v [m³/kg], from the window's floor (or T_min) upwards in temperature. */
export function traceIsochore(ctx: Context, tie: TieLines, v: number): Point[][] {
  const { f } = ctx;
  const rho = 1 / (v * f.M);
  const walk = (T0: number, T1: number, pFloor = 0) => {
    const evaluate = (T: number): Point | null => {
      const q = pointTRho(ctx, T, rho);
      return q && q[1] >= pFloor ? q : null;
    };
    return T1 > T0 ? traceCurve(evaluate, T0, T1, ctx.trace, ctx.stats) : [];
  };
  const stretches = twoPhaseStretches(tie, v, (t) => [t.vL, t.vV]);
  const parts: Point[][][] = [];
  let T = f.Tmin, pFloor = 0, overTop = false;
  const quality = (t: TieLine) => (v - t.vL) / (t.vV - t.vL);
  for (const s of stretches) {
    const a = tie.at(s.from), b = tie.at(s.to);
    if (!a || !b) continue;
    if (s.fromBoundary !== "range") parts.push(walk(T, sideTemperature(a, s.fromBoundary)));
    parts.push(traceInDome(ctx, tie, s.from, s.to, quality));
    overTop = s.toBoundary === "range";
    ({ T, pFloor } = overTop ? aboveDome(ctx, b, quality(b)) : { T: sideTemperature(b, s.toBoundary), pFloor: 0 });
  }
  const last = walk(T, ctx.tTop, pFloor);
  if (overTop && parts.length) bridge(ctx.mapping, parts[parts.length - 1]!, last, OVER_TOP_MM, ctx.stats, MERGE_MM);
  parts.push(last);
  return joinParts(ctx.mapping, parts.filter((p) => p.length > 0));
}

