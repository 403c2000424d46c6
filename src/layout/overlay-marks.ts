// Cycles and readings drawn over the chart: the path through their states, a marker at each state and
// its name set beside it where nothing else is, in one colour per overlay.

import type { Overlay } from "../cycle/overlay.js";
import { box, clipPolyline, grow, boxInside, type Box, type Rect } from "./geometry.js";
import { runMetrics } from "./font-metrics.js";
import type { Mark, Stroke } from "./scene.js";
import type { ChartScales } from "./scales.js";
import { toPage } from "./scales.js";
import type { SpatialGrid } from "./spatial-grid.js";
import { text } from "./marks.js";

export interface OverlayStyle {
  colours: string[];
  width: number;
  marker: number;
  pointsDash: number[];
  labelPt: number;
  background: string;
  halo: number;
}

export interface OverlayDrawing {
  marks: Mark[];
  /** Owners of the overlay paths in `obstacles`, which line labels must not cross. */
  owners: string[];
  placed: number;
  dropped: number;
}

/** Eight spots around a marker, the upper right first (where a reader's eye goes after the point). */
const AROUND: [number, number][] = [
  [1, -1],
  [1, 1],
  [-1, -1],
  [-1, 1],
  [1, 0],
  [-1, 0],
  [0, -1],
  [0, 1],
];

function pointLabel(x: number, y: number, label: string, style: OverlayStyle, frame: Rect, obstacles: SpatialGrid): { x: number; y: number; box: Box } | undefined {
  const m = runMetrics(label, style.labelPt, "bold");
  const hw = m.width / 2 + style.halo, hh = m.capHeight / 2 + style.halo;
  // Clear of the marker's own keep-out box (radius + 0.3 mm) and the 0.3 mm margin every label keeps.
  const reach = style.marker + 0.8;
  for (const [dx, dy] of AROUND) {
    const cx = x + dx * (reach + hw), cy = y + dy * (reach + hh);
    const b = box(cx, cy, hw, hh);
    if (boxInside(b, frame, 0.5) && !obstacles.hitsBox(grow(b, 0.3))) return { x: cx, y: cy, box: b };
  }
  return undefined;
}

export function overlayMarks(overlays: Overlay[], scales: ChartScales, style: OverlayStyle, obstacles: SpatialGrid): OverlayDrawing {
  const marks: Mark[] = [];
  const owners: string[] = [];
  let placed = 0, dropped = 0;
  overlays.forEach((overlay, i) => {
    const colour = style.colours[i % style.colours.length]!;
    const stroke: Stroke = { colour, width: style.width, join: "round", cap: "round", ...(overlay.kind === "points" ? { dash: style.pointsDash } : {}) };
    const path = overlay.path.map((q) => [q.h, q.p] as const);
    if (overlay.closed && path.length > 1) path.push(path[0]!);
    const owner = `overlay-${i}`;
    owners.push(owner);
    // Side streams (a flash tank's vapour, an economiser's injection) are drawn like the main path.
    const branches = (overlay.branches ?? []).map((b) => b.map((q) => [q.h, q.p] as const));
    for (const line of [path, ...branches]) {
      for (const piece of clipPolyline(toPage(scales, line), scales.frame)) {
        marks.push({ kind: "path", points: piece, stroke, data: { overlay: overlay.name, kind: overlay.kind } });
        obstacles.addPolyline(owner, piece);
      }
    }
    for (const point of overlay.points) {
      const x = scales.x(point.h), y = scales.y(point.p);
      if (!(x >= scales.frame.x && x <= scales.frame.x + scales.frame.width && y >= scales.frame.y && y <= scales.frame.y + scales.frame.height)) continue;
      marks.push({ kind: "circle", cx: x, cy: y, r: style.marker, fill: { colour: point.flagged ? "#ffffff" : colour }, stroke: { colour, width: Math.max(0.1, style.width * 0.6) }, data: { point: point.label, h: String(point.h), p: String(point.p) } });
      obstacles.addBox(owner, box(x, y, style.marker + 0.3, style.marker + 0.3));
    }
    for (const point of overlay.points) {
      const x = scales.x(point.h), y = scales.y(point.p);
      const spot = pointLabel(x, y, point.label, style, scales.frame, obstacles);
      if (!spot) {
        dropped++;
        continue;
      }
      marks.push(text(spot.x, spot.y, point.label, style.labelPt, colour, { weight: "bold", anchor: "middle", baseline: "middle", halo: { colour: style.background, width: style.halo } }));
      obstacles.addBox(owner, spot.box);
      placed++;
    }
  });
  return { marks, owners, placed, dropped };
}
