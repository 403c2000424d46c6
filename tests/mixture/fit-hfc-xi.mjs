// Reproduces the ξ values in fluids/blends/binary-parameters.json ("reducingFit"): the one parameter of each
// Lemmon & Jacobsen 2004 pair whose reducing parameters the dataset lacks, fitted to a pseudo-pure bubble curve.
// Run after `npx tsc -p tsconfig.json`: node tests/mixture/fit-hfc-xi.mjs (prints ξ per pair; takes ~1 min).
import { getFluid } from "../../dist/eos/index.js";
import { MixtureModel } from "../../dist/eos/mixture/model.js";
import { IncipientSolver } from "../../dist/eos/mixture/incipient.js";
import { ReducingFunction } from "../../dist/eos/mixture/reducing.js";

function moleFractions(fluids, w) {
  const n = w.map((wi, i) => wi / fluids[i].M);
  const s = n.reduce((a, b) => a + b);
  return n.map((v) => v / s);
}

/** A model whose pairs listed in xis use T_r = Σ xᵢTᵢ + Σ xᵢxⱼξ (ζ = 0). */
function build(names, w, xis) {
  const fl = names.map((n) => getFluid(n));
  const z = moleFractions(fl, w);
  const m = new MixtureModel(fl, z);
  const T = fl.map((f) => f.model.Tr);
  const pairs = m.pairs.map((p) => {
    const key = [fl[p.i].id, fl[p.j].id].sort().join("/");
    const gammaT = key in xis ? (T[p.i] + T[p.j] + xis[key]) / (2 * Math.sqrt(T[p.i] * T[p.j])) : p.gammaT;
    return [p.i, p.j, key in xis ? 1 : p.betaT, gammaT, Math.sqrt(T[p.i] * T[p.j])];
  });
  Object.defineProperty(m, "Tred", { value: new ReducingFunction(T, pairs) });
  return { m, z };
}

/** Mean ln(p_mixture / p_ancillary) of the bubble pressure over 210–320 K. */
function meanDeviation(names, w, id, xis) {
  const { m, z } = build(names, w, xis);
  const s = new IncipientSolver(m);
  const anc = getFluid(id).pBubble;
  let sum = 0, n = 0;
  for (let T = 210; T <= 320; T += 10) {
    s.feedLiquid = true;
    s.solveFromScratch(z, "T", T);
    sum += Math.log(Math.exp(s.X[m.N + 1]) / anc.value(T));
    n++;
  }
  return sum / n;
}

function fit(names, w, id, xis, key) {
  let a = -10, b = 60;
  let fa = meanDeviation(names, w, id, { ...xis, [key]: a });
  let fb = meanDeviation(names, w, id, { ...xis, [key]: b });
  for (let k = 0; k < 60 && Math.abs(b - a) > 1e-4; k++) {
    let c = b - (fb * (b - a)) / (fb - fa);
    if (!(c > Math.min(a, b) && c < Math.max(a, b))) c = 0.5 * (a + b);
    const fc = meanDeviation(names, w, id, { ...xis, [key]: c });
    if (Math.abs(fc) < 1e-7) return c;
    if (fc > 0 === fa > 0) { a = c; fa = fc; } else { b = c; fb = fc; }
  }
  return 0.5 * (a + b);
}

// Standard compositions by mass (from memory): R410A 50/50 R32/R125; R507A 50/50 R125/R143a; R407C 23/25/52 R32/R125/R134a.
const xis = {};
xis["R125/R32"] = fit(["R32", "R125"], [0.5, 0.5], "R410A", xis, "R125/R32");
xis["R125/R143a"] = fit(["R125", "R143a"], [0.5, 0.5], "R507A", xis, "R125/R143a");
xis["R134a/R32"] = fit(["R32", "R125", "R134a"], [0.23, 0.25, 0.52], "R407C", xis, "R134a/R32");
console.log(JSON.stringify(xis, null, 1));
