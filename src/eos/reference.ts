// Reference states: where enthalpy and entropy are zero (or 200 kJ/kg and 1 kJ/(kg K) for IIR).
// Computed from the equation itself at first use; a shift moves h and s by constants (a1, a2 of α⁰).
import { DomeprintError } from "../errors.js";
import type { Fluid } from "./fluid.js";
import { propertiesTRho, H, S } from "./properties.js";
import { saturationP, saturationT } from "./saturation.js";

export type ReferenceName = "native" | "iir" | "ashrae" | "nbp";
export const REFERENCE_NAMES: readonly ReferenceName[] = ["native", "iir", "ashrae", "nbp"];

export const REFERENCE_DESCRIPTIONS: Record<ReferenceName, string> = {
  native: "as published with the equation",
  iir: "h = 200 kJ/kg, s = 1 kJ/(kg K) for saturated liquid at 0 °C",
  ashrae: "h = 0, s = 0 for saturated liquid at −40 °C",
  nbp: "h = 0, s = 0 for saturated liquid at the normal boiling point (101.325 kPa)",
};

/** Constants added to mass-based h [J/kg] and s [J/(kg K)] of the published equation. */
export interface ReferenceOffset { dh: number; ds: number }

const cache = new WeakMap<Fluid, Map<ReferenceName, ReferenceOffset>>();

export function checkReferenceName(name: unknown): ReferenceName {
  if (typeof name === "string" && (REFERENCE_NAMES as readonly string[]).includes(name.toLowerCase())) return name.toLowerCase() as ReferenceName;
  throw new DomeprintError("E_INPUT", `reference = ${JSON.stringify(name)}: unknown reference state; allowed: ${REFERENCE_NAMES.join(", ")}`, { input: "reference", value: name, allowed: REFERENCE_NAMES.join(", ") });
}

function anchor(f: Fluid, name: Exclude<ReferenceName, "native">): { T: number; rho: number; h: number; s: number } {
  try {
    const sat = name === "nbp" ? saturationP(f, 101325) : saturationT(f, name === "iir" ? 273.15 : 233.15);
    return name === "iir" ? { T: sat.TL, rho: sat.rhoL, h: 200e3, s: 1e3 } : { T: sat.TL, rho: sat.rhoL, h: 0, s: 0 };
  } catch (e) {
    if (!(e instanceof DomeprintError)) throw e;
    const where = name === "nbp" ? "a normal boiling point (101.325 kPa inside its saturation range)" : `saturated liquid at ${name === "iir" ? "0 °C" : "−40 °C"}`;
    throw new DomeprintError("E_REFERENCE", `reference = ${name}: not defined for ${f.id}, which has no ${where}; allowed for this fluid: ${availableReferences(f).join(", ")}`, {
      input: "reference", value: name, allowed: availableReferences(f).join(", "),
    });
  }
}

/** The reference states that can be defined for a fluid. */
export function availableReferences(f: Fluid): ReferenceName[] {
  const ok = (T: number) => T >= f.Tmin && T <= f.satTmax;
  const out: ReferenceName[] = ["native"];
  if (ok(273.15)) out.push("iir");
  if (ok(233.15)) out.push("ashrae");
  const pLow = f.pseudoPure ? f.pBubble!.value(f.Tmin) : f.data.triple.pVapour;
  if (pLow <= 101325 && 101325 < f.pc) out.push("nbp");
  return out;
}

export function referenceOffset(f: Fluid, name: ReferenceName): ReferenceOffset {
  if (name === "native") return { dh: 0, ds: 0 };
  let m = cache.get(f);
  if (!m) cache.set(f, (m = new Map()));
  let off = m.get(name);
  if (!off) {
    const a = anchor(f, name);
    const out = new Float64Array(10);
    propertiesTRho(f.model, f.M, a.T, a.rho, out);
    off = { dh: a.h - out[H]!, ds: a.s - out[S]! };
    m.set(name, off);
  }
  return off;
}
