// The neutral scene: everything a sheet draws, in page millimetres, with no thermodynamics.
// The layout engine builds it; the SVG, PDF and PNG renderers draw it and nothing else.

/** An sRGB colour as "#rrggbb"; renderers convert it (e.g. to CMYK for print shops). */
export type Colour = string;

export interface Stroke {
  colour: Colour;
  /** Line width in mm (never below 0.1 mm on a sheet). */
  width: number;
  /** Dash pattern in mm, alternating on/off; empty or absent for a solid line. */
  dash?: number[];
  opacity?: number;
  cap?: "butt" | "round" | "square";
  join?: "miter" | "round" | "bevel";
}

export interface Fill {
  colour: Colour;
  opacity?: number;
}

/** A polyline or polygon in page mm (y grows downwards, origin at the top-left of the trimmed page). */
export interface PathMark {
  kind: "path";
  /** Flat list of points: x0, y0, x1, y1, … in mm. */
  points: number[];
  closed?: boolean;
  stroke?: Stroke;
  fill?: Fill;
  /** Machine-readable attributes written on the SVG element as data-* (e.g. quantity, value in SI). */
  data?: Record<string, string>;
  /** Clip to the plot frame (the scene's clip rectangle with this id). */
  clip?: string;
}

export interface RectMark {
  kind: "rect";
  x: number;
  y: number;
  width: number;
  height: number;
  stroke?: Stroke;
  fill?: Fill;
  data?: Record<string, string>;
}

export interface CircleMark {
  kind: "circle";
  cx: number;
  cy: number;
  r: number;
  stroke?: Stroke;
  fill?: Fill;
  data?: Record<string, string>;
}

export interface TextMark {
  kind: "text";
  /** Anchor point in mm. */
  x: number;
  y: number;
  text: string;
  /** Font size in points (1 pt = 25.4/72 mm). */
  size: number;
  weight?: "normal" | "bold";
  colour: Colour;
  /** Horizontal anchor of the text run at (x, y). */
  anchor?: "start" | "middle" | "end";
  /** Vertical placement: the baseline sits at y, or y is the middle of the cap height. */
  baseline?: "alphabetic" | "middle";
  /** Rotation in degrees, counter-clockwise positive as read on the page, about (x, y). */
  rotate?: number;
  /** A knock-out halo behind the glyphs, width in mm, in the page background colour. */
  halo?: { colour: Colour; width: number };
  data?: Record<string, string>;
}

export type Mark = PathMark | RectMark | CircleMark | TextMark;

/** A named group; renderers keep the order and write one SVG group (editor layer) per layer. */
export interface Layer {
  id: string;
  /** Human-readable layer name shown by vector editors. */
  label: string;
  marks: Mark[];
}

export interface ClipRect {
  id: string;
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface SceneMeta {
  title: string;
  subject?: string;
  author?: string;
  keywords?: string[];
  creator: string;
  /** ISO date written into the PDF info and SVG metadata; fixed for reproducible output. */
  date: string;
  /** Free machine-readable attributes for the SVG root (plot frame, axes …), JSON-serialisable. */
  attributes?: Record<string, unknown>;
}

export interface Scene {
  /** Trimmed page size in mm. */
  width: number;
  height: number;
  /** Bleed around the trimmed page in mm (0 for none); marks may extend into it. */
  bleed: number;
  cropMarks: boolean;
  background: Colour;
  /** Font family name used for every text mark. */
  fontFamily: string;
  clips: ClipRect[];
  layers: Layer[];
  meta: SceneMeta;
}

export const MM_PER_PT = 25.4 / 72;
