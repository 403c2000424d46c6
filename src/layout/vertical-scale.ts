// Draws one vertical scale beside the plot: a rule, ticks pointing away from the plot, tick labels and
// a rotated title. The pressure, gauge and saturation-temperature scales all use it.

import type { Mark, Stroke } from "./scene.js";
import { segment, text } from "./marks.js";
import type { PagePlan } from "./plan.js";

export interface ScaleTick {
  y: number;
  /** Printed beside the tick; unlabelled ticks are drawn shorter. */
  label?: string;
}

export interface VerticalScale {
  /** x of the rule in page mm. */
  rule: number;
  /** Which way ticks and labels point from the rule. */
  side: "left" | "right";
  top: number;
  bottom: number;
  ticks: ScaleTick[];
  title: string;
  /** Draw the rule itself (the plot frame already draws it for the scales that sit on the frame). */
  drawRule: boolean;
  ink: string;
  stroke: Stroke;
}

export function verticalScaleMarks(scale: VerticalScale, plan: PagePlan): Mark[] {
  const { axis } = plan;
  const dir = scale.side === "left" ? -1 : 1;
  const marks: Mark[] = [];
  if (scale.drawRule) marks.push(segment(scale.rule, scale.top, scale.rule, scale.bottom, scale.stroke));
  for (const tick of scale.ticks) {
    const length = tick.label === undefined ? axis.minorTick : axis.tick;
    marks.push(segment(scale.rule, tick.y, scale.rule + dir * length, tick.y, scale.stroke));
    if (tick.label !== undefined) {
      marks.push(text(scale.rule + dir * (axis.tick + axis.gap), tick.y, tick.label, axis.tickPt, scale.ink, { anchor: scale.side === "left" ? "end" : "start", baseline: "middle" }));
    }
  }
  const titleX = scale.rule + dir * (axis.tick + axis.gap + axis.labelWidth + axis.gap + axis.titleHeight / 2);
  // Titles read upwards on both sides, as a reader tilts the head to the left for either.
  marks.push(text(titleX, (scale.top + scale.bottom) / 2, scale.title, axis.titlePt, scale.ink, { anchor: "middle", baseline: "middle", rotate: 90 }));
  return marks;
}
