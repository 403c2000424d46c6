// The options of one sheet (library API and CLI alike) and their checking: paper, units, reference state,
// style, formats, user fields and overlays; every bad value becomes a typed error naming it.

import type { Overlay } from "../cycle/overlay.js";
import { checkReferenceName, type ReferenceName } from "../eos/index.js";
import { inputError } from "../errors.js";
import { checkPressureUnit, checkUnitSystem, type PressureUnitName, type UnitSystem } from "../layout/display-units.js";
import { USER_FIELDS, type UserFields } from "../layout/content.js";
import type { Orientation } from "../layout/paper.js";
import type { Style } from "../layout/style.js";
import type { LineSetOptions } from "../isolines/index.js";

/** What a sheet passes on to the isoline generator: window limits (SI), line spacings and families. */
export type SheetLineOptions = Pick<LineSetOptions, "window" | "densities" | "families">;

export const FORMATS = ["pdf", "svg", "png", "json"] as const;
export type Format = (typeof FORMATS)[number];

export interface SheetOptions {
  /** Fluid id, R-number or chemical name. */
  fluid: string;
  /** Paper name (A4 … A0, Letter, Tabloid, ARCH D, ARCH E) or "WxH" in mm; the style's default if unset. */
  paper?: string;
  orientation?: Orientation;
  units?: UnitSystem;
  pressure?: PressureUnitName;
  /** Draw a gauge-pressure scale for a site at this altitude [m]. */
  gauge?: boolean;
  altitude?: number;
  /** Reference state of h and s; by default IIR where the fluid has one, else NBP, else the equation's own. */
  reference?: ReferenceName;
  /** A style name from styles/, a path to a style file, or a style already loaded. */
  style?: string | Style;
  formats?: Format[];
  /** Raster resolution of the PNG. */
  dpi?: number;
  /** PDF colours as DeviceCMYK for a print shop. */
  cmyk?: boolean;
  /** Bleed around the trimmed page [mm] and crop marks outside it. */
  bleed?: number;
  cropMarks?: boolean;
  /** Sheet margin [mm], replacing the style's (scaled) margin. */
  margin?: number;
  fields?: UserFields;
  saturationTable?: boolean;
  /** Date printed on the sheet and written into its metadata (YYYY-MM-DD); today if unset. */
  date?: string;
  /** Cycles or readings already evaluated in this sheet's reference state. */
  overlays?: Overlay[];
  /** Readings files to evaluate against the fluid in the sheet's reference state and draw as points. */
  pointsFiles?: string[];
  /** Cycle files (one design cycle each, YAML or JSON) to evaluate in the sheet's reference state and draw. */
  cycleFiles?: string[];
  /** Window and line choices for the isoline generator; given spacings are drawn as asked, never thinned. */
  lineOptions?: SheetLineOptions;
}

const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Today's date in UTC, the default stamp of a sheet. */
export function today(): string {
  return new Date().toISOString().slice(0, 10);
}

export function checkDate(value: unknown): string {
  if (typeof value !== "string" || !DATE.test(value) || Number.isNaN(Date.parse(value)) || new Date(value).toISOString().slice(0, 10) !== value)
    throw inputError("date", value, "not a calendar date", "YYYY-MM-DD, e.g. 2025-03-14");
  return value;
}

export function checkFormats(value: unknown): Format[] {
  const list = typeof value === "string" ? value.split(",").map((s) => s.trim().toLowerCase()).filter(Boolean) : value;
  if (!Array.isArray(list) || list.length === 0) throw inputError("format", value, "no format given", FORMATS.join(", "));
  for (const f of list) if (!(FORMATS as readonly string[]).includes(f)) throw inputError("format", f, "unknown format", FORMATS.join(", "));
  return [...new Set(list as Format[])];
}

export interface CheckedSheetOptions {
  fluid: string;
  paper?: string;
  orientation?: Orientation;
  units: UnitSystem;
  pressure?: PressureUnitName;
  gauge: boolean;
  altitude: number;
  /** True when the caller gave the altitude (readings files may state their own). */
  altitudeGiven: boolean;
  reference?: ReferenceName;
  formats: Format[];
  dpi: number;
  cmyk: boolean;
  bleed: number;
  cropMarks: boolean;
  margin?: number;
  fields: UserFields;
  saturationTable?: boolean;
  date: string;
  overlays: Overlay[];
  pointsFiles: string[];
  cycleFiles: string[];
  lineOptions: SheetLineOptions;
}

function checkFields(fields: UserFields | undefined): UserFields {
  const out: UserFields = {};
  for (const key of USER_FIELDS) {
    const v = fields?.[key];
    if (v === undefined) continue;
    if (typeof v !== "string") throw inputError(key, v, "not text", "a string");
    if (v.length > 2000) throw inputError(key, `${v.slice(0, 20)}…`, `${v.length} characters is too long for a sheet`, "at most 2000 characters");
    out[key] = v;
  }
  return out;
}

function nonNegative(name: string, v: unknown, max: number): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || v > max) throw inputError(name, v, "out of range", `a number from 0 to ${max}`);
  return v;
}

export function checkSheetOptions(o: SheetOptions): CheckedSheetOptions {
  if (typeof o.fluid !== "string" || o.fluid.trim() === "") throw inputError("fluid", o.fluid, "missing", "a fluid id, R-number or chemical name");
  if (o.altitude !== undefined && (typeof o.altitude !== "number" || !Number.isFinite(o.altitude) || o.altitude < -500 || o.altitude > 9000))
    throw inputError("altitude", o.altitude, "outside the standard atmosphere's troposphere as used here", "−500 to 9000 m");
  return {
    fluid: o.fluid,
    ...(o.paper !== undefined ? { paper: o.paper } : {}),
    ...(o.orientation !== undefined ? { orientation: o.orientation } : {}),
    units: checkUnitSystem(o.units ?? "si"),
    ...(o.pressure !== undefined ? { pressure: checkPressureUnit(o.pressure) } : {}),
    gauge: o.gauge ?? o.altitude !== undefined,
    altitude: o.altitude ?? 0,
    altitudeGiven: o.altitude !== undefined,
    ...(o.reference !== undefined ? { reference: checkReferenceName(o.reference) } : {}),
    formats: checkFormats(o.formats ?? ["pdf", "svg"]),
    dpi: o.dpi ?? 200,
    cmyk: o.cmyk ?? false,
    bleed: o.bleed === undefined ? 0 : nonNegative("bleed", o.bleed, 20),
    cropMarks: o.cropMarks ?? false,
    ...(o.margin !== undefined ? { margin: nonNegative("margin", o.margin, 100) } : {}),
    fields: checkFields(o.fields),
    ...(o.saturationTable !== undefined ? { saturationTable: o.saturationTable } : {}),
    date: o.date === undefined ? today() : checkDate(o.date),
    overlays: o.overlays ?? [],
    pointsFiles: o.pointsFiles ?? [],
    cycleFiles: o.cycleFiles ?? [],
    lineOptions: o.lineOptions ?? {},
  };
}
