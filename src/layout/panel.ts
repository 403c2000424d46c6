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
 * widest columns give way first (water-filling), and their cells are shortened with an ellipsis.
 */
export function fitColumns(natural: number[], width: number): number[] {
  const total = natural.reduce((a, b) => a + b, 0);
  if (total <= width) return natural.map((w) => w + (width - total) / natural.length);
  let cap = width / natural.length;
  // Raise the cap until the columns under it plus the capped ones fill the width.
  const sorted = [...natural].sort((a, b) => a - b);
  let used = 0;
  for (let i = 0; i < sorted.length; i++) {
    const rest = sorted.length - i;
    const share = (width - used) / rest;
    if (sorted[i]! > share) {
      cap = share;
      break;
    }
    used += sorted[i]!;
    cap = sorted[i]!;
  }
  return natural.map((w) => Math.min(w, cap));
}

function setTable(item: Extract<PanelItem, { kind: "table" }>, c: Ctx, x: number, y: number, out: Mark[] | undefined): number {
  const s = c.style;
  const pt = s.pt;
  const lh = lineHeight(pt);
  const cols = fitColumns(tableWidths(item, pt), inner(c));
  const cell = (row: string[], top: number, weight: "normal" | "bold", colour: string) => {
    let left = x;
    row.forEach((content, j) => {
      const w = cols[j]!;
      const right = item.align[j] === "end";
      const shown = fit(content, pt, w - 1.5 * textWidth("0", pt), weight);
      // Right-set cells stop a figure's width short of the next column, so neighbours never touch.
      out?.push(text(right ? left + w - textWidth("0", pt) : left, top + lh * 0.78, shown, pt, colour, { weight, ...(right ? { anchor: "end" } : {}) }));
      left += w;
    });
  };
  let cursor = y;
  cell(item.columns, cursor, "bold", s.ink);
  cursor += lh;
  if (item.units.some((u) => u !== "")) {
    cell(item.units, cursor, "normal", s.muted);
    cursor += lh;
  }
  out?.push(segment(x, cursor, x + inner(c), cursor, { ...s.stroke }));
  item.rows.forEach((row, i) => {
    if (i % 2 === 1) out?.push(rect(x, cursor, inner(c), lh, { colour: s.stripe }));
    cell(row, cursor, "normal", s.ink);
    cursor += lh;
  });
  return cursor - y;
}

function titleHeight(style: PanelStyle): number {
  return lineHeight(style.titlePt) + style.padding;
}

export function panelHeight(panel: Panel, style: PanelStyle, width: number): number {
  return titleHeight(style) + setItems(panel, { style, width }, 0, 0, undefined) + 2 * style.padding;
}

export function drawPanel(panel: Panel, style: PanelStyle, x: number, y: number, width: number, height: number): Mark[] {
  const marks: Mark[] = [rect(x, y, width, height, { colour: style.fill }, style.stroke)];
  const band = titleHeight(style);
  marks.push(rect(x, y, width, band, { colour: style.titleFill }));
  marks.push(text(x + style.padding, y + band / 2, fit(panel.title, style.titlePt, width - 2 * style.padding, "bold"), style.titlePt, style.titleInk, { weight: "bold", baseline: "middle" }));
  setItems(panel, { style, width }, x + style.padding, y + band + style.padding, marks);
  return marks;
}
