// Benchmark of the isoline generator: time to trace the default line set of an A2 sheet, after warm-up.
// Run `npx tsc -p tsconfig.json` first, then `node bench/isolines.bench.mjs [fluid …]`; figures go to stdout.
import { buildLineSet } from "../dist/isolines/index.js";

const fluids = process.argv.slice(2).length ? process.argv.slice(2) : ["R134a", "water", "co2", "R410A"];
const WARM_UP = 3, RUNS = 10;

function points(set) {
  return set.lines.reduce((n, l) => n + l.points.length, 0);
}

function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
}

console.log(`node ${process.version}; default line set, A2 landscape frame 520 × 340 mm, tolerance 0.05 mm; ${WARM_UP} warm-up builds, median of ${RUNS}`);
for (const fluid of fluids) {
  for (let i = 0; i < WARM_UP; i++) buildLineSet(fluid);
  const times = [];
  let set;
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    set = buildLineSet(fluid);
    times.push(performance.now() - t0);
  }
  const families = {};
  for (const l of set.lines) families[l.quantity] = (families[l.quantity] ?? 0) + 1;
  console.log(
    `${fluid.padEnd(8)} median ${median(times).toFixed(1).padStart(7)} ms  min ${Math.min(...times).toFixed(1).padStart(7)} ms  ` +
    `lines ${String(set.lines.length).padStart(4)}  points ${String(points(set)).padStart(6)}  evaluations ${String(set.stats.evaluations).padStart(6)}  ` +
    Object.entries(families).map(([k, n]) => `${k} ${n}`).join(", "),
  );
}
