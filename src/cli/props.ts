// `domeprint props`: the state of a fluid from two inputs with units, as a table or JSON, or a JSON-lines batch.
import { createInterface } from "node:readline";
import type { Command } from "commander";
import { DomeprintError, requireNumber } from "../errors.js";
import { flash, INPUT_NAMES, MIXTURE_PAIRS, mixtureFlash, resolveSubstance, SUPPORTED_PAIRS, type Inputs, type MixtureState, type State, type Substance } from "../eos/index.js";
import { atmosphereAt, parseQuantity, type Quantity } from "../units/index.js";
import { EXIT_OK, reportError, type Io } from "./io.js";

const QUANTITY_OF: Record<string, Quantity> = { T: "temperature", p: "pressure", rho: "density", v: "volume", h: "enthalpy", s: "entropy", x: "quality" };

/** Parses NAME=VALUE arguments into SI inputs. */
export function parseAssignments(args: string[], atmosphere: number): Inputs {
  const inputs: Inputs = {};
  for (const a of args) {
    const eq = a.indexOf("=");
    if (eq <= 0) throw new DomeprintError("E_INPUT", `${JSON.stringify(a)}: expected NAME=VALUE with NAME one of ${INPUT_NAMES.join(", ")} (e.g. T=25C p=2.4bar)`, { input: a, allowed: INPUT_NAMES.join(", ") });
    const name = a.slice(0, eq).trim();
    const key = INPUT_NAMES.find((n) => n === name) ?? INPUT_NAMES.find((n) => n.toLowerCase() === name.toLowerCase());
    if (!key) throw new DomeprintError("E_UNKNOWN_QUANTITY", `${name}: unknown quantity; allowed: ${INPUT_NAMES.join(", ")}`, { input: name, allowed: INPUT_NAMES.join(", ") });
    if (inputs[key] !== undefined) throw new DomeprintError("E_INPUT", `${key} given twice; allowed: two different inputs`, { input: key });
    inputs[key] = parseQuantity(key, QUANTITY_OF[key]!, a.slice(eq + 1), { atmosphere, defaultUnit: key === "x" ? "" : undefined });
  }
  return inputs;
}

function isMixtureState(st: State): st is MixtureState {
  return "components" in st && "estimatedPairs" in st;
}

/**
 * The JSON form of a state: SI base units, x null outside the two-phase region. A mixture adds its
 * components and overall composition, the coexisting phases (null outside the two-phase region) and the
 * binary pairs whose parameters were estimated.
 */
export function stateJson(st: State): Record<string, unknown> {
  const base = { fluid: st.fluid, reference: st.reference, phase: st.phase, T: st.T, p: st.p, rho: st.rho, v: st.v, h: st.h, s: st.s, u: st.u, g: st.g, cv: st.cv, cp: st.cp, w: st.w, x: st.x };
  if (!isMixtureState(st)) return base;
  return { ...base, components: st.components, moleFractions: st.moleFractions, massFractions: st.massFractions, liquid: st.liquid, vapour: st.vapour, estimatedPairs: st.estimatedPairs };
}

/** Flashes a pure fluid or a mixture; a mixture takes T, p, h, s and x only. */
export function substanceFlash(sub: Substance, inputs: Inputs, reference: string): State {
  if (sub.kind === "pure") return flash(sub.fluid, inputs, reference);
  return mixtureFlash(sub.mixture, inputs as Record<string, number>, reference);
}

function composition(names: string[], w: number[]): string {
  return names.map((n, k) => `${n} ${fmt(w[k]! * 100, 4)} %`).join(", ");
}

function fmt(x: number | null, digits = 6): string {
  return x === null ? "—" : String(+x.toPrecision(digits));
}

export function stateTable(st: State, atmosphere: number): string {
  const rows: [string, string, string][] = [
    ["phase", st.phase, ""],
    ["T", `${fmt(st.T - 273.15)} °C`, `${fmt(st.T)} K`],
    ["p", `${fmt(st.p / 1e5)} bar`, `${fmt((st.p - atmosphere) / 1e5)} bar(g)`],
    ["rho", `${fmt(st.rho)} kg/m³`, ""],
    ["v", `${fmt(st.v)} m³/kg`, ""],
    ["h", `${fmt(st.h / 1e3)} kJ/kg`, ""],
    ["s", `${fmt(st.s / 1e3)} kJ/(kg K)`, ""],
    ["u", `${fmt(st.u / 1e3)} kJ/kg`, ""],
    ["cv", st.cv === null ? "—" : `${fmt(st.cv / 1e3)} kJ/(kg K)`, ""],
    ["cp", st.cp === null ? "—" : `${fmt(st.cp / 1e3)} kJ/(kg K)`, ""],
    ["w", st.w === null ? "—" : `${fmt(st.w)} m/s`, ""],
    ["x", st.x === null ? "—" : fmt(st.x), ""],
  ];
  if (isMixtureState(st)) {
    rows.push(["mass", composition(st.components, st.massFractions), "overall"]);
    if (st.liquid && st.vapour && st.phase === "two-phase") {
      rows.push(["liquid", composition(st.components, st.liquid.massFractions), `${fmt(st.liquid.rho)} kg/m³`]);
      rows.push(["vapour", composition(st.components, st.vapour.massFractions), `${fmt(st.vapour.rho)} kg/m³`]);
    }
  }
  const head = `${st.fluid}, reference state ${st.reference}`;
  const lines = [head, ...rows.map(([k, a, b]) => `  ${k.padEnd(6)} ${a.padEnd(22)} ${b}`.trimEnd())];
  if (isMixtureState(st) && st.estimatedPairs.length)
    lines.push(`  ! binary parameters estimated for ${st.estimatedPairs.map((p) => `${p.fluids[0]}/${p.fluids[1]} (${p.reason})`).join("; ")}`);
  return lines.join("\n") + "\n";
}

