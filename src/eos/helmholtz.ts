// The reduced Helmholtz energy α(δ, τ) = α⁰ + αʳ of one fluid, assembled from its term tables.
// Evaluation writes into two reusable typed arrays, so the hot path allocates nothing.
import type { FluidFile, IdealTerm, ResidualTerm } from "./fluid-file.js";
import type { IdealKernel, ResidualKernel } from "./terms/kernel.js";
import { powerTerms } from "./terms/power.js";
import { gaussianTerms } from "./terms/gaussian.js";
import { gaussianRationalTerms } from "./terms/gaussian-rational.js";
import { powerDoubleExpTerms } from "./terms/power-double-exp.js";
import { nonanalyticTerms } from "./terms/nonanalytic.js";
import { cp0Power, linearTau, logTau, planckEinstein, planckEinsteinGeneral, tauPower } from "./terms/ideal.js";

function residualKernel(term: ResidualTerm): ResidualKernel {
  switch (term.type) {
    case "power": return powerTerms(term.rows, term.columns);
    case "gaussian": return gaussianTerms(term.rows, term.columns);
    case "gaussian-rational": return gaussianRationalTerms(term.rows, term.columns);
    case "power-double-exp": return powerDoubleExpTerms(term.rows, term.columns);
    case "nonanalytic": return nonanalyticTerms(term.rows, term.columns);
  }
}

function idealKernel(term: IdealTerm, Tr: number): IdealKernel {
  switch (term.type) {
    case "lead":
    case "offset": return linearTau(term.a1, term.a2);
    case "log-tau": return logTau(term.a);
    case "tau-power": return tauPower(term.rows, term.columns);
    case "planck-einstein": return planckEinstein(term.rows, term.columns, "theta");
    case "planck-einstein-kelvin": return planckEinstein(term.rows, term.columns, "theta_K", 1 / Tr);
    case "planck-einstein-general": return planckEinsteinGeneral(term.rows, term.columns);
    case "cp0-power": return cp0Power(term.rows, term.columns, term.T0, Tr);
  }
}

export interface Helmholtz {
  /** Reducing temperature [K] and molar density [mol/m³]. */
  readonly Tr: number;
  readonly rhor: number;
  /** The equation's own molar gas constant [J/(mol K)]. */
  readonly R: number;
  /** Residual part after evalResidual: αʳ, δαʳ_δ, τααʳ_τ, δ²αʳ_δδ, τ²αʳ_ττ, δταʳ_δτ. */
  readonly r: Float64Array;
  /** Ideal part after evalIdeal (without ln δ): α⁰, τα⁰_τ, τ²α⁰_ττ; slot 3 holds ln δ after evalAll. */
  readonly i: Float64Array;
  evalResidual(tau: number, delta: number): void;
  evalIdeal(tau: number): void;
  /** Both parts at once, with ln τ and ln δ taken once (the full property set needs both). */
  evalAll(tau: number, delta: number): void;
}

/**
 * Chains a fluid's kernels into one function that clears the accumulator and calls each kernel in turn.
 * Built per fluid with its own call sites, so each site sees one kernel and stays monomorphic however many
 * fluids a process loads.
 */
function chain(fns: ((...args: never[]) => void)[], acc: Float64Array, outer: string[], prologue: string, inner: string[]): (...args: number[]) => void {
  const names = fns.map((_, k) => `k${k}`);
  const src = `const [${names.join(", ")}] = fns;
return function (${outer.join(", ")}) {
  ${Array.from(acc, (_, j) => `acc[${j}] = 0;`).join(" ")}
  ${prologue}
  ${names.map((n) => `${n}(${[...inner, "acc"].join(", ")});`).join("\n  ")}
};`;
  return new Function("fns", "acc", src)(fns, acc) as (...args: number[]) => void;
}

export function buildHelmholtz(f: FluidFile): Helmholtz {
  const Tr = f.reducing.T;
  const residual = f.residual.map(residualKernel);
  const ideal = f.ideal.map((t) => idealKernel(t, Tr));
  const r = new Float64Array(6);
  const i = new Float64Array(4);
  const evalResidual = chain(residual.map((k) => k.add), r, ["tau", "delta"], "const lnTau = Math.log(tau), lnDelta = Math.log(delta);", ["tau", "delta", "lnTau", "lnDelta"]);
  const evalIdeal = chain(ideal.map((k) => k.add), i.subarray(0, 3), ["tau"], "const lnTau = Math.log(tau);", ["tau", "lnTau"]);
  const rn = residual.map((_, k) => `r${k}`), idn = ideal.map((_, k) => `i${k}`);
  const evalAll = new Function("rf", "idf", "r", "i", `const [${rn.join(", ")}] = rf, [${idn.join(", ")}] = idf;
return function (tau, delta) {
  r[0] = 0; r[1] = 0; r[2] = 0; r[3] = 0; r[4] = 0; r[5] = 0; i[0] = 0; i[1] = 0; i[2] = 0;
  const lnTau = Math.log(tau), lnDelta = Math.log(delta);
  i[3] = lnDelta;
  ${rn.map((n) => `${n}(tau, delta, lnTau, lnDelta, r);`).join(" ")}
  ${idn.map((n) => `${n}(tau, lnTau, i);`).join(" ")}
};`)(residual.map((k) => k.add), ideal.map((k) => k.add), r, i) as (tau: number, delta: number) => void;
  return {
    Tr,
    rhor: f.reducing.rho,
    R: f.gasConstant,
    r,
    i,
    evalResidual,
    evalIdeal,
    evalAll,
  };
}
