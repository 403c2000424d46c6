// Isotherms: explicit in (T, ρ) wherever the fluid is one phase (walk ln ρ at fixed T), a plateau at the
// saturation pressure (pure fluids) or a glide segment from bubble to dew with T linear in quality (blends).
import { densityTP, saturationT, type Branch, type Saturation } from "../eos/index.js";
import { attempt, pointTRho, type Context } from "./context.js";
import { pageDistance } from "./page.js";
import { isTieLine, mixTie, type TieLines } from "./tie-lines.js";
import { bridge, EDGE_MM, joinParts, traceCurve } from "./trace.js";
import type { Point } from "./types.js";

/**
 * Liquid to vapour: ln ρ from ρ_from down to ρ_to, every point explicit. A given end point replaces the
 * evaluation there, so the walk meets a plateau at exactly the saturation pressure (they differ by rounding).
 */
function walkDensity(ctx: Context, T: number, rhoFrom: number, rhoTo: number, ends: { from?: Point; to?: Point } = {}): Point[][] {
  const t0 = Math.log(rhoFrom), t1 = Math.log(rhoTo);
  const evaluate = (t: number): Point | null =>
    t === t0 && ends.from ? ends.from : t === t1 && ends.to ? ends.to : pointTRho(ctx, T, Math.exp(t));
  return traceCurve(evaluate, t0, t1, ctx.trace, ctx.stats);
}

/** The horizontal two-phase plateau of a pure fluid, cut to the window (it is straight on the page). */
function plateau(ctx: Context, hL: number, hV: number, p: number): Point[][] {
  const w = ctx.mapping.window;
  if (p < w.pMin || p > w.pMax) return [];
  const a = Math.max(hL, w.hMin), b = Math.min(hV, w.hMax);
  return a < b ? [[[a, p], [b, p]]] : [];
}

/** The point of a blend's isotherm at T on the tie line σ = ln p: quality from T, linear across the glide. */
function glidePoint(tie: TieLines, T: number, sigma: number): Point | null {
  const t = tie.at(sigma);
  if (!t) return null;
  const x = (T - t.TL) / (t.TV - t.TL);
  if (!(x > -1e-9 && x < 1 + 1e-9)) return null;
  const m = mixTie(t, Math.min(1, Math.max(0, x)));
  return [m.h, m.p];
}

/** A blend's glide segment at T: ln p from `from` down to the dew pressure. */
function glide(ctx: Context, tie: TieLines, T: number, from: number, dew: number): Point[][] {
  const to = Math.log(dew);
  return from > to ? traceCurve((sigma) => glidePoint(tie, T, sigma), from, to, ctx.trace, ctx.stats) : [];
}

/**
 * A blend's isotherm: compressed liquid down to the bubble pressure (or to p_c, above which the engine calls the
 * blend liquid), the glide, then vapour. Just below p_c the engine may have no genuine two-phase states at T (the
 * glide is then cut at the highest genuine tie line); a straight chord bridges the gap where that is as good as
 * any line could be: when the gap spans no more than the tolerance in height on the page.
 */
function blendIsotherm(ctx: Context, tie: TieLines, T: number, sat: Saturation): Point[][] {
  const { f } = ctx;
  const liquidFloor = Math.min(sat.pL, f.pc);
  const glideFrom = Math.min(Math.log(sat.pL), tie.hi);
  const floor = liquidFloor === sat.pL ? sat.rhoL : attempt(() => densityTP(f, T, liquidFloor, "liquid", sat.rhoL));
  const liquid: Point[][] = [];
  if (ctx.pTop > liquidFloor && floor) {
    const top = attempt(() => densityTP(f, T, ctx.pTop, "liquid", sat.rhoL));
    if (top) liquid.push(...walkDensity(ctx, T, top, floor));
  }
  const wet = glide(ctx, tie, T, glideFrom, sat.pV);
  const vapour: Point[][] = [];
  if (ctx.mapping.window.pMin < sat.pV) {
    const bottom = attempt(() => densityTP(f, T, ctx.mapping.window.pMin, "vapour", undefined, sat.rhoV));
    if (bottom) vapour.push(...walkDensity(ctx, T, sat.rhoV, bottom));
  }
  if (glideFrom < Math.log(sat.pL) && floor) {
    const after = wet.length ? wet : vapour;
    const end = pointTRho(ctx, T, floor), start = wet.length ? glidePoint(tie, T, glideFrom) : pointTRho(ctx, T, sat.rhoV);
    if (bridgeable(ctx, liquid, after, end, start)) bridge(ctx.mapping, liquid, after, Infinity, ctx.stats);
  }
  return joinParts(ctx.mapping, [liquid, wet, vapour]);
}

