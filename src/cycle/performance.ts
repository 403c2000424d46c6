// Performance of a cycle from its state points: specific duties per unit mass flow through the
// evaporator, COPs, pressure ratios, and mass and volume flows when a cooling capacity is given.
import type { CyclePoint } from "./point.js";

export interface Stage {
  name: "compressor" | "low stage" | "high stage";
  suction: CyclePoint;
  discharge: CyclePoint;
  /** The isentropic end at the discharge pressure. */
  isentropic: CyclePoint;
  /** Isentropic efficiency, given or derived from a measured discharge temperature. */
  efficiency: number;
  /** Mass flow per unit mass flow through the evaporator. */
  flow: number;
}

export interface StageFlows {
  name: Stage["name"];
  /** [kg/s] */
  massFlow: number;
  /** Volume flow at the suction [m³/s]. */
  suctionVolumeFlow: number;
  /** Shaft work delivered to the gas [W]. */
  power: number;
}

export interface CapacityFigures {
  /** Cooling capacity (as given), heat rejected and compressor power [W]. */
  cooling: number;
  heatRejected: number;
  power: number;
  /** Mass flow through the evaporator and through the condenser or gas cooler [kg/s]. */
  evaporatorMassFlow: number;
  rejectionMassFlow: number;
  stages: StageFlows[];
}

export interface Performance {
  /** Refrigerating effect h_evaporator-outlet − h_evaporator-inlet [J/kg]. */
  refrigeratingEffect: number;
  /** Compressor work, all stages, per kg through the evaporator [J/kg]. */
  compressorWork: number;
  /** Heat rejected in the condenser or gas cooler, per kg through the evaporator [J/kg]. */
  heatRejected: number;
  copCooling: number;
  copHeating: number;
  /** Discharge over suction pressure of the whole compression (first suction to last discharge). */
  pressureRatio: number;
  stagePressureRatios: number[];
  /** Work of each stage per kg through the evaporator [J/kg]. */
  stageWork: number[];
  /** Temperature at the last compressor's discharge [K]. */
  dischargeTemperature: number;
  /** Refrigerating effect per unit volume drawn in by the first stage [J/m³]. */
  volumetricCapacity: number;
  /** Mass and volume flows for a given cooling capacity. */
  capacity?: CapacityFigures;
}

export interface PerformanceInputs {
  evaporatorInlet: CyclePoint;
  evaporatorOutlet: CyclePoint;
  /** Inlet and outlet of the condenser or gas cooler. */
  rejectionInlet: CyclePoint;
  rejectionOutlet: CyclePoint;
  /** Compressor stages in flow order. */
  stages: readonly Stage[];
}

export function stageWork(s: Stage): number {
  return s.flow * (s.discharge.state.h - s.suction.state.h);
}

export function performanceOf(c: PerformanceInputs, cooling?: number): Performance {
  const first = c.stages[0]!, last = c.stages[c.stages.length - 1]!;
  const refrigeratingEffect = c.evaporatorOutlet.state.h - c.evaporatorInlet.state.h;
  const works = c.stages.map(stageWork);
  const compressorWork = works.reduce((a, b) => a + b, 0);
  const heatRejected = c.rejectionInlet.flow * (c.rejectionInlet.state.h - c.rejectionOutlet.state.h);
  const perf: Performance = {
    refrigeratingEffect, compressorWork, heatRejected,
    copCooling: refrigeratingEffect / compressorWork,
    copHeating: heatRejected / compressorWork,
    pressureRatio: last.discharge.state.p / first.suction.state.p,
    stagePressureRatios: c.stages.map((s) => s.discharge.state.p / s.suction.state.p),
    stageWork: works,
    dischargeTemperature: last.discharge.state.T,
    volumetricCapacity: refrigeratingEffect / first.suction.state.v,
  };
  if (cooling !== undefined) perf.capacity = capacityFigures(c, perf, cooling);
  return perf;
}

function capacityFigures(c: PerformanceInputs, perf: Performance, cooling: number): CapacityFigures {
  const m = cooling / perf.refrigeratingEffect;
  return {
    cooling,
    heatRejected: m * perf.heatRejected,
    power: m * perf.compressorWork,
    evaporatorMassFlow: m,
    rejectionMassFlow: m * c.rejectionInlet.flow,
    stages: c.stages.map((s, i) => ({ name: s.name, massFlow: m * s.flow, suctionVolumeFlow: m * s.flow * s.suction.state.v, power: m * perf.stageWork[i]! })),
  };
}
