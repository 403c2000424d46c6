// Raster parity: the PDF rasterised by poppler and the SVG rasterised by resvg, both at 100 dpi, must
// agree to under 1 % of pixels; a deliberately shifted label must not, so the comparison can fail.

import { describe, expect, it } from "vitest";
import type { Scene } from "../../src/layout/scene.js";
import { renderPdf } from "../../src/render/pdf.js";
import { renderPng } from "../../src/render/png.js";
import { bleedScene, testScene } from "./fixture.js";
import { decodePng, differingShare, hasTool, inkedShare, rasterisePdf } from "./tools.js";

const DPI = 100;
const THRESHOLD = 0.1;
const LIMIT = 0.01;
/** Text alone: glyph edges from two rasterisers differ (about 7 % of ink measured); a run 1 px off differs far more. */
const LABEL_INK_LIMIT = 0.12;

async function pdfVersusSvg(pdfScene: Scene, svgScene: Scene = pdfScene): Promise<{ share: number; inked: number }> {
  const fromPdf = rasterisePdf(await renderPdf(pdfScene), DPI);
  const fromSvg = decodePng(renderPng(svgScene, { dpi: DPI }));
  return { share: differingShare(fromPdf, fromSvg, THRESHOLD), inked: inkedShare(fromSvg) };
}

/** Moves every label to the right: a misplacement the comparison has to see. */
function shiftedLabels(scene: Scene, mm: number): Scene {
  return {
    ...scene,
    layers: scene.layers.map((layer) => ({ ...layer, marks: layer.marks.map((m) => (m.kind === "text" ? { ...m, x: m.x + mm } : m)) })),
  };
}

function labelsOnly(scene: Scene): Scene {
  return { ...scene, layers: scene.layers.filter((layer) => layer.marks.every((m) => m.kind === "text")) };
}

const percent = (share: number) => `${(share * 100).toFixed(3)} %`;

describe.skipIf(!hasTool("pdftoppm"))("PDF and SVG rasterise alike (skipped without poppler-utils' pdftoppm)", () => {
  it.each([
    ["A4 test scene", testScene],
    ["A4 with bleed, crop marks and a tinted page", bleedScene],
  ])("%s: under 1 % of pixels differ at 100 dpi", async (name, make) => {
    const { share, inked } = await pdfVersusSvg(make());
    console.info(`raster parity, ${name}: ${percent(share)} of pixels differ (threshold ${THRESHOLD}), ${percent(inked)} inked`);
    expect(inked).toBeGreaterThan(0.05);
    expect(share).toBeLessThan(LIMIT);
  });

  it("sees labels moved by 1 mm", async () => {
    const faithful = await pdfVersusSvg(testScene());
    const shifted = await pdfVersusSvg(testScene(), shiftedLabels(testScene(), 1));
    console.info(`raster parity, labels shifted 1 mm: ${percent(shifted.share)} differ (faithful: ${percent(faithful.share)})`);
    expect(shifted.share).toBeGreaterThan(faithful.share * 3);
  });

  it("places labels alike: on a labels-only sheet, differing pixels stay a small share of the ink", async () => {
    const labels = labelsOnly(testScene());
    const faithful = await pdfVersusSvg(labels);
    const shifted = await pdfVersusSvg(labels, shiftedLabels(labels, 0.25));
    const ofInk = (r: { share: number; inked: number }) => r.share / r.inked;
    console.info(`raster parity, labels only: ${percent(ofInk(faithful))} of inked pixels differ; shifted 0.25 mm: ${percent(ofInk(shifted))}`);
    expect(ofInk(faithful)).toBeLessThan(LABEL_INK_LIMIT);
    expect(ofInk(shifted)).toBeGreaterThan(LABEL_INK_LIMIT);
  });
});
