// The single-stage circuit shared by the subcritical and transcritical models: evaporator, optional
// internal heat exchanger, suction line, compressor, discharge line, condenser or gas cooler, valve.
import type { ReferenceName, State } from "../eos/index.js";
import type { WorkingFluid as Fluid } from "./working-fluid.js";
import { chainPoints, makePoint, type ChainStep } from "./chain.js";
import { compress, type Compressor } from "./compression.js";
import { internalHeatExchange } from "./ihx.js";
import { tracePath, type PathPoint } from "./path.js";
import { performanceOf, type Performance, type Stage } from "./performance.js";
import type { CyclePoint, Role } from "./point.js";
import { superheatedVapour, throttle } from "./processes.js";

export interface CircuitSpec {
  /** Evaporator pressure [Pa] and superheat at its outlet [K]. */
  pEvaporator: number;
  superheat: number;
  /** Condenser or gas-cooler pressure [Pa] and the state leaving it. */
  pHigh: number;
  highOutlet: State;
  highSide: "condenser" | "gas-cooler";
  compressor: Compressor;
  /** Suction and discharge line pressure drops [Pa]. */
  suctionDrop: number;
  dischargeDrop: number;
  /** Internal heat exchanger effectiveness, if the circuit has one. */
  ihx?: number;
  /** Cooling capacity [W], for flows. */
  capacity?: number;
}

export interface Circuit {
  points: CyclePoint[];
  auxiliary: CyclePoint[];
  stages: Stage[];
  performance: Performance;
  path: PathPoint[];
  ihxDuty?: number;
}

const ROLES: Record<CircuitSpec["highSide"], { inlet: Role; outlet: Role }> = {
  condenser: { inlet: "condenser-inlet", outlet: "condenser-outlet" },
  "gas-cooler": { inlet: "gas-cooler-inlet", outlet: "gas-cooler-outlet" },
};

export function singleStageCircuit(f: Fluid, ref: ReferenceName, c: CircuitSpec): Circuit {
  const evapOut = superheatedVapour(f, c.pEvaporator, c.superheat, ref);
  const hx = c.ihx === undefined ? undefined : internalHeatExchange(f, c.highOutlet, evapOut, c.ihx, ref);
  const vapour = hx ? hx.vapourOut : evapOut;
  const suction = c.suctionDrop > 0 ? throttle(f, vapour, c.pEvaporator - c.suctionDrop, ref) : vapour;
  const comp = compress(f, suction, c.pHigh + c.dischargeDrop, c.compressor, ref);
  const highIn = c.dischargeDrop > 0 ? throttle(f, comp.discharge, c.pHigh, ref) : comp.discharge;
  const liquid = hx ? hx.liquidOut : c.highOutlet;
  const evapIn = throttle(f, liquid, c.pEvaporator, ref);
  const roles = ROLES[c.highSide];
  const steps: ChainStep[] = [
    { state: evapOut, role: "evaporator-outlet", flow: 1, process: "isobaric" },
    ...(hx ? [{ state: hx.vapourOut, role: "ihx-vapour-outlet" as const, flow: 1, process: "isobaric" as const }] : []),
    { state: suction, role: "compressor-suction", flow: 1, process: "isenthalpic", same: c.suctionDrop === 0 },
    { state: comp.discharge, role: "compressor-discharge", flow: 1, process: "compression" },
    { state: highIn, role: roles.inlet, flow: 1, process: "isenthalpic", same: c.dischargeDrop === 0 },
    { state: c.highOutlet, role: roles.outlet, flow: 1, process: "isobaric" },
    ...(hx ? [{ state: hx.liquidOut, role: "ihx-liquid-outlet" as const, flow: 1, process: "isobaric" as const }] : []),
    { state: evapIn, role: "evaporator-inlet", flow: 1, process: "isenthalpic" },
  ];
  const { points, legs } = chainPoints(f, steps);
  const at = (role: Role) => points.find((p) => p.roles.includes(role))!;
  const discharge = at("compressor-discharge");
  const isentropic = makePoint(f, `${discharge.label}s`, ["isentropic-discharge"], comp.isentropic, 1);
  const stages: Stage[] = [{ name: "compressor", suction: at("compressor-suction"), discharge, isentropic, efficiency: comp.efficiency, flow: 1 }];
  const performance = performanceOf({ evaporatorInlet: at("evaporator-inlet"), evaporatorOutlet: at("evaporator-outlet"), rejectionInlet: at(roles.inlet), rejectionOutlet: at(roles.outlet), stages }, c.capacity);
  const path = tracePath(f, evapOut, [...legs, { to: evapOut, process: "isobaric" }], ref);
  path.pop();
  const circuit: Circuit = { points, auxiliary: [isentropic], stages, performance, path };
  if (hx) circuit.ihxDuty = hx.duty;
  return circuit;
}
