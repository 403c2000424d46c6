// Gaussian bell-shaped terms n τ^t δ^d exp(−η(δ−ε)² − β(τ−γ)²), which shape the critical region.
// One exp per term carries the bell and the powers together; compiled to straight-line code.
import { columns, type ResidualKernel } from "./kernel.js";
import { compile, lit } from "./codegen.js";

export function gaussianTerms(rows: number[][], names: string[]): ResidualKernel {
  const cols = columns(rows, names, ["n", "t", "d", "eta", "epsilon", "beta", "gamma"]).map((c) => Array.from(c));
  const [n, t, d, eta, eps, beta, gamma] = cols as [number[], number[], number[], number[], number[], number[], number[]];
  const body: string[] = [];
  for (let i = 0; i < n.length; i++) {
    const ti = lit(t[i]!), di = lit(d[i]!), et = lit(eta[i]!), be = lit(beta[i]!);
    // A bell whose exponent passes 60 is below 1e-26 of its coefficient: skipped, far under rounding.
    body.push(`{ const dd = delta - ${lit(eps[i]!)}, dt = tau - ${lit(gamma[i]!)}, bell = ${et} * dd * dd + ${be} * dt * dt;`
      + ` if (bell < 60) {`
      + ` const u = ${lit(n[i]!)} * Math.exp(${ti} * lnTau + ${di} * lnDelta - bell);`
      + ` const A = ${di} - 2 * ${et} * delta * dd, B = ${ti} - 2 * ${be} * tau * dt;`
      + ` a += u; aD += u * A; aT += u * B;`
      + ` aDD += u * (A * A - ${di} - 2 * ${et} * delta * delta);`
      + ` aTT += u * (B * B - ${ti} - 2 * ${be} * tau * tau); aDT += u * A * B; } }`);
  }
  return { add: compile(body) };
}
