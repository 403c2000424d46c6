// The options a caller (CLI, layout, library user) gives buildLineSet, and their checking: every bad value is
// a DomeprintError naming the option, the value and what is allowed.
import { checkReferenceName, type ReferenceName } from "../eos/index.js";
import { inputError } from "../errors.js";
import { DEFAULT_FRAME } from "./page.js";
import type { ChartWindow, Frame, UnitSystem } from "./types.js";
import type { Densities } from "./values.js";

export type Family = "dome" | "isotherms" | "isentropes" | "isochores" | "qualities" | "isenthalps";
export const FAMILIES: readonly Family[] = ["dome", "isotherms", "isentropes", "isochores", "qualities", "isenthalps"];

export interface LineSetOptions {
  /** Display units of the line values: "si" (°C, kJ/kg, kJ/(kg K), m³/kg) or "ip" (°F, Btu/lb, Btu/(lb °R), ft³/lb). */
  units?: UnitSystem;
  /** Reference state of h and s (default "native", as the equation was published). */
  reference?: ReferenceName | string;
  /** Window limits in SI (h in J/kg in the chosen reference, p in Pa); unset limits are chosen per fluid. */
  window?: Partial<ChartWindow>;
  /** The plot frame on the printed sheet [mm]; default 520 × 340 (an A2 landscape sheet). */
  frame?: Frame;
  /** Largest distance [mm] a drawn chord may keep from the true line; default 0.05. */
  toleranceMm?: number;
  /** Spacing of each family, in the display unit. */
  densities?: Densities;
  /** Explicit line values in SI (K, J/(kg K), m³/kg, quality, J/kg), replacing the automatic ones of that family. */
  values?: Partial<Record<Exclude<Family, "dome">, readonly number[]>>;
  /** Families to trace (all by default); e.g. { isochores: false }. */
  families?: Partial<Record<Family, boolean>>;
}

export interface CheckedOptions {
  units: UnitSystem;
  reference: ReferenceName;
  window: Partial<ChartWindow> | undefined;
  frame: Frame;
  toleranceMm: number;
  densities: Densities;
  values: Partial<Record<Exclude<Family, "dome">, readonly number[]>>;
  families: Record<Family, boolean>;
}

function positive(name: string, v: unknown, allowed = "a finite number > 0"): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) throw inputError(name, v, "not a positive finite number", allowed);
  return v;
}

function checkDensities(d: Densities | undefined): Densities {
  if (d === undefined) return {};
  const out: Densities = {};
  if (d.isotherm !== undefined) out.isotherm = positive("densities.isotherm", d.isotherm);
  if (d.isentrope !== undefined) out.isentrope = positive("densities.isentrope", d.isentrope);
  if (d.isenthalp !== undefined) out.isenthalp = positive("densities.isenthalp", d.isenthalp);
  if (d.quality !== undefined) {
    const q = positive("densities.quality", d.quality, "0 < step < 1");
    if (q >= 1) throw inputError("densities.quality", q, "a quality step must be below 1", "0 < step < 1");
    out.quality = q;
  }
  if (d.minorIsothermSpacingMm !== undefined) {
    const v = d.minorIsothermSpacingMm;
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0) throw inputError("densities.minorIsothermSpacingMm", v, "not a finite number ≥ 0", "a spacing in mm ≥ 0 (0: no minor isotherms)");
    out.minorIsothermSpacingMm = v;
  }
  if (d.isochore !== undefined) {
    const m = d.isochore;
    if (!Array.isArray(m) || m.length === 0) throw inputError("densities.isochore", m, "not a list of mantissas", "mantissas in [1, 10), e.g. [1, 2, 5]");
    for (const x of m) if (typeof x !== "number" || !(x >= 1 && x < 10)) throw inputError("densities.isochore", x, "not a mantissa", "numbers in [1, 10), e.g. [1, 2, 5]");
    out.isochore = [...m];
  }
  return out;
}

function checkValues(v: LineSetOptions["values"]): CheckedOptions["values"] {
  const out: CheckedOptions["values"] = {};
  if (v === undefined) return out;
  for (const [key, list] of Object.entries(v)) {
    if (!(FAMILIES as readonly string[]).includes(key) || key === "dome") throw inputError("values", key, "unknown family", FAMILIES.filter((f) => f !== "dome").join(", "));
    if (!Array.isArray(list)) throw inputError(`values.${key}`, list, "not a list", "a list of numbers in SI");
    for (const x of list) if (typeof x !== "number" || !Number.isFinite(x)) throw inputError(`values.${key}`, x, "not a finite number", "finite numbers in SI");
    if (key === "isotherms" || key === "isochores") for (const x of list) positive(`values.${key}`, x, key === "isotherms" ? "temperatures > 0 K" : "specific volumes > 0 m³/kg");
    if (key === "qualities") for (const x of list) if (!(x > 0 && x < 1)) throw inputError("values.qualities", x, "outside the dome's interior", "0 < x < 1");
    out[key as Exclude<Family, "dome">] = [...list];
  }
  return out;
}

export function checkOptions(o: LineSetOptions = {}): CheckedOptions {
  const units = o.units ?? "si";
  if (units !== "si" && units !== "ip") throw inputError("units", units, "unknown unit system", "si, ip");
  const frame = o.frame ?? DEFAULT_FRAME;
  positive("frame.widthMm", frame.widthMm);
  positive("frame.heightMm", frame.heightMm);
  const toleranceMm = o.toleranceMm === undefined ? 0.05 : positive("toleranceMm", o.toleranceMm, "a distance in mm > 0");
  const families = Object.fromEntries(FAMILIES.map((f) => [f, true])) as Record<Family, boolean>;
  for (const [key, on] of Object.entries(o.families ?? {})) {
    if (!(FAMILIES as readonly string[]).includes(key)) throw inputError("families", key, "unknown family", FAMILIES.join(", "));
    if (typeof on !== "boolean") throw inputError(`families.${key}`, on, "not true or false", "true, false");
    families[key as Family] = on;
  }
  return {
    units,
    reference: checkReferenceName(o.reference ?? "native"),
    window: o.window,
    frame: { widthMm: frame.widthMm, heightMm: frame.heightMm },
    toleranceMm,
    densities: checkDensities(o.densities),
    values: checkValues(o.values),
    families,
  };
}
