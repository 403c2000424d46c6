// The binary-parameter file (fluids/blends/binary-parameters.json): schema, loading, and the look-up of one pair.
// A pair is stored in one order; asked in the other it comes back with 1/β_T and 1/β_v (the pair-order rule).
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { z } from "zod";
import { DomeprintError } from "../../errors.js";
import { FLUID_DIR } from "../registry.js";
import type { Fluid } from "../fluid.js";
import type { DepartureData } from "./departure.js";

/** The folder of the blend files and the binary-parameter file. */
export const BLEND_DIR = join(FLUID_DIR, "blends");
export const BINARY_FILE = join(BLEND_DIR, "binary-parameters.json");

const num = z.number().refine(Number.isFinite, "must be a finite number");
const pos = num.refine((x) => x > 0, "must be positive");

const binaryFileSchema = z.strictObject({
  format: z.literal("domeprint-binary/1"),
  about: z.string(),
  reducingNull: z.string(),
  sources: z.record(z.string(), z.string()),
  pairs: z.array(z.strictObject({
    fluids: z.tuple([z.string(), z.string()]),
    reducing: z.strictObject({ betaT: pos, gammaT: pos, betaV: pos, gammaV: pos }).nullable(),
    reducingFit: z.strictObject({ xi_K: num, zeta_m3_mol: num, method: z.string() }).optional(),
    F: num,
    departure: z.string().nullable(),
    source: z.string(),
  })),
  departures: z.record(z.string(), z.strictObject({
    form: z.enum(["power", "gerg"]),
    source: z.string(),
    columns: z.array(z.string()),
    rows: z.array(z.array(num)).min(1),
  })),
}).superRefine((f, ctx) => {
  f.pairs.forEach((p, k) => {
    if (p.departure !== null && !(p.departure in f.departures))
      ctx.addIssue({ code: "custom", path: ["pairs", k, "departure"], message: `names no entry of departures: ${p.departure}` });
    if (!(p.source in f.sources)) ctx.addIssue({ code: "custom", path: ["pairs", k, "source"], message: `names no entry of sources: ${p.source}` });
  });
  for (const [name, d] of Object.entries(f.departures)) {
    const want = d.form === "power" ? ["n", "t", "d", "l"] : ["n", "t", "d", "eta", "epsilon", "beta", "gamma"];
    if (d.columns.join() !== want.join()) ctx.addIssue({ code: "custom", path: ["departures", name, "columns"], message: `must be ${want.join(", ")}` });
    if (d.rows.some((r) => r.length !== want.length)) ctx.addIssue({ code: "custom", path: ["departures", name, "rows"], message: `each row needs ${want.length} numbers` });
  }
});

export type BinaryFile = z.infer<typeof binaryFileSchema>;

let cached: BinaryFile | undefined;

/** Loads (once) and checks the binary-parameter file. */
export function binaryData(): BinaryFile {
  if (cached) return cached;
  const raw: unknown = JSON.parse(readFileSync(BINARY_FILE, "utf8"));
  const parsed = binaryFileSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const path = issue.path.join(".");
    throw new DomeprintError("E_FLUID_FILE", `${BINARY_FILE}: ${path || "(root)"}: ${issue.message}`, { input: path, value: BINARY_FILE, allowed: "a file matching the domeprint-binary/1 schema" });
  }
  cached = parsed.data;
  return cached;
}

/** How a pair without published reducing parameters is estimated. */
export type EstimateRule = "linear" | "unity";

/** The parameters of one pair, oriented to the order asked for. */
export interface BinaryPair {
  betaT: number;
  gammaT: number;
  betaV: number;
  gammaV: number;
  F: number;
  departure: DepartureData | null;
  /** Citation key of the published source, or null when nothing was published for the pair. */
  source: string | null;
  /** Why (part of) the pair is estimated, or null when every parameter is published. */
  estimated: string | null;
}

/**
 * Linear combining rule: T_r and v_r linear in mole fraction between the pure values. In the GERG form this is
 * β = 1 with γ_T = (T_i + T_j)/(2√(T_i T_j)) and γ_v = (v_i + v_j)/(¼(v_i^⅓ + v_j^⅓)³).
 */
export function linearRule(a: Fluid, b: Fluid): { betaT: number; gammaT: number; betaV: number; gammaV: number } {
  const Ta = a.model.Tr, Tb = b.model.Tr, va = 1 / a.model.rhor, vb = 1 / b.model.rhor;
  const cube = Math.pow(Math.cbrt(va) + Math.cbrt(vb), 3) / 4;
  return { betaT: 1, gammaT: (Ta + Tb) / (2 * Math.sqrt(Ta * Tb)), betaV: 1, gammaV: (va + vb) / cube };
}

function estimate(a: Fluid, b: Fluid, rule: EstimateRule) {
  return rule === "linear" ? linearRule(a, b) : { betaT: 1, gammaT: 1, betaV: 1, gammaV: 1 };
}

const RULE_WORDS: Record<EstimateRule, string> = {
  linear: "linear combining rule for T_r and v_r",
  unity: "β = γ = 1",
};

/** The pair (a, b) in that order; estimated (and saying so) where the file has nothing or only part. */
export function binaryPair(a: Fluid, b: Fluid, rule: EstimateRule = "linear"): BinaryPair {
  const data = binaryData();
  const entry = data.pairs.find((p) => (p.fluids[0] === a.id && p.fluids[1] === b.id) || (p.fluids[0] === b.id && p.fluids[1] === a.id));
  if (!entry) return { ...estimate(a, b, rule), F: 0, departure: null, source: null, estimated: `no published parameters; ${RULE_WORDS[rule]}, no departure function` };
  const dep = entry.departure === null ? null : data.departures[entry.departure]!;
  const departure: DepartureData | null = dep && entry.F !== 0 ? { form: dep.form, columns: dep.columns, rows: dep.rows } : null;
  const unpublished = entry.source === "Unpublished";
  if (entry.reducing === null) {
    if (entry.reducingFit) {
      // T_r = Σ xᵢTᵢ + Σ xᵢxⱼξ, v_r = Σ xᵢvᵢ + Σ xᵢxⱼζ written in the GERG form (β = 1, symmetric in the order).
      const lin = linearRule(a, b);
      const Ta = a.model.Tr, Tb = b.model.Tr, va = 1 / a.model.rhor, vb = 1 / b.model.rhor;
      const fit = entry.reducingFit;
      return {
        betaT: 1, gammaT: lin.gammaT * (1 + fit.xi_K / (Ta + Tb)),
        betaV: 1, gammaV: lin.gammaV * (1 + fit.zeta_m3_mol / (va + vb)),
        F: entry.F, departure, source: entry.source,
        estimated: `reducing parameters not in the dataset; ξ = ${fit.xi_K} K, ζ = ${fit.zeta_m3_mol} m³/mol fitted by domeprint to a pseudo-pure blend equation; departure function and F from ${entry.source}`,
      };
    }
    return { ...estimate(a, b, rule), F: entry.F, departure, source: entry.source,
      estimated: `reducing parameters not in the dataset (${RULE_WORDS[rule]}); departure function and F from ${entry.source}` };
  }
  const r = entry.reducing;
  const forward = entry.fluids[0] === a.id;
  return {
    betaT: forward ? r.betaT : 1 / r.betaT,
    gammaT: r.gammaT,
    betaV: forward ? r.betaV : 1 / r.betaV,
    gammaV: r.gammaV,
    F: entry.F,
    departure,
    source: entry.source,
    estimated: unpublished ? "parameters without a publication (dataset entry marked unpublished)" : null,
  };
}
