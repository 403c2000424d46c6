// Parses values typed by people ("25C", "2.4bar", "35psig", "1.75kJ/kgK") into SI, naming what went wrong.
import { DomeprintError } from "../errors.js";
import { foldUnit, spellings, toSI, UNITS, type Quantity } from "./quantities.js";

const NUMBER = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*(.*)$/i;

/**
 * Reads "NUMBER UNIT" for a quantity. A bare number is taken in `defaultUnit` when one is given
 * (e.g. quality); otherwise a unit is required, since a bare number on a chart is a guess.
 */
export function parseQuantity(input: string, q: Quantity, text: string, opts: { atmosphere?: number; defaultUnit?: string } = {}): number {
  const m = NUMBER.exec(text);
  if (!m) throw new DomeprintError("E_INPUT", `${input} = ${JSON.stringify(text)}: not a number with a unit; allowed: a number followed by one of ${spellings(q).join(", ") || "(no unit)"}`, { input, value: text });
  const value = Number(m[1]);
  let unitText = m[2]!.trim();
  if (unitText === "" && opts.defaultUnit !== undefined) unitText = opts.defaultUnit;
  const unit = UNITS[q][foldUnit(unitText)];
  if (!unit) {
    const what = unitText === "" ? "has no unit" : `unknown unit ${JSON.stringify(unitText)}`;
    throw new DomeprintError("E_UNIT", `${input} = ${JSON.stringify(text)}: ${what}; allowed units: ${spellings(q).join(", ")}`, { input, value: text, allowed: spellings(q).join(", ") });
  }
  if (!Number.isFinite(value)) throw new DomeprintError("E_INPUT", `${input} = ${JSON.stringify(text)}: not a finite number`, { input, value: text });
  return toSI(value, unit, opts.atmosphere);
}
