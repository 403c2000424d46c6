// The LineSet as marks: one layer per family (dome first in importance, drawn last so it stays on top),
// each path carrying its quantity and SI value, and a label request per line for the placement optimiser.

import type { Line, LineSet } from "../isolines/index.js";
import type { DisplayUnits } from "./display-units.js";
import { toDisplay } from "./display-units.js";
import { clipPolyline, polylineLength, type Rect } from "./geometry.js";
import type { LabelRequest } from "./label-placement.js";
import type { Layer, PathMark, Stroke } from "./scene.js";
import type { ChartScales } from "./scales.js";
import { toPage } from "./scales.js";
import type { Family } from "./style.js";
import { formatNumber } from "./text.js";

export const FAMILY_OF: Partial<Record<Line["quantity"], Family>> = {
  "saturation-liquid": "dome",
  "saturation-vapour": "dome",
  temperature: "isotherm",
  entropy: "isentrope",
  "specific-volume": "isochore",
  quality: "quality",
};

/** Layer ids and the names vector editors show; the order is the drawing order, bottom to top. */
export const FAMILY_LAYERS: { family: Family; id: string; label: string }[] = [
  { family: "isochore", id: "isochores", label: "Isochores (constant specific volume)" },
  { family: "isentrope", id: "isentropes", label: "Isentropes (constant entropy)" },
  { family: "quality", id: "quality", label: "Quality lines (constant vapour fraction)" },
  { family: "isotherm", id: "isotherms", label: "Isotherms (constant temperature)" },
  { family: "dome", id: "dome", label: "Saturation dome" },
];

/** Serving order of label requests: the dome, then the families read most often. */
const PRIORITY: Record<Family, number> = { dome: 0, isotherm: 1, quality: 2, isentrope: 3, isochore: 4 };

/** SI unit written beside each path's value, so a script knows what data-value means. */
const SI_UNIT: Record<Line["quantity"], string> = {
  temperature: "K",
  entropy: "J/(kg K)",
  "specific-volume": "m3/kg",
  quality: "1",
  "saturation-liquid": "1",
  "saturation-vapour": "1",
  enthalpy: "J/kg",
};

export interface LineLabelStyle {
  sizePt: number;
  weight: "normal" | "bold";
  perLine: number;
  /** Gap between the dome and its labels, which stand beside it so the dome is never broken. */
  domeGap: number;
}

export interface DrawnLine {
  owner: string;
  family: Family;
  line: Line;
  /** Page polylines inside the plot frame. */
  pieces: number[][];
}

export function labelText(line: Line, units: DisplayUnits, glide: boolean): string {
  switch (line.quantity) {
    case "temperature":
      return `${formatNumber(toDisplay(line.value, units.temperature), 4)} ${units.temperature.symbol}`;
    case "entropy":
      return `s = ${formatNumber(toDisplay(line.value, units.entropy), 4)}`;
    case "specific-volume":
      return `v = ${formatNumber(toDisplay(line.value, units.volume), 3)}`;
    case "quality":
      return `x = ${formatNumber(line.value, 3)}`;
    case "saturation-liquid":
      return glide ? "bubble line" : "saturated liquid";
    case "saturation-vapour":
      return glide ? "dew line" : "saturated vapour";
    case "enthalpy":
      return `h = ${formatNumber(toDisplay(line.value, units.enthalpy), 4)}`;
  }
}

/** Cuts every drawable line to the plot frame; lines of families the sheet does not draw are left out. */
export function drawnLines(lines: LineSet, scales: ChartScales): DrawnLine[] {
  const out: DrawnLine[] = [];
  lines.lines.forEach((line, i) => {
    const family = FAMILY_OF[line.quantity];
    if (!family || line.points.length < 2) return;
    if (family !== "dome" && line.rank !== "major") return;
    const pieces = clipPolyline(toPage(scales, line.points), scales.frame);
    if (pieces.length > 0) out.push({ owner: `${family}-${i}`, family, line, pieces });
  });
  return out;
}

export function lineLayers(drawn: DrawnLine[], strokes: Record<Family, Stroke>): Layer[] {
  return FAMILY_LAYERS.map(({ family, id, label }) => ({
    id,
    label,
    marks: drawn
      .filter((d) => d.family === family)
      .flatMap((d) =>
        d.pieces.map(
          (points): PathMark => ({
            kind: "path",
            points,
            stroke: strokes[family],
            data: { quantity: d.line.quantity, value: String(d.line.value), unit: SI_UNIT[d.line.quantity] },
          }),
        ),
      ),
  }));
}

export type Preference = (family: Family, line: Line) => (x: number, y: number) => number;

/** How many labels a line deserves: one, and one more for each stretch of 0.6 times the frame's longer side. */
function wanted(pieces: number[][], frame: Rect, perLine: number): number {
  const length = pieces.reduce((sum, p) => sum + polylineLength(p), 0);
  return Math.max(1, Math.min(perLine, Math.floor(length / (0.6 * Math.max(frame.width, frame.height))) + 1));
}

export function labelRequests(drawn: DrawnLine[], units: DisplayUnits, glide: boolean, style: LineLabelStyle, frame: Rect, prefer: Preference): LabelRequest[] {
  return drawn.map((d) => ({
    owner: d.owner,
    family: d.family,
    text: labelText(d.line, units, glide),
    sizePt: style.sizePt,
    weight: style.weight,
    pieces: d.pieces,
    priority: PRIORITY[d.family],
    wanted: d.family === "dome" ? 1 : wanted(d.pieces, frame, style.perLine),
    prefer: prefer(d.family, d.line),
    align: d.family === "isochore" ? "column" : "row",
    ...(d.family === "dome" ? { beside: style.domeGap } : {}),
    data: { quantity: d.line.quantity, value: String(d.line.value) },
  }));
}
