// The automatic window and the line values: the window shows the dome, cold liquid and superheated vapour; values
// are round numbers in the display unit, follow the reference state and honour the caller's densities.
import { describe, expect, it } from "vitest";
import { fluidIds, getFluid, referenceOffset, saturationPressureRange } from "../../src/eos/index.js";
import { buildLineSet, type LineSet, type Quantity } from "../../src/isolines/index.js";
import { mappingOf } from "./support.js";

const NOTHING = { dome: false, isotherms: false, isentropes: false, isochores: false, qualities: false, isenthalps: false };
const displays = (set: LineSet, q: Quantity, rank?: "major" | "minor") =>
  [...new Set(set.lines.filter((l) => l.quantity === q && (!rank || l.rank === rank)).map((l) => l.display.value))].sort((a, b) => a - b);
const steps = (xs: number[]) => xs.slice(1).map((x, i) => +(x - xs[i]!).toFixed(9));
const isMultiple = (x: number, step: number) => Math.abs(x / step - Math.round(x / step)) < 1e-9;

describe("automatic window", () => {
  it("spans 1.5–2 × p_c (or the equation's p_max), reaches the dome's floor, and leaves room right of the dome", () => {
    for (const id of fluidIds()) {
      const f = getFluid(id);
      const set = buildLineSet(id, { families: { ...NOTHING, dome: true } });
      const w = set.window;
      if (w.pMax < f.pmax) {
        expect(w.pMax / f.pc, id).toBeGreaterThanOrEqual(1.5);
        expect(w.pMax / f.pc, id).toBeLessThanOrEqual(2);
      } else expect(w.pMax).toBe(f.pmax);
      // Not below the lowest pressure at which the fluid has a liquid (triple point, or a blend's lowest bubble point).
      expect(w.pMin, id).toBeGreaterThanOrEqual(saturationPressureRange(f)[0] * (1 - 1e-12));
      const liquid = set.lines.find((l) => l.quantity === "saturation-liquid")!.points;
      const vapour = set.lines.find((l) => l.quantity === "saturation-vapour")!.points;
      // The dome starts on the floor (to a thousandth of a millimetre on the page).
      expect(mappingOf(set).y(liquid[0]![1]), `${id}: where the dome starts`).toBeLessThan(1e-3);
      expect(liquid[0]![0]).toBeGreaterThanOrEqual(w.hMin);
      const widest = Math.max(...vapour.map((q) => q[0]));
      expect((w.hMax - widest) / (w.hMax - w.hMin), `${id}: superheated region`).toBeGreaterThan(0.15);
    }
  });

  it("R134a: from −60 °C evaporation up to 1.5–2 × p_c", () => {
    const set = buildLineSet("R134a", { families: NOTHING });
    // p_sat(−60 °C) = 15.9 kPa and p_c = 4.059 MPa for R134a: Tillner-Roth & Baehr 1994 (JPCRD 23:657), tables (from memory).
    // The floor is that pressure rounded down to the nearest of 1, 1.2, 1.5, 2 … × 10^k.
    expect(set.window.pMin).toBeLessThanOrEqual(15.9e3);
    expect(set.window.pMin).toBeGreaterThanOrEqual(15.9e3 / 1.25);
    expect(set.window.pMax).toBeGreaterThanOrEqual(1.5 * 4.059e6);
    expect(set.window.pMax).toBeLessThanOrEqual(2 * 4.059e6);
  });

  it("takes the caller's limits and rejects impossible ones", () => {
    const set = buildLineSet("R134a", { window: { pMin: 1e5, hMax: 5e5 }, families: NOTHING });
    expect(set.window.pMin).toBe(1e5);
    expect(set.window.hMax).toBe(5e5);
    expect(() => buildLineSet("R134a", { window: { hMin: 6e5, hMax: 5e5 } })).toThrow(/window\.hMax = 500000: not above window\.hMin/);
    expect(() => buildLineSet("R134a", { window: { pMin: -1 } })).toThrow(/window\.pMin = -1/);
    expect(() => buildLineSet("R134a", { window: { pMax: Number.NaN } })).toThrow(/window\.pMax = NaN: not a finite number/);
  });
});

