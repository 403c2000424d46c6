// Checks and notes that follow from a computed circuit rather than from its inputs: a cycle must
// refrigerate, and its output states how the compressor and heat exchangers were modelled.
import { cycleInputError } from "./check.js";
import type { Compressor } from "./compression.js";
import type { ResolvedLevel } from "./level.js";
import { levelText } from "./spec.js";

/** Liquid reaching the evaporator with more enthalpy than the vapour leaving it cools nothing. */
export function requireRefrigeratingEffect(q0: number, high: ResolvedLevel | { input: string; value: number; shown: string }): void {
  if (q0 > 0) return;
  const value = "given" in high ? ("T" in high.given ? high.given.T : high.given.p) : high.value;
  const shown = "given" in high ? levelText(high) : high.shown;
  throw cycleInputError(high.input, value, shown, `the liquid reaching the evaporator carries more enthalpy than the vapour leaving it (refrigerating effect ${+(q0 / 1e3).toPrecision(4)} kJ/kg)`, "a high-side state that leaves a positive refrigerating effect");
}

export function circuitNotes(c: Compressor, ihx: boolean): string[] {
  const notes = ["dischargeTemperature" in c
    ? "isentropic efficiency derived from the given discharge temperature"
    : "discharge from the given isentropic efficiency"];
  if (ihx) notes.push("internal heat exchanger between the suction gas leaving the evaporator and the liquid leaving the condenser or gas cooler; effectiveness = duty / largest possible duty");
  return notes;
}
