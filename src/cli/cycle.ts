// `domeprint cycle`: a refrigeration cycle's states and performance from design conditions, or the
// states of measured readings from a readings file; a readable table, or JSON in SI base units.
import { readFileSync } from "node:fs";
import type { Command } from "commander";
import { DomeprintError } from "../errors.js";
import { atmosphereAt, foldUnit, parseQuantity, spellings, unitOf } from "../units/index.js";
import {
  cycleTables, DISPLAY_UNITS, evaluateReadings, formatter, GLIDE_POINTS, optimiseHighPressure, parseReadings, readingsTable,
  singleStageCycle, transcriticalCycle, twoStageCycle, flagText,
  type Compressor, type CycleResult, type CyclePoint, type DisplayUnits, type GlidePoint, type Level, type OverlayTable, type ReadingsResult,
} from "../cycle/index.js";
import { stateJson } from "./props.js";
import { EXIT_OK, reportError, type Io } from "./io.js";

/** Printed with every result, table or JSON. */
export const CAUTION = "Caution: computed from the stated assumptions; check every value against the equipment's documentation. Local codes and licensed practice prevail.";

interface Options {
  evaporating?: string; condensing?: string; glidePoint: string; superheat?: string; subcooling?: string;
  efficiency?: string; dischargeTemperature?: string; suctionDrop?: string; dischargeDrop?: string;
  ihx?: string; flashTank?: boolean; openIntercooler?: boolean; economiser?: boolean; intermediate?: string; economiserApproach?: string;
  gasCoolerOutlet?: string; highPressure?: string; optimiseHighPressure?: boolean; highPressureBounds?: string;
  capacity?: string; reference: string; units: string; altitude?: string; readings?: string; json?: boolean;
}

function usage(option: string, value: unknown, problem: string, allowed: string): DomeprintError {
  return new DomeprintError("E_INPUT", `${option}${value === undefined ? "" : ` = ${JSON.stringify(value)}`}: ${problem}; allowed: ${allowed}`, { input: option, value, allowed });
}

/** A saturation level: a temperature (K, C, F, R) or a pressure (absolute or gauge), told apart by the unit. */
export function parseLevel(option: string, text: string, atmosphere: number): Level {
  const unit = foldUnit(text.replace(/^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?/i, ""));
  if (unitOf("temperature", unit)) return { T: parseQuantity(option, "temperature", text) };
  if (unitOf("pressure", unit)) return { p: parseQuantity(option, "pressure", text, { atmosphere }) };
  throw new DomeprintError("E_UNIT", `${option} = ${JSON.stringify(text)}: not a temperature or pressure with a unit; allowed: a number with one of ${[...spellings("temperature"), ...spellings("pressure")].join(", ")}`,
    { input: option, value: text, allowed: "a temperature or a pressure with its unit" });
}

function parseEfficiency(option: string, text: string): number {
  const m = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*(%?)\s*$/i.exec(text);
  if (!m) throw usage(option, text, "not a number", "a number above 0 and at most 1, or a percentage (0.7 or 70%)");
  return Number(m[1]) / (m[2] ? 100 : 1);
}

function parseDifference(option: string, text: string | undefined): number | undefined {
  return text === undefined ? undefined : parseQuantity(option, "temperature-difference", text);
}

/** A pressure drop is a difference, so a gauge unit reads the same as its absolute one. */
function parseDrop(option: string, text: string | undefined): number | undefined {
  return text === undefined ? undefined : parseQuantity(option, "pressure", text, { atmosphere: 0 });
}

function choice<T extends string>(option: string, text: string, allowed: readonly T[]): T {
  const v = text.toLowerCase();
  if (!(allowed as readonly string[]).includes(v)) throw usage(option, text, "not one of the choices", allowed.join(", "));
  return v as T;
}

function forbid(o: Options, keys: (keyof Options)[], why: string): void {
  for (const k of keys) {
    if (o[k] !== undefined && o[k] !== false) throw usage(`--${k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`, o[k], `not used ${why}`, "leave it out");
  }
}

function required<T>(option: string, value: T | undefined, what: string): T {
  if (value === undefined) throw usage(option, undefined, "missing", what);
  return value;
}

