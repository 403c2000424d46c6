// buildLineSet: a fluid's whole set of chart lines for one window, unit system, reference state and page,
// each line traced to the page tolerance. The one entry point the CLI and layout call.
import { resolveSubstance, type Fluid } from "../eos/index.js";
import { makeContext, type Context } from "./context.js";
import { displayUnit, SI_UNIT } from "./display.js";
import { criticalPoint, traceSaturationLine } from "./dome.js";
import { traceIsentrope } from "./isentrope.js";
import { traceIsochore } from "./isochore.js";
import { traceIsotherm } from "./isotherm.js";
import { checkOptions, type CheckedOptions, type LineSetOptions } from "./options.js";
import { pageMapping, type PageMapping } from "./page.js";
import { traceQualityLine } from "./quality.js";
import { buildMixtureLineSet } from "./mixture/line-set.js";
import { makeTieLines, type TieLines } from "./tie-lines.js";
import type { Line, LineSet, Point, Quantity } from "./types.js";
import {
  givenValues, isenthalpValues, isentropeValues, isochoreValues, isothermValues, qualityValues, windowRanges,
  type FamilyValue, type WindowRanges,
} from "./values.js";
import { autoWindow, resolveWindow } from "./window.js";

interface Build {
  f: Fluid;
  opts: CheckedOptions;
  mapping: PageMapping;
  ranges: WindowRanges;
  ctx: Context;
  tie: TieLines;
}

/** One family value's traced pieces as lines (a value the window or the equation cuts in two gives two). */
function lines(b: Build, q: Quantity, v: FamilyValue, pieces: Point[][]): Line[] {
  const display = { value: v.display, unit: displayUnit(b.opts.units, q).symbol };
  return pieces.map((points) => ({ quantity: q, value: v.si, unit: SI_UNIT[q], display: { ...display }, rank: v.rank, points }));
}

type ValueFamily = "isotherms" | "isentropes" | "isochores" | "qualities" | "isenthalps";

/** The caller's values of a family if given (SI), else the automatic round ones. */
function valuesOf(b: Build, family: ValueFamily, q: Quantity, auto: () => FamilyValue[]): FamilyValue[] {
  const given = b.opts.values[family];
  return given ? givenValues(b.opts.units, q, given) : auto();
}

function domeLines(b: Build): Line[] {
  return [
    ...lines(b, "saturation-liquid", { si: 0, display: 0, rank: "major" }, traceSaturationLine(b.ctx, b.tie, 0)),
    ...lines(b, "saturation-vapour", { si: 1, display: 1, rank: "major" }, traceSaturationLine(b.ctx, b.tie, 1)),
  ];
}

function isotherms(b: Build): Line[] {
  const { f, opts } = b;
  const values = valuesOf(b, "isotherms", "temperature", () => isothermValues(f, opts.units, b.ranges, b.mapping, opts.reference, opts.densities));
  return values.filter((v) => v.si >= f.Tmin && v.si <= f.Tmax).flatMap((v) => lines(b, "temperature", v, traceIsotherm(b.ctx, b.tie, v.si)));
}

/** Isenthalps are the vertical grid: their round values, as lines across the window's full height. */
function isenthalps(b: Build): Line[] {
  const w = b.mapping.window;
  return valuesOf(b, "isenthalps", "enthalpy", () => isenthalpValues(b.opts.units, b.mapping, b.opts.densities))
    .filter((v) => v.si >= w.hMin && v.si <= w.hMax)
    .flatMap((v) => lines(b, "enthalpy", v, [[[v.si, w.pMin], [v.si, w.pMax]]]));
}

function traceFamilies(b: Build): Line[] {
  const { opts, ctx, tie, ranges } = b;
  const d = opts.densities, on = opts.families;
  return [
    ...(on.dome ? domeLines(b) : []),
    ...(on.qualities ? valuesOf(b, "qualities", "quality", () => qualityValues(d)).flatMap((v) => lines(b, "quality", v, traceQualityLine(ctx, tie, v.si))) : []),
    ...(on.isotherms ? isotherms(b) : []),
    ...(on.isentropes ? valuesOf(b, "isentropes", "entropy", () => isentropeValues(opts.units, ranges, d)).flatMap((v) => lines(b, "entropy", v, traceIsentrope(ctx, tie, v.si))) : []),
    ...(on.isochores ? valuesOf(b, "isochores", "specific-volume", () => isochoreValues(1 / (b.f.rhoc * b.f.M), opts.units, ranges, d)).flatMap((v) => lines(b, "specific-volume", v, traceIsochore(ctx, tie, v.si))) : []),
    ...(on.isenthalps ? isenthalps(b) : []),
  ];
}

/**
 * The chart lines of a fluid (any accepted name; a blend id or composition gives a real mixture's lines). Throws DomeprintError for an unknown fluid, a reference
 * state the fluid cannot have, or a malformed option.
 */
export function buildLineSet(fluidName: string, options: LineSetOptions = {}): LineSet {
  const opts = checkOptions(options);
  const sub = resolveSubstance(fluidName);
  if (sub.kind === "mixture") return buildMixtureLineSet(sub.mixture, opts);
  const f = sub.fluid;
  const window = resolveWindow(autoWindow(f, opts.reference, opts.units), opts.window, f);
  const mapping = pageMapping(window, opts.frame);
  const ranges = windowRanges(f, mapping, opts.reference);
  const ctx = makeContext(f, opts.reference, mapping, opts.toleranceMm, ranges.Thi);
  const tie = makeTieLines(ctx);
  const lineList = traceFamilies({ f, opts, mapping, ranges, ctx, tie });
  return {
    fluid: f.id,
    units: opts.units,
    reference: opts.reference,
    window,
    frame: opts.frame,
    toleranceMm: opts.toleranceMm,
    critical: criticalPoint(ctx),
    lines: lineList,
    stats: ctx.stats,
  };
}
