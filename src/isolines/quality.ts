// Lines of constant vapour quality inside the dome: h = h' + x (h'' − h') on each tie line, traced along the
// tie-line parameter (T for pure fluids, ln p for blends) from the window's floor to the highest tie line.
import type { Context } from "./context.js";
import { traceInDome } from "./in-dome.js";
import type { TieLines } from "./tie-lines.js";
import type { Point } from "./types.js";

export function traceQualityLine(ctx: Context, tie: TieLines, x: number): Point[][] {
  return tie.hi > tie.lo ? traceInDome(ctx, tie, tie.lo, tie.hi, () => x) : [];
}
