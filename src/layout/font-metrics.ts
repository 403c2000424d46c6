// Fast text metrics for layout: per-character advances and ink extents of the bundled face, read from
// its glyph tables once, without shaping. Panels and labels measure thousands of runs while they are
// fitted; the renderers' shaped measureText stays the reference, and tests hold these figures to it.

import * as fontkit from "fontkit";
import { fontBuffer, type FontWeight } from "../render/fonts.js";
import { MM_PER_PT } from "./scene.js";

interface Glyph {
  /** Advance, ink top and ink bottom in em (1 = the type size). */
  advance: number;
  top: number;
  bottom: number;
}

interface Face {
  font: fontkit.Font;
  glyphs: Map<number, Glyph>;
  capHeight: number;
}

const faces = new Map<FontWeight, Face>();

function face(weight: FontWeight): Face {
  let f = faces.get(weight);
  if (!f) {
    const font = fontkit.create(fontBuffer(weight)) as fontkit.Font;
    f = { font, glyphs: new Map(), capHeight: font.capHeight / font.unitsPerEm };
    faces.set(weight, f);
  }
  return f;
}

function glyph(f: Face, codePoint: number): Glyph {
  let g = f.glyphs.get(codePoint);
  if (!g) {
    const gl = f.font.glyphForCodePoint(codePoint);
    const em = f.font.unitsPerEm;
    const box = gl.path.commands.length > 0 ? gl.bbox : { maxY: 0, minY: 0 };
    g = { advance: gl.advanceWidth / em, top: box.maxY / em, bottom: box.minY / em };
    f.glyphs.set(codePoint, g);
  }
  return g;
}

export interface RunMetrics {
  width: number;
  ascent: number;
  descent: number;
  capHeight: number;
}

/** Width and ink extents in mm of a one-line run at a size in points. */
export function runMetrics(text: string, sizePt: number, weight: FontWeight = "normal"): RunMetrics {
  const f = face(weight);
  const em = sizePt * MM_PER_PT;
  let width = 0, top = 0, bottom = 0;
  for (const ch of text) {
    const g = glyph(f, ch.codePointAt(0)!);
    width += g.advance;
    if (g.top > top) top = g.top;
    if (g.bottom < bottom) bottom = g.bottom;
  }
  return { width: width * em, ascent: top * em, descent: -bottom * em, capHeight: f.capHeight * em };
}
