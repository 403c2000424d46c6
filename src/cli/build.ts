// `domeprint build`: renders every sheet of a spec file, several at once, with progress and a summary.
// A bad spec exits 2 and writes nothing; a sheet that fails is reported and the others go on (exit 1).
import type { Command } from "commander";
import { SingleBar, Presets } from "cli-progress";
import { DomeprintError } from "../errors.js";
import { buildFile, type BuildResult, type SheetOutcome } from "../spec/index.js";
import { EXIT_FAILED, EXIT_OK, red, reportError, type Io } from "./io.js";

function jobsOf(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > 64) throw new DomeprintError("E_INPUT", `--jobs = ${JSON.stringify(text)}: not a count of worker threads; allowed: a whole number from 1 to 64`, { input: "--jobs", value: text, allowed: "1 to 64" });
  return n;
}

function line(o: SheetOutcome, done: number, total: number): string {
  const what = o.ok ? `ok (${(o.ms / 1000).toFixed(1)} s) ${o.files.join(", ")}` : `FAILED: ${o.error}`;
  return `[${done}/${total}] ${o.path || "sheet"}: ${what}\n`;
}

export function summary(io: Io, r: BuildResult): string {
  const ok = r.outcomes.length - r.failed;
  const files = r.outcomes.reduce((n, o) => n + o.files.length, 0);
  const failed = r.outcomes.filter((o) => !o.ok).map((o) => `  ${o.path || "sheet"}: ${o.error}\n`).join("");
  return `${ok} of ${r.outcomes.length} sheets built, ${files} files written${r.failed ? `; ${red(io, `${r.failed} failed`)}:\n${failed}` : "\n"}`;
}

export async function runBuild(io: Io, spec: string, outDir: string, jobs: number | undefined): Promise<number> {
  const tty = Boolean(process.stderr.isTTY) && !io.quiet;
  let bar: SingleBar | undefined;
  const result = await buildFile(spec, {
    outDir,
    ...(jobs !== undefined ? { jobs } : {}),
    onDone: (o, done, total) => {
      if (tty) {
        if (!bar) {
          bar = new SingleBar({ format: "sheets {bar} {value}/{total} {last}", stream: process.stderr, hideCursor: true, noTTYOutput: false }, Presets.shades_classic);
          bar.start(total, 0, { last: "" });
        }
        bar.update(done, { last: o.ok ? o.path : `${o.path} failed` });
      } else if (!io.quiet) io.err(line(o, done, total));
    },
  });
  bar?.stop();
  if (!io.quiet || result.failed) io.err(summary(io, result));
  io.out(result.outcomes.flatMap((o) => o.files).map((f) => `${f}\n`).join(""));
  return result.failed ? EXIT_FAILED : EXIT_OK;
}

export function registerBuild(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("build")
    .description("render every sheet of a spec file (YAML or JSON) into a folder, several at once")
    .argument("<spec>", "sheet spec file: one sheet (fluid: R134a) or sheets: [...] with optional defaults:")
    .option("-o, --output <dir>", "output folder; sheet names cannot leave it", "out")
    .option("--jobs <n>", "worker threads (default: one per core)")
    .addHelpText("after", `
A spec names a fluid and, if wanted, paper, units, style, window, line steps, title fields, cycles and
readings files. The smallest spec is one line:  fluid: R134a
Bad specs exit 2 and write nothing; a sheet that fails does not stop the others (exit 1 at the end).
Every file is written to a temporary name and renamed into place, so an interrupted build leaves no part file.

Examples:
  domeprint build plant-room.yaml
  domeprint build handouts.yaml -o handouts --jobs 2
  domeprint build report.json -o client-report --quiet`)
    .action(async (spec: string, flags: { output: string; jobs?: string }) => {
      try {
        setCode(await runBuild(io, spec, flags.output, jobsOf(flags.jobs)));
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
