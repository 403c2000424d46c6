// renderSheet: options in, the finished sheet out as SVG, PDF, PNG and JSON buffers, with the layout's
// report (labels placed and dropped). Plans the page, asks the engine for data, lays out, renders.

import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { lineSetToJson } from "../isolines/index.js";
import type { SheetContent } from "../layout/content.js";
import { displayUnits } from "../layout/display-units.js";
import { resolvePaper } from "../layout/paper.js";
import { defaultPanelShare, planPage } from "../layout/plan.js";
import type { Scene } from "../layout/scene.js";
import { layoutSheet, overlayBandHeight, panelMinWidth, type SheetReport } from "../layout/sheet-layout.js";
import type { Style } from "../layout/style.js";
import { loadStyle } from "../layout/style-file.js";
import { renderPdf } from "../render/pdf.js";
import { renderSvg } from "../render/svg.js";
import { atmosphereAt } from "../units/index.js";
import { defaultReference, engineData, fluidIdentity, hasGlide, saturationRows, saturationTicks } from "./content.js";
import { resolveSubstance } from "../eos/index.js";
import { mixtureDefaultReference, mixtureHashData, mixtureIdentity, mixtureLines, mixtureSaturationRows, mixtureSaturationTicks } from "./mixture-content.js";
import { DomeprintError } from "../errors.js";
import { readingsFileOverlay } from "./overlays.js";
import { cycleFileOverlay } from "./cycle-file.js";
import { checkSheetOptions, type CheckedSheetOptions, type Format, type SheetOptions } from "./options.js";

export const VERSION: string = (JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version: string }).version;

export interface RenderedSheet {
  svg?: Buffer;
  pdf?: Buffer;
  png?: Buffer;
  json?: Buffer;
  scene: Scene;
  report: SheetReport;
  /** The sheet's file name stem, e.g. "R-717_A3_landscape". */
  name: string;
}

/** Canonical JSON: keys sorted, so the same inputs always hash alike. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  if (value && typeof value === "object")
    return `{${Object.keys(value as object)
      .sort()
      .filter((k) => (value as Record<string, unknown>)[k] !== undefined)
      .map((k) => `${JSON.stringify(k)}:${canonical((value as Record<string, unknown>)[k])}`)
      .join(",")}}`;
  return JSON.stringify(value);
}

/** The first 12 hex digits of SHA-256 over everything that decides what the sheet shows. */
export function inputsHash(parts: Record<string, unknown>): string {
  return createHash("sha256").update(canonical(parts)).digest("hex").slice(0, 12);
}

/** Table rows every 5 °C (10 °F); the panel keeps every n-th of them as room allows. */
const TABLE_STEP = { si: 5, ip: 10 } as const;

function fileStem(designation: string, paper: string, orientation: string): string {
  return `${designation}_${paper}_${orientation}`.replace(/[^A-Za-z0-9._-]+/g, "-");
}

export interface ComposedSheet {
  scene: Scene;
  report: SheetReport;
  content: SheetContent;
  options: CheckedSheetOptions;
  name: string;
}

