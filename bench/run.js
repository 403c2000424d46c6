// Runs every benchmark script in bench/ (files ending .bench.mjs) one after another, against dist/.
import { readdirSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

const dir = fileURLToPath(new URL(".", import.meta.url));
const only = process.argv[2];
let failed = 0;
for (const f of readdirSync(dir).filter((x) => x.endsWith(".bench.mjs") && (!only || x.includes(only))).sort()) {
  console.log(`\n== ${f}`);
  const r = spawnSync(process.execPath, [dir + f], { stdio: "inherit" });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
