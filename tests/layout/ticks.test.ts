// Tick values: round steps, minor steps that divide the majors, decade ladders whose stated gaps are
// their true narrowest gaps, and thinning that keeps round values and a least distance.

import { describe, expect, it } from "vitest";
import { LOG_LADDERS, logLadder, logValues, minorStep, multiples, rankBySteps, roundStep, thinTicks } from "../../src/layout/ticks.js";

describe("linear steps", () => {
  it("picks the round step nearest in ratio", () => {
    expect(roundStep(0.9)).toBe(1);
    expect(roundStep(3.4)).toBe(2.5);
    expect(roundStep(3.6)).toBe(5);
    expect(roundStep(17)).toBe(20);
    expect(roundStep(80)).toBe(100);
  });

  it("gives minor steps that divide the major step into whole parts", () => {
    for (const major of [1, 2, 2.5, 5, 10, 20, 25, 50, 100]) {
      for (const wanted of [major / 12, major / 6, major / 3, major / 1.5]) {
        const minor = minorStep(major, wanted);
        const parts = major / minor;
        expect(Math.abs(parts - Math.round(parts))).toBeLessThan(1e-9);
      }
    }
  });

  it("lists multiples without float noise", () => {
    expect(multiples(-0.25, 0.35, 0.1)).toEqual([-0.2, -0.1, 0, 0.1, 0.2, 0.3]);
  });
});

describe("decade ladders", () => {
  it("state their narrowest gap truly and each holds the coarser ones", () => {
    LOG_LADDERS.forEach((ladder, i) => {
      const m = [...ladder.mantissas, 10];
      const narrowest = Math.min(...m.slice(1).map((v, j) => Math.log10(v / m[j]!)));
      expect(narrowest).toBeCloseTo(ladder.gap, 12);
      if (i > 0) for (const v of LOG_LADDERS[i - 1]!.mantissas) expect(ladder.mantissas).toContain(v);
    });
  });

  it("chooses finer ladders for longer decades and respects the finest allowed", () => {
    expect(logLadder(10, 4)).toEqual([1]);
    expect(logLadder(10, 3)).toEqual([1, 2, 5]);
    expect(logLadder(100, 3)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 1.2, 1.4, 1.6, 1.8, 2.5, 3.5, 4.5].sort((a, b) => a - b));
    expect(logLadder(1000, 3, 3)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
  });

  it("lists ladder values across decades inside the range", () => {
    expect(logValues(0.15, 30, [1, 2, 5])).toEqual([0.2, 0.5, 1, 2, 5, 10, 20]);
  });
});

describe("thinning", () => {
  it("keeps round values first and never two closer than the gap", () => {
    const candidates = Array.from({ length: 61 }, (_, i) => ({ value: i - 30, at: (i - 30) * 0.7, rank: rankBySteps(i - 30, [50, 10, 5, 2, 1]) }));
    const kept = thinTicks(candidates, 3);
    for (let i = 1; i < kept.length; i++) expect(kept[i]!.at - kept[i - 1]!.at).toBeGreaterThanOrEqual(3);
    for (const v of [-30, -20, -10, 0, 10, 20, 30]) expect(kept.map((k) => k.value)).toContain(v);
    expect(kept.map((k) => k.value)).not.toContain(1);
  });
});
