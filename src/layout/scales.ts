// Where things go: the plot frame on the page and the d3 scales that map enthalpy (linear) and absolute
// pressure (logarithmic) onto it. Marks ask these scales for positions and never compute them themselves.

import { scaleLinear, scaleLog, type ScaleLinear, type ScaleLogarithmic } from "d3-scale";
import type { Rect } from "./geometry.js";

/** The part of the (h, p) plane the chart shows, SI: h in J/kg, p in Pa. */
export interface Window {
  hMin: number;
  hMax: number;
  pMin: number;
  pMax: number;
}

export interface ChartScales {
  frame: Rect;
  window: Window;
  /** h [J/kg] → page x [mm]. */
  x: ScaleLinear<number, number>;
  /** p [Pa] → page y [mm], high pressure at the top. */
  y: ScaleLogarithmic<number, number>;
}

export function chartScales(window: Window, frame: Rect): ChartScales {
  const x = scaleLinear().domain([window.hMin, window.hMax]).range([frame.x, frame.x + frame.width]);
  const y = scaleLog().domain([window.pMin, window.pMax]).range([frame.y + frame.height, frame.y]);
  return { frame, window, x, y };
}

/** A polyline of (h, p) points as a flat page-mm list for a PathMark. */
export function toPage(scales: ChartScales, points: readonly (readonly [number, number])[]): number[] {
  const out = new Array<number>(points.length * 2);
  points.forEach(([h, p], i) => {
    out[2 * i] = scales.x(h);
    out[2 * i + 1] = scales.y(p);
  });
  return out;
}
