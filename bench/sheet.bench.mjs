// Benchmark of one A1 sheet in PDF and SVG: from a cold command (a fresh node process running the CLI)
// and in-process after warm-up, with the PDF's size. Run `npx tsc -p tsconfig.json` first.
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { renderSheet } from "../dist/sheet/index.js";
import { coldSheetMs, median } from "./clock.mjs";

const fluids = process.argv.slice(2).length ? process.argv.slice(2) : ["R717", "R134a", "R744", "R407C"];
const COLD_RUNS = 3, WARM_UP = 2, RUNS = 5;
const TARGET = { cold: 1500, warm: 500, pdfBytes: 2 * 1024 * 1024 };
const cold = (fluid, dir) => coldSheetMs(fluid, ["--paper", "A1", "--format", "pdf,svg", "--date", "2025-01-01", "-q", "-o", dir]);

async function warm(fluid) {
  const options = { fluid, paper: "A1", formats: ["pdf", "svg"], date: "2025-01-01" };
  for (let i = 0; i < WARM_UP; i++) await renderSheet(options);
  const times = [];
  let sheet;
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    sheet = await renderSheet(options);
    times.push(performance.now() - t0);
  }
  return { ms: median(times), sheet };
}

const dir = mkdtempSync(join(tmpdir(), "domeprint-bench-"));
console.log(`node ${process.version}; A1 sheet, PDF + SVG, default style; cold: median of ${COLD_RUNS} CLI runs; warm: median of ${RUNS} after ${WARM_UP} warm-up renders`);
console.log(`targets: cold ≤ ${TARGET.cold} ms, warm ≤ ${TARGET.warm} ms, PDF ≤ ${TARGET.pdfBytes / 1024 / 1024} MB`);
try {
  for (const fluid of fluids) {
    const colds = Array.from({ length: COLD_RUNS }, () => cold(fluid, dir));
    const { ms, sheet } = await warm(fluid);
    const pdf = statSync(join(dir, `${sheet.name}.pdf`)).size;
    const { placed, dropped } = sheet.report.labels;
    console.log(
      `${fluid.padEnd(7)} cold ${median(colds).toFixed(0).padStart(5)} ms  warm ${ms.toFixed(0).padStart(4)} ms  ` +
        `PDF ${(pdf / 1024).toFixed(0).padStart(5)} KiB  SVG ${(sheet.svg.length / 1024).toFixed(0).padStart(5)} KiB  labels ${placed} placed, ${dropped} dropped`,
    );
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}
