// Isolines of real mixtures: every drawn point lies on its line by an independent (p, h) mixture flash, chords
// keep within the page tolerance of the true line (recomputed at mid-pressure), and isotherms slope across the dome.
import { beforeAll, describe, expect, it } from "vitest";
import { getMixture, mixtureFlash, mixtureSaturationP, mixtureSaturationT, type Mixture } from "../../src/eos/index.js";
import { DomeprintError } from "../../src/errors.js";
import { buildLineSet, type Line, type LineSet, type Point } from "../../src/isolines/index.js";
import { deviationMm, mappingOf } from "./support.js";

const REF = "iir";

/** The mixture's state at a drawn point, or null where the flash refuses it with a typed error (counted by the caller). */
function stateAt(mix: Mixture, q: Point) {
  try {
    return mixtureFlash(mix, { p: q[1], h: q[0] }, REF);
  } catch (e) {
    if (e instanceof DomeprintError) return null;
    throw e;
  }
}

/** The line's own value at a drawn point, via the (p, h) flash; saturation lines read their quality. */
function valueAt(mix: Mixture, line: Line, q: Point): number | null | "critical" {
  const st = stateAt(mix, q);
  if (!st) return null;
  // At the dome's top (within 0.5 % of the critical pressure) a single-phase state is neither liquid nor
  // vapour, so a quality read there says nothing: such points count as refused.
  const readsQuality = line.quantity === "quality" || line.quantity === "saturation-liquid" || line.quantity === "saturation-vapour";
  if (readsQuality && st.x === null && st.p > 0.995 * mix.envelope().critical.p) return "critical";
  switch (line.quantity) {
    case "temperature": return st.T;
    case "entropy": return st.s;
    case "specific-volume": return st.v;
    case "quality": case "saturation-liquid": case "saturation-vapour": return st.x ?? (st.phase === "liquid" ? 0 : 1);
    default: return null;
  }
}

// Specific volume relative: inside the dome the (p, h) read-back multiplies its own residual in h by (v″ − v′)/v.
const TOL: Partial<Record<Line["quantity"], number>> = { temperature: 1e-6, entropy: 1e-6, "specific-volume": 1e-6, quality: 1e-7, "saturation-liquid": 1e-7, "saturation-vapour": 1e-7 };

