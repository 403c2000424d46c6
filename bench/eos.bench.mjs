// Property-engine benchmark (run against dist/ after `npm run build`): ns per full property set at (T, ρ),
// µs per saturation at T and per (p, h) and (p, s) flash, after warm-up, over varied states (process CPU time).
import { cpuTimePerCall } from "./clock.mjs";
import { getFluid, propertiesTRho, PROP_SLOTS, saturationT, flashTP, flashPH, flashPS } from "../dist/eos/index.js";

const FLUIDS = ["water", "co2", "R134a", "propane", "ammonia", "R410A"];

const time = (fn) => cpuTimePerCall(fn);

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
  const Ts0 = Float64Array.from(states, (s) => s.T), rhos = Float64Array.from(states, (s) => s.rho / f.M);
  const m = f.model, M = f.M, count = states.length;
  const props = time(() => { for (let k = 0; k < count; k++) propertiesTRho(m, M, Ts0[k], rhos[k], out); }) / count;
  const Ts = Array.from({ length: 32 }, (_, i) => f.Tmin + (f.satTmax - 1 - f.Tmin) * i / 31);
  const sat = time(() => { for (const T of Ts) saturationT(f, T); }) / Ts.length;
  const ph = time(() => { for (const s of states) flashPH(f, s.p, s.h); }) / states.length;
  const ps = time(() => { for (const s of states) flashPS(f, s.p, s.s); }) / states.length;
  rows.push({ fluid: id, "props ns": (props * 1e6).toFixed(0), "saturation µs": (sat * 1e3).toFixed(2), "(p,h) µs": (ph * 1e3).toFixed(2), "(p,s) µs": (ps * 1e3).toFixed(2), states: states.length });
}
console.log("property engine (targets: props ≤ 200 ns R134a, ≤ 600 ns water and CO2; saturation ≤ 10 µs; flash ≤ 15 µs)");
console.table(rows);