/** Everything up to the Scene: page plan, engine data, layout. No rendering, so tests can check layouts fast. */
export function composeSheet(options: SheetOptions): ComposedSheet {
  const o: CheckedSheetOptions = checkSheetOptions(options);
  const style: Style = typeof options.style === "object" ? options.style : loadStyle(options.style);
  const units = displayUnits(o.units, o.pressure);
  const orientation = o.orientation ?? style.defaults.orientation;
  const paper = resolvePaper(o.paper ?? style.defaults.paper, orientation);
  const wantsTable = o.saturationTable ?? style.defaults.saturationTable;
  // A real mixture gathers its data through mixture-content.ts; a pure fluid through content.ts.
  const sub = resolveSubstance(o.fluid);
  const mix = sub.kind === "mixture" ? sub.mixture : null;
  const fluid = sub.kind === "pure" ? sub.fluid : null;
  const fluidId = mix ? mix.id : fluid!.id;
  const glide = mix ? true : hasGlide(fluid!);
  // Beside a landscape plot the table may take at most two fifths of the sheet; on smaller paper it is left out.
  const tableWidth = wantsTable ? panelMinWidth(style, paper, glide) : 0;
  const table = wantsTable && (paper.width < paper.height || tableWidth <= 0.4 * paper.width);
  const reference = o.reference ?? (mix ? mixtureDefaultReference(mix) : defaultReference(fluid!));
  const atmosphere = atmosphereAt(o.altitude);
  const overlays = [
    ...o.overlays,
    ...o.cycleFiles.map((file) => cycleFileOverlay(file, fluidId, reference, o.units, atmosphere)),
    ...o.pointsFiles.map((file) => readingsFileOverlay(file, fluidId, reference, o.units, o.altitudeGiven ? o.altitude : undefined)),
  ];
  const landscape = paper.width >= paper.height;
  // The panels' usual share first; small paper gets a wider column (or taller band) and is traced again.
  const shares = [defaultPanelShare(landscape, table), ...(landscape ? [0.34, 0.42] : [0.45, 0.55])];
  const attempt = (panelShare: number) => {
    const plan = planPage({
      page: paper,
      style,
      gauge: o.gauge,
      glide,
      panelShare,
      ...(table ? { panelMinWidth: tableWidth, table } : {}),
      ...(o.margin !== undefined ? { margin: o.margin } : {}),
      overlayBand: overlayBandHeight(style, paper, overlays),
    });
    const data = mix
      ? { reference, lines: mixtureLines(mix, reference, units, plan.plot, o.lineOptions), hashData: mixtureHashData(mix) as unknown }
      : { ...engineData(fluid!, reference, units, plan.plot, o.lineOptions), hashData: fluid!.data as unknown };
    const identity = mix ? mixtureIdentity(mix, data.reference) : fluidIdentity(fluid!, data.reference);
    // Overlays enter the hash as drawn (not as file names), so an edited readings file gives a new hash.
    const hash = inputsHash({ version: VERSION, fluid: data.hashData, style, options: { ...o, formats: undefined, dpi: undefined, pointsFiles: undefined, cycleFiles: undefined, overlays }, paper, reference: data.reference });
    const content: SheetContent = {
      fluid: identity,
      lines: data.lines,
      saturationScale: mix ? mixtureSaturationTicks(mix, data.lines, units) : saturationTicks(fluid!, data.lines, units),
      ...(table ? { saturationTable: mix ? mixtureSaturationRows(mix, data.lines, units, data.reference, TABLE_STEP[o.units]) : saturationRows(fluid!, data.lines, units, data.reference, TABLE_STEP[o.units]) } : {}),
      overlays,
      ...(o.gauge ? { gauge: { altitude: o.altitude, atmosphere } } : {}),
      units,
      fields: o.fields,
      stamp: { date: o.date, version: VERSION, hash },
      ...(o.lineOptions.densities && Object.keys(o.lineOptions.densities).length > 0 ? { spacingGiven: true } : {}),
    };
    return { content, laid: layoutSheet(plan, content, style) };
  };
  let result: ReturnType<typeof attempt> | undefined;
  for (const [i, share] of shares.entries()) {
    try {
      result = attempt(share);
      break;
    } catch (e) {
      const noRoom = e instanceof DomeprintError && e.code === "E_UNSUPPORTED" && e.details.input === "paper";
      if (!noRoom || i === shares.length - 1) throw e;
    }
  }
  const { content, laid } = result!;
  const identity = content.fluid;
  const scene: Scene = { ...laid.scene, bleed: o.bleed, cropMarks: o.cropMarks };
  const omitted = wantsTable && !table ? ["saturation table (too wide for this paper)"] : [];
  const report = { ...laid.report, omitted: [...omitted, ...laid.report.omitted] };
  return { scene, report, content, options: o, name: fileStem(identity.designation, paper.name, orientation) };
}

export async function renderSheet(options: SheetOptions): Promise<RenderedSheet> {
  return renderComposed(composeSheet(options));
}

/** Renders a composed sheet to the formats its options ask for (the second half of renderSheet). */
export async function renderComposed(sheet: ComposedSheet): Promise<RenderedSheet> {
  const { scene, content, options: o } = sheet;
  const out: RenderedSheet = { scene, report: sheet.report, name: sheet.name };
  const wants = (f: Format) => o.formats.includes(f);
  if (wants("svg")) out.svg = Buffer.from(renderSvg(scene), "utf8");
  if (wants("pdf")) out.pdf = await renderPdf(scene, { cmyk: o.cmyk });
  // resvg is a native module; it is loaded only when a PNG is asked for, to keep the command quick to start.
  if (wants("png")) out.png = (await import("../render/png.js")).renderPng(scene, { dpi: o.dpi });
  if (wants("json")) {
    const json = { format: "domeprint-sheet-data/1", sheet: scene.meta.attributes, fluid: content.fluid, report: sheet.report, saturationTable: content.saturationTable ?? null, lines: lineSetToJson(content.lines) };
    out.json = Buffer.from(`${JSON.stringify(json)}\n`, "utf8");
  }
  return out;
}
