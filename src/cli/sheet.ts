// `domeprint sheet`: typesets one fluid's pressure–enthalpy chart on paper and writes PDF, SVG, PNG or
// JSON into a folder, atomically (temporary files renamed into place once all are written).

import type { Command } from "commander";
import { DomeprintError } from "../errors.js";
import { checkReferenceName } from "../eos/index.js";
import { USER_FIELDS } from "../layout/content.js";
import { checkPressureUnit, checkUnitSystem } from "../layout/display-units.js";
import { paperNames, type Orientation } from "../layout/paper.js";
import { styleNames } from "../layout/style-file.js";
import { checkDate, checkFormats, FORMATS, renderSheet, writeAtomically, type SheetOptions } from "../sheet/index.js";
import { parseQuantity } from "../units/index.js";
import { EXIT_OK, reportError, type Io } from "./io.js";

interface Flags {
  paper?: string;
  orientation?: string;
  units: string;
  pressure?: string;
  gauge?: boolean;
  altitude?: string;
  reference?: string;
  style?: string;
  format: string;
  dpi: string;
  title?: string;
  site?: string;
  client?: string;
  author?: string;
  revision?: string;
  notes?: string;
  saturationTable?: boolean;
  date?: string;
  output: string;
  cmyk?: boolean;
  bleed?: string;
  cropMarks?: boolean;
  margin?: string;
  points?: string[];
  cycle?: string[];
}

function orientationOf(text: string | undefined): Orientation | undefined {
  if (text === undefined) return undefined;
  const v = text.toLowerCase();
  if (v !== "portrait" && v !== "landscape") throw new DomeprintError("E_INPUT", `--orientation = ${JSON.stringify(text)}: unknown orientation; allowed: portrait, landscape`, { input: "--orientation", value: text, allowed: "portrait, landscape" });
  return v;
}

function numberOf(option: string, text: string | undefined, unit: string): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text.replace(new RegExp(`\\s*${unit}$`), ""));
  if (!Number.isFinite(v)) throw new DomeprintError("E_INPUT", `${option} = ${JSON.stringify(text)}: not a number; allowed: a number (in ${unit})`, { input: option, value: text, allowed: `a number in ${unit}` });
  return v;
}

/** Command-line flags → library options; unit-bearing values are parsed here, at the edge. */
export function sheetOptions(fluid: string, f: Flags): SheetOptions {
  const orientation = orientationOf(f.orientation);
  const altitude = f.altitude === undefined ? undefined : parseQuantity("--altitude", "length", f.altitude);
  const dpi = numberOf("--dpi", f.dpi, "dpi");
  const bleed = numberOf("--bleed", f.bleed, "mm");
  const margin = numberOf("--margin", f.margin, "mm");
  const fields = Object.fromEntries(USER_FIELDS.map((k) => [k, f[k]]));
  return {
    fluid,
    ...(f.paper !== undefined ? { paper: f.paper } : {}),
    ...(orientation ? { orientation } : {}),
    units: checkUnitSystem(f.units.toLowerCase()),
    ...(f.pressure !== undefined ? { pressure: checkPressureUnit(f.pressure) } : {}),
    gauge: Boolean(f.gauge) || altitude !== undefined,
    ...(altitude !== undefined ? { altitude } : {}),
    ...(f.reference !== undefined ? { reference: checkReferenceName(f.reference) } : {}),
    ...(f.style !== undefined ? { style: f.style } : {}),
    formats: checkFormats(f.format),
    ...(dpi !== undefined ? { dpi } : {}),
    cmyk: Boolean(f.cmyk),
    ...(bleed !== undefined ? { bleed } : {}),
    cropMarks: Boolean(f.cropMarks),
    ...(margin !== undefined ? { margin } : {}),
    fields: Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined)),
    ...(f.saturationTable !== undefined ? { saturationTable: f.saturationTable } : {}),
    ...(f.date !== undefined ? { date: checkDate(f.date) } : {}),
    pointsFiles: f.points ?? [],
    cycleFiles: f.cycle ?? [],
  };
}

const collect = (value: string, previous: string[] = []) => [...previous, value];

