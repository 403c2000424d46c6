// Nonanalytic terms n Δ^b δ ψ of the water (IAPWS-95) and CO2 equations, which reproduce the
// critical-point behaviour; derivatives as given in the IAPWS-95 release (Table 5), scaled on output.
// Compiled to straight-line code like the other term tables: quantities that several terms share
// (powers of |δ−1|, θ, Δ, ψ) are written once, and powers with rational exponents use roots, not exp/log.
import { columns, R_A, R_D, R_DD, R_DT, R_T, R_TT, type ResidualKernel } from "./kernel.js";
import { lit, powerStatements } from "./codegen.js";

/** Distance from δ = 1 below which δ is nudged: the derivatives hold (δ−1)^negative powers there. */
const SINGULAR_GAP = 1e-10;

/**
 * A term's ψ exponent C(δ−1)² + D(τ−1)² beyond which it is skipped: ψ < 2e-22 there, and even after the
 * largest derivative factors ((2D(τ−1))² ≈ 1e5) its share stays below 1e-16 of the residual part.
 */
const PSI_CUTOFF = 50;

/**
 * Statements computing |δ−1|^e (e ≥ 0, from `ad` = |δ−1|) into a named constant: by multiplication where e
 * is an integer, with one square or cube root where it is a multiple of 1/2 or 1/3, else by exp(e ln|δ−1|)
 * (flagged, so that ln|δ−1| is taken once).
 */
function distancePower(e: number, name: string): { code: string; usesLog: boolean } {
  const chain = (base: string, k: number) => Array.from({ length: k }, () => base).join(" * ");
  for (const [den, root] of [[1, ""], [2, "Math.sqrt(ad)"], [3, "Math.cbrt(ad)"]] as const) {
    const k = Math.round(e * den);
    if (Math.abs(e * den - k) > 1e-12 || k < 0 || k > 24) continue;
    const whole = Math.floor(k / den), rest = k % den;
    const parts = [chain("ad", whole), chain(`${name}r`, rest)].filter(Boolean).join(" * ") || "1";
    return { code: `${rest ? `const ${name}r = ${root}; ` : ""}const ${name} = ${parts};`, usesLog: false };
  }
  return { code: `const ${name} = Math.exp(${lit(e)} * lnAd);`, usesLog: true };
}

