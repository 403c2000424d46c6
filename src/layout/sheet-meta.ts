// The sheet's metadata: document title and keywords for the PDF and SVG, and on the SVG root the plot
// frame and each axis's quantity, unit, scale and range, so a script can map page points back to (h, p).

import type { AxisTicks } from "./axis-ticks.js";
import type { SheetContent } from "./content.js";
import { toDisplay, type DisplayUnits } from "./display-units.js";
import type { ChartScales } from "./scales.js";
import type { SceneMeta } from "./scene.js";
import type { Style } from "./style.js";
import type { Unit } from "../units/index.js";

function round(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}

export function sceneMeta(content: SheetContent, scales: ChartScales, units: DisplayUnits, style: Style, ticks: AxisTicks): SceneMeta {
  const { fluid, fields, stamp } = content;
  const { frame, window } = scales;
  const title = fields.title ? `${fields.title} — ${fluid.designation}` : `${fluid.designation} pressure–enthalpy chart`;
  const subject = `Pressure–enthalpy chart of ${fluid.designation} (${fluid.chemicalName}), ${fluid.citation}; reference state: ${fluid.reference}`;
  const axis = (quantity: string, symbol: string, scale: "linear" | "log", domain: [number, number], siUnit: string, unit: Unit, range: [number, number]) => ({
    quantity,
    symbol,
    scale,
    unit: siUnit,
    domain: domain.map(round),
    displayUnit: unit.symbol,
    displayDomain: domain.map((v) => round(toDisplay(v, unit))),
    range: range.map(round),
  });
  return {
    title,
    subject,
    ...(fields.author ? { author: fields.author } : {}),
    keywords: [fluid.designation, fluid.chemicalName, "pressure-enthalpy chart", "log p-h diagram", style.name],
    creator: `domeprint ${stamp.version}`,
    date: stamp.date,
    attributes: {
      format: "domeprint-sheet/1",
      fluid: fluid.designation,
      style: style.name,
      inputs: stamp.hash,
      units: "mm",
      plotFrame: { x: round(frame.x), y: round(frame.y), width: round(frame.width), height: round(frame.height) },
      axes: {
        x: axis("specific enthalpy", "h", "linear", [window.hMin, window.hMax], "J/kg", units.enthalpy, [frame.x, frame.x + frame.width]),
        // Page y grows downwards: the lowest pressure maps to the frame's bottom edge.
        y: axis("absolute pressure", "p", "log", [window.pMin, window.pMax], "Pa", units.pressure, [frame.y + frame.height, frame.y]),
      },
      enthalpyStep: ticks.enthalpy.step,
      reference: fluid.reference,
      isolines: "each path carries data-quantity, data-value (SI) and data-unit",
    },
  };
}
