// The line set as plain JSON data: the window, and each line with its quantity, SI and display value and its
// (h [J/kg], p [Pa]) points in order. What `domeprint lines FLUID --json` prints.
import type { ReferenceName } from "../eos/index.js";
import type { LineSet, Quantity, UnitSystem } from "./types.js";

export interface LineJson {
  quantity: Quantity;
  value: number;
  unit: string;
  display: { value: number; unit: string };
  rank: "major" | "minor";
  points: [number, number][];
}

export interface LineSetJson {
  format: "domeprint-lines/1";
  fluid: string;
  units: UnitSystem;
  reference: ReferenceName;
  window: { h: [number, number]; p: [number, number]; hUnit: "J/kg"; pUnit: "Pa" };
  frame: { widthMm: number; heightMm: number };
  toleranceMm: number;
  critical: { T: number; p: number; h: number };
  lines: LineJson[];
}

export function lineSetToJson(set: LineSet): LineSetJson {
  const w = set.window;
  return {
    format: "domeprint-lines/1",
    fluid: set.fluid,
    units: set.units,
    reference: set.reference,
    window: { h: [w.hMin, w.hMax], p: [w.pMin, w.pMax], hUnit: "J/kg", pUnit: "Pa" },
    frame: { widthMm: set.frame.widthMm, heightMm: set.frame.heightMm },
    toleranceMm: set.toleranceMm,
    critical: { ...set.critical },
    lines: set.lines.map((l) => ({
      quantity: l.quantity,
      value: l.value,
      unit: l.unit,
      display: { ...l.display },
      rank: l.rank,
      points: l.points.map((q) => [q[0], q[1]] as [number, number]),
    })),
  };
}
