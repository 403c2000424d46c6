// Every fluid against an independent evaluation of the same published equation: tests/reference/helmholtz_mp.py
// reads the original coefficient dataset, evaluates at 40 digits with numerical derivatives (fixture eos-reference.json).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fluidIds, getFluid, propertiesTRho, PROP_SLOTS, P, H, S, saturationT } from "../../src/eos/index.js";
import { rel, relScaled } from "../support.js";

interface Ref { states: { T: number; rho: number; p: number; h: number; s: number }[]; saturation: { T: number; p: number; rhoL: number; rhoV: number }[] }
const ref = JSON.parse(readFileSync(new URL("../fixtures/eos-reference.json", import.meta.url), "utf8")) as { fluids: Record<string, Ref> };

describe("p, h, s at (T, ρ) and saturation pressure agree with the independent mpmath evaluation to 1e-9", () => {
  it("covers all 39 fluids", () => {
    expect(Object.keys(ref.fluids).sort()).toEqual(fluidIds().slice().sort());
    expect(fluidIds()).toHaveLength(39);
  });
  for (const id of Object.keys(ref.fluids)) {
    it(id, () => {
      const f = getFluid(id);
      const out = new Float64Array(PROP_SLOTS);
      for (const s of ref.fluids[id]!.states) {
        propertiesTRho(f.model, f.M, s.T, s.rho, out);
        expect(rel(out[P]!, s.p), `p at ${s.T} K, ${s.rho} mol/m³`).toBeLessThan(1e-9);
        expect(relScaled(out[H]! * f.M, s.h, f.R * s.T), `h at ${s.T} K`).toBeLessThan(1e-9);
        expect(relScaled(out[S]! * f.M, s.s, f.R), `s at ${s.T} K`).toBeLessThan(1e-9);
      }
      for (const s of ref.fluids[id]!.saturation) {
        const sat = saturationT(f, s.T);
        expect(rel(sat.pL, s.p), `p_sat at ${s.T} K`).toBeLessThan(1e-9);
        expect(rel(sat.rhoL, s.rhoL), `ρ' at ${s.T} K`).toBeLessThan(1e-9);
        expect(rel(sat.rhoV, s.rhoV), `ρ'' at ${s.T} K`).toBeLessThan(1e-9);
      }
    });
  }
});
