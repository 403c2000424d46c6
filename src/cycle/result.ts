// The result of every cycle model: its numbered points, performance and drawn path, with the levels
// and conventions it was computed under so that output can state them beside the numbers.
import type { ReferenceName } from "../eos/index.js";
import type { ResolvedLevel } from "./level.js";
import type { PathPoint } from "./path.js";
import type { Performance, Stage } from "./performance.js";
import type { CyclePoint } from "./point.js";

export type CycleModel = "single-stage" | "two-stage-flash-tank" | "two-stage-open-intercooler" | "two-stage-economiser" | "transcritical";

export const MODEL_TEXT: Record<CycleModel, string> = {
  "single-stage": "single-stage vapour compression",
  "two-stage-flash-tank": "two-stage vapour compression with flash tank",
  "two-stage-open-intercooler": "two-stage vapour compression with open flash intercooler",
  "two-stage-economiser": "two-stage vapour compression with economiser",
  transcritical: "transcritical single-stage cycle",
};

/** The high-pressure search of a transcritical cycle: where the COP for cooling peaks inside the bounds. */
export interface HighPressureOptimum {
  /** High-side pressure [Pa] and the COP for cooling there. */
  pressure: number;
  cop: number;
  /** Search bounds [Pa] and the width the search stopped at [Pa]. */
  bounds: [number, number];
  tolerance: number;
  evaluations: number;
  /** True when the optimum sits on a bound: the COP still rises towards it. */
  atBound: boolean;
  /** The lowest pressure within the bounds where the cycle has a refrigerating effect, when above the lower bound [Pa]. */
  lowestComputable?: number;
}

export interface CycleResult {
  model: CycleModel;
  fluid: string;
  /** True for a pseudo-pure blend, whose temperature levels are read at a glide point. */
  blend: boolean;
  reference: ReferenceName;
  levels: {
    evaporating: ResolvedLevel;
    condensing?: ResolvedLevel;
    intermediate?: ResolvedLevel & { source: "given" | "geometric-mean" };
  };
  /** Transcritical high side: pressure [Pa] and gas-cooler outlet temperature [K]. */
  highSide?: { pressure: number; gasCoolerOutlet: number };
  /** Given superheat at the evaporator outlet and subcooling at the condenser outlet [K]. */
  superheat: number;
  subcooling?: number;
  /** Suction and discharge line pressure drops [Pa]. */
  drops: { suction: number; discharge: number };
  /** Internal heat exchanger: effectiveness and duty per kg through the evaporator [J/kg]. */
  ihx?: { effectiveness: number; duty: number };
  /** Economiser: approach of the liquid outlet to the injection inlet temperature [K]. */
  economiserApproach?: number;
  /** How the model reads its inputs and what it assumes, in words (printed with every result). */
  notes: string[];
  points: CyclePoint[];
  /** Isentropic discharge ends ("2s"), off the drawn path. */
  auxiliary: CyclePoint[];
  stages: Stage[];
  performance: Performance;
  /** Closed path through the main circuit in (h [J/kg], p [Pa]), refined along each process. */
  path: PathPoint[];
  /** Open paths of side streams (flash gas, economiser injection). */
  branches: PathPoint[][];
  optimum?: HighPressureOptimum;
}