export function registerSheet(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("sheet")
    .description("typeset a fluid's pressure–enthalpy chart for print: PDF, SVG, PNG or JSON, written atomically")
    .argument("<fluid>", "fluid id, R-number (R744, R-744), chemical name, blend id (R454B) or composition (\"R32:0.5+R125:0.5\")")
    .option("--paper <name>", `paper: ${paperNames().join(", ")} or WxH in mm (default: the style's)`)
    .option("--orientation <o>", "portrait or landscape (default: the style's)")
    .option("--units <system>", "si (bar, kJ/kg, °C) or ip (psi, Btu/lb, °F)", "si")
    .option("--pressure <unit>", "pressure unit of the axis: bar, kPa, MPa, psi")
    .option("--gauge", "add a gauge-pressure scale (standard atmosphere at --altitude)")
    .option("--altitude <height>", "site altitude for the gauge scale, e.g. 300m or 1000ft (implies --gauge)")
    .option("--reference <name>", "reference state for h and s: iir, ashrae, nbp, native (default: iir where defined)")
    .option("--style <name|file>", `style: ${styleNames().join(", ")}, or a style file (.json, .yaml)`)
    .option("--format <list>", `comma-separated: ${FORMATS.join(", ")}`, "pdf,svg")
    .option("--dpi <n>", "PNG resolution in dots per inch", "200")
    .option("--title <text>", "sheet title")
    .option("--site <text>", "site or project")
    .option("--client <text>", "client")
    .option("--author <text>", "author")
    .option("--revision <text>", "revision")
    .option("--notes <text>", "notes")
    .option("--saturation-table", "add the saturation table (default: the style's)")
    .option("--no-saturation-table", "leave the saturation table out")
    .option("--date <YYYY-MM-DD>", "date printed on the sheet and in its metadata (default: today)")
    .option("--cmyk", "PDF colours in DeviceCMYK for a print shop")
    .option("--bleed <mm>", "bleed around the trimmed page in mm")
    .option("--crop-marks", "draw crop marks outside the trimmed page")
    .option("--margin <mm>", "sheet margin in mm (default: the style's, scaled to the paper)")
    .option("--cycle <file>", "design cycle to draw: YAML or JSON with the keys of a spec's cycles entry (repeatable)", collect)
    .option("--points <file>", "readings file to plot as points (repeatable)", collect)
    .option("-o, --output <dir>", "output folder", "out")
    .addHelpText(
      "after",
      `
Files are named DESIGNATION_PAPER_ORIENTATION.EXT (e.g. R-717_A1_landscape.pdf); each is written to a
temporary file in the output folder and renamed into place when every file is ready.

Examples:
  domeprint sheet R717 --paper A1 --saturation-table --site "Cold store 2" -o charts
  domeprint sheet R744 --paper A3 --orientation landscape --gauge --altitude 300m --format pdf,png --dpi 150
  domeprint sheet R290 --style training-handout --units ip --pressure psi --date 2025-03-14
  domeprint sheet R290 --cycle design.yaml --points readings.csv --style client-report

A cycle file holds one cycle, e.g.
  name: design
  evaporating: -10C
  condensing: 40C
  superheat: 5K
  subcooling: 3K
  efficiency: 0.7`,
    )
    .action(async (fluid: string, flags: Flags) => {
      try {
        const sheet = await renderSheet(sheetOptions(fluid, flags));
        const files = (["pdf", "svg", "png", "json"] as const).flatMap((ext) => (sheet[ext] ? [{ name: `${sheet.name}.${ext}`, data: sheet[ext]! }] : []));
        const written = writeAtomically(flags.output, files);
        const { labels } = sheet.report;
        if (!io.quiet) {
          io.err(`labels: ${labels.placed} placed, ${labels.dropped} dropped\n`);
          if (labels.unlabelled.length) io.err(`note: lines left out for want of room for their labels: ${labels.unlabelled.map((u) => u.text).join(", ")}\n`);
          for (const note of sheet.report.omitted) io.err(`note: ${note}\n`);
        }
        io.out(written.map((w) => `${w}\n`).join(""));
        setCode(EXIT_OK);
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
