// Candidate positions for a label along its line: points every few millimetres where the line is
// straight enough to carry the text, each with the label's rotated box and an upright reading angle.

import { box, type Box } from "./geometry.js";

export interface LabelShape {
  /** Advance width and ink extents of the text in mm. */
  width: number;
  ascent: number;
  descent: number;
  capHeight: number;
  /** Clearance around the ink (halo plus breathing room) in mm. */
  pad: number;
}

export interface Candidate {
  /** Anchor of the text (middle of the run, middle of the cap height) in page mm. */
  x: number;
  y: number;
  /** Rotation in degrees, counter-clockwise as read on the page (the TextMark convention). */
  rotate: number;
  box: Box;
  /** Which piece of the line and where along it (mm), so further labels can keep their distance. */
  piece: number;
  at: number;
}

/** Clockwise page angle beyond which a run would read downwards; steeper lines take text reading upwards. */
const UPRIGHT_LIMIT = (80 * Math.PI) / 180;

function cumulative(points: number[]): number[] {
  const s = [0];
  for (let i = 2; i < points.length; i += 2) s.push(s[s.length - 1]! + Math.hypot(points[i]! - points[i - 2]!, points[i + 1]! - points[i - 1]!));
  return s;
}

/** The point at arc length `at` and the index of the vertex before it. */
function pointAt(points: number[], s: number[], at: number): [number, number, number] {
  let lo = 0, hi = s.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (s[mid]! <= at) lo = mid;
    else hi = mid;
  }
  const span = s[hi]! - s[lo]!;
  const t = span > 0 ? (at - s[lo]!) / span : 0;
  return [points[2 * lo]! + t * (points[2 * hi]! - points[2 * lo]!), points[2 * lo + 1]! + t * (points[2 * hi + 1]! - points[2 * lo + 1]!), lo];
}

/** Largest distance of the line's vertices between the two arc lengths from the chord joining their points. */
function deviation(points: number[], s: number[], from: number, to: number, a: [number, number, number], b: [number, number, number]): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (len === 0) return Infinity;
  let worst = 0;
  for (let i = a[2] + 1; i <= b[2] && i < s.length; i++) {
    if (s[i]! <= from || s[i]! >= to) continue;
    const d = Math.abs((points[2 * i]! - a[0]) * dy - (points[2 * i + 1]! - a[1]) * dx) / len;
    if (d > worst) worst = d;
  }
  return worst;
}

/**
 * Candidates along each piece, `step` mm apart. The text runs along the chord of the stretch it covers
 * and is turned so it never reads upside down; stretches that bend more than a fraction of the type's
 * height under the text are skipped, because a label there would stand off its line. Labels of lines
 * that must stay whole (the dome) are set `beside` mm clear of the line instead of on it.
 */
export function labelCandidates(pieces: number[][], shape: LabelShape, step: number, beside = 0, bend = 0.35): Candidate[] {
  const out: Candidate[] = [];
  const half = shape.width / 2 + shape.pad;
  const tolerance = bend * shape.capHeight;
  // The box is centred on the ink, which sits off the anchor when ascent and descent differ.
  const inkOffset = shape.capHeight / 2 + (shape.descent - shape.ascent) / 2;
  const hh = (shape.ascent + shape.descent) / 2 + shape.pad;
  pieces.forEach((points, piece) => {
    const s = cumulative(points);
    const length = s[s.length - 1]!;
    for (let at = half; at <= length - half; at += step) {
      const a = pointAt(points, s, at - half);
      const b = pointAt(points, s, at + half);
      if (deviation(points, s, at - half, at + half, a, b) > tolerance) continue;
      // Text reads left to right, and up the page on steep lines: angles are kept within (−100°, 80°].
      let angle = Math.atan2(b[1] - a[1], b[0] - a[0]);
      if (angle > UPRIGHT_LIMIT) angle -= Math.PI;
      else if (angle <= UPRIGHT_LIMIT - Math.PI) angle += Math.PI;
      const [px, py] = pointAt(points, s, at);
      const ux = Math.cos(angle), uy = Math.sin(angle);
      // On the line, or (beside > 0) set off to either side of it by that distance, parallel to it.
      for (const side of beside > 0 ? [-1, 1] : [0]) {
        const shift = side * (beside + hh);
        const x = px - uy * shift, y = py + ux * shift;
        out.push({
          x,
          y,
          rotate: (-angle * 180) / Math.PI,
          box: box(x - uy * inkOffset, y + ux * inkOffset, half, hh, angle),
          piece,
          at,
        });
      }
    }
  });
  return out;
}
