// Cycle models against textbook worked examples and a published correlation, all recalled from memory
// (flagged on each line). The books' refrigerant tables predate or round the equation domeprint uses,
// so absolute enthalpies may differ by a few hundredths of a kJ/kg and derived figures by their last digit;
// each tolerance says which. Inputs are the books' stated conditions; nothing here was computed by domeprint first.
import { describe, expect, it } from "vitest";
import { flashPX, getFluid } from "../../src/eos/index.js";
import { findPoint, optimiseHighPressure, singleStageCycle, twoStageCycle, type CycleResult, type Role } from "../../src/cycle/index.js";
import { rel } from "../support.js";

const kJ = 1e3, MPa = 1e6;
const h = (r: CycleResult, role: Role) => findPoint(r.points, role)!.state.h / kJ;

describe("Cengel & Boles, Thermodynamics: An Engineering Approach, 5th ed., Example 11-1 (ideal cycle, R-134a, 0.14/0.8 MPa, 0.05 kg/s; from memory)", () => {
  // The book's R-134a tables put h = s = 0 for saturated liquid at −40 °C: domeprint's ashrae reference.
  const r = singleStageCycle({ fluid: "R134a", reference: "ashrae", evaporating: { p: 0.14 * MPa }, condensing: { p: 0.8 * MPa }, compressor: { efficiency: 1 } });
  const m = 0.05; // kg/s, the book's mass flow
  it("state enthalpies h1 = 239.16, h2 = 275.39, h3 = h4 = 95.47 kJ/kg within 0.1 kJ/kg (book tables)", () => {
    expect(Math.abs(h(r, "compressor-suction") - 239.16)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "compressor-discharge") - 275.39)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "condenser-outlet") - 95.47)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "evaporator-inlet") - 95.47)).toBeLessThan(0.1); // from memory
  });
  it("Q_L = 7.18 kW, W_in = 1.81 kW, Q_H = 8.99 kW (printed to 0.01 kW), COP_R = 3.97 (printed to 0.01)", () => {
    expect(Math.abs((m * r.performance.refrigeratingEffect) / kJ - 7.18)).toBeLessThan(0.01); // from memory
    expect(Math.abs((m * r.performance.compressorWork) / kJ - 1.81)).toBeLessThan(0.01); // from memory
    expect(Math.abs((m * r.performance.heatRejected) / kJ - 8.99)).toBeLessThan(0.01); // from memory
    expect(Math.abs(r.performance.copCooling - 3.97)).toBeLessThan(0.01); // from memory
  });
});

describe("Cengel & Boles, 5th ed., Example 11-2 (actual cycle, R-134a: 0.14 MPa −10 °C in, 0.8 MPa 50 °C out, 26 °C and 0.72 MPa after the condenser; from memory)", () => {
  // The book's states map onto domeprint's inputs: the superheat and subcooling are the book's temperatures
  // measured from saturation at the book's pressures; the 0.08 MPa between compressor and condenser is a discharge drop.
  const f = getFluid("R134a");
  const superheat = 263.15 - flashPX(f, 0.14 * MPa, 1).T;
  const subcooling = flashPX(f, 0.72 * MPa, 0).T - 299.15;
  const r = singleStageCycle({
    fluid: f, reference: "ashrae", evaporating: { p: 0.14 * MPa }, condensing: { p: 0.72 * MPa }, superheat, subcooling,
    dischargeDrop: 0.08 * MPa, compressor: { dischargeTemperature: 323.15 },
  });
  const m = 0.05;
  it("h1 = 246.36, h2 = 286.69 kJ/kg within 0.1 kJ/kg; h3 = 87.83 kJ/kg (book: saturated liquid at 26 °C) within 0.1 kJ/kg", () => {
    expect(Math.abs(h(r, "compressor-suction") - 246.36)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "compressor-discharge") - 286.69)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "condenser-outlet") - 87.83)).toBeLessThan(0.1); // from memory
  });
  it("Q_L = 7.93 kW, W_in = 2.02 kW (printed to 0.01 kW), isentropic efficiency 93.9 % (printed to 0.1 %), COP_R = 3.93", () => {
    expect(Math.abs((m * r.performance.refrigeratingEffect) / kJ - 7.93)).toBeLessThan(0.01); // from memory
    expect(Math.abs((m * r.performance.compressorWork) / kJ - 2.02)).toBeLessThan(0.01); // from memory
    expect(Math.abs(r.stages[0]!.efficiency - 0.939)).toBeLessThan(0.002); // from memory
    expect(Math.abs(r.performance.copCooling - 3.93)).toBeLessThan(0.01); // from memory
  });
});

