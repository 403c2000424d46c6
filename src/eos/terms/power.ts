// Power terms n τ^t δ^d exp(−δ^l): the polynomial and exponential body of every multiparameter equation.
// Compiled to straight-line code (codegen.ts): τ^t, δ^d by multiplication, exp(−δ^l) once per distinct l.
import { columns, type ResidualKernel } from "./kernel.js";
import { compile, lit, powerStatements } from "./codegen.js";

export function powerTerms(rows: number[][], names: string[]): ResidualKernel {
  const [n, t, d, l] = columns(rows, names, ["n", "t", "d", "l"]).map((c) => Array.from(c)) as [number[], number[], number[], number[]];
  const tp = powerStatements("tau", "lnTau", "T", t);
  const dp = powerStatements("delta", "lnDelta", "D", [...d, ...l.filter((x) => x > 0)]);
  const body = [...tp.code, ...dp.code];
  const ls = [...new Set(l.filter((x) => x > 0))];
  ls.forEach((x, k) => body.push(`const E${k} = Math.exp(-${dp.expr.get(x)});`));
  for (let i = 0; i < n.length; i++) {
    const li = l[i]!, di = d[i]!, ti = t[i]!;
    const dl = li > 0 ? dp.expr.get(li)! : "0";
    const e = li > 0 ? ` * E${ls.indexOf(li)}` : "";
    body.push(`{ const u = ${lit(n[i]!)} * ${tp.expr.get(ti)} * ${dp.expr.get(di)}${e};`
      + ` const A = ${lit(di)} - ${lit(li)} * ${dl};`
      + ` a += u; aD += u * A; aT += u * ${lit(ti)};`
      + ` aDD += u * (A * A - ${lit(di)} - ${lit(li * (li - 1))} * ${dl});`
      + ` aTT += u * ${lit(ti * (ti - 1))}; aDT += u * A * ${lit(ti)}; }`);
  }
  return { add: compile(body) };
}
