// One name, one substance: resolves a fluid name to a pure (or pseudo-pure) Fluid or to a real Mixture,
// so every command and library entry point accepts blends and composition strings the same way.
import { editDistance } from "../edit-distance.js";
import { DomeprintError } from "../errors.js";
import type { Fluid } from "./fluid.js";
import { blendFiles, findBlend } from "./mixture/blend-file.js";
import { getMixture, type Mixture } from "./mixture/mixture.js";
import { fluidIds, foldName, getFluid, suggestFluids } from "./registry.js";

export type Substance = { kind: "pure"; fluid: Fluid } | { kind: "mixture"; mixture: Mixture };

/** Blend ids, designations and aliases within a small edit distance of the name (at most three). */
function suggestBlends(name: string): string[] {
  const q = foldName(name);
  const scored: { id: string; d: number }[] = [];
  for (const b of blendFiles()) {
    const d = Math.min(...[b.id, b.designation, ...b.aliases].map((n) => editDistance(q, foldName(n))));
    scored.push({ id: b.id, d });
  }
  scored.sort((a, b) => a.d - b.d);
  return scored.filter((s) => s.d <= Math.max(2, q.length / 3)).slice(0, 3).map((s) => s.id);
}


/**
 * A pure fluid first (so pseudo-pure blend equations such as "R410A" keep their meaning), then a blend id
 * or alias, then a composition string "A:wA+B:wB" in mass fractions. Unknown names give one E_UNKNOWN_FLUID
 * with suggestions from both the fluids and the blends.
 */
export function resolveSubstance(name: string): Substance {
  if (typeof name !== "string" || name.trim() === "")
    throw new DomeprintError("E_UNKNOWN_FLUID", `fluid = ${JSON.stringify(name)}: missing; allowed: a fluid id, R-number, chemical name, blend id or a composition such as "R32:0.5+R125:0.5"`, { input: "fluid", value: name });
  const key = name.trim();
  // A composition string is never a fluid name; its own errors (unknown component, bad fraction) are the useful ones.
  if (key.includes(":")) return { kind: "mixture", mixture: getMixture(key) };
  try {
    return { kind: "pure", fluid: getFluid(key) };
  } catch (e) {
    if (!(e instanceof DomeprintError) || e.code !== "E_UNKNOWN_FLUID") throw e;
  }
  if (findBlend(key)) return { kind: "mixture", mixture: getMixture(key) };
  const suggestions = [...suggestFluids(key), ...suggestBlends(key)].filter((s, i, all) => all.indexOf(s) === i).slice(0, 5);
  const hint = suggestions.length ? `; did you mean ${suggestions.join(", ")}?` : "";
  const blends = blendFiles().map((b) => b.id);
  throw new DomeprintError(
    "E_UNKNOWN_FLUID",
    `fluid = ${JSON.stringify(name)}: unknown fluid${hint}; allowed: a fluid id, R-number or chemical name, a blend id, or a composition such as "R32:0.5+R125:0.5" (list them with 'domeprint fluids')`,
    { input: "fluid", value: name, allowed: [...fluidIds(), ...blends].join(", "), suggestions },
  );
}

/** The id a substance is known by in results. */
export function substanceId(s: Substance): string {
  return s.kind === "pure" ? s.fluid.id : s.mixture.id;
}
