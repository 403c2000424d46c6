// Composes one sheet's Scene from its content: grid, lines, overlays, labels placed by the optimiser,
// axes, frame and panels, in page mm, with machine-readable metadata for scripts that read the SVG.

import { FONT_FAMILY } from "../render/fonts.js";
import { axesMarks } from "./axes.js";
import { axisTicks } from "./axis-ticks.js";
import type { SaturationRow, SheetContent } from "./content.js";
import { toDisplay } from "./display-units.js";
import { box, rectBox } from "./geometry.js";
import { gridMarks } from "./grid.js";
import { placeLabels, type PlacementReport } from "./label-placement.js";
import { labelPreference } from "./label-preference.js";
import { drawnLines, labelRequests, lineLayers } from "./line-marks.js";
import { thinLines } from "./line-thinning.js";
import { rect, text } from "./marks.js";
import { sceneMeta } from "./sheet-meta.js";
import { overlayMarks } from "./overlay-marks.js";
import { drawPanel, fitColumns, panelHeight, tableWidth, type Panel, type PanelStyle } from "./panel.js";
import type { Overlay } from "../cycle/overlay.js";
import { arrangePanels, type PlacedPanel } from "./panel-arrangement.js";
import type { PagePlan } from "./plan.js";
import { chartScales } from "./scales.js";
import type { Layer, Mark, Scene, Stroke } from "./scene.js";
import { cautionPanel, keyEntries, keyPanel, overlayPanels, saturationTablePanel, sourcePanel, titlePanel } from "./sheet-panels.js";
import { SpatialGrid } from "./spatial-grid.js";
import { FAMILIES, type Family, type Style } from "./style.js";
import { MIN_TYPE_PT, sizesFor, type Sizes } from "./sizes.js";
import { textWidth } from "./text.js";

export interface SheetReport {
  labels: PlacementReport;
  pointLabels: { placed: number; dropped: number };
  omitted: string[];
  panelPt: number;
}

export interface LaidOutSheet {
  scene: Scene;
  report: SheetReport;
}

/**
 * Rows of the saturation table thinned to round steps: every row, or those at multiples of 2, 4 or 10
 * times the given step (5 °C → 10, 20, 50 °C), so a shortened table still reads in round numbers.
 */
function tableRows(content: SheetContent, thinning: number): SaturationRow[] {
  const rows = content.saturationTable ?? [];
  if (rows.length < 2 || thinning === 1) return rows;
  const t = (r: SaturationRow) => Math.round(toDisplay(r.T, content.units.temperature) * 1000) / 1000;
  const step = Math.abs(t(rows[1]!) - t(rows[0]!)) * thinning;
  return rows.filter((r) => Math.abs(t(r) / step - Math.round(t(r) / step)) < 1e-6);
}

function familyStrokes(style: Style, plan: PagePlan): Record<Family, Stroke> {
  return Object.fromEntries(FAMILIES.map((f) => [f, plan.sizes.stroke(style.lines[f])])) as Record<Family, Stroke>;
}

function panelStyle(style: Style, sizes: Sizes): PanelStyle {
  return {
    pt: sizes.pt(style.type.panel),
    titlePt: sizes.pt(style.type.panelTitle),
    ink: style.page.ink,
    muted: style.page.muted,
    fill: style.panels.fill,
    stroke: sizes.stroke(style.panels.stroke),
    titleFill: style.panels.titleFill,
    titleInk: style.panels.titleInk,
    accent: style.panels.accent,
    stripe: style.panels.stripe,
    padding: sizes.mm(style.panels.padding),
  };
}

