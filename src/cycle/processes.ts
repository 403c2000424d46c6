// The elementary processes a cycle is built from, each a pure function of states and pressures:
// leaving an evaporator superheated, leaving a condenser subcooled, throttling, adiabatic mixing.
import type { ReferenceName, State } from "../eos/index.js";
import { bubbleDewAtP, statePH, statePX, stateTP, type WorkingFluid as Fluid } from "./working-fluid.js";
import { cycleInputError, differenceText, temperatureText } from "./check.js";

/** Vapour at pressure p [Pa], `superheat` [K] above the dew point; saturated vapour for zero superheat. */
export function superheatedVapour(f: Fluid, p: number, superheat: number, ref: ReferenceName, input = "superheat"): State {
  if (superheat === 0) return statePX(f, p, 1, ref);
  const T = bubbleDewAtP(f, p).TV + superheat;
  if (T > f.Tmax) throw cycleInputError(input, superheat, differenceText(superheat), `puts the vapour at ${temperatureText(T)}, above the equation's upper limit for ${f.id}`, `at most ${differenceText(f.Tmax - (T - superheat))}`);
  return stateTP(f, T, p, ref);
}

/** Liquid at pressure p [Pa], `subcooling` [K] below the bubble point; saturated liquid for zero subcooling. */
export function subcooledLiquid(f: Fluid, p: number, subcooling: number, ref: ReferenceName, input = "subcooling"): State {
  if (subcooling === 0) return statePX(f, p, 0, ref);
  const bubble = bubbleDewAtP(f, p).TL;
  const T = bubble - subcooling;
  if (T < f.Tmin) throw cycleInputError(input, subcooling, differenceText(subcooling), `puts the liquid at ${temperatureText(T)}, below the equation's lower limit for ${f.id}`, `at most ${differenceText(bubble - f.Tmin)}`);
  return stateTP(f, T, p, ref);
}

/** Adiabatic flow through a valve or a line: enthalpy kept, pressure lowered to p [Pa]. */
export function throttle(f: Fluid, from: State, p: number, ref: ReferenceName): State {
  return statePH(f, p, from.h, ref);
}

/** Adiabatic mixing of streams at pressure p [Pa]; flows in any consistent unit. */
export function mix(f: Fluid, p: number, streams: readonly { state: State; flow: number }[], ref: ReferenceName): State {
  let m = 0, mh = 0;
  for (const s of streams) {
    m += s.flow;
    mh += s.flow * s.state.h;
  }
  return statePH(f, p, mh / m, ref);
}