function compressorOf(o: Options): Compressor {
  if (o.efficiency !== undefined && o.dischargeTemperature !== undefined) throw usage("--discharge-temperature", o.dischargeTemperature, "given together with --efficiency", "one of --efficiency or --discharge-temperature");
  if (o.dischargeTemperature !== undefined) return { dischargeTemperature: parseQuantity("--discharge-temperature", "temperature", o.dischargeTemperature) };
  if (o.efficiency === undefined) throw usage("--efficiency", undefined, "missing", "--efficiency ETA (0 < ETA ≤ 1) or --discharge-temperature T");
  if (o.efficiency.includes(",")) throw usage("--efficiency", o.efficiency, "two values are for a two-stage cycle", "one isentropic efficiency");
  return { efficiency: parseEfficiency("--efficiency", o.efficiency) };
}

/** Two-stage compressors: one efficiency for both, LOW,HIGH, or an efficiency for the low stage with a discharge temperature for the high. */
function stageCompressors(o: Options): [Compressor, Compressor] {
  const e = required("--efficiency", o.efficiency, "an isentropic efficiency for both stages, or LOW,HIGH (e.g. 0.7 or 0.68,0.72)").split(",");
  if (e.length > 2) throw usage("--efficiency", o.efficiency, "more than two values", "one value, or LOW,HIGH");
  const low: Compressor = { efficiency: parseEfficiency("--efficiency", e[0]!) };
  if (o.dischargeTemperature !== undefined) {
    if (e.length === 2) throw usage("--discharge-temperature", o.dischargeTemperature, "given with a high-stage efficiency", "--efficiency LOW with --discharge-temperature, or --efficiency LOW,HIGH");
    return [low, { dischargeTemperature: parseQuantity("--discharge-temperature", "temperature", o.dischargeTemperature) }];
  }
  return [low, { efficiency: parseEfficiency("--efficiency", e[1] ?? e[0]!) }];
}

function common(o: Options, atmosphere: number) {
  const spec: { evaporating: Level; glidePoint: GlidePoint; reference: string; superheat?: number; suctionDrop?: number; dischargeDrop?: number; capacity?: number } = {
    evaporating: parseLevel("--evaporating", required("--evaporating", o.evaporating, "an evaporating temperature or pressure (e.g. -10C or 2bar)"), atmosphere),
    glidePoint: choice("--glide-point", o.glidePoint, GLIDE_POINTS),
    reference: o.reference,
  };
  const sh = parseDifference("--superheat", o.superheat), sd = parseDrop("--suction-drop", o.suctionDrop), dd = parseDrop("--discharge-drop", o.dischargeDrop);
  if (sh !== undefined) spec.superheat = sh;
  if (sd !== undefined) spec.suctionDrop = sd;
  if (dd !== undefined) spec.dischargeDrop = dd;
  if (o.capacity !== undefined) spec.capacity = parseQuantity("--capacity", "power", o.capacity);
  return spec;
}

function bounds(text: string, atmosphere: number): [number, number] {
  const parts = text.split(",");
  if (parts.length !== 2) throw usage("--high-pressure-bounds", text, "not two pressures", "LOW,HIGH with units, e.g. 80bar,130bar");
  return [parseQuantity("--high-pressure-bounds", "pressure", parts[0]!, { atmosphere }), parseQuantity("--high-pressure-bounds", "pressure", parts[1]!, { atmosphere })];
}

