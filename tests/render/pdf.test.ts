// PDF renderer: exact page boxes, embedded subset fonts, surviving text, document info, determinism,
// CMYK output and dash handling. Uses Debian's poppler-utils (pdfinfo, pdffonts, pdftotext) when present.

import { inflateSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import type { Scene } from "../../src/layout/scene.js";
import { renderPdf } from "../../src/render/pdf.js";
import { bleedScene, NON_LATIN_TEXT, SPECIAL_TEXT, testScene } from "./fixture.js";
import { hasTool, popplerText } from "./tools.js";

const PT_PER_MM = 72 / 25.4;
// ISO 216 A4 is 210 × 297 mm (from memory), so 595.2756 × 841.8898 pt.
const A4_PT = [210 * PT_PER_MM, 297 * PT_PER_MM];

function pageBox(pdf: Buffer, name: string): number[] {
  const match = pdf.toString("latin1").match(new RegExp(`/${name} \\[([^\\]]*)\\]`));
  if (!match) throw new Error(`no /${name} in the PDF`);
  return match[1]!.trim().split(/\s+/).map(Number);
}

function expectBox(actual: number[], expected: number[]): void {
  expect(actual).toHaveLength(4);
  actual.forEach((v, i) => expect(Math.abs(v - expected[i]!)).toBeLessThan(5e-4));
}

/** Inflated page content: pdfkit compresses every stream, so operators are only visible after inflating. */
function contentText(pdf: Buffer): string {
  const raw = pdf.toString("latin1");
  const streams = [...raw.matchAll(/stream\n([\s\S]*?)\nendstream/g)];
  return streams
    .map((m) => {
      try {
        return inflateSync(Buffer.from(m[1]!, "latin1")).toString("latin1");
      } catch {
        return "";
      }
    })
    .join("\n");
}

const POPPLER_MISSING = "skipped: poppler-utils not installed (apt-get install -y poppler-utils)";

describe("renderPdf", async () => {
  const pdf = await renderPdf(testScene());
  const bled = await renderPdf(bleedScene());

  it("makes the page exactly the requested paper: A4 = 595.276 × 841.890 pt", () => {
    expectBox(pageBox(pdf, "MediaBox"), [0, 0, A4_PT[0]!, A4_PT[1]!]);
    expect(pdf.toString("latin1")).not.toContain("/TrimBox");
  });

  it("adds bleed and crop-mark room to the MediaBox and sets TrimBox and BleedBox", () => {
    const margin = 10 * PT_PER_MM; // 3 mm crop gap (= bleed) + 5 mm marks + 2 mm clearance
    const bleed = 3 * PT_PER_MM;
    expectBox(pageBox(bled, "MediaBox"), [0, 0, A4_PT[0]! + 2 * margin, A4_PT[1]! + 2 * margin]);
    expectBox(pageBox(bled, "TrimBox"), [margin, margin, margin + A4_PT[0]!, margin + A4_PT[1]!]);
    expectBox(pageBox(bled, "BleedBox"), [margin - bleed, margin - bleed, margin + A4_PT[0]! + bleed, margin + A4_PT[1]! + bleed]);
  });

  it("is byte-identical when rendered twice, and the date really is what fixes it", async () => {
    expect((await renderPdf(testScene())).equals(pdf)).toBe(true);
    const later = testScene();
    later.meta.date = "2024-06-01T00:00:00Z";
    expect((await renderPdf(later)).equals(pdf)).toBe(false);
  });

  it.skipIf(!hasTool("pdffonts"))(`embeds every font it uses, as subsets (${hasTool("pdffonts") ? "pdffonts" : POPPLER_MISSING})`, () => {
    const rows = popplerText("pdffonts", pdf).trim().split("\n").slice(2);
    expect(rows.map((r) => r.split(/\s+/)[0]!.replace(/^[A-Z]{6}\+/, "")).sort()).toEqual(["NotoSans-Bold", "NotoSans-Regular"]);
    for (const row of rows) {
      const [emb, sub] = row.trim().split(/\s+/).slice(-5, -3);
      expect([row, emb, sub]).toEqual([row, "yes", "yes"]);
    }
  });

  it.skipIf(!hasTool("pdftotext"))(`keeps special and non-Latin text extractable (${hasTool("pdftotext") ? "pdftotext" : POPPLER_MISSING})`, () => {
    const text = popplerText("pdftotext", pdf);
    expect(text).toContain(SPECIAL_TEXT);
    expect(text).toContain(NON_LATIN_TEXT);
  });

  it.skipIf(!hasTool("pdfinfo"))(`writes the document info from the scene (${hasTool("pdfinfo") ? "pdfinfo" : POPPLER_MISSING})`, () => {
    const info = popplerText("pdfinfo", pdf, ["-isodates"]);
    const field = (name: string) => info.match(new RegExp(`^${name}:\\s*(.*)$`, "m"))?.[1];
    const meta = testScene().meta;
    expect(field("Title")).toBe(meta.title);
    expect(field("Subject")).toBe(meta.subject);
    expect(field("Author")).toBe(meta.author);
    expect(field("Keywords")).toBe(meta.keywords!.join(", "));
    expect(field("Creator")).toBe(meta.creator);
    expect(field("CreationDate")).toBe("2024-05-01T00:00:00Z");
  });

  it("writes DeviceRGB colours by default and only DeviceCMYK when asked", async () => {
    const strokes = (content: string, space: string) =>
      [...content.matchAll(new RegExp(`/${space} CS\\n([-\\d. ]+) SCN`, "g"))].map((m) => m[1]!.split(" ").map(Number));
    const rgb = contentText(pdf);
    expect(rgb).not.toContain("/DeviceCMYK");
    // #c0392b as an sRGB stroke: 192/255, 57/255, 43/255
    expect(strokes(rgb, "DeviceRGB").some((c) => c.every((v, i) => Math.abs(v - [192 / 255, 57 / 255, 43 / 255][i]!) < 1e-9))).toBe(true);
    const cmyk = contentText(await renderPdf(testScene(), { cmyk: true }));
    expect(cmyk).not.toContain("/DeviceRGB");
    // #c0392b by K = 1 − max = 0.2471, C = 0, M = (1 − 57/255 − K)/(1 − K) = 0.7031, Y = 0.7760
    expect(strokes(cmyk, "DeviceCMYK").some((c) => c.every((v, i) => Math.abs(v - [0, 0.7031, 0.776, 0.2471][i]!) < 1e-9))).toBe(true);
  });

  it("writes dash patterns in mm, zero-length dots included, and doubles odd lists", async () => {
    const dotted: Scene = {
      ...testScene(),
      layers: [
        {
          id: "d",
          label: "Dashes",
          marks: [
            { kind: "path", points: [10, 10, 100, 10], stroke: { colour: "#000000", width: 0.5, dash: [0, 1], cap: "round" } },
            { kind: "path", points: [10, 20, 100, 20], stroke: { colour: "#000000", width: 0.5, dash: [3] } },
          ],
        },
      ],
    };
    const content = contentText(await renderPdf(dotted));
    expect(content).toContain("[0 1] 0 d");
    expect(content).toContain("[3 3] 0 d");
  });
});
