// Overlays and tables: the drawn path passes through every numbered point in flow order and follows the
// real process between them; tables are in the chosen display units, converted here independently.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { flashPH, flashPX, getFluid } from "../../src/eos/index.js";
import {
  cycleOverlay, evaluateReadings, findPoint, parseReadings, readingsOverlay, singleStageCycle, twoStageCycle, type CycleResult, type Overlay,
} from "../../src/cycle/index.js";

const C = (t: number) => t + 273.15;
const r = singleStageCycle({ fluid: "R134a", evaporating: { T: C(-10) }, condensing: { T: C(40) }, superheat: 5, subcooling: 3, suctionDrop: 0.1e5, dischargeDrop: 0.2e5, compressor: { efficiency: 0.7 } });

/** Index of a path vertex at (h, p); pressures computed by different flashes of one isobar differ in the last bits. */
function indexOf(o: Overlay, h: number, p: number, tol = 1e-12): number {
  return o.path.findIndex((q) => Math.abs(q.h - h) <= tol * Math.abs(h) + 1e-9 && Math.abs(q.p - p) <= tol * p);
}

describe("cycle overlay path", () => {
  const o = cycleOverlay(r, "si");
  it("is closed and visits the numbered points in flow order, starting at point 1, without repeating it", () => {
    expect(o.kind).toBe("cycle");
    expect(o.closed).toBe(true);
    const idx = r.points.map((pt) => indexOf(o, pt.state.h, pt.state.p));
    expect(idx[0]).toBe(0);
    for (let i = 1; i < idx.length; i++) expect(idx[i]!).toBeGreaterThan(idx[i - 1]!);
    expect(o.path[o.path.length - 1]).not.toEqual(o.path[0]);
    expect(o.points.map((p) => p.label)).toEqual(r.points.map((p) => p.label));
  });
  it("follows the compression through intermediate states: pressure rising, entropy linear in ln p between the ends", () => {
    const f = getFluid("R134a");
    const s1 = findPoint(r.points, "compressor-suction")!.state, s2 = findPoint(r.points, "compressor-discharge")!.state;
    const a = indexOf(o, s1.h, s1.p), b = indexOf(o, s2.h, s2.p);
    expect(b - a).toBeGreaterThan(8);
    for (let i = a + 1; i < b; i++) {
      const q = o.path[i]!;
      expect(q.p).toBeGreaterThan(o.path[i - 1]!.p);
      const t = Math.log(q.p / s1.p) / Math.log(s2.p / s1.p);
      expect(Math.abs(flashPH(f, q.p, q.h).s - (s1.s + t * (s2.s - s1.s)))).toBeLessThan(1e-6);
    }
  });
  it("keeps the dome crossings of the condenser and evaporator isobars as vertices", () => {
    const f = getFluid("R134a");
    for (const p of [r.levels.condensing!.p]) {
      expect(indexOf(o, flashPX(f, p, 1).h, p, 1e-9)).toBeGreaterThan(0);
      expect(indexOf(o, flashPX(f, p, 0).h, p, 1e-9)).toBeGreaterThan(0);
    }
    const pe = r.levels.evaporating.p;
    expect(indexOf(o, flashPX(f, pe, 1).h, pe, 1e-9)).toBe(o.path.length - 1);
  });
  it("carries point notes for superheat and subcooling", () => {
    expect(o.points[0]!.note).toBe("superheat 5.0 K");
    expect(o.points.find((p) => p.label === String(findPoint(r.points, "condenser-outlet")!.label))!.note).toBe("subcooling 3.0 K");
  });
});

describe("two-stage overlay", () => {
  const t = twoStageCycle({ fluid: "ammonia", evaporating: { T: C(-35) }, condensing: { T: C(35) }, arrangement: "flash-tank", lowStage: { efficiency: 0.7 }, highStage: { efficiency: 0.7 } });
  const o = cycleOverlay(t, "si");
  it("has one branch: from the flash-tank inlet through the tank vapour to the high-stage suction, at the intermediate pressure", () => {
    expect(o.branches).toHaveLength(1);
    const b = o.branches![0]!;
    const at = (role: Parameters<typeof findPoint>[1]) => findPoint(t.points, role)!.state;
    expect(b[0]).toEqual({ h: at("flash-tank-inlet").h, p: at("flash-tank-inlet").p });
    expect(b).toContainEqual({ h: at("flash-tank-vapour").h, p: at("flash-tank-vapour").p });
    expect(b[b.length - 1]).toEqual({ h: at("high-stage-suction").h, p: at("high-stage-suction").p });
    for (const q of b) expect(Math.abs(q.p / t.levels.intermediate!.p - 1)).toBeLessThan(1e-12);
  });
  it("the branch's points are numbered after the main circuit's and are not on the closed path", () => {
    const vap = findPoint(t.points, "flash-tank-vapour")!;
    expect(Number(vap.label)).toBe(t.points.length);
    expect(indexOf(o, vap.state.h, vap.state.p)).toBe(-1);
  });
});

