// Validation of a Scene before drawing: every number finite, every colour "#rrggbb", every reference known.
// Both renderers call it first, so a bad scene fails the same way (a typed error naming the field) in each.

import { DomeprintError, inputError, show } from "../errors.js";
import type { ClipRect, Fill, Layer, Mark, Scene, Stroke, TextMark } from "../layout/scene.js";
import { isHexColour } from "./colour.js";
import { FONT_FAMILY, missingCharacters } from "./fonts.js";

/** Ids become XML ids and url(#…) references, so they keep to a safe subset of XML names. */
const XML_ID = /^[A-Za-z_][A-Za-z0-9_.-]*$/;
const ID_RULE = "a letter or _ then letters, digits, _ . -";

function finite(input: string, value: number): void {
  if (typeof value !== "number" || !Number.isFinite(value)) throw inputError(input, value, "not a finite number", "a finite number in mm");
}

function positive(input: string, value: number): void {
  finite(input, value);
  if (value <= 0) throw inputError(input, value, "must be positive", "a number > 0");
}

function nonNegative(input: string, value: number): void {
  finite(input, value);
  if (value < 0) throw inputError(input, value, "must not be negative", "a number ≥ 0");
}

function colour(input: string, value: string): void {
  if (!isHexColour(value)) throw inputError(input, value, "not an sRGB colour", 'a colour written "#rrggbb"');
}

function opacity(input: string, value: number | undefined): void {
  if (value === undefined) return;
  finite(input, value);
  if (value < 0 || value > 1) throw inputError(input, value, "outside 0–1", "an opacity from 0 to 1");
}

function xmlId(input: string, value: string): void {
  if (typeof value !== "string" || !XML_ID.test(value)) throw inputError(input, value, "not usable as an id", ID_RULE);
}

function checkStroke(at: string, stroke: Stroke | undefined): void {
  if (!stroke) return;
  colour(`${at}.colour`, stroke.colour);
  positive(`${at}.width`, stroke.width);
  opacity(`${at}.opacity`, stroke.opacity);
  if (stroke.dash && stroke.dash.length > 0) {
    stroke.dash.forEach((length, i) => nonNegative(`${at}.dash[${i}]`, length));
    if (stroke.dash.every((length) => length === 0)) throw inputError(`${at}.dash`, stroke.dash, "all lengths are zero", "on/off lengths in mm with a positive sum");
  }
}

function checkFill(at: string, fill: Fill | undefined): void {
  if (!fill) return;
  colour(`${at}.colour`, fill.colour);
  opacity(`${at}.opacity`, fill.opacity);
}

function checkData(at: string, data: Record<string, string> | undefined): void {
  for (const [key, value] of Object.entries(data ?? {})) {
    if (!XML_ID.test(key)) throw inputError(`${at}.data`, key, "not usable in a data-* attribute name", ID_RULE);
    if (typeof value !== "string") throw inputError(`${at}.data.${key}`, value, "not a string", "a string");
  }
}

/** A character without a glyph would print as an empty box, so it is refused rather than drawn. */
function checkGlyphs(at: string, mark: TextMark): void {
  const missing = missingCharacters(mark.text, mark.weight ?? "normal");
  if (missing.length === 0) return;
  const codes = missing.map((ch) => `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, "0")}`).join(", ");
  const allowed = `characters the bundled ${FONT_FAMILY} covers (Latin, Greek, Cyrillic and common symbols)`;
  throw new DomeprintError("E_UNSUPPORTED", `${at}.text = ${show(mark.text)}: no glyph for ${missing.join(" ")} (${codes}); allowed: ${allowed}`, {
    input: `${at}.text`,
    value: mark.text,
    allowed,
  });
}

function checkText(at: string, mark: TextMark): void {
  finite(`${at}.x`, mark.x);
  finite(`${at}.y`, mark.y);
  positive(`${at}.size`, mark.size);
  colour(`${at}.colour`, mark.colour);
  if (typeof mark.text !== "string") throw inputError(`${at}.text`, mark.text, "not a string", "a string");
  if (mark.rotate !== undefined) finite(`${at}.rotate`, mark.rotate);
  checkGlyphs(at, mark);
  if (mark.halo) {
    colour(`${at}.halo.colour`, mark.halo.colour);
    positive(`${at}.halo.width`, mark.halo.width);
  }
}

