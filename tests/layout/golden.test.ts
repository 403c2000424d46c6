// Golden images: three fluids in two styles, A4, rasterised from the SVG at 72 dpi and compared with
// tests/golden/*.png, so an unintended change anywhere from the engine to the layout shows up.
// DOMEPRINT_UPDATE_GOLDEN=1 rewrites them; each rewritten image must be looked at before it is committed.

import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { renderSheet } from "../../src/sheet/index.js";
import { decodePng, differingShare } from "../render/tools.js";

const DIR = new URL("../golden/", import.meta.url);
const UPDATE = process.env.DOMEPRINT_UPDATE_GOLDEN === "1";
/** Same code, same fonts, same rasteriser: any real change moves far more than this share of pixels. */
const LIMIT = 0.001;

const CASES = ["R717", "R134a", "R744"].flatMap((fluid) => ["plant-room", "training-handout"].map((style) => [fluid, style] as const));

describe("golden sheets", () => {
  it.each(CASES)("%s in %s matches its golden image", async (fluid, style) => {
    const sheet = await renderSheet({ fluid, style, paper: "A4", formats: ["png"], dpi: 72, date: "2025-03-14", fields: { title: "Golden sheet", site: "Test bench" } });
    const file = new URL(`${fluid}-${style}.png`, DIR);
    if (UPDATE) writeFileSync(file, sheet.png!);
    expect(existsSync(file)).toBe(true);
    const share = differingShare(decodePng(readFileSync(file)), decodePng(sheet.png!), 0);
    expect(share).toBeLessThanOrEqual(LIMIT);
  });
});
