// Sheets of real mixtures: R454B and R407C-mix render (well-formed SVG, a PDF), the title block carries the
// composition and flags estimated pairs, and the command line writes both files for a composition string too.
import { mkdtempSync, readdirSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { DOMParser } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { renderSheet } from "../../src/sheet/index.js";
import { cli } from "../cli/run.js";

function wellFormed(svg: string): void {
  const problems: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => problems.push(`${level}: ${message}`) }).parseFromString(svg, "image/svg+xml");
  expect(problems).toEqual([]);
  expect(doc.documentElement!.nodeName).toBe("svg");
}

function texts(svg: string): string {
  return [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]).join("\n");
}

describe("sheets of real mixtures", () => {
  it("R454B: SVG and PDF, composition in the title block, no estimate flag (published pair)", async () => {
    const sheet = await renderSheet({ fluid: "R454B", paper: "A3", orientation: "landscape", formats: ["svg", "pdf"], date: "2025-03-14" });
    const svg = sheet.svg!.toString("utf8");
    wellFormed(svg);
    const t = texts(svg);
    expect(t).toMatch(/real mixture: R32 68\.9 % \+ R1234yf 31\.1 % by mass/); // ASHRAE 34 nominal composition (from memory)
    expect(t).not.toMatch(/binary parameters estimated/);
    expect(t).toMatch(/bubble and dew lines/);
    expect(sheet.pdf!.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(sheet.pdf!.subarray(-8).toString("latin1")).toMatch(/%%EOF/);
    expect(sheet.name).toMatch(/^R-454B_A3_landscape/);
  }, 120_000);

  it("R407C-mix: the estimated pairs are flagged in the title block; the name differs from the pseudo-pure R407C's", async () => {
    const sheet = await renderSheet({ fluid: "R407C-mix", paper: "A3", orientation: "landscape", formats: ["svg", "pdf"], date: "2025-03-14" });
    const svg = sheet.svg!.toString("utf8");
    wellFormed(svg);
    expect(texts(svg)).toMatch(/binary parameters estimated for R32\/R125, R32\/R134a, R125\/R134a/);
    expect(sheet.pdf!.length).toBeGreaterThan(10_000);
    const pure = await renderSheet({ fluid: "R407C", paper: "A3", orientation: "landscape", formats: ["svg"], date: "2025-03-14" });
    expect(sheet.name).not.toBe(pure.name);
  }, 120_000);

  it("domeprint sheet with a composition string writes a PDF and an SVG", () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-mix-"));
    const r = cli(["sheet", "R32:0.5+R1234yf:0.5", "--paper", "A4", "-o", dir]);
    expect(r.code).toBe(0);
    const files = readdirSync(dir);
    expect(files.some((f) => f.endsWith(".pdf"))).toBe(true);
    const svgFile = files.find((f) => f.endsWith(".svg"))!;
    wellFormed(readFileSync(join(dir, svgFile), "utf8"));
  }, 120_000);
});
