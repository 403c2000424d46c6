// The sheet's panels as content: the title block (fluid, class, user fields), handling cautions, the
// equation's source and range, the line key, the saturation table and any overlay tables.

import type { Overlay } from "../cycle/overlay.js";
import { cautionsFor } from "./cautions.js";
import type { FluidIdentity, SaturationRow, SheetContent } from "./content.js";
import { toDisplay, type DisplayUnits } from "./display-units.js";
import type { Panel, PanelItem } from "./panel.js";
import type { Stroke } from "./scene.js";
import type { Family } from "./style.js";
import { formatFixed, formatNumber } from "./text.js";

/** Sizes of the title block's heading, subheading and small print relative to the panels' body type. */
export interface TypeScale {
  heading: number;
  subheading: number;
  small: number;
}

export function titlePanel(content: SheetContent, type: TypeScale): Panel {
  const { fluid, fields, stamp } = content;
  const items: PanelItem[] = [];
  if (fields.title) items.push({ kind: "heading", text: fields.title, scale: type.subheading * 1.15 });
  items.push({ kind: "heading", text: fluid.designation, scale: type.heading });
  items.push({ kind: "paragraph", text: `${fluid.chemicalName}, ${fluid.formula}`, scale: type.subheading });
  if (fluid.composition) items.push({ kind: "paragraph", text: fluid.composition, scale: type.subheading });
  if (fluid.estimatedPairs) items.push({ kind: "bullet", text: `binary parameters estimated for ${fluid.estimatedPairs}`, strong: true });
  items.push({ kind: "paragraph", text: fluid.safetyClass ? `ISO 817 safety class ${fluid.safetyClass}` : "no ISO 817 safety class recorded", scale: type.subheading });
  items.push({ kind: "space" });
  const field = (label: string, value: string | undefined) => {
    if (value !== undefined && value.trim() !== "") items.push({ kind: "field", label, value });
  };
  field("Site / project", fields.site);
  field("Client", fields.client);
  field("Author", fields.author);
  field("Revision", fields.revision);
  field("Date", stamp.date);
  field("Notes", fields.notes);
  return { id: "title-block", title: "Pressure–enthalpy chart", items };
}

export function cautionPanel(fluid: FluidIdentity): Panel {
  return { id: "cautions", title: "Handle with care", items: cautionsFor(fluid).map((c) => ({ kind: "bullet", text: c.text, ...(c.strong ? { strong: true } : {}) })) };
}

function kelvinRange(fluid: FluidIdentity, units: DisplayUnits): string {
  const t = (T: number) => `${formatNumber(toDisplay(T, units.temperature), 4)} ${units.temperature.symbol}`;
  const p = `${formatNumber(toDisplay(fluid.validity.pmax, units.pressure), 4)} ${units.pressure.symbol}`;
  return `Valid from ${t(fluid.validity.Tmin)} to ${t(fluid.validity.Tmax)}, up to ${p}. Critical point ${t(fluid.critical.T)}, ${formatNumber(toDisplay(fluid.critical.p, units.pressure), 5)} ${units.pressure.symbol}.`;
}

export function sourcePanel(content: SheetContent, type: TypeScale): Panel {
  const { fluid, units, stamp } = content;
  const items: PanelItem[] = [
    { kind: "paragraph", text: `Equation of state: ${fluid.citation}.` },
    { kind: "paragraph", text: fluid.equationTitle, muted: true },
    { kind: "paragraph", text: kelvinRange(fluid, units) },
    { kind: "paragraph", text: `Reference state: ${fluid.reference}.` },
    {
      kind: "paragraph",
      text: `Units: p absolute in ${units.pressure.symbol}, h in ${units.enthalpy.symbol}, t in ${units.temperature.symbol}, s in ${units.entropy.symbol}, v in ${units.volume.symbol}, ρ in ${units.density.symbol}.`,
    },
    { kind: "space" },
    { kind: "paragraph", text: `Set by domeprint ${stamp.version} on ${stamp.date}; inputs ${stamp.hash}.`, muted: true, scale: type.small },
  ];
  return { id: "source", title: "Source and validity", items };
}

export interface KeyEntry {
  family: Family | "cycle" | "points";
  stroke: Stroke;
  text: string;
}

