// Bad input gets a typed error naming the input, the value and what is allowed; nothing returns NaN.
import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { flash, flashPH, flashTP, getFluid, resolveFluidId, saturationT, fluidFromData } from "../../src/eos/index.js";
import { readFileSync } from "node:fs";

function typed(fn: () => unknown): DomeprintError {
  try {
    fn();
  } catch (e) {
    if (e instanceof DomeprintError) return e;
    throw e;
  }
  throw new Error("expected a DomeprintError, got a result");
}

const r134a = getFluid("R134a");

describe("typed errors", () => {
  it("below the triple point: E_BELOW_TRIPLE naming T, its value and the range", () => {
    const e = typed(() => flashTP(r134a, 150, 1e5));
    expect(e.code).toBe("E_BELOW_TRIPLE");
    expect(e.message).toMatch(/^T = 150: below the triple point.*allowed: 169\.85 K to 455 K for R134a/);
  });
  it("beyond the equation's range: E_RANGE for T above T_max and p above p_max (no extrapolation margin)", () => {
    expect(typed(() => flashTP(r134a, 455.01, 1e5)).code).toBe("E_RANGE");
    const e = typed(() => flashTP(r134a, 300, 70.1e6));
    expect(e.code).toBe("E_RANGE");
    expect(e.message).toMatch(/p = 70100000: outside the equation's range of validity; allowed: above 0 Pa up to 70000000 Pa/);
  });
  it("an enthalpy beyond T_max at the given pressure is a range error naming h", () => {
    const e = typed(() => flashPH(r134a, 1e5, 5e6));
    expect(e.code).toBe("E_RANGE");
    expect(e.details.input).toBe("h");
  });
  it("NaN, infinite, negative and missing inputs", () => {
    expect(typed(() => flashTP(r134a, Number.NaN, 1e5)).message).toMatch(/T = NaN: not a number \(NaN\)/);
    expect(typed(() => flashTP(r134a, 300, Number.POSITIVE_INFINITY)).message).toMatch(/p = Infinity: not finite/);
    expect(typed(() => flashTP(r134a, 300, -5)).message).toMatch(/p = -5: must be positive/);
    expect(typed(() => flash(r134a, { T: 300 })).message).toMatch(/exactly two are needed/);
    expect(typed(() => flash(r134a, { T: 300, x: 1.5 })).message).toMatch(/x = 1\.5: quality above 1/);
    expect(typed(() => flash(r134a, { T: 300, x: -0.1 })).message).toMatch(/x = -0\.1: must not be negative/);
    expect(typed(() => flash(r134a, { h: 3e5, s: 1e3 })).code).toBe("E_UNSUPPORTED");
    expect(typed(() => flash(r134a, { T: 300, p: 1e5 }, "iso")).message).toMatch(/reference = "iso": unknown reference state; allowed: native, iir, ashrae, nbp/);
  });
  it("unknown fluids get near-match suggestions", () => {
    const e = typed(() => resolveFluidId("R143"));
    expect(e.code).toBe("E_UNKNOWN_FLUID");
    expect(e.details.suggestions).toContain("R143a");
    expect(typed(() => resolveFluidId("propan")).details.suggestions).toContain("propane");
  });
  it("saturation above the critical point is a range error, not a hang or NaN", () => {
    expect(typed(() => saturationT(r134a, 380)).code).toBe("E_RANGE");
  });
  it("a fluid file that fails the schema is refused with the path of the fault", () => {
    const raw = JSON.parse(readFileSync(new URL("../../fluids/R134a.json", import.meta.url), "utf8"));
    raw.residual[0].rows[0] = [1, 2];
    const e = typed(() => fluidFromData(raw, "broken.json"));
    expect(e.code).toBe("E_FLUID_FILE");
    expect(e.message).toMatch(/broken\.json: residual\.0\.rows\.0/);
    delete raw.molarMass;
    expect(typed(() => fluidFromData(raw, "x.json")).code).toBe("E_FLUID_FILE");
  });
});

describe("fluid names", () => {
  it("accepts ids, R-numbers with or without the dash, and chemical names, in any case", () => {
    const cases: [string, string][] = [
      ["water", "water"], ["co2", "co2"], ["ammonia", "ammonia"], ["R134a", "R134a"], ["R1234zeE", "R1234zeE"],
      ["R-744", "co2"], ["R744", "co2"], ["r717", "ammonia"], ["R-1234ze(E)", "R1234zeE"], ["carbon dioxide", "co2"],
      ["Carbon Dioxide", "co2"], ["1,1,1,2-tetrafluoroethane", "R134a"], ["r-290", "propane"], ["PROPANE", "propane"],
      ["R-600a", "isobutane"], ["difluoromethane", "R32"], ["r410a", "R410A"], ["H2O", "water"],
    ];
    for (const [name, id] of cases) expect(resolveFluidId(name), name).toBe(id);
  });
});