describe("tables in display units", () => {
  const rowOf = (res: CycleResult, units: "si" | "ip") => cycleOverlay(res, units).tables.find((x) => x.title === "states")!;
  it("si: bar, °C, kJ/kg with the typographic minus", () => {
    const t = rowOf(r, "si");
    expect(t.columns.slice(2, 6)).toEqual(["p [bar]", "T [°C]", "h [kJ/kg]", "s [kJ/(kg K)]"]);
    const row = t.rows[0]!, st = r.points[0]!.state;
    expect(row[3]).toBe("−5.0");
    expect(Number(row[2])).toBeCloseTo(st.p / 1e5, 3);
    expect(row[4]).toBe((st.h / 1e3).toFixed(2));
  });
  it("ip: psia, °F, Btu/lb, converted here (1 psi = 6894.757293168 Pa, 1 Btu/lb = 2326 J/kg, °F = 1.8 °C + 32)", () => {
    const t = rowOf(r, "ip");
    expect(t.columns.slice(2, 6)).toEqual(["p [psia]", "T [°F]", "h [Btu/lb]", "s [Btu/(lb °R)]"]);
    r.points.forEach((pt, i) => {
      const row = t.rows[i]!;
      expect(Number(row[3]!.replace("−", "-"))).toBeCloseTo((pt.state.T - 273.15) * 1.8 + 32, 1);
      expect(Math.abs(Number(row[2]) / (pt.state.p / 6894.757293168361) - 1)).toBeLessThan(6e-4);
      expect(Number(row[4]!.replace("−", "-"))).toBeCloseTo(pt.state.h / 2326, 2);
      expect(Number(row[5]!.replace("−", "-"))).toBeCloseTo(pt.state.s / 4186.8, 4);
    });
  });
  it("a blend's conditions name the glide point of each level", () => {
    const b = singleStageCycle({ fluid: "R407C", evaporating: { T: C(0) }, condensing: { T: C(45) }, glidePoint: "mid", compressor: { efficiency: 0.7 } });
    const rows = cycleOverlay(b, "si").tables.find((x) => x.title === "conditions")!.rows;
    expect(rows.find((x) => x[0] === "evaporating")![1]).toMatch(/^0\.0 °C at the mid-point of the glide, at [\d.]+ bar \(dew [\d.]+ °C, bubble −[\d.]+ °C\)$/);
    expect(rows.find((x) => x[0] === "condensing")![1]).toMatch(/^45\.0 °C at the mid-point of the glide/);
  });
  it("the performance table states the figures with their units", () => {
    const rows = cycleOverlay(r, "si").tables.find((x) => x.title.startsWith("performance"))!.rows;
    expect(rows.find((x) => x[0] === "COP cooling")![1]).toBe(r.performance.copCooling.toFixed(3));
    expect(rows.find((x) => x[0] === "refrigerating effect")![1]).toBe(`${(r.performance.refrigeratingEffect / 1e3).toFixed(2)} kJ/kg`);
  });
});

describe("readings overlay", () => {
  const text = readFileSync(new URL("../fixtures/readings-implausible.csv", import.meta.url), "utf8");
  const res = evaluateReadings("co2", parseReadings(text, { source: "readings-implausible.csv" }));
  const o = readingsOverlay(res, "si");
  it("is an open set of points in file order, flagged readings marked", () => {
    expect(o.kind).toBe("points");
    expect(o.closed).toBe(false);
    expect(o.points.map((p) => p.label)).toEqual(res.readings.map((x) => x.name));
    expect(o.points.map((p) => Boolean(p.flagged))).toEqual([true, false, true, true, true]);
    expect(o.points[0]!.note).toMatch(/colder than the dew point −[\d.]+ °C/);
    expect(o.tables[0]!.rows).toHaveLength(5);
  });
});
