// Every drawn chord stays within the page tolerance of the true line: the line's exact point at each segment's
// parameter midpoint, recomputed with the engine's flashes, lies within 0.05 mm of the chord on the page.
import { describe, expect, it } from "vitest";
import { getFluid, type ReferenceName } from "../../src/eos/index.js";
import { buildLineSet, type LineSet, type LineSetOptions } from "../../src/isolines/index.js";
import { deviationMm, mappingOf, parameterMidpoint, stateOfPoint } from "./support.js";

interface Result { worst: number; where: string; segments: number; plateaus: number; closing: number }

function midpointDeviations(set: LineSet, ref: ReferenceName): Result {
  const f = getFluid(set.fluid);
  const m = mappingOf(set);
  const r: Result = { worst: 0, where: "", segments: 0, plateaus: 0, closing: 0 };
  for (const line of set.lines) {
    if (line.quantity === "enthalpy") continue;
    let prev = stateOfPoint(f, line, line.points[0]!, ref).state;
    for (let i = 1; i < line.points.length; i++) {
      const a = line.points[i - 1]!, b = line.points[i]!;
      const toApex = b[0] === set.critical.h && b[1] === set.critical.p;
      if (toApex) { r.closing = Math.max(r.closing, Math.hypot(m.x(b[0]) - m.x(a[0]), m.y(b[1]) - m.y(a[1]))); continue; }
      const cur = stateOfPoint(f, line, b, ref).state;
      const mid = parameterMidpoint(f, line, prev, cur, ref);
      if (mid === null) {
        // A pure fluid's plateau: straight by physics, so it must be exactly horizontal.
        expect(a[1]).toBe(b[1]);
        r.plateaus++;
      } else {
        const d = deviationMm(m, a, b, mid);
        r.segments++;
        if (d > r.worst) { r.worst = d; r.where = `${line.quantity} ${line.value} segment ${i}`; }
      }
      prev = cur;
    }
  }
  return r;
}

const cases: [string, LineSetOptions][] = [
  ["R134a", { reference: "iir" }],
  ["water", {}],
  ["co2", {}],
  ["R410A", {}],
  ["ammonia", { units: "ip", reference: "ashrae" }],
  ["R407C", { frame: { widthMm: 267, heightMm: 180 } }],
  ["propane", { toleranceMm: 0.02 }],
];

describe("chords stay within the page tolerance", () => {
  for (const [fluid, options] of cases) {
    it(`${fluid} ${JSON.stringify(options)}`, () => {
      const set = buildLineSet(fluid, options);
      const r = midpointDeviations(set, set.reference);
      console.log(`${fluid}: ${r.segments} segments, worst midpoint ${r.worst.toFixed(5)} mm (${r.where}); ${r.plateaus} plateaus; closing chord to the critical point ${r.closing.toFixed(3)} mm`);
      expect(r.segments).toBeGreaterThan(500);
      expect(r.worst).toBeLessThanOrEqual(set.toleranceMm * (1 + 1e-6));
      expect(set.stats.capped).toBe(0);
    });
  }
});
