// Terminal conventions shared by every command: where text goes, colour only on a terminal and
// never with NO_COLOR, quiet mode, and the mapping from error codes to exit codes.
import { DomeprintError } from "../errors.js";

export const EXIT_OK = 0, EXIT_FAILED = 1, EXIT_USAGE = 2;

export interface Io {
  out: (s: string) => void;
  err: (s: string) => void;
  quiet: boolean;
  colour: boolean;
}

export function defaultIo(quiet = false): Io {
  const colour = Boolean(process.stderr.isTTY) && !("NO_COLOR" in process.env);
  return { out: (s) => void process.stdout.write(s), err: (s) => void process.stderr.write(s), quiet, colour };
}

export function red(io: Io, s: string): string {
  return io.colour ? `\x1b[31m${s}\x1b[0m` : s;
}

/** Exit code for an error: bad input is 2, everything else (work that failed) is 1. */
export function exitCodeFor(e: unknown): number {
  if (e instanceof DomeprintError) return e.code === "E_CONVERGENCE" ? EXIT_FAILED : EXIT_USAGE;
  return EXIT_FAILED;
}

export function reportError(io: Io, e: unknown): number {
  const msg = e instanceof DomeprintError ? e.message : e instanceof Error ? (e.stack ?? e.message) : String(e);
  io.err(`${red(io, "domeprint: error:")} ${msg}\n`);
  return exitCodeFor(e);
}
