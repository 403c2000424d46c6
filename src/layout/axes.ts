// The axes' marks: enthalpy along the bottom, absolute pressure on the left with the gauge scale beyond
// it, saturation temperature on the right (bubble and dew for blends), each with its unit in the title.

import type { Mark, Stroke } from "./scene.js";
import type { AxisTicks, MarkedValue } from "./axis-ticks.js";
import { UNITS } from "../units/index.js";
import { toDisplay, type DisplayUnits } from "./display-units.js";
import { segment, text } from "./marks.js";
import type { PagePlan } from "./plan.js";
import type { ChartScales } from "./scales.js";
import { verticalScaleMarks, type ScaleTick } from "./vertical-scale.js";
import { formatNumber } from "./text.js";

export interface AxisInk {
  ink: string;
  stroke: Stroke;
}

function enthalpyMarks(ticks: AxisTicks, scales: ChartScales, units: DisplayUnits, plan: PagePlan, ink: AxisInk): Mark[] {
  const { axis } = plan;
  const bottom = scales.frame.y + scales.frame.height;
  const marks: Mark[] = [];
  for (const h of ticks.enthalpy.minor) marks.push(segment(scales.x(h), bottom, scales.x(h), bottom + axis.minorTick, ink.stroke));
  for (const h of ticks.enthalpy.major) {
    const x = scales.x(h);
    marks.push(segment(x, bottom, x, bottom + axis.tick, ink.stroke));
    marks.push(text(x, bottom + axis.tick + axis.gap + plan.axis.labelHeight * 0.5, formatNumber(toDisplay(h, units.enthalpy), 6), axis.tickPt, ink.ink, { anchor: "middle", baseline: "middle" }));
  }
  const titleY = bottom + axis.tick + axis.gap + axis.labelHeight + axis.gap + axis.titleHeight / 2;
  marks.push(text(scales.frame.x + scales.frame.width / 2, titleY, `specific enthalpy h, ${units.enthalpy.symbol}`, axis.titlePt, ink.ink, { anchor: "middle", baseline: "middle" }));
  return marks;
}

function pressureScaleTicks(ticks: AxisTicks, scales: ChartScales, units: DisplayUnits): ScaleTick[] {
  const labelled = new Set(ticks.pressure.labelled);
  return ticks.pressure.grid.map((p) => ({ y: scales.y(p), ...(labelled.has(p) ? { label: formatNumber(toDisplay(p, units.pressure), 6) } : {}) }));
}

function marked(values: MarkedValue[]): ScaleTick[] {
  return values.map((v) => ({ y: v.y, ...(v.labelled ? { label: formatNumber(v.value, 6) } : {}) }));
}

export interface AxisOptions {
  glide: boolean;
  /** Altitude of the site in m, for the gauge scale's title. */
  altitude?: number;
}

export function axesMarks(ticks: AxisTicks, scales: ChartScales, units: DisplayUnits, plan: PagePlan, ink: AxisInk, options: AxisOptions): Mark[] {
  const { frame } = scales;
  const extent = { top: frame.y, bottom: frame.y + frame.height, ink: ink.ink, stroke: ink.stroke };
  const t = units.temperature.symbol;
  const marks = [
    ...enthalpyMarks(ticks, scales, units, plan, ink),
    ...verticalScaleMarks({ ...extent, rule: plan.rules.pressure, side: "left", ticks: pressureScaleTicks(ticks, scales, units), title: `absolute pressure p, ${units.pressure.symbol}`, drawRule: false }, plan),
    ...verticalScaleMarks(
      { ...extent, rule: plan.rules.saturation, side: "right", ticks: marked(ticks.bubble), title: options.glide ? `bubble-point temperature, ${t}` : `saturation temperature, ${t}`, drawRule: false },
      plan,
    ),
  ];
  if (ticks.dew && plan.rules.dew !== undefined)
    marks.push(...verticalScaleMarks({ ...extent, rule: plan.rules.dew, side: "right", ticks: marked(ticks.dew), title: `dew-point temperature, ${t}`, drawRule: true }, plan));
  if (ticks.gauge && plan.rules.gauge !== undefined) {
    // The site's altitude in the sheet's own units: feet on an inch-pound sheet, metres otherwise.
    const length = UNITS.length[units.system === "ip" ? "ft" : "m"]!;
    const where = options.altitude === undefined ? "" : ` at ${formatNumber(toDisplay(options.altitude, length), 5)} ${length.symbol}`;
    const unit = `${units.pressure.symbol}(g)`.replace("psi(g)", "psig");
    marks.push(...verticalScaleMarks({ ...extent, rule: plan.rules.gauge, side: "left", ticks: marked(ticks.gauge), title: `gauge pressure${where}, ${unit}`, drawRule: true }, plan));
  }
  return marks;
}
