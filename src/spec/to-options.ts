// Turns a checked spec entry into the sheet's library options: units parsed to SI, fluid, paper and style
// resolved, window checked against the equation's range, cycles evaluated, output names kept inside the folder.
import { existsSync } from "node:fs";
import { dirname, isAbsolute, normalize, resolve, sep } from "node:path";
import { DomeprintError, show } from "../errors.js";
import { flashTP, resolveSubstance, type Fluid, type ReferenceName, type Substance } from "../eos/index.js";
import { cycleOverlay } from "../cycle/index.js";
import type { Overlay } from "../cycle/overlay.js";
import { runCycle } from "../cli/cycle.js";
import { USER_FIELDS } from "../layout/content.js";
import { checkPressureUnit } from "../layout/display-units.js";
import { resolvePaper } from "../layout/paper.js";
import { loadStyle } from "../layout/style-file.js";
import { checkDate, checkFormats, defaultReference, type SheetLineOptions, type SheetOptions } from "../sheet/index.js";
import { mixtureDefaultReference } from "../sheet/mixture-content.js";
import { atmosphereAt, parseQuantity, type Quantity } from "../units/index.js";
import type { LoadedSpec } from "./load.js";
import { specError } from "./load.js";
import type { CycleEntry, SheetEntry } from "./schema.js";

export interface PlannedSheet {
  /** Where the sheet sits in the spec, e.g. "sheets[2]". */
  path: string;
  /** Output stem relative to the output folder (no extension), or undefined for the sheet's default name. */
  name: string | undefined;
  options: SheetOptions;
}

/** The prefix of a key under a sheet's path ("" for a one-sheet spec). */
function pre(path: string): string {
  return path ? `${path}.` : "";
}

/** Runs fn and re-throws its typed error prefixed with the file and key path. */
function at<T>(file: string, path: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof DomeprintError && !e.message.startsWith(`${file}: `))
      throw new DomeprintError(e.code, `${file}: ${path}: ${e.message}`, { ...e.details, input: path });
    throw e;
  }
}

function merge(defaults: SheetEntry, entry: SheetEntry): SheetEntry {
  return {
    ...defaults,
    ...entry,
    ...(defaults.window || entry.window ? { window: { ...defaults.window, ...entry.window } } : {}),
    ...(defaults.lines || entry.lines ? { lines: { ...defaults.lines, ...entry.lines } } : {}),
  };
}

function q(input: string, quantity: Quantity, v: string | number, bareUnit: string, atmosphere = 101325): number {
  return typeof v === "number" ? parseQuantity(input, quantity, `${v}${bareUnit}`, { atmosphere }) : parseQuantity(input, quantity, v, { atmosphere });
}

/** A safe output stem: relative, inside the folder, plain characters. */
export function checkOutputName(file: string, path: string, name: string): string {
  const n = normalize(name);
  if (isAbsolute(name) || n.startsWith("..") || n.split(sep).includes("..") || name.includes("\0"))
    throw specError(file, path, `${show(name)}: an output name must stay inside the output folder`, name, "a relative name without '..', e.g. handouts/r134a");
  if (!/^[A-Za-z0-9._\-/ ]+$/.test(name) || /(^|\/)\.+$/.test(n))
    throw specError(file, path, `${show(name)}: unusable characters in an output name`, name, "letters, digits, '.', '_', '-', spaces and '/' for subfolders");
  return n;
}

/** The enthalpies a fluid reaches in its range, in a reference state: compressed liquid at T_min to vapour at T_max. */
function enthalpyRange(f: Fluid, ref: ReferenceName): [number, number] {
  const pLow = Math.max(f.pseudoPure ? f.pBubble!.value(f.Tmin) : f.data.triple.pVapour, 1);
  const liquid = flashTP(f, f.Tmin, Math.min(f.pmax, Math.max(2 * f.pc, pLow * 1.001)), ref);
  const vapour = flashTP(f, f.Tmax, pLow, ref);
  return [liquid.h, vapour.h];
}

