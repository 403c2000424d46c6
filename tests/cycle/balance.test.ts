// Internal checks of the cycle models: energy and mass balances close, and every point is the state
// its definition says (saturation plus superheat, the isentropic end and efficiency, throttling at
// constant enthalpy), recomputed here from the engine's flashes independently of the models' code.
import { describe, expect, it } from "vitest";
import { flashPH, flashPS, flashPX, flashTP, getFluid, saturationP } from "../../src/eos/index.js";
import {
  findPoint, optimiseHighPressure, singleStageCycle, transcriticalCycle, twoStageCycle,
  type CycleResult, type Role, type SingleStageSpec, type TwoStageSpec,
} from "../../src/cycle/index.js";

const C = (t: number) => t + 273.15;
const bar = 1e5;

const singles: [string, SingleStageSpec][] = [
  ["R134a −10/40 °C, 5 K, 3 K, η 0.7", { fluid: "R134a", evaporating: { T: C(-10) }, condensing: { T: C(40) }, superheat: 5, subcooling: 3, compressor: { efficiency: 0.7 } }],
  ["R407C 0/45 °C at mid-points, line drops", { fluid: "R407C", evaporating: { T: C(0) }, condensing: { T: C(45) }, glidePoint: "mid", superheat: 6, subcooling: 2, suctionDrop: 0.2 * bar, dischargeDrop: 0.3 * bar, compressor: { efficiency: 0.65 }, capacity: 12e3 }],
  ["R404A −30/35 °C at dew points, IHX 0.6", { fluid: "R404A", evaporating: { T: C(-30) }, condensing: { T: C(35) }, superheat: 5, subcooling: 2, ihx: 0.6, compressor: { efficiency: 0.6 } }],
  ["propane by pressure, IHX 0.8, iir reference", { fluid: "propane", reference: "iir", evaporating: { p: 3 * bar }, condensing: { p: 15 * bar }, superheat: 3, ihx: 0.8, compressor: { efficiency: 0.75 } }],
  ["ammonia with a discharge temperature", { fluid: "ammonia", evaporating: { T: C(-10) }, condensing: { T: C(35) }, superheat: 4, subcooling: 1, compressor: { dischargeTemperature: C(125) } }],
  ["R410A at bubble points", { fluid: "R410A", evaporating: { T: C(5) }, condensing: { T: C(50) }, glidePoint: "bubble", superheat: 8, subcooling: 4, compressor: { efficiency: 0.68 } }],
];

const twos: [string, TwoStageSpec][] = [
  ["ammonia −35/35 °C flash tank", { fluid: "ammonia", evaporating: { T: C(-35) }, condensing: { T: C(35) }, superheat: 2, arrangement: "flash-tank", lowStage: { efficiency: 0.7 }, highStage: { efficiency: 0.75 }, capacity: 50e3 }],
  ["ammonia −35/35 °C open flash intercooler, drops", { fluid: "ammonia", evaporating: { T: C(-35) }, condensing: { T: C(35) }, superheat: 3, subcooling: 2, arrangement: "open-intercooler", suctionDrop: 0.05 * bar, dischargeDrop: 0.2 * bar, lowStage: { efficiency: 0.7 }, highStage: { efficiency: 0.72 }, capacity: 50e3 }],
  ["R404A −40/40 °C economiser, drops", { fluid: "R404A", evaporating: { T: C(-40) }, condensing: { T: C(40) }, superheat: 5, subcooling: 2, arrangement: "economiser", economiserApproach: 4, suctionDrop: 0.1 * bar, dischargeDrop: 0.2 * bar, lowStage: { efficiency: 0.65 }, highStage: { efficiency: 0.7 } }],
  ["R134a economiser at a given intermediate temperature", { fluid: "R134a", evaporating: { T: C(-25) }, condensing: { T: C(45) }, intermediate: { T: C(5) }, arrangement: "economiser", lowStage: { efficiency: 0.7 }, highStage: { dischargeTemperature: C(70) } }],
];

function all(): [string, CycleResult][] {
  return [
    ...singles.map(([n, s]) => [n, singleStageCycle(s)] as [string, CycleResult]),
    ...twos.map(([n, s]) => [n, twoStageCycle(s)] as [string, CycleResult]),
    ["co2 transcritical 90 bar", transcriticalCycle({ fluid: "co2", evaporating: { T: C(-5) }, superheat: 5, gasCoolerOutlet: C(35), highPressure: 90 * bar, compressor: { efficiency: 0.7 } })],
    ["co2 transcritical, IHX 0.5, optimised", optimiseHighPressure({ fluid: "co2", evaporating: { T: C(0) }, gasCoolerOutlet: C(38), ihx: 0.5, compressor: { efficiency: 0.72 }, capacity: 20e3 })],
  ];
}

const at = (r: CycleResult, role: Role) => findPoint(r.points, role)!;

