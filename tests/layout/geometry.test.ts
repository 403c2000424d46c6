// Geometry for label placement: the rotated-box and segment tests agree with brute-force sampling,
// and polylines cut to a rectangle stay inside it and keep every point that was inside.

import { describe, expect, it } from "vitest";
import { box, boxesIntersect, clipPolyline, corners, segmentHitsBox, type Box } from "../../src/layout/geometry.js";
import { rng } from "../support.js";

function inside(b: Box, x: number, y: number): boolean {
  const dx = x - b.cx, dy = y - b.cy;
  return Math.abs(dx * b.ux + dy * b.uy) <= b.hw && Math.abs(-dx * b.uy + dy * b.ux) <= b.hh;
}

/** Brute force: points along both boxes' edges and inside one another. */
function sampledOverlap(a: Box, b: Box): boolean {
  const edgePoints = (q: Box) => {
    const c = corners(q);
    const out: [number, number][] = [];
    for (let i = 0; i < 4; i++) for (let t = 0; t <= 1; t += 0.02) out.push([c[i]![0] + t * (c[(i + 1) % 4]![0] - c[i]![0]), c[i]![1] + t * (c[(i + 1) % 4]![1] - c[i]![1])]);
    return out;
  };
  return edgePoints(a).some(([x, y]) => inside(b, x, y)) || edgePoints(b).some(([x, y]) => inside(a, x, y));
}

describe("rotated boxes", () => {
  it("intersect exactly when sampling finds them overlapping (clear cases)", () => {
    const r = rng(7);
    let overlapping = 0, apart = 0;
    for (let k = 0; k < 400; k++) {
      const a = box(r() * 20, r() * 20, 1 + r() * 4, 0.5 + r(), r() * Math.PI);
      const b = box(r() * 20, r() * 20, 1 + r() * 4, 0.5 + r(), r() * Math.PI);
      const sampled = sampledOverlap(a, b);
      // Near-touching pairs are where sampling itself is unsure; those are skipped.
      const shrunk = sampledOverlap({ ...a, hw: a.hw * 0.97, hh: a.hh * 0.97 }, b);
      const grown = sampledOverlap({ ...a, hw: a.hw * 1.03, hh: a.hh * 1.03 }, b);
      if (shrunk !== grown) continue;
      expect(boxesIntersect(a, b)).toBe(sampled);
      if (sampled) overlapping++;
      else apart++;
    }
    expect(overlapping).toBeGreaterThan(20);
    expect(apart).toBeGreaterThan(20);
  });

  it("see a segment only where one of its points lies in the box", () => {
    const r = rng(11);
    for (let k = 0; k < 300; k++) {
      const b = box(10, 10, 1 + r() * 3, 0.5 + r(), r() * Math.PI);
      const x1 = r() * 20, y1 = r() * 20, x2 = r() * 20, y2 = r() * 20;
      let sampled = false;
      for (let t = 0; t <= 1; t += 0.0005) if (inside(b, x1 + t * (x2 - x1), y1 + t * (y2 - y1))) sampled = true;
      if (!sampled && segmentHitsBox({ ...b, hw: b.hw * 0.99, hh: b.hh * 0.99 }, x1, y1, x2, y2)) throw new Error("hit reported where no point is inside");
      if (sampled) expect(segmentHitsBox(b, x1, y1, x2, y2)).toBe(true);
    }
  });
});

describe("clipping polylines", () => {
  it("keeps pieces inside the rectangle and splits where the line leaves and re-enters", () => {
    const rect = { x: 0, y: 0, width: 10, height: 10 };
    const zigzag = [-5, 5, 5, 5, 5, 15, 8, 15, 8, 5, 15, 5];
    const pieces = clipPolyline(zigzag, rect);
    expect(pieces.length).toBe(2);
    for (const p of pieces) for (let i = 0; i < p.length; i += 2) {
      expect(p[i]!).toBeGreaterThanOrEqual(-1e-9);
      expect(p[i]!).toBeLessThanOrEqual(10 + 1e-9);
      expect(p[i + 1]!).toBeLessThanOrEqual(10 + 1e-9);
    }
    expect(pieces[0]!.slice(0, 4)).toEqual([0, 5, 5, 5]);
    expect(clipPolyline([20, 20, 30, 30], rect)).toEqual([]);
  });
});