function windowOf(file: string, path: string, e: SheetEntry, sub: Substance, ref: ReferenceName, atmosphere: number): NonNullable<SheetLineOptions["window"]> {
  const w = e.window!;
  // A mixture's range is its components' narrowest; its enthalpy range is checked when its lines are traced.
  const f = sub.kind === "pure" ? sub.fluid : { id: sub.mixture.id, pmax: sub.mixture.pmax } as Fluid;
  const out: Record<string, number> = {};
  for (const key of ["pMin", "pMax"] as const) {
    const v = w[key];
    if (v === undefined) continue;
    const p = at(file, `${pre(path)}window.${key}`, () => q(key, "pressure", v, "Pa", atmosphere));
    if (!(p > 0) || p > f.pmax)
      throw specError(file, `${pre(path)}window.${key}`, `${show(v)}: outside the equation's range of ${f.id}`, v, `above 0 and at most ${f.pmax / 1e5} bar`);
    out[key] = p;
  }
  const [hLow, hHigh] = sub.kind === "pure" ? enthalpyRange(sub.fluid, ref) : [-Infinity, Infinity];
  for (const key of ["hMin", "hMax"] as const) {
    const v = w[key];
    if (v === undefined) continue;
    const h = at(file, `${pre(path)}window.${key}`, () => q(key, "enthalpy", v, "J/kg"));
    if (h < hLow - 0.5 * (hHigh - hLow) || h > hHigh + 0.5 * (hHigh - hLow))
      throw specError(file, `${pre(path)}window.${key}`, `${show(v)}: far outside the enthalpies ${f.id} reaches in its range (reference ${ref})`, v,
        `about ${(hLow / 1e3).toFixed(0)} to ${(hHigh / 1e3).toFixed(0)} kJ/kg`);
    out[key] = h;
  }
  for (const [lo, hi] of [["pMin", "pMax"], ["hMin", "hMax"]] as const)
    if (out[lo] !== undefined && out[hi] !== undefined && !(out[lo]! < out[hi]!))
      throw specError(file, `${pre(path)}window.${hi}`, `${show(w[hi])}: not above ${lo} (${show(w[lo])})`, w[hi], `a value above ${lo}`);
  return out;
}

function linesOf(file: string, path: string, e: SheetEntry): SheetLineOptions {
  const l = e.lines!;
  const ip = e.units === "ip";
  const densities: Record<string, unknown> = {};
  if (l.isotherm !== undefined) {
    const k = at(file, `${pre(path)}lines.isotherm`, () => q("isotherm", "temperature-difference", l.isotherm!, ip ? "F" : "K"));
    densities.isotherm = ip ? (k * 9) / 5 : k;
  }
  if (l.isentrope !== undefined) {
    const s = at(file, `${pre(path)}lines.isentrope`, () => q("isentrope", "entropy", l.isentrope!, ip ? "Btu/lbR" : "kJ/kgK"));
    densities.isentrope = ip ? s / 4186.8 : s / 1e3;
  }
  if (l.isenthalp !== undefined) {
    const h = at(file, `${pre(path)}lines.isenthalp`, () => q("isenthalp", "enthalpy", l.isenthalp!, ip ? "Btu/lb" : "kJ/kg"));
    densities.isenthalp = ip ? h / 2326 : h / 1e3;
  }
  if (l.quality !== undefined) densities.quality = l.quality;
  if (l.isochore !== undefined) densities.isochore = l.isochore;
  const families: Record<string, boolean> = {};
  for (const k of ["isotherms", "isentropes", "isochores", "qualities"] as const) if (l[k] !== undefined) families[k] = l[k]!;
  return { densities, families } as SheetLineOptions;
}

/** A cycle entry's inputs, as `domeprint cycle` takes them, evaluated in the sheet's reference state. */
function cycleOf(file: string, path: string, c: CycleEntry, fluid: string, ref: ReferenceName, units: "si" | "ip", atmosphere: number): Overlay {
  return at(file, path, () => {
    const str = (v: string | number | undefined) => (v === undefined ? undefined : String(v));
    const o = {
      evaporating: str(c.evaporating), condensing: str(c.condensing), glidePoint: c.glidePoint ?? "dew", superheat: str(c.superheat),
      subcooling: str(c.subcooling), efficiency: str(c.efficiency), dischargeTemperature: str(c.dischargeTemperature),
      suctionDrop: str(c.suctionDrop), dischargeDrop: str(c.dischargeDrop), ihx: str(c.ihx), flashTank: c.flashTank,
      openIntercooler: c.openIntercooler, economiser: c.economiser, intermediate: str(c.intermediate),
      economiserApproach: str(c.economiserApproach), gasCoolerOutlet: str(c.gasCoolerOutlet), highPressure: str(c.highPressure),
      optimiseHighPressure: c.optimiseHighPressure, highPressureBounds: c.highPressureBounds, capacity: str(c.capacity),
      reference: ref, units,
    };
    const result = runCycle(fluid, o as Parameters<typeof runCycle>[1], atmosphere);
    const overlay = cycleOverlay(result, units);
    return c.name ? { ...overlay, name: c.name } : overlay;
  });
}

