// The domeprint command line: builds the commander program, runs one command, returns its exit code.
// Usage errors exit 2, failed work 1; errors go to stderr, results to stdout.
import { readFileSync } from "node:fs";
import { Command, CommanderError } from "commander";
import { defaultIo, EXIT_OK, EXIT_USAGE, type Io } from "./io.js";
import { registerProps } from "./props.js";
import { registerFluids } from "./fluids.js";
import { registerBuild } from "./build.js";
import { registerDemo } from "./demo.js";
import { registerCycle } from "./cycle.js";
import { registerSheet } from "./sheet.js";

export const VERSION: string = (JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { version: string }).version;

export async function main(argv: string[], io: Io = defaultIo(argv.includes("--quiet") || argv.includes("-q"))): Promise<number> {
  let code = EXIT_OK;
  const setCode = (c: number) => { code = c; };
  const program = new Command("domeprint")
    .description("pressure–enthalpy charts from published equations of state, typeset for print")
    .version(VERSION, "-V, --version")
    .option("-q, --quiet", "print nothing but results and errors")
    .exitOverride()
    .configureOutput({ writeOut: io.out, writeErr: io.err })
    .showHelpAfterError("(run with --help for usage)")
    .addHelpText("after", `
Exit codes: 0 done, 1 work failed, 2 bad usage or input. Colour only on a terminal, never with NO_COLOR.

Examples:
  domeprint fluids
  domeprint props R290 T=0C x=1 --reference iir`);
  registerProps(program, io, setCode);
  registerFluids(program, io, setCode);
  registerBuild(program, io, setCode);
  registerDemo(program, io, setCode);
  registerCycle(program, io, setCode);
  registerSheet(program, io, setCode);
  try {
    await program.parseAsync(argv, { from: "user" });
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === "commander.helpDisplayed" || e.code === "commander.version" || e.code === "commander.help") return EXIT_OK;
      return EXIT_USAGE;
    }
    throw e;
  }
  return code;
}
