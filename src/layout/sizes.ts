// Scales a style's A4 sizes to the paper in hand: type, line widths, dashes and spacings grow together,
// and never fall below the print floor (6 pt type, 0.1 mm lines).

import type { Stroke } from "./scene.js";
import type { Style, StyleStroke } from "./style.js";

export const MIN_TYPE_PT = 6;
export const MIN_LINE_MM = 0.1;

/** The short side of A4 in mm, the paper every style's sizes are written for. */
const A4_SHORT_SIDE = 210;

export interface Sizes {
  /** (short side / 210 mm) ^ exponent. */
  factor: number;
  /** A type size in pt at A4 → on this paper. */
  pt(a4: number): number;
  /** A length in mm at A4 → on this paper. */
  mm(a4: number): number;
  stroke(style: StyleStroke): Stroke;
}

export function sizesFor(style: Style, page: { width: number; height: number }): Sizes {
  const factor = Math.pow(Math.min(page.width, page.height) / A4_SHORT_SIDE, style.scaling.exponent);
  const mm = (a4: number) => a4 * factor;
  return {
    factor,
    pt: (a4) => Math.max(MIN_TYPE_PT, a4 * factor),
    mm,
    stroke: (s) => ({
      colour: s.colour,
      width: Math.max(MIN_LINE_MM, mm(s.width)),
      ...(s.dash ? { dash: s.dash.map(mm) } : {}),
      ...(s.cap ? { cap: s.cap } : {}),
      join: "round",
    }),
  };
}
