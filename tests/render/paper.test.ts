// Paper sizes: ISO 216 A series, ANSI and ARCH inch sizes, custom sizes, orientation and typed errors.
// Sizes are checked against their standard definitions, cited beside each.

import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { resolvePaper } from "../../src/layout/paper.js";

describe("resolvePaper", () => {
  it.each([
    ["A0", 841, 1189], // ISO 216 (from memory)
    ["A3", 297, 420], // ISO 216 (from memory)
    ["A4", 210, 297], // ISO 216 (from memory)
    ["A6", 105, 148], // ISO 216 (from memory)
    ["Letter", 215.9, 279.4], // ANSI A, 8.5 × 11 in (common practice)
    ["Legal", 215.9, 355.6], // 8.5 × 14 in (common practice)
    ["Tabloid", 279.4, 431.8], // ANSI B, 11 × 17 in (common practice)
    ["ARCH D", 609.6, 914.4], // 24 × 36 in (common practice)
    ["ARCH E", 914.4, 1219.2], // 36 × 48 in (common practice)
  ])("%s is %f × %f mm in portrait", (name, width, height) => {
    const paper = resolvePaper(name);
    expect(paper.name).toBe(name);
    expect(paper.width).toBeCloseTo(width, 9);
    expect(paper.height).toBeCloseTo(height, 9);
  });

  it("swaps the sides for landscape", () => {
    expect(resolvePaper("A3", "landscape")).toEqual({ name: "A3", width: 420, height: 297 });
    expect(resolvePaper("A3", "portrait")).toEqual({ name: "A3", width: 297, height: 420 });
  });

  it("ignores case, spaces, hyphens and underscores in names", () => {
    for (const name of ["a4", " A4 ", "arch-d", "Arch_D", "archd"]) expect(() => resolvePaper(name)).not.toThrow();
    expect(resolvePaper("arch-d").name).toBe("ARCH D");
  });

  it("takes a custom WxH in mm as written, or turned when an orientation is given", () => {
    expect(resolvePaper("420x297")).toEqual({ name: "420x297", width: 420, height: 297 });
    expect(resolvePaper("420 × 297 mm", "portrait")).toEqual({ name: "420x297", width: 297, height: 420 });
    expect(resolvePaper("500.5x700", "landscape")).toEqual({ name: "500.5x700", width: 700, height: 500.5 });
  });

  it("names the input, the value and what is allowed when a paper is unknown", () => {
    try {
      resolvePaper("A7");
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomeprintError);
      const e = error as DomeprintError;
      expect(e.code).toBe("E_INPUT");
      expect(e.message).toContain('paper = "A7"');
      expect(e.message).toContain("A0, A1, A2, A3, A4, A5, A6, Letter, Legal, Tabloid, ARCH D, ARCH E");
      expect(e.details.suggestions).toContain("A6");
    }
  });

  it("refuses custom sizes out of range, empty names and unknown orientations", () => {
    expect(() => resolvePaper("10x297")).toThrow(/out of range/);
    expect(() => resolvePaper("")).toThrow(DomeprintError);
    expect(() => resolvePaper("A4", "sideways" as never)).toThrow(/orientation/);
  });
});
