// SVG renderer: well-formed XML, editor layers, data attributes, escaping, metadata, clips, bleed and marks.
// Internal checks on the hand-built fixture scene; no outside reference is involved.

import { DOMParser, type Element as XmlElement } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import type { Scene, TextMark } from "../../src/layout/scene.js";
import { renderSvg } from "../../src/render/svg.js";
import { bleedScene, NON_LATIN_TEXT, SPECIAL_TEXT, testScene } from "./fixture.js";

const INKSCAPE = "http://www.inkscape.org/namespaces/inkscape";

function parse(svg: string): XmlElement {
  const problems: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => problems.push(`${level}: ${message}`) }).parseFromString(svg, "image/svg+xml");
  expect(problems).toEqual([]);
  return doc.documentElement!;
}

function all(root: XmlElement, tag: string): XmlElement[] {
  return Array.from(root.getElementsByTagName(tag));
}

function layerGroups(root: XmlElement): XmlElement[] {
  return Array.from(root.childNodes).filter((n): n is XmlElement => n.nodeType === 1 && (n as XmlElement).tagName === "g");
}

describe("renderSvg", () => {
  const scene = testScene();
  const svg = renderSvg(scene);
  const root = parse(svg);

  it("is well-formed XML with the page size in mm and a viewBox in mm", () => {
    expect(root.tagName).toBe("svg");
    expect(root.getAttribute("width")).toBe("210mm");
    expect(root.getAttribute("height")).toBe("297mm");
    expect(root.getAttribute("viewBox")).toBe("0 0 210 297");
    // xmldom accepts a bare "&" in text, so it is checked here directly.
    expect(svg.match(/&(?!(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);)/)).toBeNull();
  });

  it("writes one editor layer per scene layer, in order, with ids and labels", () => {
    const groups = layerGroups(root);
    expect(groups.map((g) => g.getAttribute("id"))).toEqual(scene.layers.map((l) => l.id));
    expect(groups.map((g) => g.getAttributeNS(INKSCAPE, "label"))).toEqual(scene.layers.map((l) => l.label));
    for (const g of groups) expect(g.getAttributeNS(INKSCAPE, "groupmode")).toBe("layer");
    expect(groups.map((g) => Array.from(g.childNodes).filter((n) => n.nodeType === 1).length)).toEqual(scene.layers.map((l) => l.marks.length));
  });

  it("carries each mark's data as data-* attributes", () => {
    const isotherm = all(root, "path").find((p) => p.getAttribute("data-value") === "273.15");
    expect(isotherm?.getAttribute("data-quantity")).toBe("T");
    expect(isotherm?.getAttribute("data-unit")).toBe("K");
    expect(all(root, "circle")[0]!.getAttribute("data-state")).toBe("1");
  });

  it("escapes user text so <, &, quotes and non-Latin characters survive a parse", () => {
    const texts = all(root, "text").map((t) => t.textContent);
    expect(texts).toContain(SPECIAL_TEXT);
    expect(texts).toContain(NON_LATIN_TEXT);
    expect(all(root, "title")[0]!.textContent).toBe(scene.meta.title);
    expect(svg).toContain("a&lt;b &amp; &quot;c&quot; &apos;d&apos;");
  });

  it("writes scene.meta.attributes as JSON on the root, and Dublin Core metadata", () => {
    expect(JSON.parse(root.getAttribute("data-domeprint")!)).toEqual(scene.meta.attributes);
    const dc = "http://purl.org/dc/elements/1.1/";
    expect(root.getElementsByTagNameNS(dc, "date")[0]!.textContent).toBe(scene.meta.date);
    expect(root.getElementsByTagNameNS(dc, "creator")[0]!.textContent).toBe(scene.meta.author);
    expect(Array.from(root.getElementsByTagName("rdf:li")).map((li) => li.textContent)).toEqual(scene.meta.keywords);
  });

  it("defines each clip once and points clipped paths at it", () => {
    const clip = all(root, "clipPath");
    expect(clip.map((c) => c.getAttribute("id"))).toEqual(["clip-plot"]);
    const clipped = all(root, "path").filter((p) => p.getAttribute("clip-path") === "url(#clip-plot)");
    const expected = scene.layers.flatMap((l) => l.marks).filter((m) => m.kind === "path" && m.clip === "plot").length;
    expect(clipped.length).toBe(expected);
  });

  it("writes text in mm font sizes, rotated counter-clockwise about the anchor, with a stroke halo behind", () => {
    const label = all(root, "text").find((t) => t.textContent === "T = 0 °C")!;
    expect(Number(label.getAttribute("font-size"))).toBeCloseTo((14 * 25.4) / 72, 3);
    expect(label.getAttribute("transform")).toBe("rotate(-32 100 100)");
    expect(label.getAttribute("paint-order")).toBe("stroke");
    expect(label.getAttribute("stroke")).toBe("#ffffff");
    expect(Number(label.getAttribute("stroke-width"))).toBe(1.6);
    expect(label.getAttribute("text-anchor")).toBe("middle");
    expect(label.getAttribute("font-family")).toBe("Noto Sans, sans-serif");
    expect(Number(label.getAttribute("y"))).toBeGreaterThan(100);
  });

  it("rounds every coordinate to 0.001 mm", () => {
    const odd: Scene = { ...scene, layers: [{ id: "l", label: "L", marks: [{ kind: "path", points: [1 / 3, 2 / 3, 10.0004999, -0.0001], stroke: { colour: "#000000", width: 0.3 } }] }] };
    expect(all(parse(renderSvg(odd)), "path")[0]!.getAttribute("d")).toBe("M0.333,0.667L10,0");
  });

  it("is byte-identical when rendered twice", () => {
    expect(renderSvg(testScene())).toBe(svg);
  });

  it("widens the sheet for bleed and crop marks while the viewBox origin stays at the trimmed corner", () => {
    const bled = parse(renderSvg(bleedScene()));
    // margin = bleed 3 mm → crop gap max(3, 3) + 5 mm marks + 2 mm clearance = 10 mm a side
    expect(bled.getAttribute("width")).toBe("230mm");
    expect(bled.getAttribute("height")).toBe("317mm");
    expect(bled.getAttribute("viewBox")).toBe("-10 -10 230 317");
    const background = all(bled, "rect").find((r) => r.getAttribute("id") === "domeprint-background")!;
    expect([background.getAttribute("x"), background.getAttribute("width")]).toEqual(["-3", "216"]);
    const marks = layerGroups(bled).find((g) => g.getAttribute("id") === "domeprint-crop-marks")!;
    expect(all(marks, "path")[0]!.getAttribute("d")!.match(/M/g)).toHaveLength(8);
  });
});