describe("energy balance: heat rejected = refrigerating effect + compressor work, to 1e-9 relative", () => {
  for (const [name, r] of all()) {
    it(name, () => {
      const p = r.performance;
      expect(Math.abs(p.heatRejected - (p.refrigeratingEffect + p.compressorWork)) / p.heatRejected).toBeLessThan(1e-9);
      expect(Math.abs(p.copHeating - p.copCooling - 1)).toBeLessThan(1e-9);
      expect(p.refrigeratingEffect).toBeGreaterThan(0);
    });
  }
});

describe("every point is the state its definition gives, recomputed from the engine", () => {
  for (const [name, r] of all()) {
    it(name, () => {
      const f = getFluid(r.fluid);
      const ref = r.reference;
      // Each point re-flashed from its own (p, h) gives the same T and s.
      for (const pt of [...r.points, ...r.auxiliary]) {
        const again = flashPH(f, pt.state.p, pt.state.h, ref);
        expect(Math.abs(again.T - pt.state.T) / pt.state.T).toBeLessThan(1e-9);
        expect(Math.abs(again.s - pt.state.s)).toBeLessThan(1e-9 * Math.max(Math.abs(pt.state.s), 1e3));
      }
      const out = at(r, "evaporator-outlet").state;
      expect(out.p).toBeCloseTo(r.levels.evaporating.p, 6);
      const dew = saturationP(f, out.p).TV;
      expect(Math.abs(out.T - (dew + r.superheat))).toBeLessThan(1e-7);
      // Valves and lines keep enthalpy.
      const evapIn = at(r, "evaporator-inlet").state;
      expect(evapIn.p).toBeCloseTo(r.levels.evaporating.p, 6);
      // Each compression: isentropic end at the discharge pressure, efficiency (h2s − h1)/(h2 − h1).
      for (const s of r.stages) {
        const iso = flashPS(f, s.discharge.state.p, s.suction.state.s, ref);
        expect(Math.abs(iso.h - s.isentropic.state.h)).toBeLessThan(1e-6);
        expect(Math.abs((iso.h - s.suction.state.h) / (s.discharge.state.h - s.suction.state.h) - s.efficiency)).toBeLessThan(1e-9);
      }
      if (r.subcooling !== undefined) {
        const cond = at(r, "condenser-outlet").state;
        const expected = r.subcooling === 0 ? flashPX(f, cond.p, 0, ref) : flashTP(f, saturationP(f, cond.p).TL - r.subcooling, cond.p, ref);
        expect(Math.abs(cond.h - expected.h)).toBeLessThan(1e-6);
      }
      const suction = findPoint(r.points, "compressor-suction") ?? at(r, "low-stage-suction");
      expect(Math.abs(suction.state.p - (r.levels.evaporating.p - r.drops.suction))).toBeLessThan(1e-6 * suction.state.p);
    });
  }
});

describe("side streams and heat exchangers balance", () => {
  it("flash tank: inlet enthalpy flow = liquid out + vapour out; vapour and liquid saturated at the intermediate pressure", () => {
    const r = twoStageCycle(twos[0]![1]);
    const f = getFluid(r.fluid);
    const inlet = at(r, "flash-tank-inlet"), liquid = at(r, "flash-tank-liquid"), vapour = at(r, "flash-tank-vapour");
    const pi = r.levels.intermediate!.p;
    expect(Math.abs(inlet.flow * inlet.state.h - (liquid.flow * liquid.state.h + vapour.flow * vapour.state.h)) / (inlet.flow * inlet.state.h)).toBeLessThan(1e-12);
    expect(Math.abs(liquid.state.h - flashPX(f, pi, 0).h)).toBeLessThan(1e-6);
    expect(Math.abs(vapour.state.h - flashPX(f, pi, 1).h)).toBeLessThan(1e-6);
    const mixIn = at(r, "low-stage-discharge"), mixOut = at(r, "high-stage-suction");
    expect(Math.abs(mixOut.flow - mixIn.flow - vapour.flow)).toBeLessThan(1e-12);
    expect(Math.abs(mixOut.flow * mixOut.state.h - (mixIn.flow * mixIn.state.h + vapour.flow * vapour.state.h)) / (mixOut.flow * mixOut.state.h)).toBeLessThan(1e-9);
  });
  it("open flash intercooler: condenser liquid and low-stage discharge in = saturated vapour and liquid out", () => {
    const r = twoStageCycle(twos[1]![1]);
    const f = getFluid(r.fluid);
    const pi = r.levels.intermediate!.p;
    const low = at(r, "low-stage-discharge"), inlet = at(r, "flash-tank-inlet"), liquid = at(r, "flash-tank-liquid"), vapour = at(r, "high-stage-suction");
    const hin = low.flow * low.state.h + inlet.flow * inlet.state.h, hout = vapour.flow * vapour.state.h + liquid.flow * liquid.state.h;
    expect(Math.abs(hin - hout) / hin).toBeLessThan(1e-12);
    expect(Math.abs(low.flow + inlet.flow - vapour.flow - liquid.flow)).toBeLessThan(1e-12);
    expect(Math.abs(vapour.state.h - flashPX(f, pi, 1).h)).toBeLessThan(1e-6);
    expect(Math.abs(liquid.state.h - flashPX(f, pi, 0).h)).toBeLessThan(1e-6);
  });
  it("economiser: heat from the main liquid = heat to the injected stream; outlet = injection inlet + approach", () => {
    const r = twoStageCycle(twos[2]![1]);
    const cond = at(r, "condenser-outlet"), out = at(r, "economiser-liquid-outlet"), injIn = at(r, "economiser-injection-inlet"), injOut = at(r, "economiser-injection-outlet");
    const main = out.flow * (cond.state.h - out.state.h), side = injIn.flow * (injOut.state.h - injIn.state.h);
    expect(Math.abs(main - side) / main).toBeLessThan(1e-9);
    expect(Math.abs(out.state.T - (injIn.state.T + 4))).toBeLessThan(1e-7);
    expect(Math.abs(injIn.state.h - cond.state.h)).toBeLessThan(1e-6);
    expect(Math.abs(cond.flow - out.flow - injIn.flow)).toBeLessThan(1e-12);
  });
  it("internal heat exchanger: vapour gain = liquid loss = effectiveness × largest duty, the largest duty recomputed here", () => {
    const r = singleStageCycle(singles[2]![1]);
    const f = getFluid(r.fluid);
    const vIn = at(r, "evaporator-outlet").state, vOut = at(r, "ihx-vapour-outlet").state;
    const lIn = at(r, "condenser-outlet").state, lOut = at(r, "ihx-liquid-outlet").state;
    const gain = vOut.h - vIn.h, loss = lIn.h - lOut.h;
    expect(Math.abs(gain - loss) / gain).toBeLessThan(1e-9);
    const largest = Math.min(flashTP(f, lIn.T, vIn.p).h - vIn.h, lIn.h - flashTP(f, vIn.T, lIn.p).h);
    expect(Math.abs(gain / largest - 0.6)).toBeLessThan(1e-9);
    expect(vOut.T).toBeLessThan(lIn.T);
    expect(lOut.T).toBeGreaterThan(vIn.T);
  });
});

