// domeprint build and demo end to end through the built command line: the README's demo command, a
// three-sheet spec, a sheet that fails without stopping the others, confinement of output names,
// interrupted builds, and byte-identical rebuilds.
import { spawn } from "node:child_process";
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DOMParser } from "@xmldom/xmldom";
import { BIN, cli } from "../cli/run.js";

const tmp = () => mkdtempSync(join(tmpdir(), "domeprint-build-"));

function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((n) => (statSync(join(dir, n)).isDirectory() ? filesUnder(join(dir, n)).map((f) => join(n, f)) : [n]));
}

function complete(file: string): boolean {
  const b = readFileSync(file);
  if (file.endsWith(".pdf")) return b.subarray(0, 5).toString() === "%PDF-" && b.subarray(-8).toString().includes("%%EOF");
  if (file.endsWith(".svg")) return b.toString().trimEnd().endsWith("</svg>");
  if (file.endsWith(".png")) return b.subarray(1, 4).toString() === "PNG" && b.subarray(-8, -4).toString() === "IEND";
  return true;
}

const THREE = `defaults: { paper: A4, formats: [pdf, svg], date: 2026-12-01 }
sheets:
  - fluid: R134a
    name: one/r134a
    cycles: [{ evaporating: -10C, condensing: 40C, superheat: 5K, subcooling: 3K, efficiency: 0.7 }]
  - { fluid: R-744, name: two, units: ip, pressure: psi }
  - { fluid: ammonia, name: three, lines: { isotherm: 20K, isochores: false }, window: { pMin: 0.5bar, pMax: 60bar } }
`;

