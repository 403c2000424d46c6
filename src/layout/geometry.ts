// Plane geometry in page mm for layout: rectangles, rotated label boxes, their intersection tests, and
// clipping polylines to the plot frame. Pure functions; y grows downwards as on the page.

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A rectangle turned about its centre: the box a rotated label occupies. */
export interface Box {
  cx: number;
  cy: number;
  /** Half extents along the box's own axes, in mm. */
  hw: number;
  hh: number;
  /** Unit vector of the box's width axis on the page (cos, sin of the clockwise page angle). */
  ux: number;
  uy: number;
}

export function box(cx: number, cy: number, hw: number, hh: number, angleClockwise = 0): Box {
  return { cx, cy, hw, hh, ux: Math.cos(angleClockwise), uy: Math.sin(angleClockwise) };
}

export function rectBox(r: Rect): Box {
  return box(r.x + r.width / 2, r.y + r.height / 2, r.width / 2, r.height / 2);
}

export function corners(b: Box): [number, number][] {
  const ax = b.ux * b.hw, ay = b.uy * b.hw;
  const bx = -b.uy * b.hh, by = b.ux * b.hh;
  return [
    [b.cx - ax - bx, b.cy - ay - by],
    [b.cx + ax - bx, b.cy + ay - by],
    [b.cx + ax + bx, b.cy + ay + by],
    [b.cx - ax + bx, b.cy - ay + by],
  ];
}

/** The page-aligned rectangle around a box. */
export function bounds(b: Box): Rect {
  const ex = Math.abs(b.ux) * b.hw + Math.abs(b.uy) * b.hh;
  const ey = Math.abs(b.uy) * b.hw + Math.abs(b.ux) * b.hh;
  return { x: b.cx - ex, y: b.cy - ey, width: 2 * ex, height: 2 * ey };
}

export function grow(b: Box, by: number): Box {
  return { ...b, hw: b.hw + by, hh: b.hh + by };
}

/** Half the box's extent along a unit direction (its projection radius). */
function radius(b: Box, dx: number, dy: number): number {
  return b.hw * Math.abs(b.ux * dx + b.uy * dy) + b.hh * Math.abs(-b.uy * dx + b.ux * dy);
}

/** Separating-axis test for two rotated boxes; touching counts as intersecting. */
export function boxesIntersect(a: Box, b: Box): boolean {
  const tx = b.cx - a.cx, ty = b.cy - a.cy;
  const axes: [number, number][] = [
    [a.ux, a.uy],
    [-a.uy, a.ux],
    [b.ux, b.uy],
    [-b.uy, b.ux],
  ];
  for (const [dx, dy] of axes) {
    if (Math.abs(tx * dx + ty * dy) > radius(a, dx, dy) + radius(b, dx, dy)) return false;
  }
  return true;
}

/** Whether the segment (x1, y1)–(x2, y2) enters the box: the segment clipped in the box's own frame. */
export function segmentHitsBox(b: Box, x1: number, y1: number, x2: number, y2: number): boolean {
  const lx1 = (x1 - b.cx) * b.ux + (y1 - b.cy) * b.uy;
  const ly1 = -(x1 - b.cx) * b.uy + (y1 - b.cy) * b.ux;
  const lx2 = (x2 - b.cx) * b.ux + (y2 - b.cy) * b.uy;
  const ly2 = -(x2 - b.cx) * b.uy + (y2 - b.cy) * b.ux;
  return clipSegment(lx1, ly1, lx2, ly2, -b.hw, -b.hh, b.hw, b.hh) !== null;
}

/** A box lies wholly inside a rectangle, `inset` mm clear of its edges. */
export function boxInside(b: Box, r: Rect, inset = 0): boolean {
  const o = bounds(b);
  return o.x >= r.x + inset && o.y >= r.y + inset && o.x + o.width <= r.x + r.width - inset && o.y + o.height <= r.y + r.height - inset;
}

export function rectsIntersect(a: Rect, b: Rect): boolean {
  return a.x <= b.x + b.width && b.x <= a.x + a.width && a.y <= b.y + b.height && b.y <= a.y + a.height;
}

/**
 * Liang–Barsky: the part of a segment inside an axis-aligned rectangle as the parameters [t0, t1]
 * along it, or null when it misses.
 */
export function clipSegment(x1: number, y1: number, x2: number, y2: number, xmin: number, ymin: number, xmax: number, ymax: number): [number, number] | null {
  const dx = x2 - x1, dy = y2 - y1;
  let t0 = 0, t1 = 1;
  const edges: [number, number][] = [
    [-dx, x1 - xmin],
    [dx, xmax - x1],
    [-dy, y1 - ymin],
    [dy, ymax - y1],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) {
      if (t > t1) return null;
      if (t > t0) t0 = t;
    } else {
      if (t < t0) return null;
      if (t < t1) t1 = t;
    }
  }
  return [t0, t1];
}

/**
 * Cuts a polyline (flat x, y list) to a rectangle: the pieces that lie inside, each a flat list of at
 * least two points, with new end points where the line crosses the edge.
 */
export function clipPolyline(points: number[], r: Rect): number[][] {
  const pieces: number[][] = [];
  let current: number[] = [];
  const xmax = r.x + r.width, ymax = r.y + r.height;
  for (let i = 0; i + 3 < points.length; i += 2) {
    const x1 = points[i]!, y1 = points[i + 1]!, x2 = points[i + 2]!, y2 = points[i + 3]!;
    const t = clipSegment(x1, y1, x2, y2, r.x, r.y, xmax, ymax);
    if (!t || t[1] - t[0] < 1e-12) {
      if (current.length >= 4) pieces.push(current);
      current = [];
      continue;
    }
    const ax = x1 + t[0] * (x2 - x1), ay = y1 + t[0] * (y2 - y1);
    const bx = x1 + t[1] * (x2 - x1), by = y1 + t[1] * (y2 - y1);
    // A piece in progress ended inside the rectangle, so this segment starts where it left off.
    if (current.length === 0) current.push(ax, ay);
    current.push(bx, by);
    if (t[1] < 1) {
      if (current.length >= 4) pieces.push(current);
      current = [];
    }
  }
  if (current.length >= 4) pieces.push(current);
  return pieces;
}

/** Total length of a polyline in mm. */
export function polylineLength(points: number[]): number {
  let length = 0;
  for (let i = 0; i + 3 < points.length; i += 2) length += Math.hypot(points[i + 2]! - points[i]!, points[i + 3]! - points[i + 1]!);
  return length;
}