describe("Cengel & Boles, 5th ed., Example 11-5 (two-stage with flash chamber, R-134a, 0.8/0.32/0.14 MPa, isentropic; from memory)", () => {
  const r = twoStageCycle({
    fluid: "R134a", reference: "ashrae", evaporating: { p: 0.14 * MPa }, condensing: { p: 0.8 * MPa }, intermediate: { p: 0.32 * MPa },
    arrangement: "flash-tank", lowStage: { efficiency: 1 }, highStage: { efficiency: 1 },
  });
  // The book counts per kg through the condenser; domeprint per kg through the evaporator.
  const perCondenserKg = 1 / findPoint(r.points, "condenser-outlet")!.flow;
  it("fraction flashing in the chamber x6 = 0.2049 (printed to 1e-4)", () => {
    expect(Math.abs(findPoint(r.points, "flash-tank-inlet")!.state.x! - 0.2049)).toBeLessThan(3e-4); // from memory
  });
  it("q_L = 146.3 kJ/kg and w_in = 32.71 kJ/kg per kg through the condenser, COP_R = 4.47", () => {
    expect(Math.abs((r.performance.refrigeratingEffect * perCondenserKg) / kJ - 146.3)).toBeLessThan(0.15); // from memory
    expect(Math.abs((r.performance.compressorWork * perCondenserKg) / kJ - 32.71)).toBeLessThan(0.05); // from memory
    expect(Math.abs(r.performance.copCooling - 4.47)).toBeLessThan(0.01); // from memory
  });
  it("mixed high-stage suction h9 = 255.1 kJ/kg, high-stage discharge h4 = 274.48 kJ/kg (book tables, within 0.1 kJ/kg)", () => {
    expect(Math.abs(h(r, "high-stage-suction") - 255.1)).toBeLessThan(0.1); // from memory
    expect(Math.abs(h(r, "high-stage-discharge") - 274.48)).toBeLessThan(0.1); // from memory
  });
});

describe("Moran & Shapiro, Fundamentals of Engineering Thermodynamics, 5th ed., Example 10.1 (ideal cycle, R-134a, 0 °C / 26 °C, 0.08 kg/s; from memory)", () => {
  // The book's R-134a tables come from an older formulation with another reference, so only differences
  // of enthalpy are compared: the capacity within 1 %, the COP within 1.5 % (the small lift makes the
  // work, ≈17 kJ/kg, sensitive to table values), the power to the 0.1 kW the book prints.
  const r = singleStageCycle({ fluid: "R134a", evaporating: { T: 273.15 }, condensing: { T: 299.15 }, compressor: { efficiency: 1 } });
  const m = 0.08;
  it("compressor power 1.4 kW (printed to 0.1 kW), capacity 3.67 tons of refrigeration, COP 9.24", () => {
    expect(Math.abs((m * r.performance.compressorWork) / kJ - 1.4)).toBeLessThan(0.05); // from memory
    expect(rel((m * r.performance.refrigeratingEffect) / 3516.85, 3.67)).toBeLessThan(0.01); // from memory; 1 ton = 12000 Btu/h = 3.51685 kW
    expect(rel(r.performance.copCooling, 9.24)).toBeLessThan(0.015); // from memory
  });
  it("Carnot COP 10.5 between 0 °C and 26 °C bounds the cycle's COP from above", () => {
    expect(273.15 / 26).toBeCloseTo(10.5, 1); // the book's β_max (from memory), as the Carnot formula gives it
    expect(r.performance.copCooling).toBeLessThan(273.15 / 26);
  });
});

describe("transcritical CO2: optimum high-side pressure against the correlation of Liao, Zhao & Jakobsen, Applied Thermal Engineering 20 (2000) 831–841 (from memory)", () => {
  // p_opt = (2.778 − 0.0157 t_e) t_gc + (0.381 t_e − 9.34) bar, t in °C. The paper fitted its own cycle model
  // (compressor efficiency varying with pressure ratio); domeprint's search uses a constant 0.75 here, and the
  // COP curve is flat near its peak, so agreement within 5 bar is what can be asked.
  const cases: [number, number][] = [[-10, 35], [0, 40], [5, 45]];
  for (const [te, tgc] of cases) {
    const liao = (2.778 - 0.0157 * te) * tgc + (0.381 * te - 9.34);
    it(`t_e = ${te} °C, t_gc = ${tgc} °C: correlation ${liao.toFixed(1)} bar`, () => {
      const r = optimiseHighPressure({ fluid: "co2", evaporating: { T: 273.15 + te }, gasCoolerOutlet: 273.15 + tgc, compressor: { efficiency: 0.75 } });
      expect(r.optimum!.atBound).toBe(false);
      expect(Math.abs(r.optimum!.pressure / 1e5 - liao)).toBeLessThan(5);
    });
  }
});
