// Every shipped fluid traces its default line set: lines in the window and inside the equation's range, the
// dome closed, no depth-capped chords, no breaks, and any chord across the engine's gaps short. Internal checks.
import { describe, expect, it } from "vitest";
import { flashPH, fluidIds, getFluid } from "../../src/eos/index.js";
import { buildLineSet } from "../../src/isolines/index.js";

/** Every n-th point of every line is checked with flashPH (all of them would take the CI's two cores too long). */
const SAMPLE = 15;

describe("default line sets of every fluid", () => {
  for (const id of fluidIds()) {
    it(id, () => {
      const f = getFluid(id);
      const set = buildLineSet(id);
      const w = set.window;
      expect(set.stats.capped).toBe(0);
      expect(set.stats.breaks).toBe(0);
      expect(set.stats.longestBridgeMm).toBeLessThanOrEqual(2);
      const count = (q: string) => set.lines.filter((l) => l.quantity === q).length;
      expect(count("saturation-liquid")).toBe(1);
      expect(count("saturation-vapour")).toBe(1);
      expect(count("quality")).toBe(9);
      expect(count("temperature")).toBeGreaterThanOrEqual(8);
      expect(count("entropy")).toBeGreaterThanOrEqual(5);
      expect(count("specific-volume")).toBeGreaterThanOrEqual(3);
      // The dome closes on the critical point.
      for (const q of ["saturation-liquid", "saturation-vapour"]) {
        const pts = set.lines.find((l) => l.quantity === q)!.points;
        expect(pts[pts.length - 1]).toEqual([set.critical.h, set.critical.p]);
      }
      let checked = 0;
      for (const line of set.lines) {
        expect(line.points.length).toBeGreaterThanOrEqual(2);
        line.points.forEach((q, i) => {
          expect(Number.isFinite(q[0]) && Number.isFinite(q[1])).toBe(true);
          expect(q[0]).toBeGreaterThanOrEqual(w.hMin - 1e-9 * Math.abs(w.hMin) - 1e-9);
          expect(q[0]).toBeLessThanOrEqual(w.hMax + 1e-9 * Math.abs(w.hMax));
          expect(q[1]).toBeGreaterThanOrEqual(w.pMin * (1 - 1e-9));
          expect(q[1]).toBeLessThanOrEqual(Math.min(w.pMax, f.pmax) * (1 + 1e-9));
          if (i > 0) expect(q).not.toEqual(line.points[i - 1]);
          if (line.quantity !== "enthalpy" && i % SAMPLE === 0) {
            // Inside the equation's range: flashPH accepts the point (it throws a range error outside).
            const st = flashPH(f, q[1], q[0]);
            expect(st.T).toBeGreaterThanOrEqual(f.Tmin - 1e-9);
            expect(st.T).toBeLessThanOrEqual(f.Tmax + 1e-9);
            checked++;
          }
        });
      }
      expect(checked).toBeGreaterThan(100);
    });
  }
});
