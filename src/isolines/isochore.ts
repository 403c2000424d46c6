// Isochores (lines of constant specific volume): explicit in (T, ρ) in one phase (walk T at fixed ρ); inside
// the dome the quality follows from v on each tie line, x = (v − v') / (v'' − v').
import { pointTRho, type Context } from "./context.js";
import { twoPhaseStretches, type Boundary } from "./dome-crossings.js";
import { mixTie, type TieLine, type TieLines } from "./tie-lines.js";
import { joinParts, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/** Temperature of a tie line's end on the given side (for "range", the hotter end). */
export function boundaryTemperature(t: TieLine, b: Boundary): number {
  return b === "liquid" ? t.TL : b === "vapour" ? t.TV : Math.max(t.TL, t.TV);
}

/** The two-phase stretch of a line whose quality on each tie line is x(t) (null: not on this tie line). */
export function traceInDome(ctx: Context, tie: TieLines, from: number, to: number, quality: (t: TieLine) => number): Point[][] {
  const evaluate = (sigma: number): Point | null => {
    const t = tie.at(sigma);
    if (!t) return null;
    const x = quality(t);
    if (!(x > -1e-9 && x < 1 + 1e-9)) return null;
    const m = mixTie(t, Math.min(1, Math.max(0, x)));
    return [m.h, m.p];
  };
  return traceCurve(evaluate, from, to, ctx.trace, ctx.stats);
}

/** The isochore of specific volume v [m³/kg], from the window's floor (or T_min) upwards in temperature. */
export function traceIsochore(ctx: Context, tie: TieLines, v: number): Point[][] {
  const { f } = ctx;
  const rho = 1 / (v * f.M);
  const walk = (T0: number, T1: number) => (T1 > T0 ? traceCurve((T) => pointTRho(ctx, T, rho), T0, T1, ctx.trace, ctx.stats) : []);
  const stretches = twoPhaseStretches(tie, v, (t) => [t.vL, t.vV]);
  const parts: Point[][][] = [];
  let T = f.Tmin;
  for (const s of stretches) {
    const a = tie.at(s.from), b = tie.at(s.to);
    if (!a || !b) continue;
    if (s.fromBoundary !== "range") parts.push(walk(T, boundaryTemperature(a, s.fromBoundary)));
    parts.push(traceInDome(ctx, tie, s.from, s.to, (t) => (v - t.vL) / (t.vV - t.vL)));
    T = boundaryTemperature(b, s.toBoundary);
  }
  parts.push(walk(T, ctx.tTop));
  return joinParts(ctx.mapping, parts.filter((p) => p.length > 0));
}

