// The one type family every sheet is set in (Noto Sans, SIL OFL, shipped as TTF in an npm package),
// its file paths and bytes for the renderers, and text measurement for the layout engine.

import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import * as fontkit from "fontkit";
import { inputError } from "../errors.js";
import { MM_PER_PT } from "../layout/scene.js";
import { oneLine } from "./format.js";

export type FontWeight = "normal" | "bold";

/** The family name the TTF files declare; SVG text names it and resvg matches it. */
export const FONT_FAMILY = "Noto Sans";

/** Resolved through the module system (not a path relative to src/) so it works from dist/ and as a dependency. */
const FONT_MODULES: Record<FontWeight, string> = {
  normal: "@expo-google-fonts/noto-sans/400Regular/NotoSans_400Regular.ttf",
  bold: "@expo-google-fonts/noto-sans/700Bold/NotoSans_700Bold.ttf",
};

const resolveModule = createRequire(import.meta.url).resolve;

export function fontPath(weight: FontWeight = "normal"): string {
  return resolveModule(FONT_MODULES[weight]);
}

/** Both weights, regular first, for renderers that take a list of font files. */
export function fontPaths(): string[] {
  return [fontPath("normal"), fontPath("bold")];
}

const buffers = new Map<FontWeight, Buffer>();

export function fontBuffer(weight: FontWeight = "normal"): Buffer {
  let buffer = buffers.get(weight);
  if (!buffer) {
    buffer = readFileSync(fontPath(weight));
    buffers.set(weight, buffer);
  }
  return buffer;
}

const fonts = new Map<FontWeight, fontkit.Font>();

function font(weight: FontWeight): fontkit.Font {
  let loaded = fonts.get(weight);
  if (!loaded) {
    const opened = fontkit.create(fontBuffer(weight));
    if (!("layout" in opened)) throw inputError("font", fontPath(weight), "is a collection, not a single font", "a single TTF face");
    loaded = opened;
    fonts.set(weight, loaded);
  }
  return loaded;
}

export interface TextMetrics {
  /** Advance width of the shaped run (kerning applied), in mm: what the renderers use to anchor it. */
  width: number;
  /** Ink extent above the baseline of this run's glyphs, in mm (0 for blank text). */
  ascent: number;
  /** Ink extent below the baseline, in mm, as a positive number (0 when nothing descends). */
  descent: number;
  /** The face's cap height at this size, in mm: the renderers centre "middle" text on half of it. */
  capHeight: number;
}

/** Millimetres per font unit at a size in points. */
function unitScale(face: fontkit.Font, sizePt: number): number {
  return (sizePt * MM_PER_PT) / face.unitsPerEm;
}

function checkSize(sizePt: number): void {
  if (!Number.isFinite(sizePt) || sizePt <= 0) throw inputError("text size", sizePt, "must be a positive finite number", "a size in pt > 0");
}

/**
 * Measures a label as the renderers will draw it (one line, same face, same shaping), so the layout
 * engine can anchor labels and keep them from colliding. Ink extents, not the face's line spacing,
 * because label boxes should hug what is printed.
 */
export function measureText(text: string, sizePt: number, weight: FontWeight = "normal"): TextMetrics {
  checkSize(sizePt);
  const face = font(weight);
  const scale = unitScale(face, sizePt);
  const run = face.layout(oneLine(text));
  const inked = run.glyphs.some((glyph) => glyph.path.commands.length > 0);
  return {
    width: run.advanceWidth * scale,
    ascent: inked ? Math.max(0, run.bbox.maxY) * scale : 0,
    descent: inked ? Math.max(0, -run.bbox.minY) * scale : 0,
    capHeight: face.capHeight * scale,
  };
}

/** Cap height in mm of the face at a size in points. */
export function capHeight(sizePt: number, weight: FontWeight = "normal"): number {
  checkSize(sizePt);
  const face = font(weight);
  return face.capHeight * unitScale(face, sizePt);
}

/** Characters of a label the face has no glyph for (each listed once), which would print as empty boxes. */
export function missingCharacters(text: string, weight: FontWeight = "normal"): string[] {
  const face = font(weight);
  const missing = new Set<string>();
  for (const ch of oneLine(text)) {
    if (!face.hasGlyphForCodePoint(ch.codePointAt(0)!)) missing.add(ch);
  }
  return [...missing];
}
