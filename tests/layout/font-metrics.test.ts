// The layout's fast per-character metrics against the renderers' shaped measureText: the figures panels
// and label boxes are fitted with must match what is printed.

import { describe, expect, it } from "vitest";
import { runMetrics } from "../../src/layout/font-metrics.js";
import { measureText } from "../../src/render/fonts.js";

const SAMPLES = ["−40 °C", "s = 1.75", "v = 0.005", "x = 0.3", "saturated vapour", "R-1234ze(E)", "1,1,1,2-tetrafluoroethane", "ρ′ kg/m³", "Ωμέγα Жук"];

describe("fast text metrics", () => {
  it.each(SAMPLES)("%s: width within 1.5 % and ink extents within 0.02 mm of measureText", (text) => {
    for (const weight of ["normal", "bold"] as const) {
      for (const size of [6, 12.5]) {
        const fast = runMetrics(text, size, weight);
        const ref = measureText(text, size, weight);
        expect(Math.abs(fast.width / ref.width - 1)).toBeLessThan(0.015);
        expect(Math.abs(fast.ascent - ref.ascent)).toBeLessThan(0.02);
        expect(Math.abs(fast.descent - ref.descent)).toBeLessThan(0.02);
        expect(fast.capHeight).toBeCloseTo(ref.capHeight, 9);
      }
    }
  });
});
