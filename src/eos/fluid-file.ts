// The domeprint fluid file (fluids/*.json): its schema, checked on every load, and its TypeScript type.
// One file per fluid holds identity, safety class, the equation's terms and citation, and ancillaries.
import { z } from "zod";

const num = z.number().refine(Number.isFinite, "must be a finite number");
const pos = num.refine((x) => x > 0, "must be positive");
const table = (cols: string[]) =>
  z.strictObject({
    columns: z.array(z.string()).refine((c) => c.length === cols.length && cols.every((x, i) => c[i] === x), `columns must be ${cols.join(", ")}`),
    rows: z.array(z.array(num).length(cols.length)).min(1),
  });
const withType = <T extends string>(type: T, cols: string[]) => table(cols).extend({ type: z.literal(type) });

export const idealTermSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("lead"), a1: num, a2: num }),
  z.strictObject({ type: z.literal("offset"), a1: num, a2: num }),
  z.strictObject({ type: z.literal("log-tau"), a: num }),
  withType("tau-power", ["n", "t"]),
  withType("planck-einstein", ["n", "theta"]),
  withType("planck-einstein-kelvin", ["n", "theta_K"]),
  withType("planck-einstein-general", ["n", "c", "d", "theta"]),
  table(["c", "t"]).extend({ type: z.literal("cp0-power"), T0: pos }),
]);

export const residualTermSchema = z.discriminatedUnion("type", [
  withType("power", ["n", "t", "d", "l"]),
  withType("gaussian", ["n", "t", "d", "eta", "epsilon", "beta", "gamma"]),
  withType("gaussian-rational", ["n", "t", "d", "eta", "epsilon", "beta", "gamma", "b"]),
  withType("power-double-exp", ["n", "t", "d", "l", "m"]),
  withType("nonanalytic", ["n", "a", "b", "beta", "A", "B", "C", "D"]),
]);

const ancillarySchema = table(["n", "t"]).extend({
  form: z.enum(["linear", "exp", "exp-reduced"]),
  Tr: pos,
  valueR: pos,
  Tmin: pos,
  Tmax: pos,
  maxErrorPercent: num,
});

const anchorState = z.strictObject({ T: pos, p: pos, rho: pos, h: num, s: num });

export const fluidFileSchema = z
  .strictObject({
    format: z.literal("domeprint-fluid/1"),
    units: z.string(),
    id: z.string().regex(/^[A-Za-z0-9]+$/),
    designation: z.string().regex(/^R-/),
    chemicalName: z.string().min(1),
    formula: z.string().min(1),
    aliases: z.array(z.string()),
    cas: z.string().nullable(),
    safety: z.strictObject({ class: z.string().nullable(), source: z.string(), note: z.string().optional() }),
    pseudoPure: z.boolean(),
    molarMass: pos,
    gasConstant: pos,
    reducing: z.strictObject({ T: pos, rho: pos }),
    critical: z.strictObject({ T: pos, p: pos, rho: pos }),
    triple: z.strictObject({ T: pos, pLiquid: pos, pVapour: pos, rhoLiquid: pos, rhoVapour: pos }),
    validity: z.strictObject({ Tmin: pos, Tmax: pos, pmax: pos }),
    equation: z.strictObject({
      authors: z.array(z.string()).min(1),
      title: z.string(),
      journal: z.string(),
      volume: z.string(),
      pages: z.string(),
      year: z.number().int(),
      note: z.string().optional(),
      citationSource: z.string(),
    }),
    ideal: z.array(idealTermSchema).min(1),
    residual: z.array(residualTermSchema).min(1),
    ancillaries: z.strictObject({
      pSat: ancillarySchema.optional(),
      pBubble: ancillarySchema.optional(),
      pDew: ancillarySchema.optional(),
      rhoLiquid: ancillarySchema,
      rhoVapour: ancillarySchema,
    }),
    transcriptionAnchors: z.object({ note: z.string() }).catchall(anchorState.or(z.string())),
  })
  .superRefine((f, ctx) => {
    const leads = f.ideal.filter((t) => t.type === "lead").length;
    if (leads !== 1) ctx.addIssue({ code: "custom", path: ["ideal"], message: `needs exactly one lead term, has ${leads}` });
    if (f.pseudoPure && !(f.ancillaries.pBubble && f.ancillaries.pDew))
      ctx.addIssue({ code: "custom", path: ["ancillaries"], message: "a pseudo-pure fluid needs pBubble and pDew ancillaries" });
    if (!f.pseudoPure && !f.ancillaries.pSat)
      ctx.addIssue({ code: "custom", path: ["ancillaries"], message: "a pure fluid needs a pSat ancillary" });
    if (f.validity.Tmax <= f.triple.T) ctx.addIssue({ code: "custom", path: ["validity", "Tmax"], message: "must exceed the triple-point temperature" });
  });

export type FluidFile = z.infer<typeof fluidFileSchema>;
export type IdealTerm = z.infer<typeof idealTermSchema>;
export type ResidualTerm = z.infer<typeof residualTermSchema>;
export type AncillaryData = z.infer<typeof ancillarySchema>;