for (const id of ["R454B", "R407C-mix"]) {
  describe(`${id} line set`, () => {
    let set: LineSet;
    let mix: Mixture;
    beforeAll(() => {
      mix = getMixture(id);
      set = buildLineSet(id, { reference: REF, families: { isenthalps: false } });
    }, 60_000);

    it("has a dome, isotherms, quality lines and isentropes, and no breaks", () => {
      const q = new Set(set.lines.map((l) => l.quantity));
      for (const k of ["saturation-liquid", "saturation-vapour", "temperature", "quality", "entropy", "specific-volume"]) expect(q.has(k as Line["quantity"])).toBe(true);
      expect(set.stats.breaks).toBe(0);
      expect(set.fluid).toBe(id);
    });

    it("every drawn point (sampled) is on its line by an independent (p, h) flash", () => {
      let checked = 0, refused = 0, critical = 0, apex = 0;
      const half = mixtureSaturationP(mix, 0.5 * mix.envelope().critical.p, REF);
      const latentAtHalf = half.dew.h - half.bubble.h;
      for (const line of set.lines) {
        const tol = TOL[line.quantity];
        if (tol === undefined) continue;
        for (let k = 0; k < line.points.length; k += 3) {
          // The critical point that closes the dome and quality lines is the envelope's own (tested with it).
          if (line.points[k]![0] === set.critical!.h && line.points[k]![1] === set.critical!.p) { apex++; continue; }
          // A quality read back by a (p, h) flash carries that flash's h error divided by h″ − h′, which shrinks
          // towards the critical point: within 0.5 % of p_c the allowance is the same enthalpy, 1e-7 of the
          // latent heat at p_c / 2, divided by the latent heat at the point's pressure.
          const q = line.points[k]!;
          const readsQuality = line.quantity !== "temperature" && line.quantity !== "entropy" && line.quantity !== "specific-volume";
          // Within 0.1 % of p_c the K-factors are within a few per cent of 1 and the split's vapour fraction
          // moves by δln K / (K − 1): a quality read back there tests the reader, not the line. Counted apart.
          if (readsQuality && q[1] > 0.999 * mix.envelope().critical.p) { critical++; continue; }
          const v = valueAt(mix, line, q);
          if (v === null) { refused++; continue; }
          if (v === "critical") { critical++; continue; }
          let scale = line.quantity === "entropy" ? Math.abs(line.value) + 1e3 : line.quantity === "specific-volume" ? line.value : 1;
          if (readsQuality && q[1] > 0.995 * mix.envelope().critical.p) {
            const sat = mixtureSaturationP(mix, q[1], REF);
            scale = latentAtHalf / (sat.dew.h - sat.bubble.h);
          }
          expect(Math.abs(v - line.value), `${line.quantity} ${line.value} at ${line.points[k]![1]} Pa`).toBeLessThanOrEqual(tol * scale);
          checked++;
        }
      }
      expect(checked).toBeGreaterThan(500);
      expect(refused).toBeLessThan(0.01 * checked);
      // Only points of the closing stretch at the top of the dome are counted apart.
      expect(critical).toBeLessThan(0.02 * checked);
      expect(apex).toBeGreaterThan(0);
    });

    it("isotherm chords keep within the page tolerance: the true point at each chord's mid-pressure", () => {
      const m = mappingOf(set);
      let worst = 0, n = 0;
      for (const line of set.lines.filter((l) => l.quantity === "temperature")) {
        for (let k = 0; k + 1 < line.points.length; k += 2) {
          const a = line.points[k]!, b = line.points[k + 1]!;
          const pm = Math.sqrt(a[1] * b[1]);
          if (Math.abs(Math.log(a[1] / b[1])) < 1e-9) continue;
          let st;
          try { st = mixtureFlash(mix, { T: line.value, p: pm }, REF); } catch { continue; }
          worst = Math.max(worst, deviationMm(m, a, b, [st.h, st.p]));
          n++;
        }
      }
      expect(n).toBeGreaterThan(100);
      // The tracer bounds the deviation at parameter midpoints; elsewhere on a chord it may exceed it slightly.
      expect(worst).toBeLessThan(1.5 * set.toleranceMm);
    });

    it("an isotherm crosses the dome on a slope: from its dew pressure up to its bubble pressure (the glide)", () => {
      const T = 273.15;
      const line = set.lines.find((l) => l.quantity === "temperature" && Math.abs(l.value - T) < 1e-9)!;
      expect(line).toBeDefined();
      const sat = mixtureSaturationT(mix, T, REF);
      expect(sat.bubble.p).toBeGreaterThan(sat.dew.p);
      // Both ends of the two-phase part are vertices of the drawn line.
      const has = (st: { h: number; p: number }) => line.points.some((q) => Math.abs(q[0] - st.h) < 1e-6 && Math.abs(q[1] / st.p - 1) < 1e-12);
      expect(has(sat.bubble)).toBe(true);
      expect(has(sat.dew)).toBe(true);
      const inside = line.points.filter((q) => q[1] > sat.dew.p * (1 + 1e-9) && q[1] < sat.bubble.p * (1 - 1e-9));
      expect(inside.length).toBeGreaterThan(0);
      for (const q of inside) expect(stateAt(mix, q)!.phase).toBe("two-phase");
    });
  });
}

describe("pure limit of the mixture line set", () => {
  it("R32 with a trace of R125: bubble and dew lines lie on pure R32's saturated liquid and vapour", async () => {
    const { flashPX, getFluid } = await import("../../src/eos/index.js");
    const set = buildLineSet("R32:0.9999999+R125:0.0000001", { reference: REF, families: { isotherms: false, isentropes: false, qualities: false, isenthalps: false, isochores: false } });
    const r32 = getFluid("R32");
    let n = 0;
    for (const line of set.lines) {
      const x = line.quantity === "saturation-liquid" ? 0 : 1;
      for (const q of line.points) {
        if (q[1] > 0.98 * r32.pc) continue; // the last sliver closes on each model's own critical point
        const pure = flashPX(r32, q[1], x, REF);
        // IIR on both: h = 200 kJ/kg and s = 1 kJ/(kg K) for the saturated liquid at 0 °C (common practice).
        expect(Math.abs(pure.h - q[0])).toBeLessThan(0.5); // J/kg; a trace of R125 moves h by far less
        n++;
      }
    }
    expect(n).toBeGreaterThan(40);
  }, 60_000);
});
