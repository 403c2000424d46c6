// Isentropes through the dome: one unbroken line that meets the saturation line at a vertex, with no jump in
// slope beyond what the physics has. Along an isentrope dh = v dp, so the slope dh/d ln p is p·v, continuous
// across the saturation line; a chord's slope is the mean of p·v over it. Internal checks.
import { describe, expect, it } from "vitest";
import { flashPH, flashPS, flashPX, getFluid, type ReferenceName, type State } from "../../src/eos/index.js";
import { buildLineSet, type LineSet, type Point } from "../../src/isolines/index.js";
import { byValue } from "./support.js";

const ONLY_ISENTROPES = { isotherms: false, isochores: false, qualities: false, isenthalps: false };
const cases: [string, ReferenceName][] = [["R134a", "iir"], ["water", "native"], ["co2", "native"], ["ammonia", "native"], ["isobutane", "native"], ["R410A", "native"], ["R407C", "native"]];

/** The highest pressure of the traced dome: its last tie line, just below the point it closes on. */
function domeTop(set: LineSet): number {
  const vapour = set.lines.find((l) => l.quantity === "saturation-vapour")!.points;
  return vapour[vapour.length - 2]![1];
}

type Side = "wet" | "dome" | "dry";

/** Strictly inside the dome, on it (h equal to h' or h'' at its p, or on the traced dome's top tie line), or outside. */
function sideOf(f: ReturnType<typeof getFluid>, q: Point, st: State, top: number, ref: ReferenceName): Side {
  if (Math.abs(q[1] / top - 1) < 1e-12) return "dome";
  if (q[1] > top) return "dry";
  const hl = flashPX(f, q[1], 0, ref).h, hv = flashPX(f, q[1], 1, ref).h;
  if (Math.min(Math.abs(q[0] - hl), Math.abs(q[0] - hv)) < 1e-7 * (hv - hl)) return "dome";
  return st.x !== null && st.x > 0 && st.x < 1 ? "wet" : "dry";
}

/** Range of p·v along the isentrope between pressures pa and pb, from the engine at nine pressures. */
function pvRange(f: ReturnType<typeof getFluid>, s: number, pa: number, pb: number, ref: ReferenceName): [number, number] {
  let lo = Infinity, hi = -Infinity;
  for (let k = 0; k <= 8; k++) {
    const st = flashPS(f, pa * Math.pow(pb / pa, k / 8), s, ref);
    lo = Math.min(lo, st.p * st.v);
    hi = Math.max(hi, st.p * st.v);
  }
  return [lo, hi];
}

describe("isentropes", () => {
  for (const [fluid, ref] of cases) {
    it(`${fluid}: one piece, meeting the dome at a vertex, slope continuous there`, () => {
      const f = getFluid(fluid);
      const set = buildLineSet(fluid, { reference: ref, families: ONLY_ISENTROPES });
      const top = domeTop(set);
      let crossings = 0, worst = 0;
      for (const [key, lines] of byValue(set)) {
        if (!key.startsWith("entropy")) continue;
        expect(lines.length, `${key}: one piece`).toBe(1);
        const line = lines[0]!, pts = line.points;
        const side = pts.map((q) => sideOf(f, q, flashPH(f, q[1], q[0], ref), top, ref));
        const chord = (i: number) => (pts[i]![0] - pts[i - 1]![0]) / Math.log(pts[i]![1] / pts[i - 1]![1]);
        for (let i = 1; i < pts.length; i++) {
          expect(pts[i]![1]).toBeGreaterThan(pts[i - 1]![1]);
          // No chord jumps the saturation line: the line meets it at a vertex.
          expect(new Set([side[i - 1], side[i]]), `${key} segment ${i}`).not.toEqual(new Set(["wet", "dry"]));
        }
        for (let i = 1; i < pts.length - 1; i++) {
          if (side[i] !== "dome" || side[i - 1] === side[i + 1]) continue;
          // The chords either side are means of p·v over them, so at the vertex the drawn slope may change by
          // no more than p·v itself varies over the two chords.
          const [lo, hi] = pvRange(f, line.value, pts[i - 1]![1], pts[i + 1]![1], ref);
          const jump = Math.abs(chord(i + 1) - chord(i));
          worst = Math.max(worst, jump / (hi - lo));
          expect(jump, `${key} at vertex ${i}`).toBeLessThanOrEqual((hi - lo) * (1 + 1e-6) + 1e-9 * hi);
          crossings++;
        }
      }
      console.log(`${fluid}: ${crossings} dome crossings; slope change at the vertex at most ${worst.toFixed(3)} × the variation of p·v over the two chords`);
      expect(crossings).toBeGreaterThan(3);
    });
  }
});
