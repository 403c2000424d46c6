// Fits the panels into their area: stacked in one column beside a landscape plot, or in columns in a
// band under a portrait one. Type shrinks (never below 6 pt) and the saturation table loses rows before
// anything may overflow; what had to go is reported.

import { DomeprintError } from "../errors.js";
import type { Rect } from "./geometry.js";
import { panelHeight, tableWidth, type Panel, type PanelItem, type PanelStyle } from "./panel.js";
import { MIN_TYPE_PT } from "./sizes.js";

export interface PlacedPanel {
  panel: Panel;
  rect: Rect;
}

export interface PanelSet {
  /** Panels in reading order; the last of them is pushed to the bottom of its column. */
  fixed: Panel[];
  /** The saturation table at a given thinning (1 = every row given, 2, 4 or 10 = rows at that multiple of the step), if asked for. */
  table?: (thinning: number) => Panel | undefined;
}

export interface Arrangement {
  placed: PlacedPanel[];
  style: PanelStyle;
  /** Things left out for want of room, in words. */
  omitted: string[];
}

const SHRINK = [1, 0.92, 0.85, 0.78, 0.72, 0.66, 0.6];
const THINNING = [1, 2, 4, 10];

function scaled(style: PanelStyle, factor: number): PanelStyle {
  return { ...style, pt: Math.max(MIN_TYPE_PT, style.pt * factor), titlePt: Math.max(MIN_TYPE_PT, style.titlePt * factor), padding: style.padding * Math.max(factor, 0.7) };
}

/** Every way of dealing the panels (in order) into `count` columns; panels are few, so all are tried. */
function deals(panels: Panel[], count: number): Panel[][][] {
  if (panels.length === 0) return [Array.from({ length: count }, () => [])];
  const out: Panel[][][] = [];
  for (const rest of deals(panels.slice(1), count)) {
    for (let c = 0; c < count; c++) out.push(rest.map((col, i) => (i === c ? [panels[0]!, ...col] : col)));
  }
  return out;
}

/**
 * Columns for a band: the tables in a column of their own, the other panels dealt into two columns so
 * the taller of them is as short as it can be.
 */
function bandColumns(panels: Panel[], table: Panel | undefined, width: number, gap: number, style: PanelStyle): Panel[][] {
  const tables = [...panels.filter((p) => tableItem(p)), ...(table ? [table] : [])];
  const others = panels.filter((p) => !tableItem(p));
  const tableWidthMm = Math.max(0, ...tables.map((t) => tableWidth(tableItem(t)!, style)));
  const free = tables.length > 0 ? (width - tableWidthMm - 2 * gap) / 2 : (width - gap) / 2;
  const heights = new Map(others.map((p) => [p, panelHeight(p, style, free)]));
  let best: Panel[][] = [others, []];
  let bestHeight = Infinity;
  // The title block opens the first column, where a reader starts.
  for (const deal of deals(others, 2).filter((d) => others.length === 0 || d[0]!.includes(others[0]!))) {
    const tallest = Math.max(...deal.map((col) => col.reduce((sum, p) => sum + heights.get(p)! + gap, 0)));
    if (tallest < bestHeight) {
      bestHeight = tallest;
      best = deal;
    }
  }
  return tables.length > 0 ? [...best, tables] : best;
}

function stack(column: Panel[], area: Rect, gap: number, style: PanelStyle): PlacedPanel[] | undefined {
  const heights = column.map((p) => panelHeight(p, style, area.width));
  const total = heights.reduce((a, b) => a + b, 0) + gap * Math.max(0, column.length - 1);
  if (total > area.height + 1e-6) return undefined;
  const placed: PlacedPanel[] = [];
  let y = area.y;
  column.forEach((panel, i) => {
    const last = i === column.length - 1 && column.length > 1;
    const top = last ? area.y + area.height - heights[i]! : y;
    placed.push({ panel, rect: { x: area.x, y: top, width: area.width, height: heights[i]! } });
    y += heights[i]! + gap;
  });
  return placed;
}

function tableItem(panel: Panel): Extract<PanelItem, { kind: "table" }> | undefined {
  return panel.items.find((i): i is Extract<PanelItem, { kind: "table" }> => i.kind === "table");
}

function columnWidths(columns: Panel[][], area: Rect, gap: number, style: PanelStyle): number[] | undefined {
  const natural = columns.map((c) => Math.max(0, ...c.map((p) => (tableItem(p) ? tableWidth(tableItem(p)!, style) : 0))));
  const fixed = natural.reduce((a, b) => a + b, 0);
  const free = columns.filter((_, i) => natural[i] === 0).length;
  const rest = area.width - gap * (columns.length - 1) - fixed;
  if (rest < 0 || (free > 0 && rest / free < 40)) return undefined;
  return natural.map((w) => (w === 0 ? rest / free : w + (free === 0 ? rest / columns.length : 0)));
}

function tryArrange(fixed: Panel[], table: Panel | undefined, area: Rect, gap: number, style: PanelStyle, arrangement: "column" | "band"): PlacedPanel[] | undefined {
  if (arrangement === "column") {
    const all = table ? [...fixed.slice(0, -1), table, fixed[fixed.length - 1]!] : fixed;
    const widest = Math.max(0, ...all.map((p) => (tableItem(p) ? tableWidth(tableItem(p)!, style) : 0)));
    if (widest > area.width + 1e-6) return undefined;
    return stack(all, area, gap, style);
  }
  const columns = bandColumns(fixed, table, area.width, gap, style).filter((c) => c.length > 0);
  const widths = columnWidths(columns, area, gap, style);
  if (!widths) return undefined;
  const placed: PlacedPanel[] = [];
  let x = area.x;
  for (let i = 0; i < columns.length; i++) {
    const column = stack(columns[i]!, { x, y: area.y, width: widths[i]!, height: area.height }, gap, style);
    if (!column) return undefined;
    placed.push(...column);
    x += widths[i]! + gap;
  }
  return placed;
}

export function arrangePanels(set: PanelSet, area: Rect, gap: number, base: PanelStyle, arrangement: "column" | "band"): Arrangement {
  // A full table at the body size first; then smaller type; then fewer rows; the table goes last of all.
  for (const thinning of set.table ? THINNING : [1]) {
    const table = set.table?.(thinning);
    for (const factor of SHRINK) {
      const style = scaled(base, factor);
      const placed = tryArrange(set.fixed, table, area, gap, style, arrangement);
      if (placed) return { placed, style, omitted: thinning > 1 ? [`saturation table: rows at ${thinning} times the step`] : [] };
    }
  }
  for (const factor of SHRINK) {
    const style = scaled(base, factor);
    const placed = tryArrange(set.fixed, undefined, area, gap, style, arrangement);
    if (placed) return { placed, style, omitted: set.table ? ["saturation table (no room)"] : [] };
  }
  const size = `${area.width.toFixed(0)} × ${area.height.toFixed(0)} mm`;
  throw new DomeprintError("E_UNSUPPORTED", `paper: the panels do not fit in their ${size} area even at ${MIN_TYPE_PT} pt; allowed: a larger paper or fewer user fields`, {
    input: "paper",
    value: size,
    allowed: "a larger paper or fewer user fields",
  });
}
