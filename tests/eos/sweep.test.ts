// Robustness sweep in CI: 2,000 random (p, h) and (p, s) states per fluid (SWEEP_STATES overrides: `npm run sweep`).
import { describe, expect, it } from "vitest";
import { fluidIds } from "../../src/eos/index.js";
import { sweepFluid } from "../sweep-core.js";

const STATES = Number(process.env.SWEEP_STATES ?? 2000);

describe(`robustness sweep: ${STATES} random (p, h) and (p, s) states per fluid`, () => {
  const rows: string[] = [];
  for (const [k, id] of fluidIds().entries()) {
    it(`${id}: a state or a typed error, never NaN, never a hang`, () => {
      const r = sweepFluid(id, STATES, 20261201 + k);
      rows.push(`${id.padEnd(14)} tried ${r.tried} solved ${r.solved} typed ${JSON.stringify(r.typed)} worst round trip ${r.worstRoundTrip.toExponential(1)} slowest ${r.slowestMs.toFixed(2)} ms`);
      expect(r.defects.slice(0, 5)).toEqual([]);
      expect(r.solved).toBeGreaterThan(0.5 * r.tried);
      expect(r.worstRoundTrip).toBeLessThan(1e-9);
      expect(r.slowestMs).toBeLessThan(1000);
    });
  }
  it("prints the sweep figures", () => {
    console.log(rows.join("\n"));
    expect(rows.length).toBe(fluidIds().length);
  });
});
