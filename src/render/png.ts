// Scene → PNG: the SVG rasterised by resvg with the bundled TTF files (never system fonts),
// so glyphs sit exactly where the SVG and PDF put them; the PNG records its resolution.

import { crc32 } from "node:zlib";
import { Resvg } from "@resvg/resvg-js";
import { inputError } from "../errors.js";
import type { Scene } from "../layout/scene.js";
import { FONT_FAMILY, fontPaths } from "./fonts.js";
import { pageFrame } from "./page.js";
import { renderSvg } from "./svg.js";

export interface PngOptions {
  /** Raster resolution in dots per inch (default 300). */
  dpi?: number;
}

export const DPI_RANGE = { min: 10, max: 2400 } as const;

/** About 1.6 GB of RGBA at the limit: an A0 sheet at 300 dpi (140 Mpx) fits, a runaway dpi does not. */
export const MAX_PIXELS = 400_000_000;

const MM_PER_INCH = 25.4;

/** resvg reads the SVG's mm sizes at CSS's 96 px per inch; zooming by dpi/96 keeps the scale exact. */
const CSS_DPI = 96;

export function pixelSize(scene: Scene, dpi: number): { width: number; height: number } {
  const frame = pageFrame(scene);
  return { width: Math.round((frame.mediaWidth / MM_PER_INCH) * dpi), height: Math.round((frame.mediaHeight / MM_PER_INCH) * dpi) };
}

function checkDpi(scene: Scene, dpi: number): void {
  if (!Number.isFinite(dpi) || dpi < DPI_RANGE.min || dpi > DPI_RANGE.max)
    throw inputError("dpi", dpi, "outside the supported resolutions", `${DPI_RANGE.min}–${DPI_RANGE.max} dpi`);
  const { width, height } = pixelSize(scene, dpi);
  if (width * height > MAX_PIXELS)
    throw inputError("dpi", dpi, `gives a ${width} × ${height} px image, too large to rasterise`, `at most ${MAX_PIXELS / 1e6} Mpx (lower the dpi)`);
}

function pngChunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "latin1"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** PNG signature (8 bytes) plus the IHDR chunk (4 length + 4 type + 13 data + 4 CRC). */
const AFTER_IHDR = 8 + 25;

/** Adds a pHYs chunk after IHDR so print and layout programs place the image at its true size. */
export function withResolution(png: Buffer, dpi: number): Buffer {
  const pixelsPerMetre = Math.round(dpi / (MM_PER_INCH / 1000));
  const data = Buffer.alloc(9);
  data.writeUInt32BE(pixelsPerMetre, 0);
  data.writeUInt32BE(pixelsPerMetre, 4);
  data.writeUInt8(1, 8);
  return Buffer.concat([png.subarray(0, AFTER_IHDR), pngChunk("pHYs", data), png.subarray(AFTER_IHDR)]);
}

export function renderPng(scene: Scene, options: PngOptions = {}): Buffer {
  const dpi = options.dpi ?? 300;
  const svg = renderSvg(scene);
  checkDpi(scene, dpi);
  const resvg = new Resvg(svg, {
    fitTo: { mode: "zoom", value: dpi / CSS_DPI },
    // The sheet is paper: the crop-mark margin outside the page colour prints white, not transparent.
    background: "#ffffff",
    font: { fontFiles: fontPaths(), loadSystemFonts: false, defaultFontFamily: FONT_FAMILY, sansSerifFamily: FONT_FAMILY },
  });
  return withResolution(resvg.render().asPng(), dpi);
}