export function layoutSheet(plan: PagePlan, content: SheetContent, style: Style): LaidOutSheet {
  const { sizes } = plan;
  const { units, fluid } = content;
  const scales = chartScales(content.lines.window, plan.plot);
  const ticks = axisTicks(scales, units, plan, content.saturationScale, fluid.glide, sizes.mm(style.grid.spacing), content.gauge?.atmosphere);
  const strokes = familyStrokes(style, plan);
  // Lines closer than about 7 mm (isotherms) or 9 mm (isentropes, isochores) at A4 crowd out their labels.
  const budget = { temperature: Math.floor(plan.plot.width / sizes.mm(7)), entropy: Math.floor(plan.plot.width / sizes.mm(9)), "specific-volume": Math.floor(plan.plot.height / sizes.mm(9)) };
  const chosen = content.spacingGiven ? content.lines.lines : thinLines(content.lines.lines, units, budget);
  const drawn = drawnLines({ ...content.lines, lines: chosen }, scales);

  // Panels first: their rectangles are obstacles for everything placed later.
  const families = new Set(drawn.map((d) => d.family));
  const pStyle = panelStyle(style, plan.sizes);
  const typeScale = { heading: style.type.heading / style.type.panel, subheading: style.type.subheading / style.type.panel, small: style.type.smallPrint / style.type.panel };
  const arrangement = arrangePanels(
    {
      fixed: [titlePanel(content, typeScale), keyPanel(keyEntries(families, units, strokes, fluid.glide)), cautionPanel(fluid), sourcePanel(content, typeScale)],
      ...(content.saturationTable ? { table: (thinning: number) => saturationTablePanel(tableRows(content, thinning), units, content.gauge?.atmosphere ?? 101325, fluid.glide) } : {}),
    },
    plan.panels,
    plan.gap,
    pStyle,
    plan.arrangement,
  );

  const overlayTables = placeOverlayPanels(overlayPanels(content.overlays), plan, arrangement.style);
  const obstacles = new SpatialGrid(10);
  for (const p of [...arrangement.placed, ...overlayTables]) obstacles.addBox(p.panel.id, rectBox(p.rect));
  const hardOwners = new Set<string>();
  for (const d of drawn) {
    if (d.family !== "dome") continue;
    hardOwners.add(d.owner);
    for (const piece of d.pieces) obstacles.addPolyline(d.owner, piece);
  }

  const haloMm = sizes.mm(style.labels.halo);
  const labelPt = sizes.pt(style.type.lineLabel);
  const critical = content.lines.critical;
  const criticalMarks: Mark[] = [];
  const cx = scales.x(critical.h), cy = scales.y(critical.p);
  const { frame } = scales;
  if (cx >= frame.x && cx <= frame.x + frame.width && cy >= frame.y && cy <= frame.y + frame.height) {
    const r = sizes.mm(style.critical.radius);
    criticalMarks.push({ kind: "circle", cx, cy, r, fill: { colour: style.critical.colour }, data: { quantity: "critical-point", T: String(critical.T), p: String(critical.p), h: String(critical.h) } });
    obstacles.addBox("critical", box(cx, cy, r + haloMm, r + haloMm));
  }

  const overlay = overlayMarks(
    content.overlays,
    scales,
    { colours: style.cycles.colours, width: sizes.mm(style.cycles.width), marker: sizes.mm(style.cycles.marker), pointsDash: style.cycles.pointsDash.map(sizes.mm), labelPt: sizes.pt(style.type.lineLabel + 1), background: style.page.background, halo: haloMm },
    obstacles,
  );
  for (const owner of overlay.owners) hardOwners.add(owner);

  const lines = new SpatialGrid(8);
  for (const d of drawn) for (const piece of d.pieces) lines.addPolyline(d.owner, piece);
  const requests = labelRequests(drawn, units, fluid.glide, { sizePt: labelPt, weight: style.labels.weight, perLine: style.labels.perLine, domeGap: strokes.dome.width / 2 + sizes.mm(0.3) }, plan.plot, labelPreference(drawn, plan.plot));
  const placed = placeLabels({ requests, region: plan.plot, inset: sizes.mm(0.8), clearance: sizes.mm(style.labels.clearance), lines, obstacles, hardOwners, halo: haloMm });
  const unlabelled = new Set(placed.report.unlabelled.map((u) => u.owner));
  const labelMarks: Mark[] = placed.labels.map((l) =>
    text(l.x, l.y, l.request.text, l.request.sizePt, style.labelInk[l.request.family as Family], {
      anchor: "middle",
      baseline: "middle",
      rotate: Math.round(l.rotate * 100) / 100,
      weight: l.request.weight,
      halo: { colour: style.page.background, width: haloMm },
      data: { family: l.request.family, ...l.request.data },
    }),
  );

  const frameStroke = sizes.stroke(style.frame);
  const axisInk = { ink: style.page.ink, stroke: frameStroke };
  const layers: Layer[] = [
    { id: "grid", label: "Reading grid", marks: gridMarks(ticks, scales, sizes.stroke(style.grid.major), sizes.stroke(style.grid.minor)) },
    // A line whose label found no room is left out: every isoline drawn carries its value.
    ...lineLayers(drawn.filter((d) => !unlabelled.has(d.owner)), strokes),
    { id: "critical-point", label: "Critical point", marks: criticalMarks },
    { id: "cycles", label: "Cycles and readings", marks: overlay.marks },
    { id: "labels", label: "Line labels", marks: labelMarks },
    { id: "frame", label: "Plot frame", marks: [rect(frame.x, frame.y, frame.width, frame.height, undefined, frameStroke)] },
    { id: "axes", label: "Axes and scales", marks: axesMarks(ticks, scales, units, plan, axisInk, { glide: fluid.glide, ...(content.gauge ? { altitude: content.gauge.altitude } : {}) }) },
    { id: "panels", label: "Panels", marks: [
      ...arrangement.placed.flatMap((p) => drawPanel(p.panel, arrangement.style, p.rect.x, p.rect.y, p.rect.width, p.rect.height)),
      ...overlayTables.flatMap((p) => drawPanel(p.panel, arrangement.style, p.rect.x, p.rect.y, p.rect.width, p.rect.height, p.cellLines)),
    ] },
  ];
  const scene: Scene = {
    width: plan.width,
    height: plan.height,
    bleed: 0,
    cropMarks: false,
    background: style.page.background,
    fontFamily: FONT_FAMILY,
    clips: [],
    layers: layers.filter((l) => l.marks.length > 0),
    meta: sceneMeta(content, scales, units, style, ticks),
  };
  return {
    scene,
    report: { labels: placed.report, pointLabels: { placed: overlay.placed, dropped: overlay.dropped }, omitted: arrangement.omitted, panelPt: arrangement.style.pt },
  };
}