export function keyEntries(families: Set<Family>, units: DisplayUnits, strokes: Record<Family, Stroke>, glide: boolean): KeyEntry[] {
  const all: KeyEntry[] = [
    { family: "dome", stroke: strokes.dome, text: glide ? "bubble and dew lines" : "saturated liquid and vapour" },
    { family: "isotherm", stroke: strokes.isotherm, text: `isotherms, t in ${units.temperature.symbol}` },
    { family: "quality", stroke: strokes.quality, text: "vapour quality x (mass fraction)" },
    { family: "isentrope", stroke: strokes.isentrope, text: `isentropes, s in ${units.entropy.symbol}` },
    { family: "isochore", stroke: strokes.isochore, text: `isochores, v in ${units.volume.symbol}` },
  ];
  return all.filter((e) => e.family === "cycle" || e.family === "points" || families.has(e.family));
}

export function keyPanel(entries: KeyEntry[]): Panel {
  return { id: "key", title: "Line key", items: entries.map((e) => ({ kind: "key", stroke: e.stroke, text: e.text })) };
}

/** The saturation table's rows, formatted; `atmosphere` turns absolute into gauge pressure. */
export function saturationTablePanel(rows: SaturationRow[], units: DisplayUnits, atmosphere: number, glide: boolean): Panel {
  const t = (r: SaturationRow) => formatNumber(toDisplay(r.T, units.temperature), 5);
  const p = (v: number) => formatNumber(toDisplay(v, units.pressure), 4);
  const pg = (v: number) => formatNumber(toDisplay(v - atmosphere, units.pressure), 4);
  const d = (v: number) => formatNumber(toDisplay(v, units.density), 4);
  const h = (v: number) => formatFixed(toDisplay(v, units.enthalpy), 1);
  const s = (v: number) => formatFixed(toDisplay(v, units.entropy), 4);
  const pu = units.pressure.symbol;
  const gu = pu === "psi" ? "psig" : `${pu}(g)`;
  const pressures = glide
    ? { columns: ["p′", "p″", "p′ g", "p″ g"], units: [pu, pu, gu, gu], cells: (r: SaturationRow) => [p(r.pBubble), p(r.pDew), pg(r.pBubble), pg(r.pDew)] }
    : { columns: ["p", "p g"], units: [pu, gu], cells: (r: SaturationRow) => [p(r.pBubble), pg(r.pBubble)] };
  const columns = ["t", ...pressures.columns, "ρ′", "ρ″", "h′", "h″", "s′", "s″"];
  const unitRow = [units.temperature.symbol, ...pressures.units, units.density.symbol, units.density.symbol, units.enthalpy.symbol, units.enthalpy.symbol, units.entropy.symbol, units.entropy.symbol];
  const body = rows.map((r) => [t(r), ...pressures.cells(r), d(r.rhoLiquid), d(r.rhoVapour), h(r.hLiquid), h(r.hVapour), s(r.sLiquid), s(r.sVapour)]);
  return {
    id: "saturation-table",
    title: "Saturated states",
    items: [
      { kind: "table", columns, units: unitRow, rows: body, align: columns.map(() => "end") },
      { kind: "paragraph", text: `′ liquid (bubble), ″ vapour (dew); gauge pressure g against ${formatNumber(toDisplay(atmosphere, units.pressure), 5)} ${pu}.`, muted: true },
    ],
  };
}

/** A cell that reads as a number (with a unit after it, or empty): such columns are set flush right. */
const NUMERIC = /^$|^[\u2212+-]?\d[\d.,]*(\s*\S+)?$/;

/** A list of figures (at most two columns, the last numeric) longer than this many rows is set in two halves. */
const FOLD_ROWS = 8;

/**
 * A long list of figures (label and value, such as a cycle's performance) folded into two halves side by
 * side: half as tall, so the chart keeps its height. Lists of text (conditions, notes) are left whole,
 * since halving their width would only cut their cells shorter.
 */
function folded(columns: string[], rows: string[][]): { columns: string[]; rows: string[][] } {
  const last = columns.length - 1;
  if (columns.length > 2 || rows.length <= FOLD_ROWS || !rows.every((r) => NUMERIC.test(r[last] ?? ""))) return { columns, rows };
  const half = Math.ceil(rows.length / 2);
  const blank = columns.map(() => "");
  return { columns: [...columns, ...columns], rows: rows.slice(0, half).map((r, i) => [...r, ...(rows[half + i] ?? blank)]) };
}

export function overlayPanels(overlays: Overlay[]): Panel[] {
  return overlays.flatMap((o, i) =>
    o.tables.map((t, j) => {
      const { columns, rows } = folded(t.columns, t.rows);
      return {
        id: `overlay-${i}-${j}`,
        title: t.title === o.name ? t.title : `${o.name}: ${t.title}`,
        items: [{ kind: "table" as const, columns, units: columns.map(() => ""), rows, align: columns.map((_, k) => (rows.every((r) => NUMERIC.test(r[k] ?? "")) ? "end" : "start") as "start" | "end") }],
      };
    }),
  );
}
