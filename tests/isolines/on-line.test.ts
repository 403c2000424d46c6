// Every traced point lies on its line: flashPH at the point's (p, h) gives back the line's value.
// Internal checks against the engine's own flashes; the one outside value names its source beside it.
import { describe, expect, it } from "vitest";
import { flashPX, flashTX, getFluid, saturationP, saturationPressureRange, saturationT, type Fluid, type ReferenceName } from "../../src/eos/index.js";
import { buildLineSet, type LineSet } from "../../src/isolines/index.js";
import { stateOfPoint } from "./support.js";

/**
 * h' and h'' at pressure p. flashPX refuses the top of the saturation range itself (p ≥ its end), where the
 * dome and the quality lines end; there the tie line comes from saturationP and flashTX at its temperature.
 */
function saturatedEnthalpies(f: Fluid, p: number, ref: ReferenceName): [number, number] {
  if (f.pseudoPure || p < saturationPressureRange(f)[1]) return [flashPX(f, p, 0, ref).h, flashPX(f, p, 1, ref).h];
  const T = saturationP(f, p).TL;
  return [flashTX(f, T, 0, ref).h, flashTX(f, T, 1, ref).h];
}

interface Worst { T: number; s: number; v: number; x: number; sat: number; misses: string[] }

/** Largest deviations of every traced point from its line's value, by family. */
function worstDeviations(set: LineSet, ref: ReferenceName): Worst {
  const f = getFluid(set.fluid);
  const w: Worst = { T: 0, s: 0, v: 0, x: 0, sat: 0, misses: [] };
  for (const line of set.lines) {
    const pts = line.points;
    for (let i = 0; i < pts.length; i++) {
      const q = pts[i]!;
      const closing = (line.quantity === "saturation-liquid" || line.quantity === "saturation-vapour") && i === pts.length - 1 && q[0] === set.critical.h && q[1] === set.critical.p;
      if (closing || line.quantity === "enthalpy") continue;
      const needsState = line.quantity === "temperature" || line.quantity === "entropy" || line.quantity === "specific-volume";
      const ps = needsState ? stateOfPoint(f, line, q, ref) : null;
      if (ps && ps.via !== "flashPH") w.misses.push(`${line.quantity} ${line.value} at p = ${q[1]} Pa, h = ${q[0]} J/kg (checked with ${ps.via})`);
      if (ps) expect(Math.abs(ps.state.h - q[0]), `${line.quantity} ${line.value} at p = ${q[1]} Pa: a state with the point's h`).toBeLessThan(1e-6 * (Math.abs(q[0]) + 1e3));
      const st = ps?.state;
      switch (line.quantity) {
        case "temperature": w.T = Math.max(w.T, Math.abs(st!.T - line.value)); break;
        case "entropy": w.s = Math.max(w.s, Math.abs(st!.s - line.value) / Math.max(Math.abs(line.value), 1000)); break;
        case "specific-volume": w.v = Math.max(w.v, Math.abs(st!.v / line.value - 1)); break;
        case "quality":
        case "saturation-liquid":
        case "saturation-vapour": {
          const [hl, hv] = saturatedEnthalpies(f, q[1], ref);
          const d = Math.abs(q[0] - (hl + line.value * (hv - hl))) / (hv - hl);
          if (line.quantity === "quality") w.x = Math.max(w.x, d); else w.sat = Math.max(w.sat, d);
          break;
        }
      }
    }
  }
  return w;
}

const cases: [string, ReferenceName][] = [["R134a", "iir"], ["water", "native"], ["co2", "ashrae"], ["R410A", "native"], ["ammonia", "nbp"], ["R407C", "iir"], ["isobutane", "native"]];

describe("points lie on their lines", () => {
  for (const [fluid, ref] of cases) {
    it(`${fluid} (${ref}): T within 1 mK, s and v within 1e-6, quality h within 1e-6 of h'' − h'`, () => {
      const set = buildLineSet(fluid, { reference: ref });
      const w = worstDeviations(set, ref);
      console.log(`${fluid}: worst |ΔT| ${w.T.toExponential(2)} K, s ${w.s.toExponential(2)}, v ${w.v.toExponential(2)}, quality ${w.x.toExponential(2)}, dome ${w.sat.toExponential(2)}; points flashPH missed: ${w.misses.length ? w.misses.join("; ") : "none"}`);
      expect(w.T).toBeLessThan(1e-3);
      expect(w.s).toBeLessThan(1e-6);
      expect(w.v).toBeLessThan(1e-6);
      expect(w.x).toBeLessThan(1e-6);
      expect(w.sat).toBeLessThan(1e-6);
    });
  }
});

describe("isotherm plateaus", () => {
  it("sit at the saturation pressure of their temperature (pure fluids)", () => {
    for (const fluid of ["R134a", "water", "co2", "ammonia", "propane", "nitrogen"]) {
      const f = getFluid(fluid);
      const set = buildLineSet(fluid, { families: { isentropes: false, isochores: false, qualities: false } });
      let plateaus = 0;
      for (const line of set.lines.filter((l) => l.quantity === "temperature" && l.value <= f.satTmax)) {
        const psat = saturationT(f, line.value).pL;
        const flat = line.points.filter((q, i) => i > 0 && q[1] === line.points[i - 1]![1]);
        for (const q of flat) expect(Math.abs(q[1] / psat - 1)).toBeLessThan(1e-9);
        if (flat.length) plateaus++;
      }
      expect(plateaus).toBeGreaterThan(3);
    }
  });

  it("water's 100 °C isotherm runs flat at 101.418 kPa", () => {
    const set = buildLineSet("water", { values: { isotherms: [373.15] }, families: { dome: false, isentropes: false, isochores: false, qualities: false, isenthalps: false } });
    const pts = set.lines[0]!.points;
    const flat = pts.filter((q, i) => i > 0 && q[1] === pts[i - 1]![1]);
    expect(flat.length).toBe(1);
    // IAPWS-95 (Wagner & Pruß 2002, JPCRD 31:387), saturation table: p_s(373.15 K) = 0.101418 MPa (from memory).
    expect(Math.abs(flat[0]![1] / 101418 - 1)).toBeLessThan(5e-6);
  });
});
