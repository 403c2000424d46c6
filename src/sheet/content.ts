// The thin orchestration between the property engine and the layout: the fluid's identity, the LineSet for
// the planned frame, saturation pressures at whole degrees and the saturation table — data, no drawing.

import { citation } from "../cli/fluids.js";
import {
  availableReferences, H, propertiesTRho, PROP_SLOTS, REFERENCE_DESCRIPTIONS, referenceOffset, S, saturationP, saturationT,
  type Fluid, type ReferenceName,
} from "../eos/index.js";
import { attempt } from "../errors.js";
import { buildLineSet } from "../isolines/index.js";
import type { LineSet } from "../isolines/index.js";
import type { FluidIdentity, SaturationRow, SaturationTick } from "../layout/content.js";
import { toDisplay, type DisplayUnits } from "../layout/display-units.js";
import { toSI } from "../units/index.js";
import type { SheetLineOptions } from "./options.js";

/** IIR where the fluid has a saturated liquid at 0 °C, else NBP, else the equation's own: the refrigeration habit. */
export function defaultReference(f: Fluid): ReferenceName {
  const available = availableReferences(f);
  return available.includes("iir") ? "iir" : available.includes("nbp") ? "nbp" : "native";
}

/** A blend glides when its dew and bubble temperatures differ by more than half a kelvin mid-range. */
export function hasGlide(f: Fluid): boolean {
  if (!f.pseudoPure) return false;
  const sat = saturationT(f, 0.8 * f.Tc);
  const atDew = saturationP(f, sat.pV);
  return Math.abs(atDew.TV - atDew.TL) > 0.5;
}

const REFERENCE_NAMES: Record<ReferenceName, string> = { native: "as published", iir: "IIR", ashrae: "ASHRAE", nbp: "NBP" };

export function fluidIdentity(f: Fluid, reference: ReferenceName): FluidIdentity {
  const d = f.data;
  return {
    designation: f.designation,
    chemicalName: d.chemicalName,
    formula: d.formula,
    safetyClass: d.safety.class,
    safetySource: d.safety.source,
    ...(d.safety.note ? { safetyNote: d.safety.note } : {}),
    citation: citation(f),
    equationTitle: d.equation.title,
    validity: { Tmin: f.Tmin, Tmax: f.Tmax, pmax: f.pmax },
    critical: { T: f.Tc, p: f.pc },
    glide: hasGlide(f),
    reference: `${REFERENCE_NAMES[reference]}, ${REFERENCE_DESCRIPTIONS[reference]}`,
  };
}

/** Highest temperature whose saturation the sheet asks the engine for: just under the critical point. */
function topTemperature(f: Fluid): number {
  return f.pseudoPure ? f.Tc - 0.5 : f.satTmax - 0.05;
}

/** Saturation pressures at every whole display degree from the window's floor to the critical point. */
export function saturationTicks(f: Fluid, lines: LineSet, units: DisplayUnits): SaturationTick[] {
  const tUnit = units.temperature;
  const floor = Math.max(f.Tmin, saturationFloor(f, lines.window.pMin));
  const out: SaturationTick[] = [];
  for (let t = Math.ceil(toDisplay(floor, tUnit)); ; t++) {
    const T = toSI(t, tUnit);
    if (T > topTemperature(f)) break;
    const sat = attempt(() => saturationT(f, T));
    if (sat) out.push({ t, pBubble: sat.pL, pDew: sat.pV });
  }
  return out;
}

/** The saturation temperature at the window's lowest pressure (the dew temperature for blends), or T_min. */
function saturationFloor(f: Fluid, pMin: number): number {
  const sat = attempt(() => saturationP(f, pMin));
  return sat ? Math.min(sat.TL, sat.TV) : f.Tmin;
}

/** Table rows at multiples of `step` display degrees over the window's saturation range. */
export function saturationRows(f: Fluid, lines: LineSet, units: DisplayUnits, reference: ReferenceName, step: number): SaturationRow[] {
  const tUnit = units.temperature;
  const off = referenceOffset(f, reference);
  const out = new Float64Array(PROP_SLOTS);
  const low = Math.max(f.Tmin, saturationFloor(f, lines.window.pMin));
  const rows: SaturationRow[] = [];
  for (let t = Math.ceil(toDisplay(low, tUnit) / step) * step; ; t += step) {
    const T = toSI(t, tUnit);
    if (T > topTemperature(f) - 1) break;
    const sat = attempt(() => saturationT(f, T));
    if (!sat) continue;
    propertiesTRho(f.model, f.M, T, sat.rhoL, out);
    const hL = out[H]! + off.dh, sL = out[S]! + off.ds;
    propertiesTRho(f.model, f.M, T, sat.rhoV, out);
    const hV = out[H]! + off.dh, sV = out[S]! + off.ds;
    rows.push({ T, pBubble: sat.pL, pDew: sat.pV, rhoLiquid: sat.rhoL * f.M, rhoVapour: sat.rhoV * f.M, hLiquid: hL, hVapour: hV, sLiquid: sL, sVapour: sV });
  }
  return rows;
}

export interface EngineData {
  fluid: Fluid;
  reference: ReferenceName;
  lines: LineSet;
}

/**
 * The LineSet traced for the planned plot frame, so its 0.05 mm tolerance holds on this paper. Unless
 * asked for, no isenthalps (the grid carries enthalpy) and no 5-degree isotherms (no room for labels).
 */
export function engineData(fluid: Fluid, ref: ReferenceName, units: DisplayUnits, frame: { width: number; height: number }, given: SheetLineOptions = {}): EngineData {
  return { fluid, reference: ref, lines: sheetLines(fluid.id, ref, units, frame, given) };
}

/** The line set of a fluid or blend by id for the planned frame, with the sheet's defaults (see engineData). */
export function sheetLines(id: string, ref: ReferenceName, units: DisplayUnits, frame: { width: number; height: number }, given: SheetLineOptions = {}): LineSet {
  return buildLineSet(id, {
    units: units.system,
    reference: ref,
    frame: { widthMm: frame.width, heightMm: frame.height },
    ...(given.window ? { window: given.window } : {}),
    families: { isenthalps: false, ...given.families },
    densities: { minorIsothermSpacingMm: 0, ...given.densities },
  });
}
