// Batch benchmark: one A3 sheet (SVG + PDF) for each of the 39 fluids in one spec, built on worker threads.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fluidIds } from "../dist/eos/index.js";
import { buildText } from "../dist/spec/index.js";

const ids = fluidIds();
const spec = `defaults: { paper: A3, formats: [svg, pdf], date: 2026-12-01 }\nsheets:\n${ids.map((id) => `  - ${id}`).join("\n")}\n`;
const out = mkdtempSync(join(tmpdir(), "domeprint-batch-"));
const t0 = performance.now();
const r = await buildText("batch.yaml", spec, { outDir: out });
const s = (performance.now() - t0) / 1000;
const labels = r.outcomes.reduce((a, o) => ({ placed: a.placed + (o.labels?.placed ?? 0), dropped: a.dropped + (o.labels?.dropped ?? 0) }), { placed: 0, dropped: 0 });
console.log(`batch: ${ids.length} A3 sheets (SVG + PDF) in ${s.toFixed(1)} s wall time on ${Math.min(2, ids.length)} worker threads (target ≤ 30 s); ${r.failed} failed; labels placed ${labels.placed}, dropped ${labels.dropped}`);
for (const o of r.outcomes.filter((x) => !x.ok)) console.log(`  failed ${o.path}: ${o.error}`);
