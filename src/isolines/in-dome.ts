// Lines of a constant property inside the dome, traced along the tie lines with the quality the property gives
// on each, and where such a line that runs out over the traced dome's top takes up again in one phase.
import type { Context } from "./context.js";
import { mixTie, type TieLine, type TieLines } from "./tie-lines.js";
import { traceCurve } from "./trace.js";
import type { Point } from "./types.js";

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

/** The two-phase stretch of a line whose quality on tie line t is quality(t); outside 0…1 the line is not there. */
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