describe("line values", () => {
  it("si: isotherms every 10 K on whole degrees Celsius with 5 K ones where there is room; isentropes every 0.05 kJ/(kg K); isochores 1–2–5; quality every 0.1", () => {
    const set = buildLineSet("R134a", { reference: "iir" });
    const majors = displays(set, "temperature", "major");
    expect(new Set(steps(majors))).toEqual(new Set([10]));
    for (const v of majors) expect(isMultiple(v, 10)).toBe(true);
    const minors = displays(set, "temperature", "minor");
    expect(minors.length).toBeGreaterThan(0);
    for (const v of minors) expect(isMultiple(v - 5, 10)).toBe(true);
    for (const v of displays(set, "entropy")) expect(isMultiple(v, 0.05)).toBe(true);
    for (const v of displays(set, "specific-volume")) expect([1, 2, 5]).toContain(+(v / 10 ** Math.floor(Math.log10(v) + 1e-9)).toFixed(6));
    expect(displays(set, "quality")).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9]);
    // Display and SI agree: °C = K − 273.15 (the definition of the Celsius scale).
    for (const l of set.lines.filter((l) => l.quantity === "temperature")) expect(l.value - 273.15).toBeCloseTo(l.display.value, 9);
  });

  it("ip: °F every 10 or 20, Btu/(lb °R), ft³/lb, with SI values behind them", () => {
    const set = buildLineSet("R134a", { units: "ip" });
    const t = displays(set, "temperature", "major");
    expect([10, 20]).toContain(steps(t)[0]);
    for (const l of set.lines.filter((l) => l.quantity === "temperature")) {
      // T[K] = (T[°F] + 459.67) × 5/9 (definition of the Fahrenheit scale).
      expect(l.value).toBeCloseTo(((l.display.value + 459.67) * 5) / 9, 9);
      expect(l.display.unit).toBe("°F");
    }
    for (const l of set.lines.filter((l) => l.quantity === "entropy")) {
      // 1 Btu/(lb °R) = 4186.8 J/(kg K) with the International Table Btu (common practice).
      expect(l.value).toBeCloseTo(l.display.value * 4186.8, 6);
      expect(isMultiple(l.display.value, 0.01)).toBe(true);
    }
    for (const l of set.lines.filter((l) => l.quantity === "specific-volume")) {
      // 1 ft³/lb = 0.028316846592 m³ / 0.45359237 kg (exact definitions of the foot and the pound).
      expect(l.value).toBeCloseTo((l.display.value * 0.028316846592) / 0.45359237, 12);
    }
    for (const l of set.lines.filter((l) => l.quantity === "enthalpy")) expect(l.value).toBeCloseTo(l.display.value * 2326, 6);
  });

  it("cryogens get finer isotherm steps so the chart still carries at least eight", () => {
    expect(steps(displays(buildLineSet("helium"), "temperature"))[0]).toBe(0.5);
    expect(steps(displays(buildLineSet("hydrogen"), "temperature"))[0]).toBe(2);
  });

  it("honours the caller's densities and values", () => {
    const set = buildLineSet("R134a", {
      densities: { isotherm: 20, minorIsothermSpacingMm: 0, isentrope: 0.1, isochore: [1, 3], quality: 0.25, isenthalp: 100 },
    });
    expect(new Set(steps(displays(set, "temperature")))).toEqual(new Set([20]));
    expect(displays(set, "temperature", "minor")).toEqual([]);
    for (const v of displays(set, "entropy")) expect(isMultiple(v, 0.1)).toBe(true);
    for (const v of displays(set, "specific-volume")) expect([1, 3]).toContain(+(v / 10 ** Math.floor(Math.log10(v) + 1e-9)).toFixed(6));
    expect(displays(set, "quality")).toEqual([0.25, 0.5, 0.75]);
    for (const v of displays(set, "enthalpy")) expect(isMultiple(v, 100)).toBe(true);
    const given = buildLineSet("R134a", { values: { isotherms: [273.15, 300], qualities: [0.5] }, families: { ...NOTHING, isotherms: true, qualities: true } });
    expect(given.lines.filter((l) => l.quantity === "temperature").map((l) => l.display.value)).toEqual([0, 26.85]);
    expect(given.lines.filter((l) => l.quantity === "quality").length).toBe(1);
  });

  it("follow the reference state: the same lines, shifted by the offsets of h and s", () => {
    const iir = referenceOffset(getFluid("R134a"), "iir"), ashrae = referenceOffset(getFluid("R134a"), "ashrae");
    const dh = iir.dh - ashrae.dh, ds = iir.ds - ashrae.ds;
    // Enthalpy grid values are round in each reference, so they are left out here.
    const a = buildLineSet("R134a", { reference: "iir", window: { hMin: 1e5, hMax: 6e5 }, values: { isentropes: [1800] }, families: { isenthalps: false } });
    const b = buildLineSet("R134a", { reference: "ashrae", window: { hMin: 1e5 - dh, hMax: 6e5 - dh }, values: { isentropes: [1800 - ds] }, families: { isenthalps: false } });
    expect(b.lines.length).toBe(a.lines.length);
    a.lines.forEach((la, i) => {
      const lb = b.lines[i]!;
      expect(lb.quantity).toBe(la.quantity);
      expect(lb.points.length).toBe(la.points.length);
      la.points.forEach((q, k) => {
        expect(lb.points[k]![0] + dh).toBeCloseTo(q[0], 3);
        expect(lb.points[k]![1] / q[1]).toBeCloseTo(1, 9);
      });
    });
    // The automatic windows differ by the shift too, to within their rounding step.
    const auto = [buildLineSet("R134a", { reference: "iir", families: NOTHING }), buildLineSet("R134a", { reference: "ashrae", families: NOTHING })];
    expect(Math.abs(auto[0]!.window.hMin - auto[1]!.window.hMin - dh)).toBeLessThanOrEqual(20e3);
  });
});
