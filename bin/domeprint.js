#!/usr/bin/env node
// Entry point of the domeprint command: runs the compiled CLI from dist/.
import { main } from "../dist/cli/main.js";

main(process.argv.slice(2)).then(
  (code) => { process.exitCode = code; },
  (err) => { process.stderr.write(`domeprint: internal error: ${err && err.stack ? err.stack : err}\n`); process.exitCode = 1; },
);