export function nonanalyticTerms(rows: number[][], names: string[]): ResidualKernel {
  const cols = columns(rows, names, ["n", "a", "b", "beta", "A", "B", "C", "D"]).map((c) => Array.from(c));
  const [n, a, b, beta, A, B, C, D] = cols as [number[], number[], number[], number[], number[], number[], number[], number[]];
  const count = n.length;
  // Shared quantities, keyed by the constants they depend on; each gets one name.
  const key = (...xs: number[]) => xs.join("|");
  const pows = new Map<number, string>(), thetas = new Map<string, string>(), deltas = new Map<string, string>(), psis = new Map<string, string>();
  const shared: string[] = [];
  let usesLnAd = false;
  const distance = (e: number) => {
    if (!pows.has(e)) {
      const nm = `q${pows.size}`, pw = distancePower(e, nm);
      pows.set(e, nm); shared.push(pw.code); usesLnAd ||= pw.usesLog;
    }
    return pows.get(e)!;
  };
  const terms = Array.from({ length: count }, (_, i) => {
    const ni = n[i]!, ai = a[i]!, bi = b[i]!, be = beta[i]!, Ai = A[i]!, Bi = B[i]!, Ci = C[i]!, Di = D[i]!;
    // ((δ−1)²)^(1/(2β) − 1) = |δ−1|^(1/β − 2) and ((δ−1)²)^(a−1) = |δ−1|^(2a − 2).
    const p1 = distance(1 / be - 2), pa1 = distance(2 * ai - 2);
    const tk = key(be, Ai);
    if (!thetas.has(tk)) { const nm = `th${thetas.size}`; thetas.set(tk, nm); shared.push(`const ${nm} = 1 - tau + ${lit(Ai)} * ${p1} * d2;`); }
    const th = thetas.get(tk)!;
    const dk = key(be, Ai, ai, Bi);
    if (!deltas.has(dk)) {
      const nm = `De${deltas.size}`; deltas.set(dk, nm);
      shared.push(`let ${nm} = ${th} * ${th} + ${lit(Bi)} * ${pa1} * d2; if (${nm} < 1e-300) ${nm} = 1e-300; const ${nm}i = 1 / ${nm};`);
    }
    const De = deltas.get(dk)!;
    const pk = key(Ci, Di);
    if (!psis.has(pk)) psis.set(pk, `ps${psis.size}`);
    return { ni, ai, bi, be, Ai, Bi, Ci, Di, p1, pa1, th, De, ps: psis.get(pk)! };
  });
  const body: string[] = [
    "let delta = deltaIn;",
    `if (Math.abs(delta - 1) < ${SINGULAR_GAP}) delta = 1 + ${SINGULAR_GAP};`,
    "const dm1 = delta - 1, tm1 = tau - 1, d2 = dm1 * dm1, t2 = tm1 * tm1;",
  ];
  // The ψ exponents first: where every term's passes the cutoff, nothing else is computed.
  for (const [k, nm] of psis) {
    const [Ci, Di] = k.split("|").map(Number) as [number, number];
    body.push(`const ${nm}q = ${lit(Ci)} * d2 + ${lit(Di)} * t2;`);
  }
  body.push(`if (${[...psis.values()].map((nm) => `${nm}q >= ${PSI_CUTOFF}`).join(" && ")}) return;`);
  body.push("const ad = Math.abs(dm1);");
  if (usesLnAd) body.push("const lnAd = Math.log(ad);");
  body.push(...shared);
  body.push("let f = 0, fD = 0, fT = 0, fDD = 0, fTT = 0, fDT = 0;");
  // One block per ψ, skipped whole past the cutoff. Inside, Δ^b once per distinct (Δ, b): by square
  // roots where b is a multiple of 1/8 (CO2's 7/8), else exp(b ln Δ) with ln Δ taken once per block.
  let dbCount = 0;
  for (const nm of psis.values()) {
    const block: string[] = [`const ${nm} = Math.exp(-${nm}q);`];
    const powersOfDelta = new Map<string, string>(), logged = new Set<string>();
    for (const t of terms.filter((x) => x.ps === nm)) {
      const { ni, ai, bi, be, Ai, Bi, Ci, Di, th, De, p1, pa1 } = t;
      const dbk = `${De}^${bi}`;
      if (!powersOfDelta.has(dbk)) {
        const Db = `Dp${dbCount++}`;
        const pw = powerStatements(De, `${De}ln`, `${Db}_`, [bi]);
        if (pw.code.some((c) => c.includes("Math.exp")) && !logged.has(De)) { logged.add(De); block.push(`const ${De}ln = Math.log(${De});`); }
        block.push(...pw.code, `const ${Db} = ${pw.expr.get(bi)};`);
        powersOfDelta.set(dbk, Db);
      }
      const Db = powersOfDelta.get(dbk)!;
      // Δ, θ and their derivatives; (1/(δ−1))·∂Δ/∂δ is kept as `r` to avoid a 0/0 at δ = 1.
      block.push(`{ const r = ${lit(Ai * 2 / be)} * ${th} * ${p1} + ${lit(2 * Bi * ai)} * ${pa1};`
        + ` const dDelta = dm1 * r;`
        + ` const ddDelta = r + ${lit(4 * Bi * ai * (ai - 1))} * ${pa1} + ${lit(2 * Ai * Ai / (be * be))} * ${p1} * ${p1} * d2 + ${lit(Ai * (4 / be) * (1 / (2 * be) - 1))} * ${th} * ${p1};`
        + ` const Db1 = ${Db} * ${De}i, Db2 = Db1 * ${De}i;`
        + ` const dDb = ${lit(bi)} * Db1 * dDelta;`
        + ` const ddDb = ${lit(bi)} * (Db1 * ddDelta + ${lit(bi - 1)} * Db2 * dDelta * dDelta);`
        + ` const tDb = ${lit(-2 * bi)} * ${th} * Db1;`
        + ` const ttDb = ${lit(2 * bi)} * Db1 + ${lit(4 * bi * (bi - 1))} * ${th} * ${th} * Db2;`
        + ` const dtDb = ${lit(-Ai * bi * 2 / be)} * Db1 * dm1 * ${p1} - ${lit(2 * bi * (bi - 1))} * ${th} * Db2 * dDelta;`
        + ` const psi = ${nm};`
        + ` const dPsi = ${lit(-2 * Ci)} * dm1 * psi, ddPsi = (${lit(2 * Ci)} * d2 - 1) * ${lit(2 * Ci)} * psi;`
        + ` const tPsi = ${lit(-2 * Di)} * tm1 * psi, ttPsi = (${lit(2 * Di)} * t2 - 1) * ${lit(2 * Di)} * psi;`
        + ` const dtPsi = ${lit(4 * Ci * Di)} * dm1 * tm1 * psi;`
        + ` const n = ${lit(ni)}, Db = ${Db};`
        + ` f += n * Db * delta * psi;`
        + ` fD += n * (Db * (psi + delta * dPsi) + dDb * delta * psi);`
        + ` fDD += n * (Db * (2 * dPsi + delta * ddPsi) + 2 * dDb * (psi + delta * dPsi) + ddDb * delta * psi);`
        + ` fT += n * delta * (tDb * psi + Db * tPsi);`
        + ` fTT += n * delta * (ttDb * psi + 2 * tDb * tPsi + Db * ttPsi);`
        + ` fDT += n * (Db * (tPsi + delta * dtPsi) + delta * dDb * tPsi + tDb * (psi + delta * dPsi) + dtDb * delta * psi); }`);
    }
    body.push(`if (${nm}q < ${PSI_CUTOFF}) {`, ...block, "}");
  }
  body.push(
    `acc[${R_A}] += f; acc[${R_D}] += delta * fD; acc[${R_T}] += tau * fT;`,
    `acc[${R_DD}] += delta * delta * fDD; acc[${R_TT}] += tau * tau * fTT; acc[${R_DT}] += delta * tau * fDT;`,
  );
  return { add: new Function("tau", "deltaIn", "lnTau", "lnDelta", "acc", body.join("\n")) as ResidualKernel["add"] };
}
