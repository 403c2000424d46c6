// Reference states of mixtures, defined on the bubble-point liquid of the overall composition: IIR
// (h = 200 kJ/kg, s = 1 kJ/(kg K) at 0 °C), ASHRAE (h = s = 0 at −40 °C), NBP (h = s = 0 at 101.325 kPa).
import { DomeprintError } from "../../errors.js";
import { H, S } from "../properties.js";
import type { ReferenceName, ReferenceOffset } from "../reference.js";
import type { Mixture } from "./mixture.js";
import { mixturePropertiesTRho } from "./properties.js";
import { saturationPoint } from "./saturation.js";

const cache = new WeakMap<Mixture, Map<ReferenceName, ReferenceOffset>>();

/** Constants added to the mixture's mass-based h [J/kg] and s [J/(kg K)]. */
export function mixtureReferenceOffset(mix: Mixture, name: ReferenceName): ReferenceOffset {
  if (name === "native") return { dh: 0, ds: 0 };
  let m = cache.get(mix);
  if (!m) cache.set(mix, (m = new Map()));
  let off = m.get(name);
  if (off) return off;
  let sat;
  try {
    sat = name === "nbp" ? saturationPoint(mix, "bubble", "p", 101325) : saturationPoint(mix, "bubble", "T", name === "iir" ? 273.15 : 233.15);
  } catch (e) {
    if (!(e instanceof DomeprintError)) throw e;
    const where = name === "nbp" ? "a bubble point at 101.325 kPa" : `a bubble point at ${name === "iir" ? "0 °C" : "−40 °C"}`;
    throw new DomeprintError("E_REFERENCE", `reference = ${name}: not defined for ${mix.id}, which has no ${where} (${e.message})`, { input: "reference", value: name, allowed: "native or a reference whose anchor lies on the mixture's bubble line" });
  }
  const out = new Float64Array(10);
  mixturePropertiesTRho(mix.model, sat.T, sat.rhoFeed, mix.z, out);
  const h0 = name === "iir" ? 200e3 : 0, s0 = name === "iir" ? 1e3 : 0;
  off = { dh: h0 - out[H]!, ds: s0 - out[S]! };
  m.set(name, off);
  return off;
}