function checkMark(at: string, mark: Mark, clips: Set<string>): void {
  switch (mark.kind) {
    case "path":
      if (mark.points.length < 4 || mark.points.length % 2 !== 0)
        throw inputError(`${at}.points`, mark.points.length, "needs an even count of at least 4 numbers", "x0, y0, x1, y1, … in mm");
      mark.points.forEach((v, i) => finite(`${at}.points[${i}]`, v));
      if (mark.clip !== undefined && !clips.has(mark.clip))
        throw inputError(`${at}.clip`, mark.clip, "names no clip rectangle of the scene", [...clips].join(", ") || "no clips defined");
      break;
    case "rect":
      finite(`${at}.x`, mark.x);
      finite(`${at}.y`, mark.y);
      nonNegative(`${at}.width`, mark.width);
      nonNegative(`${at}.height`, mark.height);
      break;
    case "circle":
      finite(`${at}.cx`, mark.cx);
      finite(`${at}.cy`, mark.cy);
      positive(`${at}.r`, mark.r);
      break;
    case "text":
      checkText(at, mark);
      break;
    default:
      throw inputError(`${at}.kind`, (mark as { kind: unknown }).kind, "unknown mark", "path, rect, circle, text");
  }
  if (mark.kind !== "text") {
    checkStroke(`${at}.stroke`, mark.stroke);
    checkFill(`${at}.fill`, mark.fill);
  }
  checkData(at, mark.data);
}

function checkClip(at: string, clip: ClipRect): void {
  xmlId(`${at}.id`, clip.id);
  finite(`${at}.x`, clip.x);
  finite(`${at}.y`, clip.y);
  nonNegative(`${at}.width`, clip.width);
  nonNegative(`${at}.height`, clip.height);
}

function uniqueIds(at: string, items: { id: string }[]): Set<string> {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) throw inputError(`${at}[${i}].id`, item.id, "used twice", "ids unique within the scene");
    seen.add(item.id);
  });
  return seen;
}

/** Ids the renderers write themselves; a layer taking one would make the SVG's ids ambiguous. */
const RESERVED_ID = /^(clip-|domeprint-)/;

function checkLayer(at: string, layer: Layer, clips: Set<string>): void {
  xmlId(`${at}.id`, layer.id);
  if (RESERVED_ID.test(layer.id)) throw inputError(`${at}.id`, layer.id, "uses a prefix the renderers reserve", "an id not starting with clip- or domeprint-");
  if (typeof layer.label !== "string") throw inputError(`${at}.label`, layer.label, "not a string", "a layer name");
  layer.marks.forEach((mark, i) => checkMark(`${at}.marks[${i}]`, mark, clips));
}

/** Throws a DomeprintError (E_INPUT) naming the first field a renderer could not draw faithfully. */
export function checkScene(scene: Scene): void {
  positive("scene.width", scene.width);
  positive("scene.height", scene.height);
  nonNegative("scene.bleed", scene.bleed);
  colour("scene.background", scene.background);
  // The PDF and PNG can only use the bundled face; an SVG naming another would print differently.
  if (scene.fontFamily !== FONT_FAMILY)
    throw new DomeprintError("E_UNSUPPORTED", `scene.fontFamily = ${show(scene.fontFamily)}: not a bundled family; allowed: ${FONT_FAMILY}`, {
      input: "scene.fontFamily",
      value: scene.fontFamily,
      allowed: FONT_FAMILY,
    });
  if (Number.isNaN(Date.parse(scene.meta.date))) throw inputError("scene.meta.date", scene.meta.date, "not a date", "an ISO 8601 date such as 2024-05-01");
  scene.clips.forEach((clip, i) => checkClip(`scene.clips[${i}]`, clip));
  const clips = uniqueIds("scene.clips", scene.clips);
  uniqueIds("scene.layers", scene.layers);
  scene.layers.forEach((layer, i) => checkLayer(`scene.layers[${i}]`, layer, clips));
}
