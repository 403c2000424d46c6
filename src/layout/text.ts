// Setting running text in panels: measured words wrapped to a width, line spacing, and number format.
// Measurement comes from the renderers' own font metrics, so what fits here fits on the page.

import type { FontWeight } from "../render/fonts.js";
import { runMetrics } from "./font-metrics.js";
import { MM_PER_PT } from "./scene.js";

/** Leading as a multiple of the type size: open enough for 6 pt to read on a plant-room wall. */
export const LEADING = 1.3;

export function lineHeight(sizePt: number): number {
  return sizePt * MM_PER_PT * LEADING;
}

/**
 * Advance width in mm, from per-character advances (no kerning): panels measure thousands of runs while
 * they are fitted, and kerning moves these figures by far less than the padding every panel keeps.
 */
export function textWidth(text: string, sizePt: number, weight: FontWeight = "normal"): number {
  return runMetrics(text, sizePt, weight).width;
}

/** Greedy line filling; a word longer than the width is broken between characters rather than overflow. */
export function wrap(text: string, sizePt: number, width: number, weight: FontWeight = "normal"): string[] {
  const lines: string[] = [];
  const space = textWidth(" ", sizePt, weight);
  for (const paragraph of text.split(/\n/)) {
    let line = "";
    let used = 0;
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const w = textWidth(word, sizePt, weight);
      if (line === "" ? w <= width : used + space + w <= width) {
        used = line === "" ? w : used + space + w;
        line = line === "" ? word : `${line} ${word}`;
        continue;
      }
      if (line !== "") lines.push(line);
      line = word;
      used = w;
      while (used > width && line.length > 1) {
        let cut = line.length - 1;
        while (cut > 1 && textWidth(line.slice(0, cut), sizePt, weight) > width) cut--;
        lines.push(line.slice(0, cut));
        line = line.slice(cut);
        used = textWidth(line, sizePt, weight);
      }
    }
    lines.push(line);
  }
  return lines;
}

/** Shortens text with an ellipsis until it fits the width. */
export function fit(text: string, sizePt: number, width: number, weight: FontWeight = "normal"): string {
  if (textWidth(text, sizePt, weight) <= width) return text;
  let cut = text.length;
  while (cut > 0 && textWidth(`${text.slice(0, cut)}…`, sizePt, weight) > width) cut--;
  return `${text.slice(0, cut)}…`;
}

/** A number as printed on the sheet: at most `digits` significant figures, a true minus sign, no float noise. */
export function formatNumber(value: number, digits = 6): string {
  const rounded = Number(value.toPrecision(digits));
  const text = String(rounded === 0 ? 0 : rounded);
  return text.replace("-", "\u2212");
}

/** A number with a fixed count of decimals and a true minus sign. */
export function formatFixed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace("-", "\u2212");
}
