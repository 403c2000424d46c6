// The readings file: domeprint's own small CSV dialect for measured pressures and temperatures, with
// units in the header and the site altitude for gauge pressures. Described in readings-format.md.
import { DomeprintError } from "../errors.js";
import { atmosphereAt, parseQuantity, spellings, toSI, unitOf, type Unit } from "../units/index.js";
import { splitCsvLine } from "./csv.js";

export type Expectation = "vapour" | "liquid" | "supercritical";
const EXPECTATIONS: Record<string, Expectation> = { vapour: "vapour", vapor: "vapour", liquid: "liquid", supercritical: "supercritical" };

export interface Reading {
  /** Line number in the file (1-based). */
  line: number;
  name: string;
  /** Absolute pressure [Pa] and temperature [K]. */
  p: number;
  T: number;
  /** The values as written, with their column's unit (e.g. "2.4 bar(g)"). */
  pText: string;
  TText: string;
  /** What the reading's line should carry; absent when not stated. */
  expect?: Expectation;
  note?: string;
}

export interface ReadingsFile {
  source: string;
  title?: string;
  /** The fluid named in the file, if any. */
  fluid?: string;
  /** True when pressures are gauge readings. */
  gauge: boolean;
  /** Site altitude [m] and the standard atmosphere there [Pa], when gauge pressures needed them. */
  altitude?: number;
  atmosphere?: number;
  readings: Reading[];
}

const SETTINGS = ["altitude", "fluid", "title"] as const;
type Setting = (typeof SETTINGS)[number];
const COLUMNS = ["name", "p", "T", "expect", "note"] as const;
type Column = (typeof COLUMNS)[number];
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;

function fileError(where: string, problem: string, allowed: string, value?: string, code: "E_INPUT" | "E_UNIT" = "E_INPUT"): DomeprintError {
  return new DomeprintError(code, `${where}: ${problem}; allowed: ${allowed}`, { input: where, value, allowed });
}

interface Line { no: number; text: string }

function meaningfulLines(text: string): Line[] {
  return text.replace(/^\uFEFF/, "").split(/\r?\n/).map((t, i) => ({ no: i + 1, text: t.trim() })).filter((l) => l.text !== "" && !l.text.startsWith("#"));
}

function readSettings(lines: Line[], source: string): Partial<Record<Setting, { value: string; where: string }>> {
  const out: Partial<Record<Setting, { value: string; where: string }>> = {};
  for (const l of lines.filter((x) => x.text.startsWith("@"))) {
    const where = `${source} line ${l.no}`;
    const m = /^@([A-Za-z-]+)\s*:\s*(.*)$/.exec(l.text);
    if (!m) throw fileError(where, `${JSON.stringify(l.text)} is not a setting`, `@NAME: VALUE with NAME one of ${SETTINGS.join(", ")}`, l.text);
    const key = m[1]!.toLowerCase() as Setting;
    if (!SETTINGS.includes(key)) throw fileError(where, `unknown setting @${m[1]}`, SETTINGS.map((s) => `@${s}`).join(", "), m[1]);
    if (out[key]) throw fileError(where, `@${key} given twice (first on ${out[key]!.where})`, "each setting once", key);
    out[key] = { value: m[2]!.trim(), where };
  }
  return out;
}

interface HeaderColumn { column: Column; unit?: Unit; unitText?: string }

function readHeader(fields: string[], where: string): HeaderColumn[] {
  const seen = new Set<Column>();
  const cols = fields.map((f) => {
    const m = /^([A-Za-z]+)\s*(?:\[(.*)\])?$/.exec(f);
    const column = m ? COLUMNS.find((c) => c.toLowerCase() === m[1]!.toLowerCase()) : undefined;
    if (!m || !column) throw fileError(where, `unknown column ${JSON.stringify(f)}`, "name, p [unit], T [unit], expect, note", f);
    if (seen.has(column)) throw fileError(where, `column ${column} twice`, "each column once", f);
    seen.add(column);
    const unitText = m[2]?.trim();
    if (column !== "p" && column !== "T") {
      if (unitText) throw fileError(where, `column ${column} takes no unit`, `${column} without brackets`, f);
      return { column };
    }
    const quantity = column === "p" ? "pressure" : "temperature";
    if (!unitText) throw fileError(where, `column ${JSON.stringify(f)} has no unit`, `${column} [unit] with unit one of ${spellings(quantity).join(", ")}`, f, "E_UNIT");
    const unit = unitOf(quantity, unitText);
    if (!unit) throw fileError(where, `unknown ${quantity} unit ${JSON.stringify(unitText)} in column ${JSON.stringify(f)}`, spellings(quantity).join(", "), unitText, "E_UNIT");
    return { column, unit, unitText };
  });
  for (const need of ["p", "T"] as const) if (!seen.has(need)) throw fileError(where, `no ${need} column`, `a header with p [unit] and T [unit] (and optionally name, expect, note)`, fields.join(","));
  return cols;
}

