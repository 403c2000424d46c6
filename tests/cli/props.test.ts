// `domeprint props` and `domeprint fluids` end to end: units, JSON, batch streams, exit codes and messages.
import { describe, expect, it } from "vitest";
import { flash, getFluid } from "../../src/eos/index.js";
import { cli } from "./run.js";
import { rel } from "../support.js";

describe("domeprint props", () => {
  it("prints a readable table by default", () => {
    const r = cli(["props", "R134a", "T=-10C", "x=1", "--reference", "iir"]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/R134a, reference state iir/);
    expect(r.out).toMatch(/p\s+2\.006\d* bar/);
  });
  it("--json gives one object in SI base units with the documented keys, equal to the library's state", () => {
    const r = cli(["props", "R-744", "p=35bar", "h=430kJ/kg", "--json"]);
    expect(r.code).toBe(0);
    const o = JSON.parse(r.out);
    for (const k of ["T", "p", "rho", "h", "s", "u", "cv", "cp", "w", "x", "phase"]) expect(o).toHaveProperty(k);
    const st = flash(getFluid("co2"), { p: 35e5, h: 430e3 });
    expect(o.T).toBe(st.T);
    expect(o.phase).toBe("two-phase");
    expect(o.cp).toBeNull();
  });
  it("accepts °F, kelvin, kPa, psi and gauge pressures at an altitude", () => {
    const a = JSON.parse(cli(["props", "r717", "T=77F", "p=1000kPa", "--json"]).out);
    expect(Math.abs(a.T - 298.15)).toBeLessThan(1e-9);
    const g = JSON.parse(cli(["props", "ammonia", "T=298.15K", "p=8.5barg", "--altitude", "1500m", "--json"]).out);
    const atm = 101325 * Math.pow(1 - 2.25577e-5 * 1500, 5.25588); // ISO 2533 barometric formula (common practice)
    expect(rel(g.p, 8.5e5 + atm)).toBeLessThan(1e-12);
    const psi = JSON.parse(cli(["props", "propane", "T=20C", "p=150psi", "--json"]).out);
    expect(rel(psi.p, 150 * 6894.757293168361)).toBeLessThan(1e-12);
  });
  it("unknown fluid: exit 2, suggestions on stderr", () => {
    const r = cli(["props", "R134", "T=0C", "x=0"]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/fluid = "R134": unknown fluid; did you mean R134a/);
    expect(r.out).toBe("");
  });
  it("unknown quantity, bad unit, missing unit, out of range: exit 2 naming the input and what is allowed", () => {
    expect(cli(["props", "water", "Q=1", "T=300K"]).err).toMatch(/Q: unknown quantity; allowed: T, p, rho, v, h, s, x/);
    const bad = cli(["props", "water", "T=300furlongs", "p=1bar"]);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/T = "300furlongs": unknown unit "furlongs"; allowed units: K, °C, °F, °R/);
    expect(cli(["props", "water", "T=300", "p=1bar"]).err).toMatch(/T = "300": has no unit/);
    const low = cli(["props", "water", "T=-20C", "p=1bar"]);
    expect(low.code).toBe(2);
    expect(low.err).toMatch(/below the triple point/);
  });
  it("--batch streams one JSON line per input line, in order, and goes on after a bad line", () => {
    const input = ['{"T": 300, "p": 1e5}', '{"T": 1}', "not json", '{"p": 1e5, "h": 3e6}', '{"T": 300, "q": 1}'].join("\n") + "\n";
    const r = cli(["props", "water", "--batch"], { input });
    expect(r.code).toBe(0);
    const lines = r.out.trim().split("\n").map((l) => JSON.parse(l));
    expect(lines).toHaveLength(5);
    expect(lines[0].phase).toBe("liquid");
    expect(lines[1].error).toMatch(/exactly two are needed/);
    expect(lines[2].error).toMatch(/line 3: not valid JSON/);
    expect(lines[3].phase).toBe("vapour");
    expect(lines[4].error).toMatch(/q: unknown key/);
  });
  it("--help lists units, gauge notation and examples; --version prints the version", () => {
    const h = cli(["props", "--help"]);
    expect(h.code).toBe(0);
    expect(h.out).toMatch(/gauge pressure with a g/);
    expect(h.out).toMatch(/Examples:/);
    expect(cli(["--version"]).out.trim()).toMatch(/^\d+\.\d+\.\d+$/);
  });
  it("errors carry no colour codes when NO_COLOR is set", () => {
    const r = cli(["props", "nosuchfluid", "T=1K", "p=1Pa"], { env: { NO_COLOR: "1" } });
    expect(r.err).not.toMatch(/\x1b\[/);
  });
});

describe("domeprint fluids", () => {
  it("--json lists all 39 fluids with designation, name, safety class, citation and range", () => {
    const r = cli(["fluids", "--json"]);
    expect(r.code).toBe(0);
    const list = JSON.parse(r.out);
    expect(list).toHaveLength(39);
    const nh3 = list.find((f: { id: string }) => f.id === "ammonia");
    expect(nh3.designation).toBe("R-717");
    expect(nh3.safetyClass).toBe("B2L"); // ISO 817 class of ammonia (from memory)
    expect(nh3.equation.citation).toMatch(/J\. Phys\. Chem\. Ref\. Data/);
    expect(nh3.range.Tmax).toBe(725);
  });
  it("prints a table by default", () => {
    expect(cli(["fluids"]).out).toMatch(/R-744\s+carbon dioxide\s+A1/);
  });
});
