// Style files: every bundled style validates, says why it looks as it does and names its palette; its
// line families differ in colour and in dash or weight; sizes scale with paper but never below the floor.

import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { resolvePaper } from "../../src/layout/paper.js";
import { MIN_LINE_MM, MIN_TYPE_PT, sizesFor } from "../../src/layout/sizes.js";
import { FAMILIES } from "../../src/layout/style.js";
import { loadStyle, styleNames } from "../../src/layout/style-file.js";
import { DomeprintError } from "../../src/errors.js";

/** Relative luminance (WCAG 2 formula) of "#rrggbb". */
function luminance(hex: string): number {
  const c = [1, 3, 5].map((i) => Number.parseInt(hex.slice(i, i + 2), 16) / 255).map((v) => (v <= 0.03928 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4));
  return 0.2126 * c[0]! + 0.7152 * c[1]! + 0.0722 * c[2]!;
}

describe("bundled styles", () => {
  it("are at least the three designed for the wall, the classroom and the report", () => {
    expect(styleNames()).toEqual(expect.arrayContaining(["plant-room", "training-handout", "client-report"]));
  });

  it.each(styleNames())("%s validates, names its palette and says why it looks as it does", (name) => {
    const style = loadStyle(name);
    expect(style.name).toBe(name);
    expect(style.rationale.length).toBeGreaterThan(100);
    expect(style.palette.name.length).toBeGreaterThan(5);
    expect(style.palette.source.length).toBeGreaterThan(10);
  });

  it.each(styleNames())("%s: each family differs from every other in colour and in dash or weight", (name) => {
    const style = loadStyle(name);
    for (let i = 0; i < FAMILIES.length; i++) {
      for (let j = i + 1; j < FAMILIES.length; j++) {
        const a = style.lines[FAMILIES[i]!], b = style.lines[FAMILIES[j]!];
        expect(a.colour).not.toBe(b.colour);
        const sameDash = JSON.stringify(a.dash ?? []) === JSON.stringify(b.dash ?? []);
        expect(sameDash && a.width === b.width).toBe(false);
      }
    }
  });

  it.each(styleNames())("%s: the dome is the heaviest line, and label text reads on the page (contrast ≥ 3:1)", (name) => {
    const style = loadStyle(name);
    for (const f of FAMILIES) if (f !== "dome") expect(style.lines.dome.width).toBeGreaterThan(style.lines[f].width);
    const page = luminance(style.page.background);
    for (const f of FAMILIES) {
      const ink = luminance(style.labelInk[f]);
      expect((Math.max(page, ink) + 0.05) / (Math.min(page, ink) + 0.05)).toBeGreaterThanOrEqual(3);
    }
  });

  it.each(["A6", "A4", "A0"])("sizes on %s: type never below 6 pt, lines never below 0.1 mm, larger paper never smaller", (paper) => {
    for (const name of styleNames()) {
      const style = loadStyle(name);
      const sizes = sizesFor(style, resolvePaper(paper));
      for (const pt of Object.values(style.type)) expect(sizes.pt(pt)).toBeGreaterThanOrEqual(MIN_TYPE_PT);
      for (const f of FAMILIES) expect(sizes.stroke(style.lines[f]).width).toBeGreaterThanOrEqual(MIN_LINE_MM);
      const a4 = sizesFor(style, resolvePaper("A4"));
      if (paper === "A0") expect(sizes.pt(style.type.lineLabel)).toBeGreaterThan(a4.pt(style.type.lineLabel));
    }
  });
});

describe("style files from elsewhere", () => {
  const dir = mkdtempSync(join(tmpdir(), "domeprint-style-"));

  it("load from a YAML path", () => {
    const style = loadStyle("plant-room");
    const path = join(dir, "mine.yaml");
    writeFileSync(path, JSON.stringify({ ...style, name: "mine" }));
    expect(loadStyle(path).name).toBe("mine");
  });

  it("are refused with the field that is wrong", () => {
    const style = loadStyle("plant-room");
    const path = join(dir, "thin.json");
    writeFileSync(path, JSON.stringify({ ...style, lines: { ...style.lines, isotherm: { colour: "#000000", width: 0.05 } } }));
    expect(() => loadStyle(path)).toThrow(DomeprintError);
    expect(() => loadStyle(path)).toThrow(/lines\.isotherm\.width/);
    expect(() => loadStyle("no-such-style")).toThrow(/plant-room/);
  });
});