/** Picks the model from the options given and computes it. */
export function runCycle(fluid: string, o: Options, atmosphere: number): CycleResult {
  const transcritical = o.gasCoolerOutlet !== undefined || o.highPressure !== undefined || o.optimiseHighPressure;
  const arrangements = ([["flashTank", "flash-tank"], ["openIntercooler", "open-intercooler"], ["economiser", "economiser"]] as const).filter(([k]) => o[k]);
  if (transcritical) {
    forbid(o, ["condensing", "subcooling", "flashTank", "openIntercooler", "economiser", "intermediate", "economiserApproach"], "in a transcritical cycle (no condenser; single stage)");
    const spec = {
      ...common(o, atmosphere), fluid, compressor: compressorOf(o),
      gasCoolerOutlet: parseQuantity("--gas-cooler-outlet", "temperature", required("--gas-cooler-outlet", o.gasCoolerOutlet, "the gas-cooler outlet temperature (e.g. 35C)")),
      ...(o.ihx !== undefined ? { ihx: parseEfficiency("--ihx", o.ihx) } : {}),
    };
    if (o.optimiseHighPressure) {
      forbid(o, ["highPressure"], "with --optimise-high-pressure (the search sets it)");
      return optimiseHighPressure(spec, o.highPressureBounds ? { bounds: bounds(o.highPressureBounds, atmosphere) } : {});
    }
    forbid(o, ["highPressureBounds"], "without --optimise-high-pressure");
    const pHigh = parseQuantity("--high-pressure", "pressure", required("--high-pressure", o.highPressure, "the high-side pressure (e.g. 90bar), or --optimise-high-pressure"), { atmosphere });
    return transcriticalCycle({ ...spec, highPressure: pHigh });
  }
  forbid(o, ["optimiseHighPressure", "highPressureBounds"], "without a gas cooler (--gas-cooler-outlet)");
  const condensing = parseLevel("--condensing", required("--condensing", o.condensing, "a condensing temperature or pressure (e.g. 40C), or --gas-cooler-outlet with --high-pressure for a transcritical cycle"), atmosphere);
  const subcooling = parseDifference("--subcooling", o.subcooling);
  const sc = subcooling === undefined ? {} : { subcooling };
  if (arrangements.length) {
    if (arrangements.length > 1) throw usage(`--${arrangements[1]![1]}`, true, `given with --${arrangements[0]![1]}`, "one of --flash-tank, --open-intercooler or --economiser");
    const arrangement = arrangements[0]![1];
    forbid(o, ["ihx"], "in a two-stage cycle");
    if (arrangement !== "economiser") forbid(o, ["economiserApproach"], "without an economiser");
    const [lowStage, highStage] = stageCompressors(o);
    const approach = parseDifference("--economiser-approach", o.economiserApproach);
    return twoStageCycle({
      ...common(o, atmosphere), fluid, condensing, ...sc, lowStage, highStage, arrangement,
      ...(o.intermediate !== undefined ? { intermediate: parseLevel("--intermediate", o.intermediate, atmosphere) } : {}),
      ...(approach !== undefined ? { economiserApproach: approach } : {}),
    });
  }
  forbid(o, ["intermediate", "economiserApproach"], "in a single-stage cycle (two stages: --flash-tank, --open-intercooler or --economiser)");
  return singleStageCycle({
    ...common(o, atmosphere), fluid, condensing, ...sc, compressor: compressorOf(o),
    ...(o.ihx !== undefined ? { ihx: parseEfficiency("--ihx", o.ihx) } : {}),
  });
}

// ---------------------------------------------------------------- output

/** An overlay table as aligned text columns. */
export function textTable(t: OverlayTable, withHeader = true): string {
  const rows = withHeader ? [t.columns, ...t.rows] : t.rows;
  const widths = t.columns.map((_, i) => Math.max(...rows.map((r) => (r[i] ?? "").length)));
  const line = (r: string[]) => "  " + r.map((c, i) => (i === r.length - 1 ? c : c.padEnd(widths[i]!))).join("  ").trimEnd();
  return [t.title, ...rows.map(line)].join("\n") + "\n";
}

function pointJson(pt: CyclePoint): Record<string, unknown> {
  const out: Record<string, unknown> = { point: pt.label, roles: pt.roles, flow: pt.flow };
  if (pt.superheat !== undefined) out.superheat = pt.superheat;
  if (pt.subcooling !== undefined) out.subcooling = pt.subcooling;
  out.state = stateJson(pt.state);
  return out;
}

/** The JSON form of a cycle: states and figures in SI base units (K, Pa, J/kg, J/(kg K), J/m³, W, kg/s, m³/s). */
export function cycleJson(r: CycleResult): Record<string, unknown> {
  const { points, auxiliary, stages, path, branches, ...rest } = r;
  return {
    ...rest,
    points: points.map(pointJson),
    auxiliary: auxiliary.map(pointJson),
    stages: stages.map((s) => ({ name: s.name, suction: s.suction.label, discharge: s.discharge.label, isentropic: s.isentropic.label, efficiency: s.efficiency, flow: s.flow })),
    caution: CAUTION,
  };
}

