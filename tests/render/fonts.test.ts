// Bundled font and text measurement: the files resolve and are TrueType, metrics behave, and the width
// measureText reports is the advance resvg's own shaper (independent of fontkit) gives the same run.

import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { MM_PER_PT, type Scene, type TextMark } from "../../src/layout/scene.js";
import { capHeight, fontPaths, measureText, missingCharacters } from "../../src/render/fonts.js";
import { renderPng } from "../../src/render/png.js";
import { textScene } from "./fixture.js";
import { decodePng, differingShare, inkedShare } from "./tools.js";

const textSheet = (marks: TextMark[]): Scene => textScene(marks, 120, 40);

describe("fonts", () => {
  it("resolves regular and bold TrueType files", () => {
    const files = fontPaths();
    expect(files).toHaveLength(2);
    for (const file of files) expect(readFileSync(file).readUInt32BE(0)).toBe(0x00010000); // TrueType sfnt version
  });

  it("covers Latin, Greek, Cyrillic and the symbols sheets use, and names what it lacks", () => {
    expect(missingCharacters("Ø±ΔТ°·²₃ρκ−×", "normal")).toEqual([]);
    expect(missingCharacters("Ø±ΔТ", "bold")).toEqual([]);
    expect(missingCharacters("h₁ → h₂ →")).toEqual(["→"]);
  });

  it("scales linearly with size and widens in bold", () => {
    const small = measureText("Isotherm 20 °C", 8);
    const large = measureText("Isotherm 20 °C", 16);
    expect(large.width / small.width).toBeCloseTo(2, 10);
    expect(large.capHeight / small.capHeight).toBeCloseTo(2, 10);
    expect(measureText("Isotherm 20 °C", 8, "bold").width).toBeGreaterThan(small.width);
  });

  it("reports ink extents: nothing below the baseline for 'x', a descent for 'p', zero for blank text", () => {
    const x = measureText("x", 10);
    const p = measureText("p", 10);
    expect(x.descent).toBe(0);
    expect(x.ascent).toBeGreaterThan(0);
    expect(x.ascent).toBeLessThan(capHeight(10));
    expect(p.descent).toBeGreaterThan(0.5);
    expect(measureText("   ", 10)).toMatchObject({ ascent: 0, descent: 0 });
    expect(measureText("   ", 10).width).toBeGreaterThan(0);
    // A 10 pt em is 3.528 mm; Latin capitals stand at roughly 0.7 em in sans faces (common practice).
    expect(capHeight(10) / (10 * MM_PER_PT)).toBeGreaterThan(0.65);
    expect(capHeight(10) / (10 * MM_PER_PT)).toBeLessThan(0.75);
  });

  it("agrees with resvg's shaping: a run anchored at its end lands where measureText says it starts", () => {
    const text = "Pressure–enthalpy ΔТ AV To";
    const size = 14;
    const { width } = measureText(text, size);
    const start = decodePng(renderPng(textSheet([{ kind: "text", x: 110 - width, y: 25, text, size, colour: "#000000" }]), { dpi: 300 }));
    const end = decodePng(renderPng(textSheet([{ kind: "text", x: 110, y: 25, text, size, colour: "#000000", anchor: "end" }]), { dpi: 300 }));
    const wrong = decodePng(renderPng(textSheet([{ kind: "text", x: 110 - width + 0.1, y: 25, text, size, colour: "#000000" }]), { dpi: 300 }));
    expect(inkedShare(start)).toBeGreaterThan(0.005);
    expect(differingShare(start, end, 0.1)).toBeLessThan(1e-4);
    // 0.1 mm is about one pixel at 300 dpi: the same comparison must notice it.
    expect(differingShare(start, wrong, 0.1)).toBeGreaterThan(1e-3);
  });
});