describe("domeprint build", () => {
  it("the README's demo command writes the example sheets into out/demo", () => {
    const dir = tmp();
    const r = cli(["demo", "-o", dir]);
    expect(r.code, r.err).toBe(0);
    const files = filesUnder(join(dir, "demo"));
    for (const f of ["demo-spec.yaml", "harbourside-readings.csv", "larchmont-readings.csv"]) expect(files).toContain(f);
    const sheets = files.filter((f) => /\.(pdf|svg|png)$/.test(f));
    expect(sheets).toHaveLength(12);
    for (const f of sheets) expect(complete(join(dir, "demo", f)), f).toBe(true);
    const svg = readFileSync(join(dir, "demo", "harbourside-cold-store", "ammonia-wall-chart.svg"), "utf8");
    const doc = new DOMParser().parseFromString(svg, "image/svg+xml");
    expect(doc.getElementsByTagName("parsererror").length).toBe(0);
    expect(svg).toContain("Harbourside Cold Store");
  }, 240_000);

  it("builds a three-sheet spec: every file written, in subfolders where the names say so", () => {
    const dir = tmp();
    writeFileSync(join(dir, "three.yaml"), THREE);
    const r = cli(["build", join(dir, "three.yaml"), "-o", join(dir, "out")]);
    expect(r.code, r.err).toBe(0);
    expect(filesUnder(join(dir, "out")).sort()).toEqual(["one/r134a.pdf", "one/r134a.svg", "three.pdf", "three.svg", "two.pdf", "two.svg"]);
    expect(r.err).toMatch(/3 of 3 sheets built, 6 files written/);
  }, 240_000);

  it("a sheet that fails while writing does not stop the others; the run ends with a summary and exit 1", () => {
    const dir = tmp();
    writeFileSync(join(dir, "three.yaml"), THREE);
    mkdirSync(join(dir, "out", "two.svg"), { recursive: true }); // a folder where a file must go: the write fails
    const r = cli(["build", join(dir, "three.yaml"), "-o", join(dir, "out")]);
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/2 of 3 sheets built/);
    expect(r.err).toMatch(/sheets\[1\]/);
    expect(existsSync(join(dir, "out", "three.pdf"))).toBe(true);
    expect(existsSync(join(dir, "out", "one", "r134a.pdf"))).toBe(true);
    expect(existsSync(join(dir, "out", "two.pdf"))).toBe(false); // all of a sheet's files or none
  }, 240_000);

  it("refuses output names that would leave the output folder, before writing anything", () => {
    const dir = tmp();
    writeFileSync(join(dir, "s.yaml"), "sheets:\n  - { fluid: R32, name: ok }\n  - { fluid: R32, name: ../../escaped }\n");
    const r = cli(["build", join(dir, "s.yaml"), "-o", join(dir, "out")]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/sheets\[1\]\.name: "\.\.\/\.\.\/escaped": an output name must stay inside the output folder/);
    expect(existsSync(join(dir, "out"))).toBe(false);
    expect(existsSync(join(dir, "..", "escaped.svg"))).toBe(false);
  });

  it("an interrupted build leaves no partial file, and the next build clears its temporaries", async () => {
    const dir = tmp();
    const sheets = ["R134a", "R32", "R290", "R717", "R744", "R1234yf"].map((f) => `  - { fluid: ${f}, paper: A3 }`).join("\n");
    writeFileSync(join(dir, "six.yaml"), `defaults: { formats: [pdf, svg, png], dpi: 150, date: 2026-12-01 }\nsheets:\n${sheets}\n`);
    const out = join(dir, "out");
    const child = spawn(process.execPath, [BIN, "build", join(dir, "six.yaml"), "-o", out, "--jobs", "2"], { stdio: "ignore" });
    // Kill it hard once the first finished sheet has appeared, while others are being written.
    const t0 = Date.now();
    while (Date.now() - t0 < 120_000 && !filesUnder(out).some((f) => f.endsWith(".png") && !f.startsWith("."))) await new Promise((r) => setTimeout(r, 20));
    child.kill("SIGKILL");
    await new Promise((r) => child.on("exit", r));
    const left = filesUnder(out);
    for (const f of left.filter((x) => !x.startsWith("."))) expect(complete(join(out, f)), `${f} is complete`).toBe(true);
    // A rebuild sweeps the dead build's temporaries and completes.
    const r = cli(["build", join(dir, "six.yaml"), "-o", out]);
    expect(r.code, r.err).toBe(0);
    const after = filesUnder(out);
    expect(after.filter((f) => f.startsWith("."))).toEqual([]);
    expect(after.filter((f) => /\.(pdf|svg|png)$/.test(f))).toHaveLength(18);
  }, 300_000);

  it("rebuilding the same spec gives byte-identical SVG and PDF", () => {
    const dir = tmp();
    writeFileSync(join(dir, "s.yaml"), "fluid: R1234zeE\npaper: A4\ndate: 2026-12-01\nformats: [svg, pdf]\nname: r\ntitle: \"Tom & Jerry's <unit> Ø±ΔТ\"\n");
    expect(cli(["build", join(dir, "s.yaml"), "-o", join(dir, "a")]).code).toBe(0);
    expect(cli(["build", join(dir, "s.yaml"), "-o", join(dir, "b")]).code).toBe(0);
    for (const ext of ["svg", "pdf"]) expect(readFileSync(join(dir, "a", `r.${ext}`)).equals(readFileSync(join(dir, "b", `r.${ext}`))), ext).toBe(true);
    expect(readFileSync(join(dir, "a", "r.svg"), "utf8")).toContain("Tom &amp; Jerry&apos;s &lt;unit&gt; Ø±ΔТ");
  }, 240_000);
});

describe("specs with real mixtures", () => {
  it("a blend id and a composition string both build, with the blend's safety class and a design cycle", async () => {
    const { buildText } = await import("../../src/spec/index.js");
    const dir = tmp();
    const text = `defaults: { paper: A4, formats: [svg], date: 2026-12-01 }
sheets:
  - fluid: R454B
    name: r454b
    cycles: [{ evaporating: -10C, condensing: 40C, superheat: 5K, subcooling: 3K, efficiency: 0.7 }]
  - { fluid: "R32:0.7+R1234yf:0.3", name: custom }
`;
    const r = await buildText("m.yaml", text, { outDir: dir, jobs: 1 });
    expect(r.failed).toBe(0);
    const svg = readFileSync(join(dir, "r454b.svg"), "utf8");
    expect(svg).toContain("R-454B");
    expect(svg).toContain("A2L"); // ISO 817 class of R-454B (from memory, recorded in its blend file)
    expect(readFileSync(join(dir, "custom.svg"), "utf8")).toContain("R32 70 %");
  }, 240_000);
});
