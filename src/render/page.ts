// The printed sheet around a scene's trimmed page: media size, bleed, and crop-mark geometry in mm.
// SVG and PDF both draw from this one frame, so their page boxes and marks coincide.

import type { Scene } from "../layout/scene.js";

export interface Segment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

/** Crop-mark drawing rules (common practice: marks start outside the bleed, hairline weight). */
export const CROP_MARK = {
  /** Nearest gap between a mark and the trim corner when there is no (or a small) bleed, in mm. */
  minGap: 3,
  length: 5,
  /** Clear paper beyond the marks so a printer's unprintable edge does not clip them. */
  clearance: 2,
  width: 0.1,
} as const;

export interface PageFrame {
  /** Whole sheet in mm: trimmed page plus bleed, plus room for crop marks when they are drawn. */
  mediaWidth: number;
  mediaHeight: number;
  /** Distance from the sheet edge to the trim edge on every side, in mm. */
  margin: number;
  bleed: number;
  /** Crop marks in page mm (origin at the trimmed page's top-left), empty when not asked for. */
  cropMarks: Segment[];
}

function cropGap(bleed: number): number {
  return Math.max(bleed, CROP_MARK.minGap);
}

/** Two short lines per corner, each on the extension of a trim edge and pointing away from the page. */
function cornerMarks(width: number, height: number, gap: number): Segment[] {
  const far = gap + CROP_MARK.length;
  const corners: [number, number, number, number][] = [
    [0, 0, -1, -1],
    [width, 0, 1, -1],
    [0, height, -1, 1],
    [width, height, 1, 1],
  ];
  return corners.flatMap(([cx, cy, sx, sy]) => [
    { x1: cx + sx * gap, y1: cy, x2: cx + sx * far, y2: cy },
    { x1: cx, y1: cy + sy * gap, x2: cx, y2: cy + sy * far },
  ]);
}

export function pageFrame(scene: Scene): PageFrame {
  const bleed = scene.bleed;
  const margin = scene.cropMarks ? cropGap(bleed) + CROP_MARK.length + CROP_MARK.clearance : bleed;
  return {
    mediaWidth: scene.width + 2 * margin,
    mediaHeight: scene.height + 2 * margin,
    margin,
    bleed,
    cropMarks: scene.cropMarks ? cornerMarks(scene.width, scene.height, cropGap(bleed)) : [],
  };
}
