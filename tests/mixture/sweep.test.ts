// Robustness sweep of the mixture flash for every standard blend: random (p, h) across and around the dome give a
// state that meets its inputs or a typed error, never NaN; one test per blend with a timeout, so a hang fails it.
import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { blendIds, getMixture, mixtureFlash, mixtureSaturationP } from "../../src/eos/mixture/index.js";
import { rng } from "../support.js";

describe("random (p, h) per blend", () => {
  for (const id of blendIds()) {
    it(`${id}: a state meeting its inputs or a typed error, never NaN`, () => {
      const rand = rng(1000 + id.length * 7 + id.charCodeAt(1));
      const mix = getMixture(id);
      const c = mix.envelope().critical;
      let states = 0, twoPhase = 0;
      for (let k = 0; k < 40; k++) {
        const p = Math.exp(Math.log(1e4) + rand() * (Math.log(1.5 * c.p) - Math.log(1e4)));
        // Half the draws inside the dome's enthalpy span at p (when it has one), half over a wide range.
        let h = 20e3 + rand() * 600e3;
        if (k % 2 === 0 && p < c.p) {
          try {
            const sat = mixtureSaturationP(mix, p, "iir");
            h = sat.bubble.h + rand() * (sat.dew.h - sat.bubble.h);
          } catch (e) {
            expect(e).toBeInstanceOf(DomeprintError);
          }
        }
        let st;
        try {
          st = mixtureFlash(mix, { p, h }, "iir");
        } catch (e) {
          expect(e).toBeInstanceOf(DomeprintError);
          continue;
        }
        {
          for (const v of [st.T, st.p, st.rho, st.v, st.h, st.s, st.u, st.g]) expect(Number.isFinite(v)).toBe(true);
          expect(Math.abs(st.h - h)).toBeLessThan(1e-6 * (Math.abs(h) + 1e5));
          expect(Math.abs(st.p / p - 1)).toBeLessThan(1e-9); // single-phase p is recomputed from (T, ρ)
          if (st.phase === "two-phase" && st.liquid && st.vapour) {
            twoPhase++;
            expect(st.x!).toBeGreaterThanOrEqual(0);
            expect(st.x!).toBeLessThanOrEqual(1);
            for (const ph of [st.liquid, st.vapour]) expect(Math.abs(ph.moleFractions.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
          } else {
            for (const v of [st.cp!, st.w!]) expect(Number.isFinite(v)).toBe(true);
          }
          states++;
        }
      }
      expect(states).toBeGreaterThan(20);
      expect(twoPhase).toBeGreaterThan(5);
    }, 15_000);
  }
});
