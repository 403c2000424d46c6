// Where a reader looks for each family's labels, as a score over the plot (0 best … 1 worst):
// isotherms just right of the dew line, quality lines low in the dome, isentropes high in the vapour
// region, isochores near the right edge, the dome's own names low on each side.

import type { Line } from "../isolines/index.js";
import type { DrawnLine, Preference } from "./line-marks.js";
import type { Rect } from "./geometry.js";
import type { Family } from "./style.js";

/**
 * x of the dew (saturated-vapour) line at page height y, or undefined above the dome: tabulated once
 * every half millimetre of height, because the optimiser asks for it at every candidate.
 */
function dewLine(drawn: DrawnLine[], frame: Rect): (y: number) => number | undefined {
  const points = drawn.filter((d) => d.line.quantity === "saturation-vapour").flatMap((d) => d.pieces);
  const STEP = 0.5;
  const rows = Math.ceil(frame.height / STEP) + 1;
  const table = new Float64Array(rows).fill(Number.NaN);
  for (const p of points) {
    for (let i = 0; i + 3 < p.length; i += 2) {
      const y1 = p[i + 1]!, y2 = p[i + 3]!;
      const lo = Math.max(0, Math.ceil((Math.min(y1, y2) - frame.y) / STEP)), hi = Math.min(rows - 1, Math.floor((Math.max(y1, y2) - frame.y) / STEP));
      for (let r = lo; r <= hi; r++) {
        const y = frame.y + r * STEP;
        const x = y1 === y2 ? Math.max(p[i]!, p[i + 2]!) : p[i]! + ((y - y1) / (y2 - y1)) * (p[i + 2]! - p[i]!);
        if (Number.isNaN(table[r]!) || x > table[r]!) table[r] = x;
      }
    }
  }
  return (y) => {
    const v = table[Math.round((y - frame.y) / STEP)];
    return v === undefined || Number.isNaN(v) ? undefined : v;
  };
}

function bowl(du: number, dv: number, su: number, sv: number): number {
  return Math.min(1, (du / su) ** 2 + (dv / sv) ** 2);
}

export function labelPreference(drawn: DrawnLine[], frame: Rect): Preference {
  const dew = dewLine(drawn, frame);
  const u = (x: number) => (x - frame.x) / frame.width;
  const v = (y: number) => (y - frame.y) / frame.height;
  return (family: Family, line: Line) => {
    switch (family) {
      case "isotherm":
        return (x, y) => {
          const edge = dew(y);
          // Above the dome, isotherms are read near the middle of the plot.
          if (edge === undefined) return bowl(u(x) - 0.6, v(y) - 0.3, 0.4, 1);
          return bowl(u(x) - u(edge) - 0.05, 0, 0.25, 1) * 0.8 + 0.2 * Math.abs(v(y) - 0.5);
        };
      case "quality":
        return (x, y) => bowl(0, v(y) - 0.8, 1, 0.5);
      case "isentrope":
        return (x, y) => bowl(0, v(y) - 0.25, 1, 0.6);
      case "isochore":
        return (x, y) => bowl(u(x) - 0.92, v(y) - 0.5, 0.3, 2);
      case "dome":
        return line.quantity === "saturation-liquid" ? (x, y) => bowl(0, v(y) - 0.75, 1, 0.4) : (x, y) => bowl(0, v(y) - 0.65, 1, 0.4);
    }
  };
}
