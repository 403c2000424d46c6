// Benchmark of the isoline generator: time to trace the default line set of an A2 sheet, after warm-up.
// Run `npx tsc -p tsconfig.json` first, then `node bench/isolines.bench.mjs [fluid …]`; figures go to stdout.
import { buildLineSet } from "../dist/isolines/index.js";
import { median } from "./clock.mjs";

const fluids = process.argv.slice(2).length ? process.argv.slice(2) : ["R134a", "water", "co2", "R410A"];
const TARGET_MS = { R134a: 150, water: 300 };
const WARM_UP = 3, RUNS = 15;

/** One build, timed in this process's CPU time (steady on a shared machine) and in wall time. */
function timed(fluid) {
  const c0 = process.cpuUsage(), t0 = performance.now();
  const set = buildLineSet(fluid);
  const c = process.cpuUsage(c0);
  return { set, cpu: (c.user + c.system) / 1000, wall: performance.now() - t0 };
}

console.log(`node ${process.version}; default line set, A2 landscape frame 520 × 340 mm, tolerance 0.05 mm; ${WARM_UP} warm-up builds, median of ${RUNS} (CPU time of this process, wall time beside it)`);
for (const fluid of fluids) {
  for (let i = 0; i < WARM_UP; i++) buildLineSet(fluid);
  const runs = Array.from({ length: RUNS }, () => timed(fluid));
  const set = runs[0].set;
  const points = set.lines.reduce((n, l) => n + l.points.length, 0);
  const cpu = median(runs.map((r) => r.cpu)), wall = median(runs.map((r) => r.wall));
  const target = TARGET_MS[fluid] ? ` (target ≤ ${TARGET_MS[fluid]} ms: ${cpu <= TARGET_MS[fluid] ? "met" : "MISSED"})` : "";
  console.log(`${fluid.padEnd(6)} ${cpu.toFixed(1).padStart(6)} ms CPU, ${wall.toFixed(1).padStart(6)} ms wall${target}; ${set.lines.length} lines, ${points} points, ${set.stats.evaluations} evaluations`);
}
