// Lines of constant vapour quality inside the dome: h = h' + x (h'' − h') on each tie line, traced along the
// tie-line parameter (T for pure fluids, ln p for blends) from the window's floor to the highest tie line.
import type { Context } from "./context.js";
import { mixTie, type TieLines } from "./tie-lines.js";
import { traceCurve } from "./trace.js";
import type { Point } from "./types.js";

export function traceQualityLine(ctx: Context, tie: TieLines, x: number): Point[][] {
  const evaluate = (sigma: number): Point | null => {
    const t = tie.at(sigma);
    if (!t) return null;
    const m = mixTie(t, x);
    return [m.h, m.p];
  };
  if (!(tie.hi > tie.lo)) return [];
  return traceCurve(evaluate, tie.lo, tie.hi, ctx.trace, ctx.stats);
}
