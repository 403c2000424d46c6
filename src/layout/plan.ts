// The page plan: margins, the plot frame, the bands its scales need and the panel area, in page mm.
// It depends only on paper, style and which scales are asked for, so the isoline generator can be told
// the frame's size (its tolerance is in print millimetres) before any line is traced.

import type { Rect } from "./geometry.js";
import { sizesFor, type Sizes } from "./sizes.js";
import type { Style } from "./style.js";
import { lineHeight, textWidth } from "./text.js";

export interface PlanOptions {
  page: { width: number; height: number };
  style: Style;
  /** Draw a gauge-pressure scale beside the absolute one. */
  gauge: boolean;
  /** The fluid has a temperature glide: bubble and dew temperatures get a scale each. */
  glide: boolean;
  /** Least width the panels need (e.g. for the saturation table), in mm. */
  panelMinWidth?: number;
  /** Sheet margin in mm, replacing the style's margin scaled to the paper. */
  margin?: number;
  /** The panels include a saturation table: a portrait band is made taller to hold it. */
  table?: boolean;
  /**
   * Height (mm) the band under the plot needs for overlay tables (readings, cycle states) at a given width,
   * kept within maxHeight where it can be (table cells then wrap onto fewer lines).
   */
  overlayBand?: (width: number, maxHeight: number) => number;
  /** Share of the inner page the panels take: the column's width (landscape) or the band's height (portrait). */
  panelShare?: number;
}

/** The overlay tables' band may take at most this share of the plot's height before their cells wrap less. */
const MAX_BAND_SHARE = 0.35;

/** The panels' usual share of the page; small paper may need more (see PANEL_SHARES). */
export function defaultPanelShare(landscape: boolean, table: boolean): number {
  return landscape ? 0.27 : table ? 0.37 : 0.3;
}

export interface AxisMetrics {
  tickPt: number;
  titlePt: number;
  tick: number;
  minorTick: number;
  gap: number;
  /** Widest pressure or temperature tick label allowed for, in mm. */
  labelWidth: number;
  labelHeight: number;
  titleHeight: number;
}

export interface PagePlan {
  width: number;
  height: number;
  sizes: Sizes;
  margin: number;
  gap: number;
  plot: Rect;
  /** Where the title block, cautions, key and tables go. */
  panels: Rect;
  /** Panels stand in a column right of the plot (landscape) or in a band below it (portrait). */
  arrangement: "column" | "band";
  axis: AxisMetrics;
  /** Band under the plot, as wide as the plot area, for overlay tables (height 0 when there are none). */
  overlayBand: Rect;
  /** x of each vertical scale's rule, for the axes to draw on. */
  rules: { pressure: number; gauge?: number; saturation: number; dew?: number };
}

function axisMetrics(style: Style, sizes: Sizes): AxisMetrics {
  const tickPt = sizes.pt(style.type.tick);
  const titlePt = sizes.pt(style.type.axisTitle);
  return {
    tickPt,
    titlePt,
    tick: sizes.mm(1.6),
    minorTick: sizes.mm(0.9),
    gap: sizes.mm(1),
    // Pressure labels run to five characters ("0.005", "15000"), temperatures to four ("−100").
    labelWidth: textWidth("0.0005", tickPt),
    labelHeight: lineHeight(tickPt),
    titleHeight: lineHeight(titlePt),
  };
}

/** Width of one labelled vertical scale: tick, gap, labels, gap, rotated title. */
function scaleWidth(a: AxisMetrics): number {
  return a.tick + a.gap + a.labelWidth + a.gap + a.titleHeight;
}

export function planPage(options: PlanOptions): PagePlan {
  const { page, style } = options;
  const sizes = sizesFor(style, page);
  const margin = options.margin ?? sizes.mm(style.page.margin);
  const gap = sizes.mm(style.page.gap);
  const axis = axisMetrics(style, sizes);
  const scale = scaleWidth(axis);
  const left = scale + (options.gauge ? gap + scale : 0);
  const right = scale * (options.glide ? 2 : 1) + (options.glide ? axis.gap : 0);
  const bottom = axis.tick + axis.gap + axis.labelHeight + axis.gap + axis.titleHeight;
  const top = axis.labelHeight;
  const landscape = page.width >= page.height;
  const inner = { x: margin, y: margin, width: page.width - 2 * margin, height: page.height - 2 * margin };
  let panels: Rect;
  let plotOuter: Rect;
  if (landscape) {
    const share = options.panelShare ?? defaultPanelShare(true, Boolean(options.table));
    const width = Math.min(Math.max(inner.width * share, options.panelMinWidth ?? 0), inner.width * 0.45);
    panels = { x: inner.x + inner.width - width, y: inner.y, width, height: inner.height };
    plotOuter = { x: inner.x, y: inner.y, width: inner.width - width - gap, height: inner.height };
  } else {
    // Three columns of panels under the plot; a table needs about a fifth more height than the text panels.
    const height = inner.height * (options.panelShare ?? defaultPanelShare(false, Boolean(options.table)));
    panels = { x: inner.x, y: inner.y + inner.height - height, width: inner.width, height };
    plotOuter = { x: inner.x, y: inner.y, width: inner.width, height: inner.height - height - gap };
  }
  // Overlay tables are wide (ten columns of readings), so they take a band under the plot, not the panel column.
  const bandHeight = options.overlayBand ? options.overlayBand(plotOuter.width, MAX_BAND_SHARE * plotOuter.height) : 0;
  const band = bandHeight > 0 ? bandHeight + gap : 0;
  const overlayBand = { x: plotOuter.x, y: plotOuter.y + plotOuter.height - bandHeight, width: plotOuter.width, height: bandHeight };
  const plot = { x: plotOuter.x + left, y: plotOuter.y + top, width: plotOuter.width - left - right, height: plotOuter.height - top - bottom - band };
  const rules = {
    pressure: plot.x,
    ...(options.gauge ? { gauge: plot.x - scale - gap } : {}),
    saturation: plot.x + plot.width,
    ...(options.glide ? { dew: plot.x + plot.width + scale + axis.gap } : {}),
  };
  return { width: page.width, height: page.height, sizes, margin, gap, plot, panels, overlayBand, arrangement: landscape ? "column" : "band", axis, rules };
}
