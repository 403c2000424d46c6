// Input checks shared by the cycle models, and the wording of their errors: each names the input,
// the value as the user would write it (°C beside K, bar beside Pa) and what is allowed.
import { DomeprintError } from "../errors.js";

/** A temperature [K] as people read it in a message: "40 °C (313.15 K)". */
export function temperatureText(T: number): string {
  return `${round(T - 273.15)} °C (${round(T)} K)`;
}

/** A pressure [Pa] as people read it in a message: "10.2 bar (1020000 Pa)". */
export function pressureText(p: number): string {
  return `${round(p / 1e5)} bar (${round(p)} Pa)`;
}

/** A temperature difference [K]. */
export function differenceText(dT: number): string {
  return `${round(dT)} K`;
}

function round(x: number): string {
  const r = +x.toPrecision(6);
  return String(Object.is(r, -0) ? 0 : r);
}

/** The error every cycle input check throws: E_INPUT with the input, its value and what is allowed. */
export function cycleInputError(input: string, value: number | string, shown: string, problem: string, allowed: string): DomeprintError {
  return new DomeprintError("E_INPUT", `${input} = ${shown}: ${problem}; allowed: ${allowed}`, { input, value, allowed });
}

function requireFinite(input: string, value: number, shown: string): void {
  if (typeof value !== "number" || !Number.isFinite(value)) throw cycleInputError(input, String(value), shown, "not a finite number", "a finite number");
}

/** A temperature difference that may be zero but not negative (superheat, subcooling, approach). */
export function requireDifference(input: string, dT: number): number {
  requireFinite(input, dT, String(dT));
  if (dT < 0) throw cycleInputError(input, dT, differenceText(dT), "negative", "0 K or more");
  return dT;
}

/** A pressure drop [Pa]: zero or more, and less than the pressure it is taken from. */
export function requireDrop(input: string, dp: number, from: number): number {
  requireFinite(input, dp, String(dp));
  if (dp < 0) throw cycleInputError(input, dp, pressureText(dp), "negative", "0 bar or more");
  if (dp >= from) throw cycleInputError(input, dp, pressureText(dp), `not below the pressure it is taken from, ${pressureText(from)}`, `less than ${pressureText(from)}`);
  return dp;
}

/** An efficiency in (0, 1]: zero would need infinite work, above one would create energy. */
export function requireEfficiency(input: string, eta: number): number {
  requireFinite(input, eta, String(eta));
  if (!(eta > 0 && eta <= 1)) throw cycleInputError(input, eta, String(eta), "outside (0, 1]", "a number above 0 and at most 1 (e.g. 0.7)");
  return eta;
}

/** A heat-exchanger effectiveness in [0, 1]. */
export function requireEffectiveness(input: string, eps: number): number {
  requireFinite(input, eps, String(eps));
  if (!(eps >= 0 && eps <= 1)) throw cycleInputError(input, eps, String(eps), "outside [0, 1]", "a number from 0 to 1 (e.g. 0.6)");
  return eps;
}

/** A capacity [W]: positive. */
export function requireCapacity(input: string, q: number): number {
  requireFinite(input, q, String(q));
  if (!(q > 0)) throw cycleInputError(input, q, `${round(q / 1e3)} kW`, "not positive", "a power above 0 W (e.g. 10kW)");
  return q;
}
