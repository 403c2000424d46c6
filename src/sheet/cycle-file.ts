// Reads a cycle file for `--cycle FILE`: one design cycle in YAML or JSON with the keys of a sheet spec's
// cycles entry (the inputs of `domeprint cycle`), evaluated in the sheet's reference state as an Overlay.

import { readFileSync } from "node:fs";
import { parse as parseYaml } from "yaml";
import { runCycle } from "../cli/cycle.js";
import { cycleOverlay } from "../cycle/index.js";
import type { Overlay } from "../cycle/overlay.js";
import type { ReferenceName } from "../eos/index.js";
import { DomeprintError } from "../errors.js";
import type { UnitSystem } from "../layout/display-units.js";
import { cycleEntrySchema } from "../spec/schema.js";

function fileError(path: string, problem: string, allowed: string): DomeprintError {
  return new DomeprintError("E_INPUT", `--cycle = ${JSON.stringify(path)}: ${problem}; allowed: ${allowed}`, { input: "--cycle", value: path, allowed });
}

export function cycleFileOverlay(path: string, fluid: string, reference: ReferenceName, units: UnitSystem, atmosphere: number): Overlay {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch {
    throw fileError(path, "cannot read the file", "a readable YAML or JSON file");
  }
  let data: unknown;
  try {
    data = parseYaml(text);
  } catch (e) {
    throw fileError(path, `not valid YAML or JSON (${e instanceof Error ? e.message : String(e)})`, "one cycle as key: value");
  }
  const checked = cycleEntrySchema.safeParse(data);
  if (!checked.success) {
    const issue = checked.error.issues[0]!;
    throw fileError(path, `${issue.path.join(".") || "(top level)"}: ${issue.message}`, `keys ${Object.keys(cycleEntrySchema.shape).join(", ")}`);
  }
  const { name, ...inputs } = checked.data;
  // runCycle takes the command line's spellings: every value as the text a person would type.
  const options = Object.fromEntries(Object.entries(inputs).map(([k, v]) => [k, typeof v === "boolean" ? v : String(v)]));
  const result = runCycle(fluid, { glidePoint: "dew", ...options, reference, units } as Parameters<typeof runCycle>[1], atmosphere);
  const overlay = cycleOverlay(result, units);
  return name ? { ...overlay, name } : overlay;
}
