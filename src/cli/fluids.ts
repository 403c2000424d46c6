// `domeprint fluids`: every fluid with its designation, name, safety class, equation and range, then the real
// mixtures (blends) with their composition and any binary pairs whose parameters are estimated.
import type { Command } from "commander";
import { blendIds, fluidIds, getFluid, getMixture, type Fluid, type Mixture } from "../eos/index.js";
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

/** Mass fractions as "R32 68.9 % + R1234yf 31.1 %". */
export function compositionText(m: Mixture): string {
  return m.components.map((f, k) => `${f.id} ${+(m.massFractions[k]! * 100).toPrecision(4)} %`).join(" + ");
}

export function blendSummary(m: Mixture): Record<string, unknown> {
  return {
    id: m.id,
    designation: m.designation,
    kind: "real mixture",
    components: m.components.map((f, k) => ({ fluid: f.id, massFraction: m.massFractions[k]!, moleFraction: m.z[k]! })),
    compositionSource: m.compositionSource,
    safetyClass: m.safety?.class ?? null,
    safetyClassSource: m.safety?.source ?? null,
    estimatedPairs: m.estimatedPairs,
    range: { Tmin: m.Tmin, Tmax: m.Tmax, pmax: m.pmax },
  };
}

export function registerFluids(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("fluids")
    .description("list the fluids: id, designation, name, safety class, equation and range; then the real mixtures")
    .option("--json", "print a JSON array (of the fluids; of the real mixtures with --mixtures)")
    .option("--mixtures", "list only the real mixtures: composition, source and estimated binary pairs")
    .addHelpText("after", `
Safety classes follow ISO 817 / ASHRAE 34 as recorded from memory: check them against the current edition.

Examples:
  domeprint fluids
  domeprint fluids --json
  domeprint fluids --mixtures --json`)
    .action((opts: { json?: boolean; mixtures?: boolean }) => {
      try {
        const blends = blendIds().map(getMixture);
        // The JSON array of fluids keeps its shape for existing readers; the blends have their own array.
        if (opts.json) io.out(JSON.stringify(opts.mixtures ? blends.map(blendSummary) : fluidIds().map(getFluid).map(fluidSummary), null, 2) + "\n");
        else {
          const all = opts.mixtures ? [] : fluidIds().map(getFluid);
          const rows = all.map((f) => [f.id, f.designation, f.data.chemicalName, f.data.safety.class ?? "—",
            `${+f.Tmin.toFixed(2)}–${f.Tmax} K, ≤ ${+(f.pmax / 1e6).toPrecision(4)} MPa`, citation(f)]);
          const head = ["id", "designation", "name", "class", "range", "equation"];
          const width = head.map((h, j) => Math.max(h.length, ...rows.map((r) => r[j]!.length)));
          const line = (r: string[]) => r.map((c, j) => (j === r.length - 1 ? c : c.padEnd(width[j]!))).join("  ");
          if (all.length) io.out([line(head), ...rows.map(line)].join("\n") + "\n\n");
          const brows = blends.map((m) => [m.id, m.designation, m.safety?.class ?? "—", `real mixture: ${compositionText(m)}`,
            m.estimatedPairs.length ? `! estimated: ${m.estimatedPairs.map((p) => p.fluids.join("/")).join(", ")}` : "published binary parameters"]);
          const bhead = ["id", "designation", "class", "composition (mass)", "binary parameters"];
          const bwidth = bhead.map((h, j) => Math.max(h.length, ...brows.map((r) => r[j]!.length)));
          const bline = (r: string[]) => r.map((c, j) => (j === r.length - 1 ? c : c.padEnd(bwidth[j]!))).join("  ");
          io.out("Real mixtures (multi-fluid model; use the id, or a composition such as \"R32:0.5+R125:0.5\"):\n" + [bline(bhead), ...brows.map(bline)].join("\n") + "\n");
        }
        setCode(EXIT_OK);
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
