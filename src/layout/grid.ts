// The reading grid: fine vertical lines at enthalpy steps and horizontal lines at pressure steps, with
// the labelled values drawn a little stronger so the eye can count across the sheet.

import type { AxisTicks } from "./axis-ticks.js";
import type { Mark, Stroke } from "./scene.js";
import { segment } from "./marks.js";
import type { ChartScales } from "./scales.js";

export function gridMarks(ticks: AxisTicks, scales: ChartScales, major: Stroke, minor: Stroke): Mark[] {
  const { frame } = scales;
  const right = frame.x + frame.width, bottom = frame.y + frame.height;
  const strongH = new Set(ticks.enthalpy.major);
  const strongP = new Set(ticks.pressure.labelled);
  const marks: Mark[] = [];
  // Minor lines first, so the major ones are painted over them where they coincide.
  for (const strong of [false, true]) {
    for (const h of ticks.enthalpy.minor) if (strongH.has(h) === strong) marks.push(segment(scales.x(h), frame.y, scales.x(h), bottom, strong ? major : minor));
    for (const p of ticks.pressure.grid) if (strongP.has(p) === strong) marks.push(segment(frame.x, scales.y(p), right, scales.y(p), strong ? major : minor));
  }
  return marks;
}
