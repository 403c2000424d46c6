// `domeprint props` and `domeprint fluids` with real mixtures end to end: blend ids, composition strings,
// phase compositions in JSON, batch lines, the pure limit of a composition, and one error for unknown names.
import { describe, expect, it } from "vitest";
import { flash, getFluid, getMixture, mixtureFlash } from "../../src/eos/index.js";
import { cli } from "./run.js";
import { rel } from "../support.js";

describe("domeprint props with a real mixture", () => {
  it("R454B in the dome: table with the liquid and vapour compositions, no estimate flag (published pair)", () => {
    const r = cli(["props", "R454B", "p=10bar", "x=0.5"]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/phase\s+two-phase/);
    expect(r.out).toMatch(/liquid\s+R32 [\d.]+ %, R1234yf [\d.]+ %/);
    expect(r.out).toMatch(/vapour\s+R32 [\d.]+ %, R1234yf [\d.]+ %/);
    expect(r.out).not.toMatch(/estimated/);
  });
  it("--json equals the library state; the phases close the mass balance (lever rule)", () => {
    const r = cli(["props", "R407C-mix", "p=10bar", "h=300kJ/kg", "--json"]);
    expect(r.code).toBe(0);
    const o = JSON.parse(r.out);
    const st = mixtureFlash(getMixture("R407C-mix"), { p: 10e5, h: 300e3 });
    expect(o.T).toBe(st.T);
    expect(o.phase).toBe("two-phase");
    expect(o.components).toEqual(["R32", "R125", "R134a"]);
    expect(o.estimatedPairs.length).toBe(3);
    for (let k = 0; k < 3; k++) {
      const w = (1 - o.x) * o.liquid.massFractions[k] + o.x * o.vapour.massFractions[k];
      expect(Math.abs(w - o.massFractions[k])).toBeLessThan(1e-9);
    }
    // R32 is the most volatile component of the three: richer in the vapour (common practice).
    expect(o.vapour.massFractions[0]).toBeGreaterThan(o.liquid.massFractions[0]);
  });
  it("single-phase JSON has null phases; a composition string flags its estimated pair in the table", () => {
    const o = JSON.parse(cli(["props", "R32:0.5+R125:0.5", "T=40C", "p=5bar", "--json"]).out);
    expect(o.phase).toBe("vapour");
    expect(o.liquid).toBeNull();
    expect(o.vapour).toBeNull();
    expect(cli(["props", "R32:0.5+R125:0.5", "T=40C", "p=5bar"]).out).toMatch(/! binary parameters estimated for R32\/R125/);
  });
  it("pure limit: a composition of R32 with a trace of R125 gives R32's own saturation pressure", () => {
    const o = JSON.parse(cli(["props", "R32:0.9999999+R125:0.0000001", "T=0C", "x=0", "--json"]).out);
    const pure = flash(getFluid("R32"), { T: 273.15, x: 0 });
    expect(rel(o.p, pure.p)).toBeLessThan(1e-5);
  });
  it("R410A keeps its pseudo-pure meaning; R410A-mix is the real mixture", () => {
    const a = JSON.parse(cli(["props", "R410A", "T=0C", "x=0", "--json"]).out);
    expect(a.components).toBeUndefined();
    const b = JSON.parse(cli(["props", "R410A-mix", "T=0C", "x=0", "--json"]).out);
    expect(b.components).toEqual(["R32", "R125"]);
    // The real mixture and the pseudo-pure equation describe the same blend: bubble pressures within 3 %.
    expect(rel(b.p, a.p)).toBeLessThan(0.03);
  });
  it("--batch: one line per input, errors as lines, pairs a mixture cannot take named", () => {
    const r = cli(["props", "R454B", "--batch"], { input: '{"p": 1e6, "h": 3e5}\n{"p": 1e6, "rho": 3}\n{"T": 280, "rho": 50}\n' });
    expect(r.code).toBe(0);
    const lines = r.out.trim().split("\n").map((l) => JSON.parse(l));
    expect(lines[0].phase).toBe("two-phase");
    expect(lines[0].liquid.massFractions).toHaveLength(2);
    expect(lines[1].code).toBe("E_UNSUPPORTED");
    expect(lines[1].error).toMatch(/inputs = p,rho: this pair is not supported for mixtures; allowed pairs: T,p; p,h; p,s; p,x; T,x; T,rho; T,v/);
    expect(lines[2].phase).toBe("two-phase");
    expect(Math.abs(lines[2].rho - 50)).toBeLessThan(1e-9 * 50);
  });
  it("unknown name: one error, exit 2, suggestions from fluids and blends", () => {
    const r = cli(["props", "R454", "T=0C", "p=5bar"]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/fluid = "R454": unknown fluid; did you mean [^?]*R454B/);
    expect(r.err.trim().split("\n")).toHaveLength(1);
    expect(cli(["props", "R32:0.5+R999:0.5", "T=0C", "p=5bar"]).err).toMatch(/R999/);
  });
});

describe("domeprint fluids lists the real mixtures", () => {
  it("table: blends marked as real mixtures with composition and estimated pairs", () => {
    const out = cli(["fluids"]).out;
    // ASHRAE 34 nominal composition and ISO 817 class (from memory)
    expect(out).toMatch(/R454B\s+R-454B\s+A2L\s+real mixture: R32 68\.9 % \+ R1234yf 31\.1 %/);
    expect(out).toMatch(/R410A-mix\s+R-410A\s+A1\s+real mixture: R32 50 % \+ R125 50 %\s+! estimated: R32\/R125/);
  });
  it("--mixtures --json: each blend with components, fractions summing to one, and its estimated pairs", () => {
    const list = JSON.parse(cli(["fluids", "--mixtures", "--json"]).out);
    expect(list.length).toBeGreaterThanOrEqual(16);
    for (const b of list) {
      expect(b.kind).toBe("real mixture");
      expect(Math.abs(b.components.reduce((s: number, c: { massFraction: number }) => s + c.massFraction, 0) - 1)).toBeLessThan(1e-9);
    }
    expect(list.find((b: { id: string }) => b.id === "R454B").estimatedPairs).toEqual([]);
    expect(list.find((b: { id: string }) => b.id === "R448A").estimatedPairs.length).toBeGreaterThan(0);
  });
});
