// `domeprint demo` (and `npm start`): writes the built-in demo spec and readings into a folder and builds
// it, so a newcomer gets example sheets in two commands and an editable spec to start from.
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import type { Command } from "commander";
import { DEMO_READINGS, DEMO_SPEC } from "../spec/demo.js";
import { writeAtomically } from "../sheet/index.js";
import { runBuild } from "./build.js";
import { reportError, type Io } from "./io.js";

export function registerDemo(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("demo")
    .description("build the demo sheets (an invented cold store and supermarket) into out/demo")
    .option("-o, --output <dir>", "parent folder of the demo", "out")
    .option("--jobs <n>", "worker threads (default: one per core)")
    .addHelpText("after", `
Writes DIR/demo/demo-spec.yaml and its readings files, then builds them into DIR/demo.
The plants, sites and readings are invented.

Examples:
  domeprint demo
  domeprint demo -o /tmp/charts`)
    .action(async (flags: { output: string; jobs?: string }) => {
      try {
        const dir = join(flags.output, "demo");
        mkdirSync(dir, { recursive: true });
        writeAtomically(dir, [
          { name: "demo-spec.yaml", data: Buffer.from(DEMO_SPEC, "utf8") },
          ...Object.entries(DEMO_READINGS).map(([name, text]) => ({ name, data: Buffer.from(text, "utf8") })),
        ]);
        if (!io.quiet) io.err(`demo spec and readings written to ${dir}; building…\n`);
        const jobs = flags.jobs === undefined ? undefined : Number(flags.jobs);
        setCode(await runBuild(io, join(dir, "demo-spec.yaml"), dir, jobs));
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
