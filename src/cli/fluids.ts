// `domeprint fluids`: every fluid with its designation, name, safety class, equation and range.
import type { Command } from "commander";
import { fluidIds, getFluid, type Fluid } from "../eos/index.js";
import { EXIT_OK, reportError, type Io } from "./io.js";

export function citation(f: Fluid): string {
  const e = f.data.equation;
  const authors = e.authors.length > 2 ? `${e.authors[0]} et al.` : e.authors.join(" and ");
  const where = [e.journal, e.volume, e.pages].filter(Boolean).join(" ");
  return `${authors}, ${where} (${e.year})`;
}

export function fluidSummary(f: Fluid): Record<string, unknown> {
  return {
    id: f.id,
    designation: f.designation,
    name: f.data.chemicalName,
    formula: f.data.formula,
    aliases: f.data.aliases,
    safetyClass: f.data.safety.class,
    safetyClassSource: f.data.safety.source,
    pseudoPure: f.pseudoPure,
    equation: { citation: citation(f), title: f.data.equation.title, source: f.data.equation.citationSource },
    range: { Tmin: f.Tmin, Tmax: f.Tmax, pmax: f.pmax },
    critical: { T: f.Tc, p: f.pc, rho: f.rhoc * f.M },
  };
}

export function registerFluids(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("fluids")
    .description("list the fluids: id, designation, name, safety class, equation and range")
    .option("--json", "print a JSON array")
    .addHelpText("after", `
Safety classes follow ISO 817 / ASHRAE 34 as recorded from memory: check them against the current edition.

Examples:
  domeprint fluids
  domeprint fluids --json`)
    .action((opts: { json?: boolean }) => {
      try {
        const all = fluidIds().map(getFluid);
        if (opts.json) io.out(JSON.stringify(all.map(fluidSummary), null, 2) + "\n");
        else {
          const rows = all.map((f) => [f.id, f.designation, f.data.chemicalName, f.data.safety.class ?? "—",
            `${+f.Tmin.toFixed(2)}–${f.Tmax} K, ≤ ${+(f.pmax / 1e6).toPrecision(4)} MPa`, citation(f)]);
          const head = ["id", "designation", "name", "class", "range", "equation"];
          const width = head.map((h, j) => Math.max(h.length, ...rows.map((r) => r[j]!.length)));
          const line = (r: string[]) => r.map((c, j) => (j === r.length - 1 ? c : c.padEnd(width[j]!))).join("  ");
          io.out([line(head), ...rows.map(line)].join("\n") + "\n");
        }
        setCode(EXIT_OK);
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
