// How a TextMark's anchor, baseline, rotation and halo translate into drawing geometry.
// One definition for SVG and PDF, so both put the same glyphs in the same place.

import { MM_PER_PT, type TextMark } from "../layout/scene.js";
import { capHeight, type FontWeight } from "./fonts.js";

/** Fraction of the run's advance width that lies before the anchor point. */
export function anchorShare(mark: TextMark): number {
  return mark.anchor === "middle" ? 0.5 : mark.anchor === "end" ? 1 : 0;
}

export function weightOf(mark: TextMark): FontWeight {
  return mark.weight ?? "normal";
}

export function sizeMm(mark: TextMark): number {
  return mark.size * MM_PER_PT;
}

/** Baseline y in page mm before rotation: "middle" puts y at half the cap height, so the baseline sits lower. */
export function baselineY(mark: TextMark): number {
  return mark.baseline === "middle" ? mark.y + capHeight(mark.size, weightOf(mark)) / 2 : mark.y;
}

/** Clockwise degrees for y-down page space, where both SVG and pdfkit measure rotation clockwise. */
export function clockwise(mark: TextMark): number {
  return mark.rotate ? -mark.rotate : 0;
}

/**
 * The halo's width is the clearance it keeps around each glyph outline; a stroke is centred on the
 * outline, so it is drawn twice as wide, behind the fill.
 */
export function haloStrokeWidth(mark: TextMark): number {
  return mark.halo ? 2 * mark.halo.width : 0;
}
