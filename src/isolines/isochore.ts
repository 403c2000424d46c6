// Isochores (lines of constant specific volume): explicit in (T, ρ) in one phase (walk T at fixed ρ); inside
// the dome the quality follows from v on each tie line, x = (v − v') / (v'' − v').
import { pointTRho, type Context } from "./context.js";
import { twoPhaseStretches, type Boundary } from "./dome-crossings.js";
import { mixTie, type TieLine, type TieLines } from "./tie-lines.js";
import { bridge, joinParts, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/** Temperature where a line leaves a tie line on the liquid or vapour side. */
function sideTemperature(t: TieLine, b: Boundary): number {
  return b === "liquid" ? t.TL : t.TV;
}

/**
 * Where a line that runs out of the traced dome through its top (the last millikelvin below the critical point
 * for pure fluids, the band below p_c a blend's engine cannot trace) takes up again in one phase: a pure fluid
 * above its equation's critical temperature, a blend above p_c, where the engine calls it one-phase.
 */
export function aboveDome(ctx: Context, t: TieLine, x: number): { T: number; pFloor: number } {
  const { f } = ctx;
  if (!f.pseudoPure) return { T: Math.max(t.TL, f.TcEquation), pFloor: 0 };
  return { T: t.TL + Math.min(1, Math.max(0, x)) * (t.TV - t.TL), pFloor: f.pc };
}

/** The widest gap [mm] a line may cross on a chord where it passes over the traced dome's top. */
export const OVER_TOP_MM = 2;
/** Gaps up to this size [mm] there are closed by moving the one-phase start onto the dome's end. */
export const MERGE_MM = 0.01;

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

