// A real mixture's share of a sheet's data, gathered here so the layout never calls the engine: its identity
// (composition and estimated pairs for the title block), bubble and dew pressures at whole degrees, the table.
import { mixtureReferenceOffset, mixtureSaturationT, REFERENCE_DESCRIPTIONS, type Mixture, type ReferenceName } from "../eos/index.js";
import { attempt } from "../errors.js";
import type { LineSet } from "../isolines/index.js";
import { sheetLines } from "./content.js";
import type { FluidIdentity, SaturationRow, SaturationTick } from "../layout/content.js";
import { toDisplay, type DisplayUnits } from "../layout/display-units.js";
import { toSI } from "../units/index.js";
import type { SheetLineOptions } from "./options.js";

const REFERENCE_NAMES: Record<ReferenceName, string> = { native: "as published", iir: "IIR", ashrae: "ASHRAE", nbp: "NBP" };

/** IIR where the mixture's bubble-point liquid at 0 °C exists, else the model's own: the refrigeration habit. */
export function mixtureDefaultReference(mix: Mixture): ReferenceName {
  return attempt(() => mixtureReferenceOffset(mix, "iir")) ? "iir" : "native";
}

export function mixtureIdentity(mix: Mixture, reference: ReferenceName): FluidIdentity {
  const env = mix.envelope();
  const names = mix.components.map((f) => f.id);
  const composition = `real mixture: ${names.map((n, k) => `${n} ${+(mix.massFractions[k]! * 100).toPrecision(4)} %`).join(" + ")} by mass`;
  const identity: FluidIdentity = {
    // A "-mix" blend shares its R-number with a pseudo-pure equation; the words keep the two sheets apart.
    designation: !mix.designation.startsWith("R-") ? mix.id : mix.id.endsWith("-mix") ? `${mix.designation} mixture` : mix.designation,
    chemicalName: names.join(" / "),
    formula: "mixture",
    // A standard blend's class comes from its file; a user composition has none, and none is guessed.
    safetyClass: mix.safety?.class ?? null,
    safetySource: mix.safety?.source ?? "no class recorded: this composition has not been classified",
    citation: `multi-fluid mixture model over the components' own equations (${mix.components.map((f) => f.id).join(", ")})`,
    equationTitle: mix.compositionSource ?? "composition as given by the user",
    validity: { Tmin: mix.Tmin, Tmax: mix.Tmax, pmax: mix.pmax },
    critical: { T: env.critical.T, p: env.critical.p },
    glide: true,
    reference: `${REFERENCE_NAMES[reference]}, ${REFERENCE_DESCRIPTIONS[reference]}`,
    composition,
  };
  if (mix.estimatedPairs.length) identity.estimatedPairs = mix.estimatedPairs.map((p) => p.fluids.join("/")).join(", ");
  return identity;
}

/** The dew temperature at the window's floor (or the model's lowest), and the top just under the critical point. */
function span(mix: Mixture, lines: LineSet): [number, number] {
  const env = mix.envelope();
  const floor = Math.max(mix.Tmin, env.bubble[0]!.T, env.dew[0]!.T);
  let lo = floor;
  for (const p of env.dew) if (p.p <= lines.window.pMin) lo = Math.max(lo, p.T);
  return [lo, env.critical.T - 0.5];
}

/** Bubble and dew pressures at every whole display degree across the window's saturation range. */
export function mixtureSaturationTicks(mix: Mixture, lines: LineSet, units: DisplayUnits): SaturationTick[] {
  const [lo, hi] = span(mix, lines);
  const out: SaturationTick[] = [];
  for (let t = Math.ceil(toDisplay(lo, units.temperature)); ; t++) {
    const T = toSI(t, units.temperature);
    if (T > hi) break;
    const sat = attempt(() => mixtureSaturationT(mix, T));
    if (sat) out.push({ t, pBubble: sat.bubble.p, pDew: sat.dew.p });
  }
  return out;
}

/** Table rows at multiples of `step` display degrees: bubble-point liquid and dew-point vapour at each T. */
export function mixtureSaturationRows(mix: Mixture, lines: LineSet, units: DisplayUnits, reference: ReferenceName, step: number): SaturationRow[] {
  const [lo, hi] = span(mix, lines);
  const rows: SaturationRow[] = [];
  for (let t = Math.ceil(toDisplay(lo, units.temperature) / step) * step; ; t += step) {
    const T = toSI(t, units.temperature);
    if (T > hi - 1) break;
    const sat = attempt(() => mixtureSaturationT(mix, T, reference));
    if (!sat) continue;
    const L = sat.bubble, V = sat.dew;
    rows.push({ T, pBubble: L.p, pDew: V.p, rhoLiquid: L.rho, rhoVapour: V.rho, hLiquid: L.h, hVapour: V.h, sLiquid: L.s, sVapour: V.s });
  }
  return rows;
}

/** The mixture's LineSet for the planned frame, with the same sheet defaults as a pure fluid's (see content.ts). */
export function mixtureLines(mix: Mixture, ref: ReferenceName, units: DisplayUnits, frame: { width: number; height: number }, given: SheetLineOptions = {}): LineSet {
  return sheetLines(mix.id, ref, units, frame, given);
}

/** What identifies the mixture's sheet in the inputs hash: its components and composition. */
export function mixtureHashData(mix: Mixture): Record<string, unknown> {
  return { mixture: mix.id, components: mix.components.map((f) => f.id), massFractions: Array.from(mix.massFractions), estimatedPairs: mix.estimatedPairs };
}
