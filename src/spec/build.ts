// Builds every sheet of a spec: plans them all first (a bad spec writes nothing), then renders on worker
// threads, several at a time; one failing sheet does not stop the others.
import { existsSync, mkdirSync, readdirSync, rmSync, statSync } from "node:fs";
import { availableParallelism } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { loadSpec, parseSpec, type LoadedSpec } from "./load.js";
import { planSheets } from "./to-options.js";
import { renderOne, type SheetOutcome, type SheetTask } from "./render-one.js";

export interface BuildOptions {
  outDir: string;
  /** Worker threads; 1 renders in this thread. Default: the machine's cores, at most the number of sheets. */
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

function inProcess(tasks: SheetTask[], opts: BuildOptions): Promise<SheetOutcome[]> {
  return (async () => {
    const out: SheetOutcome[] = [];
    for (const t of tasks) {
      const o = await renderOne(t);
      out.push(o);
      opts.onDone?.(o, out.length, tasks.length);
    }
    return out;
  })();
}

function onWorkers(tasks: SheetTask[], jobs: number, opts: BuildOptions): Promise<SheetOutcome[]> {
  return new Promise((resolvePromise, reject) => {
    const queue = [...tasks];
    const outcomes: SheetOutcome[] = [];
    let live = 0;
    const start = () => {
      const w = new Worker(WORKER);
      live++;
      const next = () => w.postMessage(queue.shift() ?? null);
      w.on("message", (o: SheetOutcome) => {
        outcomes.push(o);
        opts.onDone?.(o, outcomes.length, tasks.length);
        next();
      });
      w.on("error", reject);
      w.on("exit", () => {
        if (--live === 0) resolvePromise(outcomes.sort((a, b) => a.index - b.index));
      });
      next();
    };
    for (let k = 0; k < jobs; k++) start();
  });
}

export async function buildSpec(spec: LoadedSpec, opts: BuildOptions): Promise<BuildResult> {
  const planned = planSheets(spec); // throws on a bad spec, before anything is written
  mkdirSync(opts.outDir, { recursive: true });
  sweepStaleTemporaries(opts.outDir);
  const tasks: SheetTask[] = planned.map((p, index) => ({ index, path: p.path, name: p.name, options: p.options, outDir: opts.outDir }));
  const jobs = Math.max(1, Math.min(opts.jobs ?? availableParallelism(), tasks.length));
  const useWorkers = jobs > 1 && existsSync(WORKER);
  const outcomes = useWorkers ? await onWorkers(tasks, jobs, opts) : await inProcess(tasks, opts);
  return { outcomes, failed: outcomes.filter((o) => !o.ok).length };
}

export function buildFile(file: string, opts: BuildOptions): Promise<BuildResult> {
  return buildSpec(loadSpec(file), opts);
}

export function buildText(file: string, text: string, opts: BuildOptions): Promise<BuildResult> {
  return buildSpec(parseSpec(file, text), opts);
}
