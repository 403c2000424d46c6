// Spawns the built command line (bin/domeprint.js, run `npm run build` or `npm test` first) for end-to-end tests.
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

export const BIN = fileURLToPath(new URL("../../bin/domeprint.js", import.meta.url));

export function cli(args: string[], opts: { input?: string; env?: Record<string, string>; cwd?: string } = {}) {
  const r = spawnSync(process.execPath, [BIN, ...args], { input: opts.input, encoding: "utf8", cwd: opts.cwd, env: { ...process.env, ...opts.env }, timeout: 60_000 });
  return { code: r.status, out: r.stdout, err: r.stderr };
}
