// A whole sheet as files: the SVG is well-formed, layered and self-describing (a script finds the 0 °C
// isotherm and maps it back to (h, p)); the PDF has the exact page box, embedded fonts and the user's text.

import { DOMParser, type Element as XmlElement } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { getFluid, saturationT } from "../../src/eos/index.js";
import { DomeprintError } from "../../src/errors.js";
import { renderSheet } from "../../src/sheet/index.js";
import type { TextMark } from "../../src/layout/scene.js";
import { hasTool, popplerText } from "../render/tools.js";

const TITLE = `Plant <3> & "Kältezentrale" — Ωμέγα / Холод`;
const INKSCAPE = "http://www.inkscape.org/namespaces/inkscape";

interface Axis {
  quantity: string;
  scale: "linear" | "log";
  unit: string;
  domain: [number, number];
  range: [number, number];
}

function parse(svg: string): XmlElement {
  const problems: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => problems.push(`${level}: ${message}`) }).parseFromString(svg, "image/svg+xml");
  expect(problems).toEqual([]);
  return doc.documentElement!;
}

/** Page position → physical value, using only what the SVG root says about its axes. */
function invert(axis: Axis, at: number): number {
  const t = (at - axis.range[0]) / (axis.range[1] - axis.range[0]);
  const [a, b] = axis.domain;
  return axis.scale === "log" ? Math.exp(Math.log(a) + t * (Math.log(b) - Math.log(a))) : a + t * (b - a);
}

