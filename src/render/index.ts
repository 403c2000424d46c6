// The renderers' public surface: a Scene drawn as SVG, PDF or PNG, plus the bundled font and its metrics.
// Paper sizes live with the layout (src/layout/paper.ts) and are re-exported here for callers that print.

export { renderSvg } from "./svg.js";
export { renderPdf, type PdfOptions } from "./pdf.js";
export { renderPng, pixelSize, DPI_RANGE, MAX_PIXELS, type PngOptions } from "./png.js";
export { FONT_FAMILY, capHeight, fontBuffer, fontPath, fontPaths, measureText, missingCharacters, type FontWeight, type TextMetrics } from "./fonts.js";
export { rgbToCmyk, parseHex, type Cmyk, type Rgb } from "./colour.js";
export { checkScene } from "./check.js";
export { pageFrame, CROP_MARK, type PageFrame, type Segment } from "./page.js";
export { resolvePaper, paperNames, CUSTOM_RANGE_MM, type Orientation, type Paper } from "../layout/paper.js";
