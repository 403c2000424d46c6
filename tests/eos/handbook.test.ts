// Refrigerants and gases against handbook and datasheet values recalled from memory (flagged on each line),
// and facts of the trade (common practice). Tolerances fit the precision such tables print.
import { describe, expect, it } from "vitest";
import { flash, getFluid, propertiesTRho, PROP_SLOTS, P, saturationP, saturationT } from "../../src/eos/index.js";
import { rel } from "../support.js";

describe("critical points: the equation's own critical point against the published constants (from memory)", () => {
  // fluid, T_c [K], p_c [MPa]
  const rows: [string, number, number][] = [
    ["R134a", 374.21, 4.0593], ["co2", 304.1282, 7.3773], ["water", 647.096, 22.064], ["ammonia", 405.56, 11.3634],
    ["propane", 369.89, 4.2512], ["R32", 351.255, 5.782], ["R22", 369.295, 4.99], ["R1234yf", 367.85, 3.3822],
    ["R1234zeE", 382.513, 3.6349], ["isobutane", 407.81, 3.629], ["nitrogen", 126.192, 3.3958], ["methane", 190.564, 4.5992],
  ];
  for (const [id, Tc, pc] of rows) {
    it(`${id}: T_c = ${Tc} K within 0.01 K, p_c = ${pc} MPa within 0.05 %`, () => {
      const f = getFluid(id);
      expect(Math.abs(f.TcEquation - Tc)).toBeLessThan(0.01);
      const out = new Float64Array(PROP_SLOTS);
      propertiesTRho(f.model, f.M, f.TcEquation, f.rhocEquation, out);
      expect(rel(out[P]! / 1e6, pc)).toBeLessThan(5e-4);
    });
  }
});

describe("normal boiling points at 101.325 kPa, handbook values (from memory), within 0.05 K", () => {
  const nbp: [string, number][] = [
    ["R134a", 247.08], ["R22", 232.34], ["R32", 221.5], ["R125", 225.06], ["R143a", 225.91], ["R152a", 249.13],
    ["propane", 231.04], ["isobutane", 261.4], ["butane", 272.66], ["ammonia", 239.82], ["R1234yf", 243.7],
    ["R1234zeE", 254.18], ["R23", 191.13], ["water", 373.124], ["nitrogen", 77.355], ["oxygen", 90.188],
    ["argon", 87.302], ["methane", 111.667], ["ethane", 184.57], ["ethylene", 169.38], ["propylene", 225.53],
    ["helium", 4.222], ["hydrogen", 20.369], ["R1233zdE", 291.41], ["R245fa", 288.2], ["R227ea", 256.81],
    ["R236fa", 271.66], ["isopentane", 300.98], ["pentane", 309.21], ["dimethylether", 248.37], ["R1234zeZ", 282.88],
  ];
  for (const [id, T] of nbp) it(`${id}: ${T} K`, () => expect(Math.abs(saturationP(getFluid(id), 101325).TL - T)).toBeLessThan(0.05));
});

describe("blends at 101.325 kPa: bubble and dew temperatures, datasheet values (from memory), within 0.1 K", () => {
  const rows: [string, number, number][] = [["R410A", -51.44, -51.36], ["R404A", -46.22, -45.47], ["R407C", -43.63, -36.63], ["R507A", -46.74, -46.74]];
  for (const [id, bubble, dew] of rows) {
    it(`${id}: bubble ${bubble} °C, dew ${dew} °C (glide ${+(dew - bubble).toFixed(2)} K)`, () => {
      const s = saturationP(getFluid(id), 101325);
      expect(Math.abs(s.TL - 273.15 - bubble)).toBeLessThan(0.1);
      expect(Math.abs(s.TV - 273.15 - dew)).toBeLessThan(0.1);
    });
  }
});

describe("saturation pressures from refrigerant property tables (from memory), within 0.1 %", () => {
  const rows: [string, number, number][] = [
    ["R134a", 0, 2.928], ["R134a", 25, 6.6538], ["R22", 0, 4.976], ["ammonia", 0, 4.2938], ["co2", 0, 34.851],
    ["co2", 20, 57.29], ["propane", 0, 4.7446], ["R32", 0, 8.1337], ["R1234yf", 0, 3.1563], ["isobutane", 0, 1.5698],
    ["water", 100, 1.01418],
  ];
  for (const [id, tC, bar] of rows) it(`${id} at ${tC} °C: ${bar} bar`, () => expect(rel(saturationT(getFluid(id), tC + 273.15).pL / 1e5, bar)).toBeLessThan(1e-3));
});

describe("saturated R134a at 0 °C in the IIR reference state (property tables, from memory)", () => {
  const f = getFluid("R134a");
  const l = flash(f, { T: 273.15, x: 0 }, "iir"), v = flash(f, { T: 273.15, x: 1 }, "iir");
  it("h' = 200.00 kJ/kg and s' = 1.0000 kJ/(kg K) by definition of the reference state", () => {
    expect(Math.abs(l.h - 200e3)).toBeLessThan(1e-6);
    expect(Math.abs(l.s - 1e3)).toBeLessThan(1e-9);
  });
  it("h'' = 398.60 kJ/kg, ρ' = 1294.8 kg/m³, ρ'' = 14.43 kg/m³", () => {
    expect(Math.abs(v.h / 1e3 - 398.6)).toBeLessThan(0.05);
    expect(Math.abs(l.rho - 1294.8)).toBeLessThan(0.1);
    expect(Math.abs(v.rho - 14.43)).toBeLessThan(0.01);
  });
});

describe("facts of the trade (common practice)", () => {
  it("n-butane's absolute vapour pressure at 25 °C is about 2.4 bar (within 0.1 bar)", () => {
    expect(Math.abs(saturationT(getFluid("R600"), 298.15).pL / 1e5 - 2.4)).toBeLessThan(0.1);
  });
  it("CO2 cannot be liquid below its triple point, 5.18 bar and −56.6 °C", () => {
    const co2 = getFluid("R-744");
    expect(Math.abs(co2.data.triple.pVapour / 1e5 - 5.18)).toBeLessThan(0.01);
    expect(() => flash(co2, { p: 4e5, x: 0.5 })).toThrow(/triple/);
  });
});