describe("renderSvg refuses scenes it cannot draw faithfully", () => {
  const withMark = (mark: Scene["layers"][number]["marks"][number]): Scene => ({ ...testScene(), layers: [{ id: "x", label: "X", marks: [mark] }] });
  const text = (over: Partial<TextMark>): Scene => withMark({ kind: "text", x: 1, y: 1, text: "a", size: 8, colour: "#000000", ...over });

  it.each([
    ["a colour that is not #rrggbb", text({ colour: "red" }), "E_INPUT", "colour"],
    ["a NaN coordinate", text({ x: Number.NaN }), "E_INPUT", ".x"],
    ["an unknown clip", withMark({ kind: "path", points: [0, 0, 1, 1], clip: "nowhere" }), "E_INPUT", ".clip"],
    ["an odd point list", withMark({ kind: "path", points: [0, 0, 1] }), "E_INPUT", ".points"],
    ["a data key that cannot be an attribute", text({ data: { "bad key": "1" } }), "E_INPUT", ".data"],
    ["a character the font lacks", text({ text: "h₁ → h₂" }), "E_UNSUPPORTED", "U+2192"],
    ["a font family that is not bundled", { ...testScene(), fontFamily: "Serif Display" }, "E_UNSUPPORTED", "Noto Sans"],
  ])("%s", (_name, bad, code, mention) => {
    const attempt = () => renderSvg(bad);
    expect(attempt).toThrow(DomeprintError);
    try {
      attempt();
    } catch (error) {
      expect((error as DomeprintError).code).toBe(code);
      expect((error as DomeprintError).message).toContain(mention);
    }
  });
});