async function runBatch(io: Io, fluidName: string, reference: string): Promise<number> {
  const sub = resolveSubstance(fluidName);
  const rl = createInterface({ input: process.stdin, crlfDelay: Infinity });
  let lineNo = 0;
  for await (const line of rl) {
    lineNo++;
    if (line.trim() === "") continue;
    try {
      let obj: unknown;
      try {
        obj = JSON.parse(line);
      } catch {
        throw new DomeprintError("E_INPUT", `line ${lineNo}: not valid JSON`, { input: `line ${lineNo}` });
      }
      if (!obj || typeof obj !== "object" || Array.isArray(obj)) throw new DomeprintError("E_INPUT", `line ${lineNo}: expected a JSON object with two of T, p, rho, h, s, x`, { input: `line ${lineNo}` });
      const inputs: Inputs = {};
      for (const [k, v] of Object.entries(obj as Record<string, unknown>)) {
        if (!["T", "p", "rho", "h", "s", "x"].includes(k)) throw new DomeprintError("E_UNKNOWN_QUANTITY", `line ${lineNo}: ${k}: unknown key; allowed: T, p, rho, h, s, x (SI base units)`, { input: k });
        inputs[k as keyof Inputs] = requireNumber(k, v, { allowNegative: k === "h" || k === "s" });
      }
      io.out(JSON.stringify(stateJson(substanceFlash(sub, inputs, reference))) + "\n");
    } catch (e) {
      if (!(e instanceof DomeprintError)) throw e;
      io.out(JSON.stringify({ error: e.message, code: e.code }) + "\n");
    }
  }
  return EXIT_OK;
}

export function registerProps(program: Command, io: Io, setCode: (c: number) => void): void {
  program
    .command("props")
    .description("state of a fluid from two inputs with units: a table, JSON, or a JSON-lines batch from stdin")
    .argument("<fluid>", "fluid id, R-number (R744, R-744), chemical name, blend id (R454B) or composition (\"R32:0.5+R125:0.5\", mass fractions)")
    .argument("[inputs...]", "exactly two of T=, p=, rho=, v=, h=, s=, x= with units")
    .option("--reference <name>", "reference state for h and s: native, iir, ashrae, nbp", "native")
    .option("--json", "print one JSON object in SI base units")
    .option("--batch", "read JSON lines with two of T, p, rho, h, s, x (SI) from stdin; write one JSON line each")
    .option("--altitude <height>", "site altitude for gauge pressures (e.g. 300m, 1000ft); standard atmosphere", "0m")
    .addHelpText("after", `
Units: T in K, C, F or R (absolute temperatures; 25C, 298.15K, 77F).
p absolute in Pa, kPa, MPa, bar, mbar, psi, psia, atm; gauge pressure with a g:
  barg, kPag, MPag, psig (read against the standard atmosphere at --altitude).
rho in kg/m3, g/cm3, lb/ft3; v in m3/kg, L/kg, ft3/lb; h in J/kg, kJ/kg, Btu/lb;
s in J/kgK, kJ/kgK, Btu/lbR; x as a fraction (0.3) or percent (30%).
Input pairs: ${SUPPORTED_PAIRS.join("; ")}.
Real mixtures (blend ids from 'domeprint fluids', or compositions): ${MIXTURE_PAIRS.join("; ")};
  JSON adds the overall composition, the liquid and vapour phases in the two-phase region
  and any binary pairs whose parameters are estimated.

Examples:
  domeprint props R134a T=-10C x=1
  domeprint props R744 p=35bar h=430kJ/kg --reference iir --json
  domeprint props ammonia T=25C p=10barg --altitude 300m
  domeprint props R454B p=10bar x=0.5 --json
  domeprint props "R32:0.5+R125:0.5" T=0C p=5bar
  echo '{"T": 300, "p": 1e5}' | domeprint props water --batch`)
    .action(async (fluid: string, args: string[], opts: { reference: string; json?: boolean; batch?: boolean; altitude: string }) => {
      try {
        const atmosphere = atmosphereAt(parseQuantity("--altitude", "length", opts.altitude));
        if (opts.batch) {
          if (args.length) throw new DomeprintError("E_INPUT", `--batch reads inputs from stdin; got arguments ${args.join(" ")}`, { input: "inputs" });
          setCode(await runBatch(io, fluid, opts.reference));
          return;
        }
        const st = substanceFlash(resolveSubstance(fluid), parseAssignments(args, atmosphere), opts.reference);
        io.out(opts.json ? JSON.stringify(stateJson(st)) + "\n" : stateTable(st, atmosphere));
        setCode(EXIT_OK);
      } catch (e) {
        setCode(reportError(io, e));
      }
    });
}
