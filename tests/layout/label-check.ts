// Independent checks of a laid-out scene's labels: each label's box rebuilt from the renderers' shaped
// measureText and its rotation, then tested against the other labels, the plot frame, the panels and the dome.

import { measureText } from "../../src/render/fonts.js";
import type { PathMark, RectMark, Scene, TextMark } from "../../src/layout/scene.js";

type Point = [number, number];

/** The label's ink box grown by its halo, as four corners on the page. */
export function labelPolygon(mark: TextMark): Point[] {
  const m = measureText(mark.text, mark.size, mark.weight ?? "normal");
  const halo = mark.halo?.width ?? 0;
  const share = mark.anchor === "middle" ? 0.5 : mark.anchor === "end" ? 1 : 0;
  const base = mark.baseline === "middle" ? m.capHeight / 2 : 0;
  const x0 = -share * m.width - halo, x1 = (1 - share) * m.width + halo;
  const y0 = base - m.ascent - halo, y1 = base + m.descent + halo;
  const a = (-(mark.rotate ?? 0) * Math.PI) / 180;
  const c = Math.cos(a), s = Math.sin(a);
  return ([[x0, y0], [x1, y0], [x1, y1], [x0, y1]] as Point[]).map(([x, y]) => [mark.x + x * c - y * s, mark.y + x * s + y * c]);
}

function axes(poly: Point[]): Point[] {
  return poly.map((p, i) => {
    const q = poly[(i + 1) % poly.length]!;
    return [-(q[1] - p[1]), q[0] - p[0]];
  });
}

function project(poly: Point[], [ax, ay]: Point): [number, number] {
  let lo = Infinity, hi = -Infinity;
  for (const [x, y] of poly) {
    const v = x * ax + y * ay;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [lo, hi];
}

/** Separating-axis test for convex polygons (segments count as two-point polygons). */
export function convexIntersect(a: Point[], b: Point[]): boolean {
  for (const axis of [...axes(a), ...axes(b)]) {
    if (axis[0] === 0 && axis[1] === 0) continue;
    const [a0, a1] = project(a, axis), [b0, b1] = project(b, axis);
    if (a1 < b0 || b1 < a0) return false;
  }
  return true;
}

export function rectPolygon(r: { x: number; y: number; width: number; height: number }): Point[] {
  return [[r.x, r.y], [r.x + r.width, r.y], [r.x + r.width, r.y + r.height], [r.x, r.y + r.height]];
}

function crosses(poly: Point[], path: PathMark): boolean {
  for (let k = 0; k + 3 < path.points.length; k += 2) {
    if (convexIntersect(poly, [[path.points[k]!, path.points[k + 1]!], [path.points[k + 2]!, path.points[k + 3]!]])) return true;
  }
  return false;
}

export interface LabelProblems {
  labels: number;
  overlaps: string[];
  outsideFrame: string[];
  onPanels: string[];
  onDome: string[];
  /** Labels crossing a cycle's or readings' path. */
  onOverlays: string[];
}

function layerMarks<T>(scene: Scene, id: string, kind: string): T[] {
  return (scene.layers.find((l) => l.id === id)?.marks ?? []).filter((m) => m.kind === kind) as T[];
}

export function labelProblems(scene: Scene): LabelProblems {
  const labels = layerMarks<TextMark>(scene, "labels", "text");
  const polys = labels.map(labelPolygon);
  const frame = (scene.meta.attributes as { plotFrame: { x: number; y: number; width: number; height: number } }).plotFrame;
  const panels = layerMarks<RectMark>(scene, "panels", "rect").map(rectPolygon);
  const dome = layerMarks<PathMark>(scene, "dome", "path");
  const overlays = layerMarks<PathMark>(scene, "cycles", "path");
  const problems: LabelProblems = { labels: labels.length, overlaps: [], outsideFrame: [], onPanels: [], onDome: [], onOverlays: [] };
  for (let i = 0; i < polys.length; i++) {
    for (let j = i + 1; j < polys.length; j++) if (convexIntersect(polys[i]!, polys[j]!)) problems.overlaps.push(`${labels[i]!.text} × ${labels[j]!.text}`);
    const inside = polys[i]!.every(([x, y]) => x > frame.x && x < frame.x + frame.width && y > frame.y && y < frame.y + frame.height);
    if (!inside) problems.outsideFrame.push(labels[i]!.text);
    if (panels.some((p) => convexIntersect(polys[i]!, p))) problems.onPanels.push(labels[i]!.text);
    if (dome.some((path) => crosses(polys[i]!, path))) problems.onDome.push(labels[i]!.text);
    if (overlays.some((path) => crosses(polys[i]!, path))) problems.onOverlays.push(labels[i]!.text);
  }
  return problems;
}

const LINE_LAYERS = ["dome", "isotherms", "isentropes", "isochores", "quality"];

/** Drawn isolines (quantity and SI value from their data-* attributes) that no label names. */
export function unlabelledPaths(scene: Scene): string[] {
  const key = (data: Record<string, string> | undefined) => `${data?.quantity} ${data?.value}`;
  const labelled = new Set(layerMarks<TextMark>(scene, "labels", "text").map((m) => key(m.data)));
  const missing = new Set<string>();
  for (const id of LINE_LAYERS) for (const path of layerMarks<PathMark>(scene, id, "path")) if (!labelled.has(key(path.data))) missing.add(key(path.data));
  return [...missing];
}
