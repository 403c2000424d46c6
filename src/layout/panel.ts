// A panel: a titled box of items (headings, paragraphs, fields, bullets, key rows, tables) that can say
// how tall it is at a width and then draw itself there. Content builders fill it; the panel sets it.

import type { Mark, Stroke } from "./scene.js";
import { rect, segment, text } from "./marks.js";
import { fit, lineHeight, textWidth, wrap } from "./text.js";
import { MIN_TYPE_PT } from "./sizes.js";

export type PanelItem =
  | { kind: "heading"; text: string; scale: number }
  | { kind: "paragraph"; text: string; scale?: number; muted?: boolean }
  | { kind: "field"; label: string; value: string }
  | { kind: "bullet"; text: string; strong?: boolean }
  | { kind: "key"; stroke: Stroke; text: string }
  | { kind: "table"; columns: string[]; units: string[]; rows: string[][]; align: ("start" | "end")[] }
  | { kind: "space" };

export interface PanelStyle {
  /** Body size in pt (already scaled to the paper). */
  pt: number;
  titlePt: number;
  ink: string;
  muted: string;
  fill: string;
  stroke: Stroke;
  titleFill: string;
  titleInk: string;
  accent: string;
  stripe: string;
  padding: number;
}

export interface Panel {
  id: string;
  title: string;
  items: PanelItem[];
}

interface Ctx {
  style: PanelStyle;
  width: number;
  /** Lines a table cell may wrap onto before the last is cut short with an ellipsis. */
  cellLines: number;
}

const inner = (c: Ctx) => c.width - 2 * c.style.padding;

function size(pt: number, scale = 1): number {
  return Math.max(MIN_TYPE_PT, pt * scale);
}

function tableWidths(item: Extract<PanelItem, { kind: "table" }>, pt: number): number[] {
  const gap = textWidth("00", pt);
  return item.columns.map((c, j) => Math.max(textWidth(c, pt, "bold"), textWidth(item.units[j] ?? "", pt), ...item.rows.map((r) => textWidth(r[j] ?? "", pt))) + gap);
}

/** Natural width of a table item, padding included: what a panel must offer to hold it. */
export function tableWidth(item: Extract<PanelItem, { kind: "table" }>, style: PanelStyle): number {
  return tableWidths(item, style.pt).reduce((a, b) => a + b, 0) + 2 * style.padding;
}

function fieldLabelWidth(items: PanelItem[], pt: number): number {
  return Math.max(0, ...items.filter((i): i is Extract<PanelItem, { kind: "field" }> => i.kind === "field").map((i) => textWidth(i.label, pt)));
}

/** Draws the items from the top; with `draw` false it only measures. Returns the height used. */
function setItems(panel: Panel, c: Ctx, x: number, y: number, out: Mark[] | undefined): number {
  const s = c.style;
  const pt = s.pt;
  const lh = lineHeight(pt);
  const labelWidth = fieldLabelWidth(panel.items, pt);
  let cursor = y;
  const line = (content: string, at: number, sizePt: number, colour: string, weight: "normal" | "bold" = "normal") =>
    out?.push(text(at, cursor + lineHeight(sizePt) * 0.78, content, sizePt, colour, { weight }));
  for (const item of panel.items) {
    switch (item.kind) {
      case "space":
        cursor += lh * 0.4;
        break;
      case "heading": {
        const hpt = size(pt, item.scale);
        for (const l of wrap(item.text, hpt, inner(c), "bold")) {
          line(l, x, hpt, s.ink, "bold");
          cursor += lineHeight(hpt);
        }
        break;
      }
      case "paragraph": {
        const ppt = size(pt, item.scale ?? 1);
        for (const l of wrap(item.text, ppt, inner(c))) {
          line(l, x, ppt, item.muted ? s.muted : s.ink);
          cursor += lineHeight(ppt);
        }
        break;
      }
      case "field": {
        const valueX = x + labelWidth + textWidth("  ", pt);
        const lines = wrap(item.value, pt, inner(c) - (valueX - x));
        line(item.label, x, pt, s.muted);
        for (const l of lines) {
          line(l, valueX, pt, s.ink);
          cursor += lh;
        }
        break;
      }
      case "bullet": {
        const indent = textWidth("•  ", pt);
        const lines = wrap(item.text, pt, inner(c) - indent, item.strong ? "bold" : "normal");
        line("•", x, pt, s.accent, "bold");
        for (const l of lines) {
          line(l, x + indent, pt, s.ink, item.strong ? "bold" : "normal");
          cursor += lh;
        }
        break;
      }
      case "key": {
        const sample = textWidth("0000000", pt);
        const mid = cursor + lh * 0.5;
        out?.push({ kind: "path", points: [x, mid, x + sample, mid], stroke: item.stroke });
        const lines = wrap(item.text, pt, inner(c) - sample - textWidth("  ", pt));
        for (const l of lines) {
          line(l, x + sample + textWidth("  ", pt), pt, s.ink);
          cursor += lh;
        }
        break;
      }
      case "table":
        cursor += setTable(item, c, x, cursor, out);
        break;
    }
  }
  return cursor - y;
}

/**
 * Column widths that fill the panel: spare width is shared out evenly; when the table is too wide, the
 * widest columns give way first (water-filling), down to their `minimum` where one is given (the longest
 * word of a column whose cells wrap); only when even the minimums do not fit do all columns share alike.
 */
