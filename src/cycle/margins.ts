// Superheat and subcooling of a state: how far it lies from the dew and bubble points at its own
// pressure. Blends count superheat from the dew point and subcooling from the bubble point.
import type { State } from "../eos/index.js";
import { twoPhasePressureLimit } from "./level.js";
import { bubbleDewAtP, twoPhasePressureSpan, type WorkingFluid as Fluid } from "./working-fluid.js";

export interface Margins {
  /** Bubble and dew temperatures at the state's pressure [K]; absent at or above the critical pressure. */
  bubble?: number;
  dew?: number;
  /** T − T_dew for vapour warmer than the dew point [K]. */
  superheat?: number;
  /** T_bubble − T for liquid colder than the bubble point [K]. */
  subcooling?: number;
}

/** The lowest pressure with a dew and a bubble point inside the equation's range [Pa]. */
function twoPhasePressureFloor(f: Fluid): number {
  return twoPhasePressureSpan(f)[0];
}

export function saturationMargins(f: Fluid, st: State): Margins {
  if (!(st.p < twoPhasePressureLimit(f) && st.p >= twoPhasePressureFloor(f))) return {};
  const sat = bubbleDewAtP(f, st.p);
  const m: Margins = { bubble: sat.TL, dew: sat.TV };
  if (st.phase === "two-phase") return m;
  if (st.T >= sat.TV) m.superheat = st.T - sat.TV;
  if (st.T <= sat.TL) m.subcooling = sat.TL - st.T;
  return m;
}
