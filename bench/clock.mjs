// Timing helpers for the benchmarks. process.cpuUsage() itself costs about 2 µs on these machines, so it is
// read only once per batch of calls lasting about a millisecond, never per call.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

const CLI = fileURLToPath(new URL("../bin/domeprint.js", import.meta.url));

/** The median of a list of numbers (the mean of the middle two for an even count). */
export function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
}

/** Wall time [ms] of one cold `domeprint sheet FLUID …args` in a fresh node process; throws if it fails. */
export function coldSheetMs(fluid, args) {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, [CLI, "sheet", fluid, ...args], { encoding: "utf8" });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`domeprint sheet ${fluid} exited ${r.status}: ${r.stderr}`);
  return ms;
}

/** CPU time [ms] used by this process since the start value c0 (from process.cpuUsage()). */
function cpuMsSince(c0) {
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1000;
}

/**
 * ms of process CPU time per call of fn: best of `runs` runs of at least minMs each, after a warm-up. Calls
 * come in batches sized so that each lasts about a millisecond, so the clock's own cost stays under 0.5 %.
 */
export function cpuTimePerCall(fn, { minMs = 200, runs = 3 } = {}) {
  fn(); // warm-up and JIT
  let batch = 1;
  for (;;) { // calibrate on the wall clock, which is cheap to read
    const t0 = performance.now();
    for (let k = 0; k < batch; k++) fn();
    if (performance.now() - t0 >= 1 || batch >= 1 << 20) break;
    batch *= 2;
  }
  let best = Infinity;
  for (let rep = 0; rep < runs; rep++) {
    let n = 0, used = 0;
    const c0 = process.cpuUsage();
    while (used < minMs) {
      for (let k = 0; k < batch; k++) fn();
      n += batch;
      used = cpuMsSince(c0);
    }
    best = Math.min(best, used / n);
  }
  return best;
}