export function readingsJson(r: ReadingsResult): Record<string, unknown> {
  return { ...r, readings: r.readings.map(({ state, ...rest }) => ({ ...rest, state: state ? stateJson(state) : null })), caution: CAUTION };
}

function cycleText(r: CycleResult, units: DisplayUnits): string {
  const [conditions, states, performance] = cycleTables(r, units);
  return [textTable(conditions!, false), textTable(states!), textTable(performance!, false), CAUTION + "\n"].join("\n");
}

function readingsText(r: ReadingsResult, units: DisplayUnits): string {
  const fmt = formatter(units);
  const head = [`${r.fluid}, reference state ${r.reference}`];
  if (r.gauge) head.push(`gauge pressures read against the standard atmosphere at ${+r.altitude!.toFixed(1)} m: ${fmt.withUnit("pressure", r.atmosphere!)}`);
  const flagged = r.readings.filter((x) => x.flags.length).length;
  head.push(flagged ? `${flagged} of ${r.readings.length} readings flagged` : `${r.readings.length} readings, none flagged`);
  const table = readingsTable(r, units);
  const flags = r.readings.flatMap((x) => x.flags.map((f) => `  ${x.name}: ${flagText(fmt, f)}`));
  const body = { ...table, columns: table.columns.slice(0, -1), rows: table.rows.map((row) => row.slice(0, -1)) };
  return [head.join("\n") + "\n", textTable(body), ...(flags.length ? ["flags\n" + flags.join("\n") + "\n"] : []), CAUTION + "\n"].join("\n");
}

const CYCLE_OPTIONS: (keyof Options)[] = ["evaporating", "condensing", "superheat", "subcooling", "efficiency", "dischargeTemperature", "suctionDrop", "dischargeDrop", "ihx",
  "flashTank", "openIntercooler", "economiser", "intermediate", "economiserApproach", "gasCoolerOutlet", "highPressure", "optimiseHighPressure", "highPressureBounds", "capacity"];

function runReadings(io: Io, fluid: string, o: Options, units: DisplayUnits): void {
  forbid(o, CYCLE_OPTIONS, "with --readings (a readings file is evaluated on its own)");
  let text: string;
  try {
    text = readFileSync(o.readings!, "utf8");
  } catch (e) {
    throw usage("--readings", o.readings, `cannot be read (${(e as NodeJS.ErrnoException).code ?? "error"})`, "a readable readings file");
  }
  const altitude = o.altitude === undefined ? undefined : parseQuantity("--altitude", "length", o.altitude);
  const res = evaluateReadings(fluid, parseReadings(text, { source: o.readings!, ...(altitude !== undefined ? { altitude } : {}) }), o.reference);
  io.out(o.json ? JSON.stringify(readingsJson(res)) + "\n" : readingsText(res, units));
}

