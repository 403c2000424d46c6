// buildLineSet: a fluid's whole set of chart lines for one window, unit system, reference state and page,
// each line traced to the page tolerance. The one entry point the CLI and layout call.
import { getFluid, type Fluid } from "../eos/index.js";
import { makeContext, type Context } from "./context.js";
import { displayUnit, SI_UNIT } from "./display.js";
import { criticalPoint, traceSaturationLine } from "./dome.js";
import { traceIsentrope } from "./isentrope.js";
import { traceIsochore } from "./isochore.js";
import { traceIsotherm } from "./isotherm.js";
import { checkOptions, type CheckedOptions, type LineSetOptions } from "./options.js";
import { pageMapping, type PageMapping } from "./page.js";
import { traceQualityLine } from "./quality.js";
import { makeTieLines, type TieLines } from "./tie-lines.js";
import type { Line, LineSet, Point, Quantity } from "./types.js";
import {
  givenValues, isenthalpValues, isentropeValues, isochoreValues, isothermValues, qualityValues, windowRanges,
  type FamilyValue, type WindowRanges,
} from "./values.js";
import { autoWindow, resolveWindow } from "./window.js";

function lines(opts: CheckedOptions, q: Quantity, v: FamilyValue, pieces: Point[][]): Line[] {
  return pieces.map((points) => ({
    quantity: q,
    value: v.si,
    unit: SI_UNIT[q],
    display: { value: v.display, unit: q === "saturation-liquid" || q === "saturation-vapour" ? "" : displaySymbol(opts, q) },
    rank: v.rank,
    points,
  }));
}

function displaySymbol(opts: CheckedOptions, q: Quantity): string {
  return displayUnit(opts.units, q).symbol;
}

interface Build {
  f: Fluid;
  opts: CheckedOptions;
  mapping: PageMapping;
  ranges: WindowRanges;
  ctx: Context;
  tie: TieLines;
}

function valuesOf(b: Build, family: "isotherms" | "isentropes" | "isochores" | "qualities" | "isenthalps", q: Quantity, auto: () => FamilyValue[]): FamilyValue[] {
  const given = b.opts.values[family];
  return given ? givenValues(b.opts.units, q, given) : auto();
}

function traceFamilies(b: Build): Line[] {
  const { f, opts, ctx, tie, mapping, ranges } = b;
  const out: Line[] = [];
  const fam = opts.families;
  const d = opts.densities;
  if (fam.dome) {
    out.push(...lines(opts, "saturation-liquid", { si: 0, display: 0, rank: "major" }, traceSaturationLine(ctx, tie, 0)));
    out.push(...lines(opts, "saturation-vapour", { si: 1, display: 1, rank: "major" }, traceSaturationLine(ctx, tie, 1)));
  }
  if (fam.qualities) for (const v of valuesOf(b, "qualities", "quality", () => qualityValues(d))) out.push(...lines(opts, "quality", v, traceQualityLine(ctx, tie, v.si)));
  if (fam.isotherms) {
    const values = valuesOf(b, "isotherms", "temperature", () => isothermValues(f, opts.units, ranges, mapping, opts.reference, d));
    for (const v of values) if (v.si >= f.Tmin && v.si <= f.Tmax) out.push(...lines(opts, "temperature", v, traceIsotherm(ctx, tie, v.si)));
  }
  if (fam.isentropes) for (const v of valuesOf(b, "isentropes", "entropy", () => isentropeValues(opts.units, ranges, d))) out.push(...lines(opts, "entropy", v, traceIsentrope(ctx, tie, v.si)));
  if (fam.isochores) for (const v of valuesOf(b, "isochores", "specific-volume", () => isochoreValues(f, opts.units, ranges, d))) out.push(...lines(opts, "specific-volume", v, traceIsochore(ctx, tie, v.si)));
  if (fam.isenthalps) {
    const w = mapping.window;
    for (const v of valuesOf(b, "isenthalps", "enthalpy", () => isenthalpValues(opts.units, mapping, d))) {
      if (v.si >= w.hMin && v.si <= w.hMax) out.push(...lines(opts, "enthalpy", v, [[[v.si, w.pMin], [v.si, w.pMax]]]));
    }
  }
  return out;
}

/**
 * The chart lines of a fluid (any accepted name). Throws DomeprintError for an unknown fluid, a reference
 * state the fluid cannot have, or a malformed option.
 */
export function buildLineSet(fluidName: string, options: LineSetOptions = {}): LineSet {
  const opts = checkOptions(options);
  const f = getFluid(fluidName);
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
