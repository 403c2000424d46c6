// Reads a sheet spec from YAML or JSON and checks its shape; every error names the file, the key path
// (e.g. sheets[2].paper), the value and what is allowed, with "did you mean" for unknown keys.
import { readFileSync } from "node:fs";
import { parseDocument } from "yaml";
import type { z } from "zod";
import { DomeprintError, show } from "../errors.js";
import { editDistance } from "../edit-distance.js";
import { KNOWN_KEYS, sheetEntrySchema, type SheetEntry } from "./schema.js";

export interface LoadedSpec {
  file: string;
  /** True for a one-sheet spec written without "sheets:"; its key paths have no sheets[i] prefix. */
  single: boolean;
  defaults: SheetEntry;
  sheets: SheetEntry[];
}

export function specError(file: string, path: string, message: string, value?: unknown, allowed?: string, suggestions?: string[]): DomeprintError {
  return new DomeprintError("E_INPUT", `${file}: ${path || "(top level)"}: ${message}`, {
    input: path, value, ...(allowed ? { allowed } : {}), ...(suggestions?.length ? { suggestions } : {}),
  });
}


export function didYouMean(key: string, known: readonly string[]): string | undefined {
  let best: string | undefined, bestD = Infinity;
  for (const k of known) {
    const d = editDistance(key.toLowerCase(), k.toLowerCase());
    if (d < bestD) { bestD = d; best = k; }
  }
  return best !== undefined && bestD <= Math.max(2, Math.floor(key.length / 3)) ? best : undefined;
}

/** Joins a zod issue path to the spec's notation: sheets[2].window.pMin. */
export function joinPath(prefix: string, path: readonly PropertyKey[]): string {
  let out = prefix;
  for (const p of path) out += typeof p === "number" ? `[${p}]` : out === "" ? String(p) : `.${String(p)}`;
  return out;
}

function known(path: readonly PropertyKey[]): readonly string[] {
  const last = [...path].reverse().find((p) => typeof p === "string");
  if (last === "window") return KNOWN_KEYS.window;
  if (last === "lines") return KNOWN_KEYS.lines;
  if (last === "cycles") return KNOWN_KEYS.cycle;
  return KNOWN_KEYS.sheet;
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const p of path) v = v && typeof v === "object" ? (v as Record<PropertyKey, unknown>)[p] : undefined;
  return v;
}

function checkEntry(file: string, prefix: string, raw: unknown): SheetEntry {
  if (typeof raw === "string") raw = { fluid: raw }; // a list item may be just a fluid name
  const r = sheetEntrySchema.safeParse(raw);
  if (r.success) return r.data;
  const issue = r.error.issues[0]! as z.core.$ZodIssue;
  if (issue.code === "unrecognized_keys") {
    const key = issue.keys[0]!;
    const list = known(issue.path);
    const hint = didYouMean(key, list);
    return (() => {
      throw specError(file, joinPath(prefix, [...issue.path, key]), `unknown key${hint ? `; did you mean "${hint}"?` : ""}; allowed keys here: ${list.join(", ")}`, key, list.join(", "), hint ? [hint] : []);
    })();
  }
  const value = valueAt(raw, issue.path);
  const allowed = issue.code === "invalid_value" ? (issue.values as unknown[]).map(String).join(", ") : issue.code === "invalid_type" ? `a value of type ${issue.expected}` : undefined;
  throw specError(file, joinPath(prefix, issue.path), `${show(value)}: ${issue.message}${allowed ? `; allowed: ${allowed}` : ""}`, value, allowed);
}

/** Parses spec text (YAML is a superset of JSON, so one parser reads both). */
export function parseSpec(file: string, source: string): LoadedSpec {
  const doc = parseDocument(source, { prettyErrors: true, uniqueKeys: true });
  if (doc.errors.length) {
    const e = doc.errors[0]!;
    const where = e.linePos?.[0] ? `line ${e.linePos[0].line}, column ${e.linePos[0].col}` : "";
    throw specError(file, where, `not valid YAML or JSON: ${e.message.split("\n")[0]}`, undefined, "YAML or JSON text");
  }
  const data: unknown = doc.toJS();
  if (typeof data === "string") return { file, single: true, defaults: {}, sheets: [checkEntry(file, "", { fluid: data })] };
  if (!data || typeof data !== "object" || Array.isArray(data))
    throw specError(file, "", `${show(Array.isArray(data) ? "a list" : data)}: a spec is a mapping: a fluid ("fluid: R134a") or "sheets:" with a list`, data, "a mapping with fluid: or sheets:");
  const top = data as Record<string, unknown>;
  if ("sheets" in top || "defaults" in top) {
    for (const k of Object.keys(top)) {
      if (k !== "sheets" && k !== "defaults") {
        const hint = didYouMean(k, ["sheets", "defaults"]);
        throw specError(file, k, `unknown key next to "sheets"${hint ? `; did you mean "${hint}"?` : ""}; allowed keys here: sheets, defaults (sheet keys go inside each sheet or defaults)`, k, "sheets, defaults", hint ? [hint] : []);
      }
    }
    if (!Array.isArray(top.sheets) || top.sheets.length === 0) throw specError(file, "sheets", `${show(top.sheets)}: not a list of sheets`, top.sheets, "a list with at least one sheet");
    const defaults = top.defaults === undefined ? {} : checkEntry(file, "defaults", top.defaults);
    return { file, single: false, defaults, sheets: top.sheets.map((s, i) => checkEntry(file, `sheets[${i}]`, s)) };
  }
  return { file, single: true, defaults: {}, sheets: [checkEntry(file, "", top)] };
}

export function loadSpec(file: string): LoadedSpec {
  let source: string;
  try {
    source = readFileSync(file, "utf8");
  } catch (e) {
    throw new DomeprintError("E_INPUT", `${file}: cannot read the spec (${(e as NodeJS.ErrnoException).code ?? String(e)}); allowed: a readable YAML or JSON file`, { input: "spec", value: file });
  }
  return parseSpec(file, source);
}
