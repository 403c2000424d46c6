// Renders one planned sheet and writes its files atomically under the output folder; used in-process
// and by the build's worker threads alike, so both paths produce the same bytes.
import { basename, dirname, join } from "node:path";
import { renderSheet, writeAtomically, type SheetOptions } from "../sheet/index.js";

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
  ms: number;
}

export async function renderOne(task: SheetTask): Promise<SheetOutcome> {
  const t0 = performance.now();
  try {
    const sheet = await renderSheet(task.options);
    const stem = task.name ?? sheet.name;
    const dir = join(task.outDir, dirname(stem));
    const files = (["pdf", "svg", "png", "json"] as const).flatMap((ext) => (sheet[ext] ? [{ name: `${basename(stem)}.${ext}`, data: sheet[ext]! }] : []));
    const written = writeAtomically(dir, files);
    return { index: task.index, path: task.path, ok: true, files: written, labels: { placed: sheet.report.labels.placed, dropped: sheet.report.labels.dropped }, ms: performance.now() - t0 };
  } catch (e) {
    const err = e as { message?: string; code?: string };
    return { index: task.index, path: task.path, ok: false, files: [], error: err.message ?? String(e), ...(err.code ? { code: err.code } : {}), ms: performance.now() - t0 };
  }
}
