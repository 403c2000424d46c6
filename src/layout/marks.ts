// Small constructors for scene marks (segments, rectangles, text), so layout code reads as what it draws
// rather than as object literals.

import type { Colour, Fill, PathMark, RectMark, Stroke, TextMark } from "./scene.js";

export function segment(x1: number, y1: number, x2: number, y2: number, stroke: Stroke, data?: Record<string, string>): PathMark {
  return { kind: "path", points: [x1, y1, x2, y2], stroke, ...(data ? { data } : {}) };
}

export function rect(x: number, y: number, width: number, height: number, fill?: Fill, stroke?: Stroke): RectMark {
  return { kind: "rect", x, y, width, height, ...(fill ? { fill } : {}), ...(stroke ? { stroke } : {}) };
}

export interface TextOptions {
  weight?: "normal" | "bold";
  anchor?: "start" | "middle" | "end";
  baseline?: "alphabetic" | "middle";
  rotate?: number;
  halo?: { colour: Colour; width: number };
  data?: Record<string, string>;
}

export function text(x: number, y: number, content: string, size: number, colour: Colour, options: TextOptions = {}): TextMark {
  const mark: TextMark = { kind: "text", x, y, text: content, size, colour };
  if (options.weight && options.weight !== "normal") mark.weight = options.weight;
  if (options.anchor && options.anchor !== "start") mark.anchor = options.anchor;
  if (options.baseline && options.baseline !== "alphabetic") mark.baseline = options.baseline;
  if (options.rotate) mark.rotate = options.rotate;
  if (options.halo) mark.halo = options.halo;
  if (options.data) mark.data = options.data;
  return mark;
}