/** The site altitude [m]: from the file's @altitude or the caller's option; both given must agree. */
function siteAltitude(setting: { value: string; where: string } | undefined, option: number | undefined): number | undefined {
  const fromFile = setting ? parseQuantity(`${setting.where}: @altitude`, "length", setting.value) : undefined;
  if (fromFile !== undefined && option !== undefined && Math.abs(fromFile - option) > 1e-6) {
    throw fileError(setting!.where, `@altitude ${setting!.value} differs from the altitude option ${option} m`, "the same altitude in both places, or only one of them", setting!.value);
  }
  return fromFile ?? option;
}

function readNumber(text: string, where: string, column: string): number {
  if (text === "") throw fileError(where, `${column} is empty`, "a number (decimal point, no thousands separator)", text);
  if (!NUMBER.test(text)) throw fileError(where, `${column} = ${JSON.stringify(text)} is not a number`, "a number with a decimal point, e.g. 2.4 or -12.5 (the unit belongs in the header)", text);
  return Number(text);
}

/** Parses a readings file; `altitude` [m] is the command line's site altitude, used when the file names none. */
export function parseReadings(text: string, opts: { source?: string; altitude?: number } = {}): ReadingsFile {
  const source = opts.source ?? "readings";
  const lines = meaningfulLines(text);
  const settings = readSettings(lines, source);
  const table = lines.filter((l) => !l.text.startsWith("@"));
  if (table.length === 0) throw fileError(source, "no header line", "a header such as: name,p [bar(g)],T [C],expect", "");
  const headerWhere = `${source} line ${table[0]!.no}`;
  const header = readHeader(splitCsvLine(table[0]!.text, headerWhere), headerWhere);
  const pCol = header.find((c) => c.column === "p")!, TCol = header.find((c) => c.column === "T")!;
  const gauge = Boolean(pCol.unit!.gauge);
  const altitude = siteAltitude(settings.altitude, opts.altitude);
  if (gauge && altitude === undefined) {
    throw fileError(headerWhere, `gauge pressures (${pCol.unitText}) need the site altitude`, "an @altitude: line in the file (e.g. @altitude: 450 m) or the --altitude option", pCol.unitText);
  }
  const atmosphere = altitude === undefined ? undefined : atmosphereAt(altitude);
  const readings = table.slice(1).map((l, i) => readRow(l, `${source} line ${l.no}`, header, pCol, TCol, atmosphere, i + 1));
  if (readings.length === 0) throw fileError(source, "no readings below the header", "one reading per line after the header", "");
  const out: ReadingsFile = { source, gauge, readings };
  if (settings.title) out.title = settings.title.value;
  if (settings.fluid) out.fluid = settings.fluid.value;
  if (altitude !== undefined) out.altitude = altitude;
  if (atmosphere !== undefined) out.atmosphere = atmosphere;
  return out;
}

function readRow(l: Line, where: string, header: HeaderColumn[], pCol: HeaderColumn, TCol: HeaderColumn, atmosphere: number | undefined, index: number): Reading {
  const fields = splitCsvLine(l.text, where);
  if (fields.length !== header.length) {
    throw fileError(where, `${fields.length} fields for ${header.length} columns`, `${header.length} comma-separated fields (numbers take a decimal point, never a decimal comma)`, l.text);
  }
  const cell = (c: Column) => fields[header.findIndex((h) => h.column === c)];
  const pValue = readNumber(cell("p")!, where, "p");
  const TValue = readNumber(cell("T")!, where, "T");
  const reading: Reading = {
    line: l.no, name: cell("name") || `M${index}`,
    p: toSI(pValue, pCol.unit!, atmosphere), T: toSI(TValue, TCol.unit!),
    pText: `${cell("p")} ${pCol.unit!.symbol}`, TText: `${cell("T")} ${TCol.unit!.symbol}`,
  };
  const expect = cell("expect");
  if (expect) {
    const e = EXPECTATIONS[expect.toLowerCase()];
    if (!e) throw fileError(where, `expect = ${JSON.stringify(expect)} is not known`, "vapour (or vapor), liquid, supercritical, or empty", expect);
    reading.expect = e;
  }
  const note = cell("note");
  if (note) reading.note = note;
  return reading;
}
