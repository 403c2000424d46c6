// One sheet of a build in two steps: compose (trace and lay out; input faults surface here) and render
// (draw and write atomically). Used in-process and by the worker threads alike, so both give the same bytes.
import { basename, dirname, join } from "node:path";
import { DomeprintError } from "../errors.js";
import { composeSheet, renderComposed, writeAtomically, type ComposedSheet, type SheetOptions } from "../sheet/index.js";

export interface SheetTask {
  index: number;
  path: string;
  name: string | undefined;
  options: SheetOptions;
  outDir: string;
}

export interface SheetOutcome {
  index: number;
  path: string;
  ok: boolean;
  files: string[];
  labels?: { placed: number; dropped: number };
  error?: string;
  code?: string;
  /** True when the fault lies in the spec (bad input), not in the work: the whole build then writes nothing. */
  inputFault?: boolean;
  ms: number;
}

/** Codes that mean the spec asked for something that cannot be (as opposed to work that failed). */
const INPUT_CODES = new Set(["E_INPUT", "E_RANGE", "E_BELOW_TRIPLE", "E_UNKNOWN_FLUID", "E_UNKNOWN_QUANTITY", "E_UNIT", "E_UNSUPPORTED", "E_REFERENCE"]);

function failure(task: SheetTask, e: unknown, t0: number): SheetOutcome {
  const err = e as { message?: string; code?: string };
  const input = e instanceof DomeprintError && INPUT_CODES.has(e.code);
  const message = input && task.path ? `${task.path}: ${err.message}` : err.message ?? String(e);
  return { index: task.index, path: task.path, ok: false, files: [], error: message, ...(err.code ? { code: err.code } : {}), ...(input ? { inputFault: true } : {}), ms: performance.now() - t0 };
}

export function composeOne(task: SheetTask): { sheet?: ComposedSheet; outcome: SheetOutcome } {
  const t0 = performance.now();
  try {
    const sheet = composeSheet(task.options);
    return { sheet, outcome: { index: task.index, path: task.path, ok: true, files: [], ms: performance.now() - t0 } };
  } catch (e) {
    return { outcome: failure(task, e, t0) };
  }
}

export async function renderOne(task: SheetTask, sheet: ComposedSheet, composeMs = 0): Promise<SheetOutcome> {
  const t0 = performance.now() - composeMs;
  try {
    const out = await renderComposed(sheet);
    const stem = task.name ?? out.name;
    const dir = join(task.outDir, dirname(stem));
    const files = (["pdf", "svg", "png", "json"] as const).flatMap((ext) => (out[ext] ? [{ name: `${basename(stem)}.${ext}`, data: out[ext]! }] : []));
    const written = writeAtomically(dir, files);
    return { index: task.index, path: task.path, ok: true, files: written, labels: { placed: out.report.labels.placed, dropped: out.report.labels.dropped }, ms: performance.now() - t0 };
  } catch (e) {
    const o = failure(task, e, t0);
    delete o.inputFault; // past composition, a failure is work that failed: the other sheets go on
    return o;
  }
}
