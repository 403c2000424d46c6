// Chooses which of a LineSet's lines a sheet draws: on small paper a family keeps only its rounder values
// (every 20 K instead of every 10 K), so the lines that remain have room for their labels.

import type { Line } from "../isolines/index.js";
import { toDisplay, type DisplayUnits } from "./display-units.js";
import type { Unit } from "../units/index.js";

export interface LineBudget {
  temperature: number;
  entropy: number;
  "specific-volume": number;
}

const LINEAR_FACTORS = [1, 2, 5, 10];
/** Mantissa sets of a 1–2–5 series, densest first. */
const LOG_SETS = [[1, 2, 5], [1, 5], [1]];

function displayValue(line: Line, unit: Unit): number {
  return Math.round(toDisplay(line.value, unit) * 1e9) / 1e9;
}

/** The values kept from an evenly stepped family: multiples of 1, 2, 5 or 10 steps, the densest that fits. */
function linearKeep(values: number[], budget: number): Set<number> {
  const distinct = [...new Set(values)].sort((a, b) => a - b);
  if (distinct.length <= budget || distinct.length < 2) return new Set(distinct);
  let step = Infinity;
  for (let i = 1; i < distinct.length; i++) step = Math.min(step, distinct[i]! - distinct[i - 1]!);
  for (const k of LINEAR_FACTORS) {
    const kept = distinct.filter((v) => Math.abs(v / (k * step) - Math.round(v / (k * step))) < 1e-6);
    if (kept.length <= budget && kept.length > 0) return new Set(kept);
  }
  return new Set(distinct.filter((v) => Math.abs(v / (10 * step) - Math.round(v / (10 * step))) < 1e-6));
}

function mantissa(v: number): number {
  return Number((v / Math.pow(10, Math.floor(Math.log10(v)))).toPrecision(3));
}

function logKeep(values: number[], budget: number): Set<number> {
  const distinct = [...new Set(values)];
  for (const set of LOG_SETS) {
    const kept = distinct.filter((v) => set.includes(mantissa(v)));
    if (kept.length <= budget) return new Set(kept);
  }
  return new Set(distinct.filter((v) => mantissa(v) === 1));
}

export function thinLines(lines: Line[], units: DisplayUnits, budget: LineBudget): Line[] {
  const of = (q: Line["quantity"], unit: Unit) => lines.filter((l) => l.quantity === q).map((l) => displayValue(l, unit));
  const keepT = linearKeep(of("temperature", units.temperature), budget.temperature);
  const keepS = linearKeep(of("entropy", units.entropy), budget.entropy);
  const keepV = logKeep(of("specific-volume", units.volume), budget["specific-volume"]);
  return lines.filter((l) => {
    switch (l.quantity) {
      case "temperature":
        return keepT.has(displayValue(l, units.temperature));
      case "entropy":
        return keepS.has(displayValue(l, units.entropy));
      case "specific-volume":
        return keepV.has(displayValue(l, units.volume));
      default:
        return true;
    }
  });
}
