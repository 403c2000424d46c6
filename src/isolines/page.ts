// The page mapping: where a physical point (h, p) lands on the printed plot frame, in millimetres.
// Enthalpy runs linearly, pressure logarithmically; chord deviations are measured here.
import type { ChartWindow, Frame, Point } from "./types.js";

export interface PageMapping {
  readonly window: ChartWindow;
  readonly frame: Frame;
  /** Millimetres from the frame's left edge. */
  x(h: number): number;
  /** Millimetres from the frame's bottom edge. */
  y(p: number): number;
}

/** A3 and A2 sheets are the common print sizes; the default frame is that of an A2 landscape sheet. */
export const DEFAULT_FRAME: Frame = { widthMm: 520, heightMm: 340 };

export function pageMapping(window: ChartWindow, frame: Frame = DEFAULT_FRAME): PageMapping {
  const sx = frame.widthMm / (window.hMax - window.hMin);
  const sy = frame.heightMm / Math.log(window.pMax / window.pMin);
  const h0 = window.hMin, lnp0 = Math.log(window.pMin);
  return {
    window,
    frame,
    x: (h) => (h - h0) * sx,
    y: (p) => (Math.log(p) - lnp0) * sy,
  };
}

/** Distance [mm] between two points on the page. */
export function pageDistance(m: PageMapping, a: Point, b: Point): number {
  return Math.hypot(m.x(a[0]) - m.x(b[0]), m.y(a[1]) - m.y(b[1]));
}

/** Distance [mm] from point q to the chord a–b on the page (to the nearer end beyond the chord's ends). */
export function chordDeviation(m: PageMapping, a: Point, b: Point, q: Point): number {
  const ax = m.x(a[0]), ay = m.y(a[1]);
  const dx = m.x(b[0]) - ax, dy = m.y(b[1]) - ay;
  const qx = m.x(q[0]) - ax, qy = m.y(q[1]) - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, (qx * dx + qy * dy) / len2)) : 0;
  return Math.hypot(qx - t * dx, qy - t * dy);
}

/** Whether a point lies in the window (edges included, with a slack of rounding size). */
export function inWindow(w: ChartWindow, q: Point): boolean {
  const eh = 1e-12 * (w.hMax - w.hMin);
  return q[0] >= w.hMin - eh && q[0] <= w.hMax + eh && q[1] >= w.pMin * (1 - 1e-12) && q[1] <= w.pMax * (1 + 1e-12);
}
