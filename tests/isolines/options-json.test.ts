// The public face: buildLineSet's options are checked with errors that name the option, the value and what is
// allowed; lineSetToJson gives the window and every line with its values, units and (h, p) points.
import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { buildLineSet, lineSetToJson, type LineSetOptions } from "../../src/isolines/index.js";

function error(options: LineSetOptions, fluid = "R134a"): DomeprintError {
  try {
    buildLineSet(fluid, options);
  } catch (e) {
    if (e instanceof DomeprintError) return e;
    throw e;
  }
  throw new Error("no error");
}

describe("options", () => {
  it("reject bad values with typed errors naming them", () => {
    const cases: [LineSetOptions, string, RegExp][] = [
      [{ units: "metric" as never }, "units", /units = "metric": unknown unit system; allowed: si, ip/],
      [{ frame: { widthMm: -5, heightMm: 300 } }, "frame.widthMm", /frame\.widthMm = -5/],
      [{ toleranceMm: 0 }, "toleranceMm", /toleranceMm = 0: not a positive finite number/],
      [{ densities: { quality: 1.5 } }, "densities.quality", /below 1/],
      [{ densities: { isochore: [0.5] } }, "densities.isochore", /mantissa/],
      [{ values: { qualities: [1.2] } }, "values.qualities", /0 < x < 1/],
      [{ values: { isotherms: [Number.NaN] } }, "values.isotherms", /not a finite number/],
      [{ families: { contours: true } as never }, "families", /unknown family/],
      [{ reference: "sea-level" }, "reference", /unknown reference state/],
    ];
    for (const [options, input, message] of cases) {
      const e = error(options);
      expect(e.code).toBe("E_INPUT");
      expect(e.details.input).toBe(input);
      expect(e.message).toMatch(message);
      expect(e.details.allowed).toBeTruthy();
    }
  });

  it("reject a reference state the fluid cannot have, and an unknown fluid", () => {
    expect(error({ reference: "iir" }, "water").code).toBe("E_REFERENCE");
    const unknown = error({}, "R134");
    expect(unknown.code).toBe("E_UNKNOWN_FLUID");
  });

  it("accept a fluid by any of its names", () => {
    expect(buildLineSet("r-134a", { families: { isotherms: false, isentropes: false, isochores: false } }).fluid).toBe("R134a");
  });
});

describe("lineSetToJson", () => {
  const set = buildLineSet("R134a", { reference: "iir" });
  const json = lineSetToJson(set);
  const text = JSON.stringify(json);

  it("carries the window, reference, units and every line in order", () => {
    expect(json.format).toBe("domeprint-lines/1");
    expect(json.fluid).toBe("R134a");
    expect(json.reference).toBe("iir");
    expect(json.window).toEqual({ h: [set.window.hMin, set.window.hMax], p: [set.window.pMin, set.window.pMax], hUnit: "J/kg", pUnit: "Pa" });
    expect(json.lines.length).toBe(set.lines.length);
    json.lines.forEach((l, i) => {
      expect(l.quantity).toBe(set.lines[i]!.quantity);
      expect(l.points).toEqual(set.lines[i]!.points.map((q) => [q[0], q[1]]));
    });
    expect(JSON.parse(text)).toEqual(json);
  });

  it("names each quantity and its SI and display units", () => {
    const units = new Map(json.lines.map((l) => [l.quantity, [l.unit, l.display.unit]]));
    expect(Object.fromEntries(units)).toEqual({
      "saturation-liquid": ["", ""],
      "saturation-vapour": ["", ""],
      quality: ["", ""],
      temperature: ["K", "°C"],
      entropy: ["J/(kg K)", "kJ/(kg K)"],
      "specific-volume": ["m³/kg", "m³/kg"],
      enthalpy: ["J/kg", "kJ/kg"],
    });
    const ip = lineSetToJson(buildLineSet("R134a", { units: "ip", families: { dome: false, qualities: false } }));
    expect(Object.fromEntries(ip.lines.map((l) => [l.quantity, l.display.unit]))).toEqual({
      temperature: "°F", entropy: "Btu/(lb °R)", "specific-volume": "ft³/lb", enthalpy: "Btu/lb",
    });
  });

  it("gives isenthalps as the grid's full height at their round values", () => {
    for (const l of json.lines.filter((l) => l.quantity === "enthalpy")) {
      expect(l.points).toEqual([[l.value, set.window.pMin], [l.value, set.window.pMax]]);
      expect(l.value / 1000).toBeCloseTo(l.display.value, 9);
    }
  });
});
