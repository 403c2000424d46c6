// Finds and loads fluid files by id, R-number (with or without the dash) or chemical name, any case.
// Files are checked against the schema when loaded; unknown names get near-match suggestions.
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { join } from "node:path";
import { DomeprintError } from "../errors.js";
import { editDistance } from "../edit-distance.js";
import { fluidFileSchema, type FluidFile } from "./fluid-file.js";
import { Fluid } from "./fluid.js";

/** The folder of the fluid files shipped with the package. */
export const FLUID_DIR = fileURLToPath(new URL("../../fluids/", import.meta.url));

/** Folds a name for matching: lower case, no dashes, spaces, brackets, commas or underscores. */
export function foldName(name: string): string {
  return name.toLowerCase().replace(/[-\s()_,.'’]/g, "");
}

interface IndexEntry { id: string; file: string; names: string[] }
let index: Map<string, IndexEntry> | undefined;
let entries: IndexEntry[] | undefined;
const cache = new Map<string, Fluid>();

function buildIndex(): Map<string, IndexEntry> {
  if (index) return index;
  index = new Map();
  entries = [];
  for (const file of readdirSync(FLUID_DIR).filter((f) => f.endsWith(".json")).sort()) {
    const raw = JSON.parse(readFileSync(join(FLUID_DIR, file), "utf8")) as Partial<FluidFile>;
    if (typeof raw.id !== "string") continue;
    const names = [raw.id, raw.designation ?? "", raw.chemicalName ?? "", raw.formula ?? "", ...(raw.aliases ?? [])].filter(Boolean);
    const entry = { id: raw.id, file, names };
    entries.push(entry);
    for (const n of names) {
      const k = foldName(n);
      if (!index.has(k)) index.set(k, entry);
    }
  }
  return index;
}

/** Ids of every fluid shipped, in file order. */
export function fluidIds(): string[] {
  buildIndex();
  return entries!.map((e) => e.id);
}


/** Up to three known names closest to an unknown one. */
export function suggestFluids(name: string): string[] {
  const idx = buildIndex();
  const q = foldName(name);
  const scored = [...idx.entries()].map(([k, e]) => ({ id: e.id, d: k.startsWith(q) || q.startsWith(k) ? Math.min(1, editDistance(q, k)) : editDistance(q, k) }));
  scored.sort((a, b) => a.d - b.d);
  const out: string[] = [];
  for (const s of scored) {
    if (s.d > Math.max(2, q.length / 3)) break;
    if (!out.includes(s.id)) out.push(s.id);
    if (out.length === 3) break;
  }
  return out;
}

/** Resolves any accepted name of a fluid to its id, or throws E_UNKNOWN_FLUID with suggestions. */
export function resolveFluidId(name: string): string {
  if (typeof name !== "string" || name.trim() === "")
    throw new DomeprintError("E_UNKNOWN_FLUID", `fluid = ${JSON.stringify(name)}: missing; allowed: a fluid id, R-number or chemical name (see 'domeprint fluids')`, { input: "fluid", value: name });
  const e = buildIndex().get(foldName(name));
  if (e) return e.id;
  const suggestions = suggestFluids(name);
  const hint = suggestions.length ? `; did you mean ${suggestions.join(", ")}?` : "";
  throw new DomeprintError(
    "E_UNKNOWN_FLUID",
    `fluid = ${JSON.stringify(name)}: unknown fluid${hint}; allowed: a fluid id, R-number or chemical name (list them with 'domeprint fluids')`,
    { input: "fluid", value: name, allowed: fluidIds().join(", "), suggestions },
  );
}

/** Checks a parsed fluid file against the schema and builds its Fluid. */
export function fluidFromData(raw: unknown, source: string): Fluid {
  const parsed = fluidFileSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const path = issue.path.join(".");
    throw new DomeprintError("E_FLUID_FILE", `${source}: ${path || "(root)"}: ${issue.message}`, { input: path, value: source, allowed: "a file matching the domeprint-fluid/1 schema" });
  }
  return new Fluid(parsed.data);
}

/** Loads (once) and returns the fluid known under any of its names. */
export function getFluid(name: string): Fluid {
  const id = resolveFluidId(name);
  let f = cache.get(id);
  if (!f) {
    const entry = entries!.find((e) => e.id === id)!;
    const file = join(FLUID_DIR, entry.file);
    f = fluidFromData(JSON.parse(readFileSync(file, "utf8")), file);
    cache.set(id, f);
  }
  return f;
}
