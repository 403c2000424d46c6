// Blend definition files (fluids/blends/*.json, format domeprint-blend/1) and the composition syntax
// "R32:0.5+R125:0.5" (mass fractions) for mixtures of any fluids domeprint has equations for.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { z } from "zod";
import { DomeprintError, inputError, show } from "../../errors.js";
import { foldName } from "../registry.js";
import { BLEND_DIR } from "./binary-data.js";

const frac = z.number().refine((x) => Number.isFinite(x) && x > 0 && x <= 1, "must be a mass fraction in (0, 1]");

export const blendFileSchema = z.strictObject({
  format: z.literal("domeprint-blend/1"),
  id: z.string().regex(/^[A-Za-z0-9-]+$/),
  designation: z.string().regex(/^R-/),
  aliases: z.array(z.string()),
  /** Components by fluid id with their mass fractions, in the order they are designated. */
  components: z.array(z.strictObject({ fluid: z.string(), massFraction: frac })).min(2),
  compositionSource: z.string(),
  /** ISO 817 safety class of the standard blend, with where the value came from. */
  safety: z.strictObject({ class: z.string(), source: z.string() }).optional(),
  note: z.string().optional(),
}).superRefine((b, ctx) => {
  const sum = b.components.reduce((s, c) => s + c.massFraction, 0);
  if (Math.abs(sum - 1) > 1e-6) ctx.addIssue({ code: "custom", path: ["components"], message: `mass fractions sum to ${sum}, not 1` });
  const ids = b.components.map((c) => c.fluid);
  if (new Set(ids).size !== ids.length) ctx.addIssue({ code: "custom", path: ["components"], message: "a fluid is listed twice" });
});

export type BlendFile = z.infer<typeof blendFileSchema>;

let blends: BlendFile[] | undefined;

/** Every blend file shipped, checked against the schema (the binary-parameter file is skipped by its format). */
export function blendFiles(): BlendFile[] {
  if (blends) return blends;
  const out: BlendFile[] = [];
  for (const file of readdirSync(BLEND_DIR).filter((f) => f.endsWith(".json")).sort()) {
    const path = join(BLEND_DIR, file);
    const raw = JSON.parse(readFileSync(path, "utf8")) as { format?: unknown };
    if (raw.format !== "domeprint-blend/1") continue;
    const parsed = blendFileSchema.safeParse(raw);
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      const where = issue.path.join(".");
      throw new DomeprintError("E_FLUID_FILE", `${path}: ${where || "(root)"}: ${issue.message}`, { input: where, value: path, allowed: "a file matching the domeprint-blend/1 schema" });
    }
    out.push(parsed.data);
  }
  blends = out;
  return out;
}

/** The blend file known under an id or alias (folded as fluid names are), or undefined. */
export function findBlend(name: string): BlendFile | undefined {
  const q = foldName(name);
  return blendFiles().find((b) => [b.id, b.designation, ...b.aliases].some((n) => foldName(n) === q));
}

/** Parses "A:wA+B:wB+…" into components and mass fractions, normalised when they sum to 1 within 1e-6. */
export function parseComposition(spec: string): { names: string[]; massFractions: number[] } {
  const allowed = "components joined by '+', each 'fluid:massFraction', fractions summing to 1 (e.g. \"R32:0.5+R125:0.5\")";
  const parts = spec.split("+").map((s) => s.trim());
  if (parts.length < 2) throw inputError("composition", spec, "needs at least two components", allowed);
  const names: string[] = [], w: number[] = [];
  for (const part of parts) {
    const m = /^([^:]+):\s*([0-9.eE+-]+)$/.exec(part);
    if (!m) throw inputError("composition", spec, `cannot read ${show(part)}`, allowed);
    const v = Number(m[2]);
    if (!Number.isFinite(v) || v < 0 || v > 1) throw inputError("composition", spec, `mass fraction ${show(m[2])} of ${m[1]!.trim()} is not in 0…1`, allowed);
    names.push(m[1]!.trim());
    w.push(v);
  }
  const sum = w.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - 1) > 1e-6) throw inputError("composition", spec, `mass fractions sum to ${show(sum)}, not 1 (within 1e-6)`, allowed);
  return { names, massFractions: w.map((x) => x / sum) };
}
