// Which values the sheet's scales mark and where: enthalpy steps, pressure decades, whole saturation
// temperatures and round gauge pressures, chosen so labels never crowd and the grid is fine but legible.

import { toSI, type Unit } from "../units/index.js";
import type { SaturationTick } from "./content.js";
import { toDisplay, type DisplayUnits } from "./display-units.js";
import type { PagePlan } from "./plan.js";
import type { ChartScales } from "./scales.js";
import { FINEST_LABEL_LADDER, logLadder, logValues, minorStep, multiples, rankBySteps, roundStep, thinTicks, type TickCandidate } from "./ticks.js";

export interface LinearTicks {
  /** Labelled values, SI. */
  major: number[];
  /** Grid values between them, SI (the majors included). */
  minor: number[];
  /** Step of the majors in the display unit. */
  step: number;
}

export interface LogTicks {
  labelled: number[];
  grid: number[];
}

export interface MarkedValue {
  /** Value in the display unit, as printed. */
  value: number;
  y: number;
  labelled: boolean;
}

export interface AxisTicks {
  enthalpy: LinearTicks;
  pressure: LogTicks;
  bubble: MarkedValue[];
  /** Dew-point scale, only for blends with a glide. */
  dew?: MarkedValue[];
  gauge?: MarkedValue[];
}

function enthalpyTicks(scales: ChartScales, unit: Unit, plan: PagePlan, gridSpacing: number): LinearTicks {
  const lo = toDisplay(scales.window.hMin, unit), hi = toDisplay(scales.window.hMax, unit);
  const width = scales.frame.width;
  // A label every 14 mm or so at A4 keeps five-digit values apart and the scale easy to interpolate.
  const step = roundStep(((hi - lo) * plan.sizes.mm(14)) / width);
  const minor = minorStep(step, ((hi - lo) * gridSpacing) / width);
  return {
    major: multiples(lo, hi, step).map((v) => toSI(v, unit)),
    minor: multiples(lo, hi, minor).map((v) => toSI(v, unit)),
    step,
  };
}

function pressureTicks(scales: ChartScales, unit: Unit, plan: PagePlan, gridSpacing: number): LogTicks {
  const lo = toDisplay(scales.window.pMin, unit), hi = toDisplay(scales.window.pMax, unit);
  const decade = scales.frame.height / Math.log10(hi / lo);
  const labels = logLadder(decade, plan.axis.labelHeight * 1.35, FINEST_LABEL_LADDER);
  // The grid never gets coarser than the labels, or a label would sit on no line.
  const fine = logLadder(decade, gridSpacing);
  const grid = fine.length >= labels.length ? fine : labels;
  return {
    labelled: logValues(lo, hi, labels).map((v) => toSI(v, unit)),
    grid: logValues(lo, hi, grid).map((v) => toSI(v, unit)),
  };
}

/** Rounder temperatures first: multiples of 50, 10, 5, 2, then any whole degree. */
const TEMPERATURE_STEPS = [50, 10, 5, 2, 1];

function temperatureMarks(ticks: SaturationTick[], pressureOf: (t: SaturationTick) => number, scales: ChartScales, plan: PagePlan): MarkedValue[] {
  const { frame } = scales;
  const candidates: TickCandidate[] = [];
  for (const t of ticks) {
    const p = pressureOf(t);
    if (!(p >= scales.window.pMin && p <= scales.window.pMax)) continue;
    candidates.push({ value: t.t, at: scales.y(p), rank: rankBySteps(t.t, TEMPERATURE_STEPS) });
  }
  const inside = candidates.filter((c) => c.at >= frame.y && c.at <= frame.y + frame.height);
  // Labels only at multiples of 5 degrees; whole degrees between them get ticks where there is room.
  const labelled = new Set(thinTicks(inside.filter((c) => c.rank <= 2), plan.axis.labelHeight * 1.2).map((c) => c.value));
  return thinTicks(inside, plan.sizes.mm(0.9)).map((c) => ({ value: c.value, y: c.at, labelled: labelled.has(c.value) }));
}

/** 0 for a power of ten, 1 for 2 or 5 times one, 2 for the rest. */
function mantissaRank(value: number): number {
  const m = Number((value / Math.pow(10, Math.floor(Math.log10(value)))).toPrecision(3));
  return m === 1 ? 0 : m === 2 || m === 5 ? 1 : 2;
}

function gaugeMarks(scales: ChartScales, unit: Unit, atmosphere: number, plan: PagePlan): MarkedValue[] {
  const lo = toDisplay(scales.window.pMin, unit), hi = toDisplay(scales.window.pMax, unit);
  const atm = toDisplay(atmosphere, unit);
  const candidates: TickCandidate[] = [];
  const add = (g: number, rank: number) => {
    const p = g + atm;
    if (p > lo && p <= hi) candidates.push({ value: g, at: scales.y(toSI(p, unit)), rank });
  };
  add(0, 0);
  const mantissas = [1, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8, 9];
  for (const g of logValues(Math.max((hi - atm) * 1e-4, 1e-6), Math.max(hi - atm, 1e-6), mantissas)) add(g, 1 + mantissaRank(g));
  // Vacuum: gauge readings between −atm and 0, in tenths and hundredths of the atmosphere's size.
  const vacuumStep = roundStep(atm / 10);
  for (const g of multiples(-atm + vacuumStep / 10, -vacuumStep / 10, vacuumStep / 10)) add(g, rankBySteps(g, [vacuumStep * 5, vacuumStep, vacuumStep / 2]) + 1);
  const { frame } = scales;
  const inside = candidates.filter((c) => c.at >= frame.y && c.at <= frame.y + frame.height);
  // As dense as the absolute scale beside it allows, the rounder readings first.
  const labelled = new Set(thinTicks(inside.filter((c) => c.rank <= 3), plan.axis.labelHeight * 1.35).map((c) => c.value));
  return thinTicks(inside, plan.sizes.mm(1.2)).map((c) => ({ value: c.value, y: c.at, labelled: labelled.has(c.value) }));
}

export function axisTicks(
  scales: ChartScales,
  units: DisplayUnits,
  plan: PagePlan,
  saturation: SaturationTick[],
  glide: boolean,
  gridSpacing: number,
  atmosphere?: number,
): AxisTicks {
  return {
    enthalpy: enthalpyTicks(scales, units.enthalpy, plan, gridSpacing),
    pressure: pressureTicks(scales, units.pressure, plan, gridSpacing),
    bubble: temperatureMarks(saturation, (t) => t.pBubble, scales, plan),
    ...(glide ? { dew: temperatureMarks(saturation, (t) => t.pDew, scales, plan) } : {}),
    ...(atmosphere === undefined ? {} : { gauge: gaugeMarks(scales, units.pressure, atmosphere, plan) }),
  };
}
