// Property-engine benchmark (run against dist/ after `npm run build`): ns per full property set at (T, ρ),
// µs per saturation at T and per (p, h) and (p, s) flash, after warm-up, over varied states (process CPU time).
import { getFluid, propertiesTRho, PROP_SLOTS, saturationT, flashTP, flashPH, flashPS } from "../dist/eos/index.js";

const FLUIDS = ["water", "co2", "R134a", "propane", "ammonia", "R410A"];

/** ms per call of fn, in this process's CPU time (steadier than wall time on a shared machine); best of 3 runs. */
function time(fn, minMs = 200) {
  fn(); // warm-up and JIT
  let best = Infinity;
  for (let rep = 0; rep < 3; rep++) {
    let n = 0;
    const c0 = process.cpuUsage();
    let used = 0;
    while (used < minMs * 1000) { fn(); n++; const c = process.cpuUsage(c0); used = c.user + c.system; }
    best = Math.min(best, used / 1000 / n);
  }
  return best;
}

const rows = [];
for (const id of FLUIDS) {
  const f = getFluid(id);
  // 64 states across liquid, vapour and supercritical regions.
  const states = [];
  for (let i = 0; i < 64; i++) {
    const T = f.Tmin + (Math.min(1.5 * f.Tc, f.Tmax) - f.Tmin) * ((i * 37) % 64) / 63;
    const p = Math.min(f.pc * 2, f.pmax) * Math.pow(10, -3 * ((i * 11) % 64) / 63);
    try { states.push(flashTP(f, T, p)); } catch { /* outside the range: skipped */ }
  }
  const out = new Float64Array(PROP_SLOTS);
  const TR = states.map((s) => [s.T, s.rho / f.M]);
  const props = time(() => { for (const [T, r] of TR) propertiesTRho(f.model, f.M, T, r, out); }) / TR.length;
  const Ts = Array.from({ length: 32 }, (_, i) => f.Tmin + (f.satTmax - 1 - f.Tmin) * i / 31);
  const sat = time(() => { for (const T of Ts) saturationT(f, T); }) / Ts.length;
  const ph = time(() => { for (const s of states) flashPH(f, s.p, s.h); }) / states.length;
  const ps = time(() => { for (const s of states) flashPS(f, s.p, s.s); }) / states.length;
  rows.push({ fluid: id, "props ns": (props * 1e6).toFixed(0), "saturation µs": (sat * 1e3).toFixed(2), "(p,h) µs": (ph * 1e3).toFixed(2), "(p,s) µs": (ps * 1e3).toFixed(2), states: states.length });
}
console.log("property engine (targets: props ≤ 200 ns R134a, ≤ 600 ns water and CO2; saturation ≤ 10 µs; flash ≤ 15 µs)");
console.table(rows);
