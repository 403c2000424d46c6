// The saturation dome: the saturated-liquid (bubble) and saturated-vapour (dew) lines, traced along the
// tie-line parameter from the window's floor to the highest tie line and closed at the critical point.
import { H, P, propertiesTRho } from "../eos/index.js";
import type { Context } from "./context.js";
import { inWindow, pageDistance } from "./page.js";
import type { TieLines } from "./tie-lines.js";
import { EDGE_MM, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/** The critical point as the dome closes on it: the equation evaluated at the fluid's stated T_c and ρ_c. */
export function criticalPoint(ctx: Context): { T: number; p: number; h: number } {
  const { f } = ctx;
  const o = ctx.scratch;
  propertiesTRho(f.model, f.M, f.Tc, f.rhoc, o);
  return { T: f.Tc, p: o[P]!, h: o[H]! + ctx.off.dh };
}

/**
 * One side of the dome (x = 0: liquid, x = 1: vapour), ordered from low to high pressure. The piece that
 * reaches the highest tie line is closed at the critical point when that lies in the window.
 */
export function traceSaturationLine(ctx: Context, tie: TieLines, x: 0 | 1): Point[][] {
  const evaluate = (sigma: number): Point | null => {
    const t = tie.at(sigma);
    return t ? (x === 0 ? [t.hL, t.pL] : [t.hV, t.pV]) : null;
  };
  if (!(tie.hi > tie.lo)) return [];
  const pieces = traceCurve(evaluate, tie.lo, tie.hi, ctx.trace, ctx.stats);
  const top = evaluate(tie.hi);
  const last = pieces[pieces.length - 1];
  const c = criticalPoint(ctx);
  const apex: Point = [c.h, c.p];
  if (top && last && pageDistance(ctx.mapping, last[last.length - 1]!, top) < EDGE_MM && inWindow(ctx.mapping.window, apex)) last.push(apex);
  return pieces;
}
