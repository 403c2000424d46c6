// The packed tarball installs into an empty folder; its `npx domeprint --help` works and it renders a sheet.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

describe("npm pack", () => {
  it("installs into an empty folder, answers --help and renders a sheet", () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-pack-"));
    execFileSync("npm", ["pack", "--pack-destination", dir, "--silent"], { cwd: ROOT, stdio: "pipe" });
    const tgz = readdirSync(dir).find((f) => f.endsWith(".tgz"))!;
    expect(tgz).toMatch(/^domeprint-\d+\.\d+\.\d+\.tgz$/);
    const app = join(dir, "app");
    mkdirSync(app);
    execFileSync("npm", ["init", "-y"], { cwd: app, stdio: "pipe" });
    execFileSync("npm", ["install", "--no-audit", "--no-fund", join(dir, tgz)], { cwd: app, stdio: "pipe", timeout: 280_000 });
    const help = spawnSync("npx", ["domeprint", "--help"], { cwd: app, encoding: "utf8" });
    expect(help.status, help.stderr).toBe(0);
    expect(help.stdout).toMatch(/Usage: domeprint/);
    const sheet = spawnSync("npx", ["domeprint", "sheet", "R290", "--paper", "A4", "--format", "svg", "--date", "2026-12-01", "-o", "charts"], { cwd: app, encoding: "utf8" });
    expect(sheet.status, sheet.stderr).toBe(0);
    const svg = join(app, "charts", "R-290_A4_landscape.svg");
    expect(existsSync(svg)).toBe(true);
    expect(readFileSync(svg, "utf8")).toContain("R-290");
  }, 300_000);
});