/**
 * Whether a chord may stand in for the glide the engine cannot give: both walks must reach the gap's edges in the
 * window, and the gap may span no more than the tolerance in height, so any glide between lies within it.
 */
function bridgeable(ctx: Context, before: Point[][], after: Point[][], end: Point | null, start: Point | null): boolean {
  const last = before[before.length - 1], first = after[0];
  if (!last || !first || !end || !start) return false;
  const m = ctx.mapping;
  const near = (a: Point, b: Point) => pageDistance(m, a, b) < EDGE_MM;
  return near(last[last.length - 1]!, end) && near(first[0]!, start) && Math.abs(m.y(end[1]) - m.y(start[1])) <= ctx.trace.toleranceMm;
}

function saturationAt(ctx: Context, T: number): Saturation | null {
  const f = ctx.f;
  if (T > f.satTmax) return null;
  const sat = attempt(() => saturationT(f, T));
  return sat && (f.pseudoPure || isTieLine(f, sat)) ? sat : null;
}

/** The isotherm at T [K], from compressed liquid (or the window's top) to the window's floor. */
export function traceIsotherm(ctx: Context, tie: TieLines, T: number): Point[][] {
  const { f } = ctx;
  const pBottom = ctx.mapping.window.pMin, pTop = ctx.pTop;
  const density = (p: number, branch: Branch, guess?: number, cap?: number) => attempt(() => densityTP(f, T, p, branch, guess, cap));
  const sat = saturationAt(ctx, T);
  if (sat && f.pseudoPure) return blendIsotherm(ctx, tie, T, sat);
  if (sat) {
    // The walks end on the plateau at exactly the saturation pressure.
    const tl = pointTRho(ctx, T, sat.rhoL), tv = pointTRho(ctx, T, sat.rhoV);
    const liquidEnd: Point | undefined = tl ? [tl[0], sat.pL] : undefined;
    const vapourEnd: Point | undefined = tv ? [tv[0], sat.pV] : undefined;
    const parts: Point[][][] = [];
    if (pTop > sat.pL) {
      const top = density(pTop, "liquid", sat.rhoL);
      if (top) parts.push(walkDensity(ctx, T, top, sat.rhoL, { to: liquidEnd }));
    }
    if (liquidEnd && vapourEnd) parts.push(plateau(ctx, liquidEnd[0], vapourEnd[0], sat.pL));
    if (pBottom < sat.pV) {
      const bottom = density(pBottom, "vapour", undefined, sat.rhoV);
      if (bottom) parts.push(walkDensity(ctx, T, sat.rhoV, bottom, { from: vapourEnd }));
    }
    return joinParts(ctx.mapping, parts);
  }
  // One phase all the way; or the band between satTmax and the equation's own T_c that the saturation solver
  // leaves out (1 mK; 19 mK for oxygen), where the isotherm's loop dips by under 3e-5 p_c, far below a line width.
  const twoRoots = T < Math.max(f.Tc, f.TcEquation);
  const top = density(pTop, twoRoots ? "liquid" : "single");
  const bottom = density(pBottom, twoRoots ? "vapour" : "single");
  return top && bottom && top > bottom ? walkDensity(ctx, T, top, bottom) : [];
}