function pathPoints(d: string): [number, number][] {
  // SVG path data: M or L, then x and y separated by a comma or a space (d3-shape writes commas).
  return [...d.matchAll(/[ML]?(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

describe("R-134a sheet, A4 landscape, as SVG", async () => {
  const sheet = await renderSheet({ fluid: "R134a", paper: "A4", orientation: "landscape", formats: ["svg", "pdf"], date: "2025-03-14", reference: "iir", fields: { title: TITLE, author: "Zoë O'Brien" }, gauge: true, altitude: 300 });
  const svg = sheet.svg!.toString("utf8");
  const root = parse(svg);
  const meta = JSON.parse(root.getAttribute("data-domeprint")!) as { plotFrame: { x: number; y: number; width: number; height: number }; axes: { x: Axis; y: Axis } };

  it("names every layer for vector editors", () => {
    const labels = Array.from(root.childNodes)
      .filter((n): n is XmlElement => n.nodeType === 1 && (n as XmlElement).tagName === "g")
      .map((g) => g.getAttributeNS(INKSCAPE, "label"));
    for (const name of ["Reading grid", "Saturation dome", "Isotherms (constant temperature)", "Isentropes (constant entropy)", "Isochores (constant specific volume)", "Quality lines (constant vapour fraction)", "Line labels", "Axes and scales", "Panels"])
      expect(labels).toContain(name);
  });

  it("describes its plot frame and axes on the root", () => {
    expect(meta.axes.x).toMatchObject({ quantity: "specific enthalpy", scale: "linear", unit: "J/kg" });
    expect(meta.axes.y).toMatchObject({ quantity: "absolute pressure", scale: "log", unit: "Pa" });
    expect(meta.axes.x.range).toEqual([meta.plotFrame.x, meta.plotFrame.x + meta.plotFrame.width].map((v) => Math.round(v * 1e6) / 1e6));
  });

  it("lets a script find the 0 °C isotherm and read saturation at 0 °C back from it", () => {
    const paths = Array.from(root.getElementsByTagName("path")).filter((p) => p.getAttribute("data-quantity") === "temperature" && Number(p.getAttribute("data-value")) === 273.15);
    expect(paths.length).toBeGreaterThan(0);
    const points = paths.flatMap((p) => pathPoints(p.getAttribute("d")!)).map(([x, y]) => [invert(meta.axes.x, x), invert(meta.axes.y, y)] as const);
    const sat = saturationT(getFluid("R134a"), 273.15);
    // The isotherm runs flat through the dome at the saturation pressure; a path point is within 0.05 mm
    // of the true line and coordinates are written to 0.001 mm, so 0.2 % in p is generous.
    const flat = points.filter(([, p]) => Math.abs(p / sat.pL - 1) < 0.002);
    expect(flat.length).toBeGreaterThanOrEqual(2);
    // IIR reference state: the saturated liquid at 0 °C has h = 200 kJ/kg by definition (IIR convention, common practice).
    const hs = flat.map(([h]) => h);
    expect(Math.min(...hs) / 1000).toBeCloseTo(200, 0);
  });

  it("sets the gauge scale's zero at the standard atmosphere of 300 m and the 0 °C mark at its saturation pressure", () => {
    const axes = sheet.scene.layers.find((l) => l.id === "axes")!.marks;
    const zeros = axes.filter((m): m is TextMark => m.kind === "text" && m.text === "0");
    const left = zeros.filter((m) => m.x < meta.plotFrame.x);
    const right = zeros.filter((m) => m.x > meta.plotFrame.x + meta.plotFrame.width);
    expect(left.length).toBe(1);
    expect(right.length).toBe(1);
    // ISO 2533 standard atmosphere at 300 m: 97.77 kPa (from memory); the label sits at its tick's height.
    expect(invert(meta.axes.y, left[0]!.y) / 97770).toBeCloseTo(1, 3);
    expect(invert(meta.axes.y, right[0]!.y) / saturationT(getFluid("R134a"), 273.15).pL).toBeCloseTo(1, 4);
  });

  it("names the gauge scale's site altitude in the sheet's units: metres here, feet on an inch-pound sheet", async () => {
    const axes = sheet.scene.layers.find((l) => l.id === "axes")!.marks;
    expect(axes.some((m) => m.kind === "text" && m.text === "gauge pressure at 300 m, bar(g)")).toBe(true);
    const ip = await renderSheet({ fluid: "R134a", paper: "A4", units: "ip", formats: ["svg"], date: "2025-03-14", gauge: true, altitude: 304.8 });
    const ipAxes = ip.scene.layers.find((l) => l.id === "axes")!.marks;
    expect(ipAxes.some((m) => m.kind === "text" && m.text === "gauge pressure at 1000 ft, psig")).toBe(true); // 304.8 m = 1000 ft exactly
  });

  it("keeps the user's text, markup characters and all, as real text", () => {
    expect(svg).toContain("Plant &lt;3&gt; &amp; &quot;Kältezentrale&quot; — Ωμέγα / Холод");
    const texts = Array.from(root.getElementsByTagName("text")).map((t) => t.textContent);
    expect(texts).toContain(TITLE);
  });

  describe.skipIf(!hasTool("pdfinfo"))("as PDF (skipped without poppler-utils)", () => {
    const pdf = sheet.pdf!;

    it("has the exact A4 landscape page box", () => {
      const info = popplerText("pdfinfo", pdf);
      expect(info).toMatch(/Page size:\s+841\.89 x 595\.276? pts/);
      expect(info).toContain(`Title:           ${TITLE} — R-134a`);
      expect(info).toContain("Author:          Zoë O'Brien");
    });

    it("embeds every font it uses", () => {
      const rows = popplerText("pdffonts", pdf).trim().split("\n").slice(2);
      expect(rows.length).toBeGreaterThan(0);
      for (const row of rows) expect(row.split(/\s+/).slice(-5, -4)[0]).toBe("yes");
    });

    it("carries the title's characters as text", () => {
      expect(popplerText("pdftotext", pdf)).toContain(TITLE);
    });
  });
});

describe.skipIf(!hasTool("pdfinfo"))("page boxes of other papers (skipped without poppler-utils)", () => {
  it.each([
    ["A0", "portrait", /Page size:\s+2383\.94 x 3370\.39\d? pts/],
    ["Letter", "portrait", /Page size:\s+612 x 792 pts/],
    ["ARCH D", "landscape", /Page size:\s+2592 x 1728 pts/],
    ["500x300", "landscape", /Page size:\s+1417\.32 x 850\.394? pts/],
  ] as const)("%s %s", async (paper, orientation, size) => {
    const sheet = await renderSheet({ fluid: "R744", paper, orientation, formats: ["pdf"], date: "2025-03-14" });
    expect(popplerText("pdfinfo", sheet.pdf!)).toMatch(size);
  });
});

describe.skipIf(!hasTool("pdfinfo"))("print-shop options (skipped without poppler-utils)", () => {
  it("puts the trimmed A4 page inside a 3 mm bleed and room for crop marks", async () => {
    const sheet = await renderSheet({ fluid: "R32", paper: "A4", bleed: 3, cropMarks: true, cmyk: true, formats: ["pdf"], date: "2025-03-14" });
    const boxes = popplerText("pdfinfo", sheet.pdf!, ["-box"]);
    const box = (name: string) => boxes.match(new RegExp(`${name}:\\s+([\\d.]+)\\s+([\\d.]+)\\s+([\\d.]+)\\s+([\\d.]+)`))!.slice(1).map(Number);
    const [tx0, ty0, tx1, ty1] = box("TrimBox");
    const [bx0, , bx1] = box("BleedBox");
    const pt = 72 / 25.4;
    expect(tx1! - tx0!).toBeCloseTo(297 * pt, 1);
    expect(ty1! - ty0!).toBeCloseTo(210 * pt, 1);
    expect(bx1! - bx0!).toBeCloseTo(303 * pt, 1);
  });
});

it("refuses text the bundled face cannot print, with a typed error", async () => {
  await expect(renderSheet({ fluid: "R290", paper: "A4", formats: ["svg"], fields: { title: "冷凍機" }, date: "2025-03-14" })).rejects.toThrow(DomeprintError);
});