export function fitColumns(natural: number[], width: number, minimum: number[] = natural.map(() => 0)): number[] {
  const total = natural.reduce((a, b) => a + b, 0);
  if (total <= width) return natural.map((w) => w + (width - total) / natural.length);
  const floor = natural.map((w, j) => Math.min(w, minimum[j] ?? 0));
  if (floor.reduce((a, b) => a + b, 0) >= width) return fitColumns(natural, width);
  // The cap c with Σ max(floor, min(natural, c)) = width, by bisection (the sum rises with c).
  const sum = (c: number) => natural.reduce((a, w, j) => a + Math.max(floor[j]!, Math.min(w, c)), 0);
  let lo = 0, hi = Math.max(...natural);
  for (let k = 0; k < 60; k++) {
    const mid = 0.5 * (lo + hi);
    if (sum(mid) > width) hi = mid; else lo = mid;
  }
  return natural.map((w, j) => Math.max(floor[j]!, Math.min(w, lo)));
}

/** The widest word of each column (a right-set column keeps whole cells): the narrowest it may be set. */
function tableMinimums(item: Extract<PanelItem, { kind: "table" }>, pt: number): number[] {
  const gap = textWidth("00", pt);
  const widest = (cell: string, weight: "normal" | "bold", whole: boolean) =>
    whole ? textWidth(cell, pt, weight) : Math.max(0, ...cell.split(/\s+/).map((w) => textWidth(w, pt, weight)));
  return item.columns.map((c, j) => {
    const whole = item.align[j] === "end";
    return Math.max(widest(c, "bold", whole), widest(item.units[j] ?? "", "normal", whole), ...item.rows.map((r) => widest(r[j] ?? "", "normal", whole))) + gap;
  });
}

/** Wraps a cell onto at most `max` lines; a longer text ends its last line with an ellipsis. */
function wrapCell(content: string, pt: number, width: number, weight: "normal" | "bold", max: number): string[] {
  if (textWidth(content, pt, weight) <= width) return [content]; // as written, leading spaces (indents) kept
  const lines = wrap(content, pt, width, weight);
  if (lines.length <= max) return lines;
  return [...lines.slice(0, max - 1), fit(lines.slice(max - 1).join(" "), pt, width, weight)];
}

/** A table whose cells wrap within their columns up to c.cellLines lines: each row as tall as its longest cell. */
function setTable(item: Extract<PanelItem, { kind: "table" }>, c: Ctx, x: number, y: number, out: Mark[] | undefined): number {
  const s = c.style;
  const pt = s.pt;
  const lh = lineHeight(pt);
  const fig = textWidth("0", pt);
  const cols = fitColumns(tableWidths(item, pt), inner(c), tableMinimums(item, pt));
  /** Sets one row from `top` (or only measures it without `out`); returns its height. */
  const row = (cells: string[], top: number, weight: "normal" | "bold", colour: string, stripe: boolean) => {
    const lines = cells.map((content, j) => wrapCell(content, pt, cols[j]! - 1.5 * fig, weight, c.cellLines));
    const height = lh * Math.max(1, ...lines.map((l) => l.length));
    if (stripe) out?.push(rect(x, top, inner(c), height, { colour: s.stripe }));
    let left = x;
    lines.forEach((ls, j) => {
      const w = cols[j]!;
      const right = item.align[j] === "end";
      // Right-set cells stop a figure's width short of the next column, so neighbours never touch.
      ls.forEach((l, k) => out?.push(text(right ? left + w - fig : left, top + lh * (k + 0.78), l, pt, colour, { weight, ...(right ? { anchor: "end" } : {}) })));
      left += w;
    });
    return height;
  };
  let cursor = y;
  cursor += row(item.columns, cursor, "bold", s.ink, false);
  if (item.units.some((u) => u !== "")) cursor += row(item.units, cursor, "normal", s.muted, false);
  out?.push(segment(x, cursor, x + inner(c), cursor, { ...s.stroke }));
  item.rows.forEach((r, i) => {
    cursor += row(r, cursor, "normal", s.ink, i % 2 === 1);
  });
  return cursor - y;
}

function titleHeight(style: PanelStyle): number {
  return lineHeight(style.titlePt) + style.padding;
}

/** Height of a panel set at this width; its table cells wrap onto at most `cellLines` lines. */
export function panelHeight(panel: Panel, style: PanelStyle, width: number, cellLines = 1): number {
  return titleHeight(style) + setItems(panel, { style, width, cellLines }, 0, 0, undefined) + 2 * style.padding;
}

export function drawPanel(panel: Panel, style: PanelStyle, x: number, y: number, width: number, height: number, cellLines = 1): Mark[] {
  const marks: Mark[] = [rect(x, y, width, height, { colour: style.fill }, style.stroke)];
  const band = titleHeight(style);
  marks.push(rect(x, y, width, band, { colour: style.titleFill }));
  marks.push(text(x + style.padding, y + band / 2, fit(panel.title, style.titlePt, width - 2 * style.padding, "bold"), style.titlePt, style.titleInk, { weight: "bold", baseline: "middle" }));
  setItems(panel, { style, width, cellLines }, x + style.padding, y + band + style.padding, marks);
  return marks;
}