interface OverlayRow {
  panels: Panel[];
  widths: number[];
  height: number;
}

/** Overlay table cells wrap onto up to this many lines, fewer where the band would crowd the chart. */
const CELL_LINES = [3, 2, 1] as const;

/** No overlay table claims more than half the band, so a table with one long note shares its row. */
const MAX_TABLE_SHARE = 0.5;
/** Tables in one row may be squeezed to this share of their natural widths before a new row starts. */
const SQUEEZE = 0.8;

/**
 * Overlay tables in rows across the band: as many side by side as fit (squeezed a little if need be),
 * the rest on further rows; within a row the widest give way first, their long cells wrapping onto up to
 * `cellLines` lines, the last ending in an ellipsis if need be.
 */
function overlayRows(panels: Panel[], style: PanelStyle, width: number, gap: number, cellLines: number): OverlayRow[] {
  const natural = panels.map((p) => {
    const item = p.items.find((i) => i.kind === "table");
    return Math.min(item && item.kind === "table" ? tableWidth(item, style) : width, width * MAX_TABLE_SHARE);
  });
  const rows: { panels: Panel[]; natural: number[] }[] = [];
  panels.forEach((panel, i) => {
    const row = rows[rows.length - 1];
    const used = row ? row.natural.reduce((a, b) => a + b + gap, 0) : Infinity;
    if (row && SQUEEZE * (used + natural[i]!) <= width) {
      row.panels.push(panel);
      row.natural.push(natural[i]!);
    } else rows.push({ panels: [panel], natural: [natural[i]!] });
  });
  return rows.map((row) => {
    const widths = fitColumns(row.natural, width - gap * (row.panels.length - 1));
    return { panels: row.panels, widths, height: Math.max(...row.panels.map((p, i) => panelHeight(p, style, widths[i]!, cellLines))) };
  });
}

function bandHeight(rows: OverlayRow[], gap: number): number {
  return rows.reduce((sum, row, i) => sum + row.height + (i > 0 ? gap : 0), 0);
}

/** The rows with the most lines per cell whose band fits `maxHeight` (one line per cell if none does). */
function overlayRowsWithin(panels: Panel[], style: PanelStyle, width: number, gap: number, maxHeight: number): { rows: OverlayRow[]; cellLines: number } {
  for (const cellLines of CELL_LINES) {
    const rows = overlayRows(panels, style, width, gap, cellLines);
    if (bandHeight(rows, gap) <= maxHeight * (1 + 1e-9) || cellLines === 1) return { rows, cellLines };
  }
  throw new Error("unreachable: CELL_LINES ends with 1");
}

function placeOverlayPanels(panels: Panel[], plan: PagePlan, style: PanelStyle): (PlacedPanel & { cellLines: number })[] {
  const band = plan.overlayBand;
  const placed: (PlacedPanel & { cellLines: number })[] = [];
  let y = band.y;
  const { rows, cellLines } = overlayRowsWithin(panels, style, band.width, plan.gap, band.height);
  for (const row of rows) {
    let x = band.x;
    row.panels.forEach((panel, i) => {
      placed.push({ panel, rect: { x, y, width: row.widths[i]!, height: row.height }, cellLines });
      x += row.widths[i]! + plan.gap;
    });
    y += row.height + plan.gap;
  }
  return placed;
}

/**
 * The height overlay tables need in a band of the given width, at the style's panel type on this paper:
 * with cells wrapped onto as many lines as keep the band within maxHeight.
 */
export function overlayBandHeight(style: Style, page: { width: number; height: number }, overlays: Overlay[]): (width: number, maxHeight: number) => number {
  const panels = overlayPanels(overlays);
  const sizes = sizesFor(style, page);
  const pStyle = panelStyle(style, sizes);
  const gap = sizes.mm(style.page.gap);
  return (width, maxHeight) => (panels.length === 0 ? 0 : bandHeight(overlayRowsWithin(panels, pStyle, width, gap, maxHeight).rows, gap));
}

/** Width the panels need for a saturation table at the smallest type the arrangement may use. */
export function panelMinWidth(style: Style, page: { width: number; height: number }, glide: boolean): number {
  const sizes = sizesFor(style, page);
  const columns = glide ? 11 : 9;
  // The widest cells are five-figure numbers with a sign ("−1234.5", "1.2345"), plus a two-digit gap.
  const cell = textWidth("\u22121234.500", MIN_TYPE_PT);
  return columns * cell + 2 * sizes.mm(style.panels.padding);
}
