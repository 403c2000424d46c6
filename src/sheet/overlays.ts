// Loads what a sheet overlays from files: measured readings (the cycle helper's readings format),
// evaluated against the fluid and turned into an Overlay for the layout to draw.

import { readFileSync } from "node:fs";
import { evaluateReadings, parseReadings, readingsOverlay } from "../cycle/index.js";
import type { Overlay } from "../cycle/overlay.js";
import type { ReferenceName } from "../eos/index.js";
import { DomeprintError } from "../errors.js";
import type { UnitSystem } from "../layout/display-units.js";

function readText(path: string, option: string): string {
  try {
    return readFileSync(path, "utf8");
  } catch {
    throw new DomeprintError("E_INPUT", `${option} = ${JSON.stringify(path)}: cannot read the file; allowed: a readable file path`, { input: option, value: path, allowed: "a readable file path" });
  }
}

/**
 * Readings from a readings file as a points overlay. The site altitude, when given, sets the atmosphere
 * of gauge readings (the file may state its own, and the parser refuses a contradiction).
 */
export function readingsFileOverlay(path: string, fluid: string, reference: ReferenceName, units: UnitSystem, altitude: number | undefined): Overlay {
  const file = parseReadings(readText(path, "--points"), { source: path, ...(altitude !== undefined ? { altitude } : {}) });
  return readingsOverlay(evaluateReadings(fluid, file, reference), units);
}
