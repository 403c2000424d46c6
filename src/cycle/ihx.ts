// The internal (suction–liquid) heat exchanger: warm liquid from the condenser or gas cooler gives heat
// to the cold suction gas. Equal mass flows on both sides; effectiveness = duty / largest possible duty.
import type { ReferenceName, State } from "../eos/index.js";
import { statePH, stateTP, type WorkingFluid as Fluid } from "./working-fluid.js";
import { cycleInputError, requireEffectiveness, temperatureText } from "./check.js";

export interface HeatExchange {
  liquidOut: State;
  vapourOut: State;
  /** Heat passed from the liquid to the vapour per unit mass flow [J/kg]. */
  duty: number;
}

/**
 * The largest duty is set by whichever stream would first reach the other's inlet temperature: the
 * vapour warmed to the liquid inlet temperature, or the liquid cooled to the vapour inlet temperature.
 * Enthalpies rather than heat capacities keep this right where cp varies strongly (near the critical point).
 */
export function largestDuty(f: Fluid, liquidIn: State, vapourIn: State, ref: ReferenceName): number {
  const vapourLimit = stateTP(f, liquidIn.T, vapourIn.p, ref).h - vapourIn.h;
  const liquidLimit = liquidIn.h - stateTP(f, vapourIn.T, liquidIn.p, ref).h;
  return Math.min(vapourLimit, liquidLimit);
}

export function internalHeatExchange(f: Fluid, liquidIn: State, vapourIn: State, effectiveness: number, ref: ReferenceName, input = "ihx"): HeatExchange {
  const eps = requireEffectiveness(input, effectiveness);
  if (!(liquidIn.T > vapourIn.T)) {
    throw cycleInputError(input, eps, String(eps), `the liquid at ${temperatureText(liquidIn.T)} is not warmer than the suction gas at ${temperatureText(vapourIn.T)}, so no heat can pass`, "an internal heat exchanger only where the liquid is warmer than the suction gas");
  }
  const duty = eps * largestDuty(f, liquidIn, vapourIn, ref);
  return { duty, liquidOut: statePH(f, liquidIn.p, liquidIn.h - duty, ref), vapourOut: statePH(f, vapourIn.p, vapourIn.h + duty, ref) };
}
