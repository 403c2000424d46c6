// The bounded golden-section search, on functions with known maxima and on the transcritical COP
// against a plain scan of the high-side pressure.
import { describe, expect, it } from "vitest";
import { goldenSectionMaximum, optimiseHighPressure, transcriticalCycle } from "../../src/cycle/index.js";
import { getFluid } from "../../src/eos/index.js";

describe("goldenSectionMaximum", () => {
  it("finds the peak of a parabola to the tolerance", () => {
    const m = goldenSectionMaximum((x) => -((x - 3.3) ** 2), 0, 10, 1e-6);
    expect(Math.abs(m.x - 3.3)).toBeLessThan(1e-6);
    expect(m.width).toBeLessThanOrEqual(1e-6);
    // Each evaluation shrinks the bracket by 1/φ: about 35 for 10 → 1e-6.
    expect(m.evaluations).toBeLessThan(40);
  });
  it("returns a bound when the function rises towards it", () => {
    expect(goldenSectionMaximum((x) => x, 1, 2, 1e-9).x).toBe(2);
    expect(goldenSectionMaximum((x) => -x, 1, 2, 1e-9).x).toBe(1);
  });
  it("stops at its evaluation cap", () => {
    expect(goldenSectionMaximum((x) => -Math.abs(x), -1, 1, 0, 25).evaluations).toBeLessThanOrEqual(27);
  });
});

describe("transcritical optimum against a scan of the COP every 0.1 bar", () => {
  const spec = { fluid: "co2", evaporating: { T: 268.15 }, superheat: 5, gasCoolerOutlet: 308.15, compressor: { efficiency: 0.7 } };
  const r = optimiseHighPressure(spec);
  it("no scanned pressure beats the optimum, and the best scanned pressure lies within 0.2 bar of it", () => {
    let best = { p: 0, cop: -Infinity };
    for (let p = 80e5; p <= 100e5; p += 0.1e5) {
      const cop = transcriticalCycle({ ...spec, highPressure: p }).performance.copCooling;
      if (cop > best.cop) best = { p, cop };
    }
    expect(best.cop).toBeLessThanOrEqual(r.optimum!.cop + 1e-12);
    expect(Math.abs(best.p - r.optimum!.pressure)).toBeLessThan(0.2e5);
    expect(r.optimum!.atBound).toBe(false);
    expect(r.highSide!.pressure).toBe(r.optimum!.pressure);
    expect(r.performance.copCooling).toBe(r.optimum!.cop);
  });
  it("below the critical temperature the COP falls with pressure: the optimum sits on the lower bound and says so", () => {
    const low = optimiseHighPressure({ ...spec, gasCoolerOutlet: 295.15 });
    expect(low.optimum!.atBound).toBe(true);
    expect(low.optimum!.pressure - low.optimum!.bounds[0]).toBeLessThan(2e3);
  });
  it("a hot gas cooler has no cycle near the critical pressure: the search starts where one exists", () => {
    const hotSpec = { ...spec, evaporating: { T: 278.15 }, superheat: 0, gasCoolerOutlet: 318.15 };
    const hot = optimiseHighPressure(hotSpec);
    expect(hot.optimum!.lowestComputable).toBeGreaterThan(hot.optimum!.bounds[0]);
    expect(hot.optimum!.atBound).toBe(false);
    expect(() => transcriticalCycle({ ...hotSpec, highPressure: hot.optimum!.lowestComputable! - 5e3 })).toThrow(/refrigerating effect/);
    expect(transcriticalCycle({ ...hotSpec, highPressure: hot.optimum!.lowestComputable! }).performance.refrigeratingEffect).toBeGreaterThan(0);
  });
  it("bounds are checked: above the critical pressure and increasing", () => {
    const pc = getFluid("co2").pc;
    expect(() => optimiseHighPressure(spec, { bounds: [0.9 * pc, 1.2e7] })).toThrow(/high-pressure-bounds = .*not above the critical pressure/);
    expect(() => optimiseHighPressure(spec, { bounds: [1.2e7, 1.0e7] })).toThrow(/upper bound is not above the lower/);
  });
});
