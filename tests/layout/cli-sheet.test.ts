// `domeprint sheet` end to end in-process: files named by fluid and paper land in the output folder
// through temporary files; bad input exits 2 and leaves what was on disk as it was.

import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../../src/cli/main.js";
import type { Io } from "../../src/cli/io.js";
import { writeAtomically } from "../../src/sheet/index.js";

function capture(): Io & { stdout: string[]; stderr: string[] } {
  const stdout: string[] = [], stderr: string[] = [];
  return { out: (s) => void stdout.push(s), err: (s) => void stderr.push(s), quiet: false, colour: false, stdout, stderr };
}

describe("domeprint sheet", () => {
  it("writes the asked formats into the output folder and lists them", async () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-sheet-"));
    const io = capture();
    const code = await main(["sheet", "R-32", "--paper", "A4", "--orientation", "landscape", "--format", "svg,json", "--date", "2025-03-14", "-o", dir], io);
    expect(code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(["R-32_A4_landscape.json", "R-32_A4_landscape.svg"]);
    expect(io.stdout.join("")).toBe(`${join(dir, "R-32_A4_landscape.svg")}\n${join(dir, "R-32_A4_landscape.json")}\n`);
    expect(io.stderr.join("")).toMatch(/labels: \d+ placed, \d+ dropped/);
    const json = JSON.parse(readFileSync(join(dir, "R-32_A4_landscape.json"), "utf8"));
    expect(json.format).toBe("domeprint-sheet-data/1");
    expect(json.lines.lines.length).toBeGreaterThan(20);
  });

  it("leaves files already on disk alone when the input is bad", async () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-sheet-"));
    writeFileSync(join(dir, "R-32_A4_landscape.svg"), "old sheet");
    for (const args of [["R-9999"], ["R-32", "--paper", "B7"], ["R-32", "--format", "pdf,tiff"], ["R-32", "--date", "2025-02-30"], ["R-32", "--units", "cgs"], ["R-32", "--style", "no-such-style"]]) {
      const io = capture();
      const code = await main(["sheet", ...args, "-o", dir], io);
      expect(code).toBe(2);
      expect(io.stderr.join("")).toMatch(/domeprint: error: .*allowed/i);
    }
    expect(readdirSync(dir)).toEqual(["R-32_A4_landscape.svg"]);
    expect(readFileSync(join(dir, "R-32_A4_landscape.svg"), "utf8")).toBe("old sheet");
  });
});

describe("atomic writing", () => {
  it("writes every file or none, removing its temporary files", () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-write-"));
    writeFileSync(join(dir, "a.pdf"), "old a");
    expect(() => writeAtomically(dir, [{ name: "a.pdf", data: Buffer.from("new a") }, { name: join("missing", "b.svg"), data: Buffer.from("b") }])).toThrow();
    expect(readdirSync(dir)).toEqual(["a.pdf"]);
    expect(readFileSync(join(dir, "a.pdf"), "utf8")).toBe("old a");
    writeAtomically(dir, [{ name: "a.pdf", data: Buffer.from("new a") }]);
    expect(readFileSync(join(dir, "a.pdf"), "utf8")).toBe("new a");
    expect(existsSync(join(dir, "missing"))).toBe(false);
  });
});
