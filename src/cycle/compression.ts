// Adiabatic compression from a suction state to a discharge pressure, set either by an isentropic
// efficiency or by a measured discharge temperature (from which the efficiency follows).
import { DomeprintError } from "../errors.js";
import type { ReferenceName, State } from "../eos/index.js";
import { statePH, statePS, stateTP, type WorkingFluid as Fluid } from "./working-fluid.js";
import { cycleInputError, pressureText, requireEfficiency, temperatureText } from "./check.js";

/** How the compressor is described: an isentropic efficiency in (0, 1], or the discharge temperature [K]. */
export type Compressor = { efficiency: number } | { dischargeTemperature: number };

/** The input name of a compressor description, with an optional qualifier such as "low stage". */
export function compressorInput(c: Compressor, qualifier?: string): string {
  const name = "efficiency" in c ? "efficiency" : "discharge-temperature";
  return qualifier ? `${name} (${qualifier})` : name;
}

export interface Compression {
  discharge: State;
  /** The end of the isentropic compression to the same pressure: the reference of the efficiency. */
  isentropic: State;
  /** Isentropic efficiency (h2s − h1) / (h2 − h1), given or derived from the discharge temperature. */
  efficiency: number;
}

/** `input` names the compressor's description in errors (e.g. "efficiency", "discharge-temperature"). */
export function compress(f: Fluid, suction: State, pOut: number, c: Compressor, ref: ReferenceName, input = compressorInput(c)): Compression {
  const isentropic = isentropicEnd(f, suction, pOut, ref, input, c);
  if ("efficiency" in c) {
    const eta = requireEfficiency(input, c.efficiency);
    const discharge = eta === 1 ? isentropic : dischargeAt(f, pOut, suction.h + (isentropic.h - suction.h) / eta, ref, input, eta);
    return { discharge, isentropic, efficiency: eta };
  }
  const T = c.dischargeTemperature;
  // A discharge colder than the isentropic end would mean the compressor gave out entropy: an efficiency above 1.
  if (!(Number.isFinite(T) && T > isentropic.T)) {
    throw cycleInputError(input, T, temperatureText(T), `not above the isentropic discharge temperature ${temperatureText(isentropic.T)} (that would be an efficiency above 1)`, `above ${temperatureText(isentropic.T)}`);
  }
  const discharge = stateTP(f, T, pOut, ref);
  return { discharge, isentropic, efficiency: (isentropic.h - suction.h) / (discharge.h - suction.h) };
}

/** The isentropic end; a steep compression of a hot suction gas can end past the equation's upper temperature. */
function isentropicEnd(f: Fluid, suction: State, pOut: number, ref: ReferenceName, input: string, c: Compressor): State {
  try {
    return statePS(f, pOut, suction.s, ref);
  } catch (e) {
    if (!(e instanceof DomeprintError) || e.code !== "E_RANGE") throw e;
    const value = "efficiency" in c ? c.efficiency : c.dischargeTemperature;
    throw cycleInputError(input, value, "efficiency" in c ? String(value) : temperatureText(value),
      `even an isentropic compression from ${temperatureText(suction.T)} to ${pressureText(pOut)} ends above the upper temperature limit ${temperatureText(f.Tmax)} of the equation for ${f.id}`,
      "a lower condensing level, a higher evaporating level, a smaller suction drop or less superheat");
  }
}

/** The discharge state at enthalpy h; a low efficiency can push it past the equation's upper temperature. */
function dischargeAt(f: Fluid, p: number, h: number, ref: ReferenceName, input: string, eta: number): State {
  try {
    return statePH(f, p, h, ref);
  } catch (e) {
    if (!(e instanceof DomeprintError) || e.code !== "E_RANGE") throw e;
    throw cycleInputError(input, eta, String(eta), `puts the discharge above the upper temperature limit ${temperatureText(f.Tmax)} of the equation for ${f.id}`, "a higher efficiency");
  }
}