export function registerCycle(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("cycle")
    .description("a refrigeration cycle's states and performance, or the states of measured readings")
    .argument("<fluid>", "fluid id, R-number, chemical name; single-stage and --economiser also a blend id (R454B) or composition")
    .option("--evaporating <level>", "evaporating temperature or pressure (e.g. -10C, 2.1bar, 20psig)")
    .option("--condensing <level>", "condensing temperature or pressure (subcritical cycles)")
    .option("--glide-point <point>", "for blends, where a temperature level sits in the glide: dew, bubble, mid", "dew")
    .option("--superheat <dT>", "superheat at the evaporator outlet (default 0K)")
    .option("--subcooling <dT>", "subcooling at the condenser outlet (default 0K)")
    .option("--efficiency <eta>", "compressor isentropic efficiency, 0 < eta ≤ 1 (two-stage: one value or LOW,HIGH)")
    .option("--discharge-temperature <T>", "measured discharge temperature instead of an efficiency (two-stage: the high stage)")
    .option("--suction-drop <dp>", "suction line pressure drop (e.g. 0.2bar)")
    .option("--discharge-drop <dp>", "discharge line pressure drop (e.g. 0.3bar)")
    .option("--ihx <effectiveness>", "internal (suction–liquid) heat exchanger of this effectiveness, 0 to 1")
    .option("--flash-tank", "two-stage with a flash tank at the intermediate pressure")
    .option("--open-intercooler", "two-stage with an open flash intercooler: the flash tank also desuperheats the low-stage discharge")
    .option("--economiser", "two-stage with an economiser (subcooler) at the intermediate pressure")
    .option("--intermediate <level>", "intermediate temperature or pressure (default: geometric mean of the pressures)")
    .option("--economiser-approach <dT>", "economiser liquid outlet above its injection inlet temperature (default 5K)")
    .option("--gas-cooler-outlet <T>", "transcritical: gas-cooler outlet temperature")
    .option("--high-pressure <p>", "transcritical: high-side pressure")
    .option("--optimise-high-pressure", "transcritical: search the high-side pressure of greatest COP")
    .option("--high-pressure-bounds <lo,hi>", "search bounds (default 1.01 to 2 times the critical pressure)")
    .option("--capacity <power>", "cooling capacity for mass and volume flows (e.g. 10kW, 3TR)")
    .option("--reference <name>", "reference state for h and s: native, iir, ashrae, nbp", "native")
    .option("--units <system>", "display units of the table: si (°C, bar, kJ/kg) or ip (°F, psia, Btu/lb)", "si")
    .option("--altitude <height>", "site altitude for gauge pressures (standard atmosphere); options default to 0m")
    .option("--readings <file>", "evaluate a readings file (see below) instead of a design cycle")
    .option("--json", "print JSON in SI base units instead of a table")
    .addHelpText("after", `
Models: single-stage (--condensing), with an internal heat exchanger (--ihx), two-stage
(--flash-tank, --open-intercooler or --economiser), transcritical (--gas-cooler-outlet with --high-pressure or
--optimise-high-pressure). Real mixtures run single-stage or two-stage with --economiser (a flash tank or
open intercooler would separate phases of different composition). For blends a temperature level is read at the dew point unless
--glide-point says otherwise; superheat counts from the dew point, subcooling from the bubble point.
JSON (SI): T K, p Pa, h J/kg, s J/(kg K), volumetric capacity J/m³, power W, mass flow kg/s, volume flow m³/s.

Readings files (UTF-8, comma-separated):
  # a comment line
  @altitude: 450 m          site altitude for gauge pressures (or --altitude)
  @fluid: R404A             optional; must match FLUID
  @title: plant room 2      optional; legend of the readings
  name,p [bar(g)],T [C],expect,note
  suction,2.1,-4.5,vapour,after the filter
The header names the columns: p [unit] and T [unit] are required, with their units in square
brackets (gauge units barg, bar(g), kPa(g), psig need the altitude); name, expect (vapour,
liquid, supercritical) and note are optional. Readings colder than the dew point where vapour is
expected, warmer than the bubble point where liquid is expected, or at a pressure on the wrong
side of the critical point are flagged.

Examples:
  domeprint cycle R134a --evaporating -10C --condensing 40C --superheat 5K --subcooling 3K --efficiency 0.7
  domeprint cycle R407C --evaporating 0C --condensing 45C --glide-point mid --efficiency 0.65 --capacity 10kW
  domeprint cycle R290 --evaporating -5C --condensing 45C --ihx 0.6 --efficiency 0.7 --units ip
  domeprint cycle ammonia --evaporating -35C --condensing 35C --flash-tank --efficiency 0.72 --json
  domeprint cycle R744 --evaporating -5C --gas-cooler-outlet 35C --optimise-high-pressure --efficiency 0.7
  domeprint cycle R404A --readings plant.csv --altitude 300m`)
    .action((fluid: string, opts: Options) => {
      try {
        const units = choice("--units", opts.units, DISPLAY_UNITS);
        if (opts.readings !== undefined) {
          runReadings(io, fluid, opts, units);
        } else {
          const atmosphere = atmosphereAt(parseQuantity("--altitude", "length", opts.altitude ?? "0m"));
          const r = runCycle(fluid, opts, atmosphere);
          io.out(opts.json ? JSON.stringify(cycleJson(r)) + "\n" : cycleText(r, units));
        }
        setCode(EXIT_OK);
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
