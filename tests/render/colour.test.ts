// Colour parsing and the naive sRGB → CMYK conversion, checked against the formula K = 1 − max(R, G, B),
// C = (1 − R − K)/(1 − K) and likewise M, Y (common practice for device CMYK without a profile).

import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { parseHex, rgbToCmyk } from "../../src/render/colour.js";

describe("colour", () => {
  it("parses #rrggbb and refuses anything else with a typed error", () => {
    expect(parseHex("#C0392b")).toEqual({ r: 192, g: 57, b: 43 });
    for (const bad of ["red", "#fff", "#12345g", "c0392b"]) expect(() => parseHex(bad)).toThrow(DomeprintError);
  });

  it.each([
    ["#000000", [0, 0, 0, 100]],
    ["#ffffff", [0, 0, 0, 0]],
    ["#ff0000", [0, 100, 100, 0]],
    ["#808080", [0, 0, 0, 49.8]], // K = 1 − 128/255 = 0.498
    ["#c0392b", [0, 70.31, 77.6, 24.71]], // K = 63/255; M = (192 − 57)/192; Y = (192 − 43)/192
  ])("%s → %j", (hex, cmyk) => {
    expect(rgbToCmyk(parseHex(hex))).toEqual(cmyk);
  });
});
