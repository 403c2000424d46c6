// Compiles a table of terms into one straight-line JavaScript function at load time, the way fast
// numeric code is written by hand: powers by multiplication chains, one exp per exponential factor,
// coefficients as literals, no loops or array reads per term. The numbers stay data; only the shape is code.

/** Writes the statements that compute x^e for each distinct exponent; returns the expression for each. */
export function powerStatements(x: string, lnX: string, prefix: string, exponents: number[]): { code: string[]; expr: Map<number, string> } {
  const code: string[] = [];
  const expr = new Map<number, string>();
  const distinct = [...new Set(exponents)];
  let maxBit = -1;
  let roots = 0; // bit mask of needed roots: 1 = x^(1/2), 2 = x^(1/4), 4 = x^(1/8)
  const plans: { e: number; bits: number[]; r: number; neg: boolean; exact: boolean }[] = [];
  for (const e of distinct) {
    const k = Math.round(Math.abs(e) * 8);
    const exact = Math.abs(Math.abs(e) * 8 - k) < 1e-12 && k <= 8 * 256;
    if (!exact) { plans.push({ e, bits: [], r: 0, neg: false, exact }); continue; }
    const q = Math.floor(k / 8), r = k % 8;
    const bits: number[] = [];
    for (let b = 0; 1 << b <= q; b++) if (q & (1 << b)) bits.push(b);
    if (bits.length) maxBit = Math.max(maxBit, bits[bits.length - 1]!);
    roots |= (r & 4 ? 1 : 0) | (r & 2 ? 2 : 0) | (r & 1 ? 4 : 0);
    plans.push({ e, bits, r, neg: e < 0, exact });
  }
  for (let b = 0; b <= maxBit; b++) code.push(b === 0 ? `const ${prefix}b0 = ${x};` : `const ${prefix}b${b} = ${prefix}b${b - 1} * ${prefix}b${b - 1};`);
  if (roots) {
    code.push(`const ${prefix}r2 = Math.sqrt(${x});`);
    if (roots & 6) code.push(`const ${prefix}r4 = Math.sqrt(${prefix}r2);`);
    if (roots & 4) code.push(`const ${prefix}r8 = Math.sqrt(${prefix}r4);`);
  }
  plans.forEach((pl, j) => {
    const name = `${prefix}v${j}`;
    if (!pl.exact) {
      code.push(`const ${name} = Math.exp(${pl.e} * ${lnX});`);
    } else {
      const parts = pl.bits.map((b) => `${prefix}b${b}`);
      if (pl.r & 4) parts.push(`${prefix}r2`);
      if (pl.r & 2) parts.push(`${prefix}r4`);
      if (pl.r & 1) parts.push(`${prefix}r8`);
      const prod = parts.length ? parts.join(" * ") : "1";
      code.push(`const ${name} = ${pl.neg ? `1 / (${prod})` : prod};`);
    }
    expr.set(pl.e, name);
  });
  return { code, expr };
}

/** A literal that parses back to exactly the same double. */
export function lit(x: number): string {
  return Object.is(x, -0) ? "0" : `(${String(x)})`;
}

export type Kernel = (tau: number, delta: number, lnTau: number, lnDelta: number, acc: Float64Array) => void;

/** Builds the kernel from its body (statements using tau, delta, lnTau, lnDelta) and accumulator updates. */
export function compile(body: string[]): Kernel {
  const src = [
    "let a = 0, aD = 0, aT = 0, aDD = 0, aTT = 0, aDT = 0;",
    ...body,
    "acc[0] += a; acc[1] += aD; acc[2] += aT; acc[3] += aDD; acc[4] += aTT; acc[5] += aDT;",
  ].join("\n");
  return new Function("tau", "delta", "lnTau", "lnDelta", "acc", src) as Kernel;
}