export function planSheets(spec: LoadedSpec): PlannedSheet[] {
  const { file } = spec;
  const base = dirname(resolve(file));
  return spec.sheets.map((entry, i) => {
    const path = spec.single ? "" : `sheets[${i}]`;
    const e = merge(spec.defaults, entry);
    if (!e.fluid) throw specError(file, `${pre(path)}fluid`, "missing", undefined, "a fluid id, R-number or chemical name (e.g. fluid: R134a)");
    // Pure and pseudo-pure fluids first, then real blends and compositions ("R32:0.5+R125:0.5").
    const sub = at(file, `${pre(path)}fluid`, () => resolveSubstance(e.fluid!));
    const fluidId = sub.kind === "pure" ? sub.fluid.id : e.fluid!.trim();
    if (e.paper !== undefined) at(file, `${pre(path)}paper`, () => resolvePaper(e.paper!, e.orientation));
    if (e.style !== undefined) at(file, `${pre(path)}style`, () => loadStyle(e.style!));
    const pressure = e.pressure === undefined ? undefined : at(file, `${pre(path)}pressure`, () => checkPressureUnit(e.pressure));
    const altitude = e.altitude === undefined ? undefined : at(file, `${pre(path)}altitude`, () => q("altitude", "length", e.altitude!, "m"));
    if (altitude !== undefined && (altitude < -500 || altitude > 9000)) throw specError(file, `${pre(path)}altitude`, `${show(e.altitude)}: outside the troposphere the standard atmosphere covers here`, e.altitude, "−500 m to 9000 m");
    const atmosphere = atmosphereAt(altitude ?? 0);
    const ref = (e.reference ?? (sub.kind === "pure" ? defaultReference(sub.fluid) : mixtureDefaultReference(sub.mixture))) as ReferenceName;
    const formats = e.formats === undefined ? undefined : at(file, `${pre(path)}formats`, () => checkFormats(Array.isArray(e.formats) ? e.formats : e.formats));
    const units = e.units ?? "si";
    if (e.date !== undefined) at(file, `${pre(path)}date`, () => checkDate(e.date));
    if (e.dpi !== undefined && !(Number.isFinite(e.dpi) && e.dpi >= 10 && e.dpi <= 2400))
      throw specError(file, `${pre(path)}dpi`, `${show(e.dpi)}: not a usable resolution`, e.dpi, "10 to 2400 dots per inch");
    const lineOptions = {
      ...(e.window ? { window: windowOf(file, path, e, sub, ref, atmosphere) } : {}),
      ...(e.lines ? linesOf(file, path, e) : {}),
    };
    const overlays = (e.cycles ?? []).map((c, k) => cycleOf(file, `${pre(path)}cycles[${k}]`, c, fluidId, ref, units, atmosphere));
    const pointsFiles = (e.points ?? []).map((p, k) => {
      const full = resolve(base, p);
      if (!existsSync(full)) throw specError(file, `${pre(path)}points[${k}]`, `${show(p)}: no such readings file (looked for ${full})`, p, "a readings CSV file, relative to the spec");
      return full;
    });
    const mm = (key: "bleed" | "margin") => {
      const v = e[key];
      if (v === undefined) return undefined;
      const n = typeof v === "number" ? v : Number(String(v).replace(/\s*mm$/i, ""));
      if (!Number.isFinite(n)) throw specError(file, `${pre(path)}${key}`, `${show(v)}: not a length in mm`, v, "a number of millimetres, e.g. 3 or 3mm");
      return n;
    };
    const bleed = mm("bleed"), margin = mm("margin");
    const fields = Object.fromEntries(USER_FIELDS.filter((k) => e[k] !== undefined).map((k) => [k, e[k]!]));
    const options: SheetOptions = {
      fluid: fluidId,
      ...(e.paper !== undefined ? { paper: e.paper } : {}),
      ...(e.orientation !== undefined ? { orientation: e.orientation } : {}),
      units,
      ...(pressure !== undefined ? { pressure } : {}),
      ...(e.gauge !== undefined || altitude !== undefined ? { gauge: e.gauge ?? true } : {}),
      ...(altitude !== undefined ? { altitude } : {}),
      reference: ref,
      ...(e.style !== undefined ? { style: e.style } : {}),
      ...(formats ? { formats } : {}),
      ...(e.dpi !== undefined ? { dpi: e.dpi } : {}),
      ...(e.cmyk !== undefined ? { cmyk: e.cmyk } : {}),
      ...(bleed !== undefined ? { bleed } : {}),
      ...(e.cropMarks !== undefined ? { cropMarks: e.cropMarks } : {}),
      ...(margin !== undefined ? { margin } : {}),
      fields,
      ...(e.saturationTable !== undefined ? { saturationTable: e.saturationTable } : {}),
      ...(e.date !== undefined ? { date: e.date } : {}),
      overlays,
      pointsFiles,
      ...(Object.keys(lineOptions).length ? { lineOptions } : {}),
    };
    const name = e.name === undefined ? undefined : checkOutputName(file, `${pre(path)}name`, e.name);
    return { path, name, options };
  });
}
