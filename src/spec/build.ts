// Builds every sheet of a spec in two phases. Compose: check the spec, trace and lay out every sheet (on
// worker threads); any fault of the spec stops here, before anything is written. Render: draw and write each
// sheet atomically; a sheet that fails then does not stop the others.
import { existsSync, mkdirSync, readdirSync, rmSync, statSync } from "node:fs";
import { availableParallelism } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { DomeprintError } from "../errors.js";
import type { ComposedSheet } from "../sheet/index.js";
import { loadSpec, parseSpec, type LoadedSpec } from "./load.js";
import { planSheets } from "./to-options.js";
import { composeOne, renderOne, type SheetOutcome, type SheetTask } from "./render-one.js";

export interface BuildOptions {
  outDir: string;
  /** Worker threads; 1 works in this thread. Default: the machine's cores, at most the number of sheets. */
  jobs?: number;
  onDone?: (outcome: SheetOutcome, done: number, total: number) => void;
}

export interface BuildResult {
  outcomes: SheetOutcome[];
  failed: number;
}

const WORKER = fileURLToPath(new URL("./worker.js", import.meta.url));

/** Temporaries left by a build that was killed (its process is gone) are removed before a new one writes. */
function sweepStaleTemporaries(dir: string): void {
  if (!existsSync(dir)) return;
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    const m = /^\..+\.(\d+)-[0-9a-f]{8}\.tmp$/.exec(name);
    if (m) {
      let alive = true;
      try { process.kill(Number(m[1]), 0); } catch { alive = false; }
      if (!alive) rmSync(full, { force: true });
    } else if (!name.startsWith(".") && statSync(full).isDirectory()) sweepStaleTemporaries(full);
  }
}

/** The first spec fault among the composed sheets, as the build's error (exit 2, nothing written). */
function specFault(file: string, composed: SheetOutcome[]): DomeprintError | undefined {
  const bad = composed.filter((o) => o.inputFault).sort((a, b) => a.index - b.index);
  if (!bad.length) return undefined;
  const more = bad.length > 1 ? ` (and ${bad.length - 1} more sheet${bad.length > 2 ? "s" : ""} with faults)` : "";
  return new DomeprintError((bad[0]!.code as never) ?? "E_INPUT", `${file}: ${bad[0]!.error}${more}`, { input: bad[0]!.path });
}

async function inProcess(file: string, tasks: SheetTask[], opts: BuildOptions): Promise<SheetOutcome[]> {
  const composed = tasks.map((t) => composeOne(t));
  const fault = specFault(file, composed.map((c) => c.outcome));
  if (fault) throw fault;
  prepare(opts.outDir);
  const out: SheetOutcome[] = [];
  for (let i = 0; i < tasks.length; i++) {
    const c = composed[i]!;
    const o = c.sheet ? await renderOne(tasks[i]!, c.sheet as ComposedSheet, c.outcome.ms) : c.outcome;
    out.push(o);
    opts.onDone?.(o, out.length, tasks.length);
  }
  return out;
}

function prepare(outDir: string): void {
  mkdirSync(outDir, { recursive: true });
  sweepStaleTemporaries(outDir);
}

async function onWorkers(file: string, tasks: SheetTask[], jobs: number, opts: BuildOptions): Promise<SheetOutcome[]> {
  const workers = Array.from({ length: jobs }, () => new Worker(WORKER));
  const owner = new Map<number, Worker>();
  try {
    // Phase 1: compose, each worker taking the next task as it finishes one.
    const composed = await new Promise<SheetOutcome[]>((resolveAll, reject) => {
      const queue = [...tasks];
      const done: SheetOutcome[] = [];
      for (const w of workers) {
        const next = () => {
          const t = queue.shift();
          if (t) { owner.set(t.index, w); w.postMessage({ kind: "compose", task: t }); }
        };
        w.on("message", (m: { kind: string; outcome: SheetOutcome }) => {
          if (m.kind !== "composed") return;
          done.push(m.outcome);
          if (done.length === tasks.length) resolveAll(done);
          else next();
        });
        w.on("error", reject);
        next();
      }
    });
    const fault = specFault(file, composed);
    if (fault) throw fault;
    prepare(opts.outDir);
    // Phase 2: render on the worker that holds each composed sheet.
    const byIndex = new Map(composed.map((o) => [o.index, o]));
    const outcomes = await new Promise<SheetOutcome[]>((resolveAll, reject) => {
      const results: SheetOutcome[] = [];
      const finish = (o: SheetOutcome) => {
        results.push(o);
        opts.onDone?.(o, results.length, tasks.length);
        if (results.length === tasks.length) resolveAll(results.sort((a, b) => a.index - b.index));
      };
      for (const w of workers) {
        w.removeAllListeners("message");
        w.on("message", (m: { kind: string; outcome: SheetOutcome }) => { if (m.kind === "rendered") finish(m.outcome); });
        w.on("error", reject);
      }
      for (const t of tasks) {
        const c = byIndex.get(t.index)!;
        if (c.ok) owner.get(t.index)!.postMessage({ kind: "render", index: t.index });
        else finish(c);
      }
    });
    return outcomes;
  } finally {
    for (const w of workers) w.postMessage({ kind: "stop" });
  }
}

export async function buildSpec(spec: LoadedSpec, opts: BuildOptions): Promise<BuildResult> {
  const planned = planSheets(spec); // throws on a bad spec, before anything is written
  const tasks: SheetTask[] = planned.map((p, index) => ({ index, path: p.path, name: p.name, options: p.options, outDir: opts.outDir }));
  const jobs = Math.max(1, Math.min(opts.jobs ?? availableParallelism(), tasks.length));
  const useWorkers = jobs > 1 && existsSync(WORKER);
  const outcomes = useWorkers ? await onWorkers(spec.file, tasks, jobs, opts) : await inProcess(spec.file, tasks, opts);
  return { outcomes, failed: outcomes.filter((o) => !o.ok).length };
}

export function buildFile(file: string, opts: BuildOptions): Promise<BuildResult> {
  return buildSpec(loadSpec(file), opts);
}

export function buildText(file: string, text: string, opts: BuildOptions): Promise<BuildResult> {
  return buildSpec(parseSpec(file, text), opts);
}
