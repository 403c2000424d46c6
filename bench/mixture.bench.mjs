// Timing of the mixture engine (plain node against dist/; build first with `npx tsc -p tsconfig.json`):
// bubble and dew points at given T, and two-phase (p, h) flashes, for a binary, a ternary and a quinary blend.
import { getMixture, mixtureFlash, saturationPoint } from "../dist/eos/mixture/index.js";

function time(label, count, fn) {
  for (let i = 0; i < Math.min(20, count); i++) fn(i);
  const t0 = process.hrtime.bigint();
  for (let i = 0; i < count; i++) fn(i);
  const us = Number(process.hrtime.bigint() - t0) / 1e3 / count;
  console.log(`${label.padEnd(48)} ${us.toFixed(1).padStart(9)} µs`);
}

for (const id of ["R410A-mix", "R407C-mix", "R448A"]) {
  const t0 = process.hrtime.bigint();
  const mix = getMixture(id);
  mix.envelope();
  console.log(`${id}: envelope traced once in ${(Number(process.hrtime.bigint() - t0) / 1e6).toFixed(1)} ms (${mix.N} components)`);
  time(`${id} bubble point at T`, 400, (i) => saturationPoint(mix, "bubble", "T", 240 + (i % 80)));
  time(`${id} dew point at T`, 400, (i) => saturationPoint(mix, "dew", "T", 240 + (i % 80)));
  const p = 8e5;
  const lo = mixtureFlash(mix, { p, x: 0 }).h, hi = mixtureFlash(mix, { p, x: 1 }).h;
  time(`${id} two-phase (p, h) flash`, 200, (i) => mixtureFlash(mix, { p, h: lo + ((i % 97) + 1) / 99 * (hi - lo) }));
  time(`${id} liquid (p, h) flash`, 200, (i) => mixtureFlash(mix, { p, h: lo - 20e3 - (i % 50) * 1e3 }));
}

// A whole line set of a mixture (default window and families, A2 frame), in CPU time: the sheet's main cost.
const { buildLineSet } = await import("../dist/isolines/index.js");
for (const id of ["R454B", "R407C-mix"]) {
  const c0 = process.cpuUsage();
  const set = buildLineSet(id, { reference: "iir" });
  const c = process.cpuUsage(c0);
  console.log(`${`${id} line set (${set.lines.length} lines, ${set.stats.evaluations} evaluations)`.padEnd(48)} ${((c.user + c.system) / 1e3).toFixed(0).padStart(9)} ms CPU`);
}

// A full A3 sheet (PDF + SVG) of each: a cold command (fresh node process running the CLI, median of 3) and
// in-process after a warm-up render (median of 3). Target ≤ 3 s.
const { mkdtempSync, rmSync } = await import("node:fs");
const { tmpdir } = await import("node:os");
const { join } = await import("node:path");
const { renderSheet } = await import("../dist/sheet/index.js");
const { coldSheetMs, median } = await import("./clock.mjs");
const dir = mkdtempSync(join(tmpdir(), "domeprint-bench-"));
try {
  for (const id of ["R407C-mix", "R454B"]) {
    const cold = [];
    for (let i = 0; i < 3; i++) cold.push(coldSheetMs(id, ["--paper", "A3", "--format", "pdf,svg", "--date", "2026-12-01", "-q", "-o", dir]));
    const options = { fluid: id, paper: "A3", formats: ["pdf", "svg"], date: "2026-12-01" };
    await renderSheet(options);
    const warm = [];
    for (let i = 0; i < 3; i++) { const t0 = performance.now(); await renderSheet(options); warm.push(performance.now() - t0); }
    console.log(`${`${id} A3 sheet, PDF + SVG (target ≤ 3000 ms)`.padEnd(48)} cold ${median(cold).toFixed(0).padStart(5)} ms   warm ${median(warm).toFixed(0).padStart(5)} ms`);
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}