describe("flows for a given capacity", () => {
  it("mass flow × refrigerating effect = capacity; volume flow = mass flow × suction volume; volumetric capacity × volume flow = capacity", () => {
    const r = singleStageCycle(singles[1]![1]);
    const c = r.performance.capacity!;
    expect(Math.abs(c.evaporatorMassFlow * r.performance.refrigeratingEffect - 12e3)).toBeLessThan(1e-8);
    const v = at(r, "compressor-suction").state.v;
    expect(Math.abs(c.stages[0]!.suctionVolumeFlow - c.evaporatorMassFlow * v)).toBeLessThan(1e-15);
    expect(Math.abs(r.performance.volumetricCapacity * c.stages[0]!.suctionVolumeFlow - 12e3)).toBeLessThan(1e-8);
    expect(Math.abs(c.heatRejected - c.cooling - c.power) / c.heatRejected).toBeLessThan(1e-9);
  });
  it("two-stage: each stage's flow follows its points' flows", () => {
    const r = twoStageCycle(twos[0]![1]);
    const c = r.performance.capacity!;
    const [low, high] = c.stages;
    expect(Math.abs(high!.massFlow / low!.massFlow - at(r, "high-stage-suction").flow)).toBeLessThan(1e-12);
    expect(Math.abs(high!.suctionVolumeFlow - high!.massFlow * at(r, "high-stage-suction").state.v)).toBeLessThan(1e-15);
  });
});

describe("glide points of a blend: a temperature level is the dew, bubble or mid-point temperature at the resolved pressure", () => {
  const f = getFluid("R407C");
  for (const point of ["dew", "bubble", "mid"] as const) {
    it(point, () => {
      const r = singleStageCycle({ fluid: f, evaporating: { T: C(-5) }, condensing: { T: C(40) }, glidePoint: point, compressor: { efficiency: 0.7 } });
      for (const [l, T] of [[r.levels.evaporating, C(-5)], [r.levels.condensing!, C(40)]] as const) {
        const sat = saturationP(f, l.p);
        const at = point === "dew" ? sat.TV : point === "bubble" ? sat.TL : 0.5 * (sat.TL + sat.TV);
        expect(Math.abs(at - T)).toBeLessThan(1e-6);
        expect(sat.TV - sat.TL).toBeGreaterThan(3); // R407C glides several kelvin (common practice)
      }
    });
  }
  it("a level's own glide point overrides the cycle's", () => {
    const r = singleStageCycle({ fluid: f, evaporating: { T: C(-5), glidePoint: "bubble" }, condensing: { T: C(40) }, glidePoint: "dew", compressor: { efficiency: 0.7 } });
    expect(Math.abs(saturationP(f, r.levels.evaporating.p).TL - C(-5))).toBeLessThan(1e-6);
    expect(Math.abs(saturationP(f, r.levels.condensing!.p).TV - C(40))).toBeLessThan(1e-6);
  });
});
