// At least 200 generated malformed specs: each is refused with an error that names the offending key path,
// maps to exit code 2, and writes nothing. Expected paths come from how each spec was broken, not from the code.
import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { stringify } from "yaml";
import { DomeprintError } from "../../src/errors.js";
import { buildText, KNOWN_KEYS } from "../../src/spec/index.js";
import { exitCodeFor } from "../../src/cli/io.js";

type Sheet = Record<string, unknown>;
const base = (): Sheet => ({ fluid: "R134a", paper: "A4", formats: ["svg"], date: "2026-12-01" });

interface Case { what: string; text: string; path: string }

function multi(sheets: Sheet[]): string {
  return stringify({ sheets });
}

/** Puts a broken sheet at index k of a three-sheet spec; the expected path is sheets[k] + the key. */
function at(k: number, broken: Sheet, key: string): Case {
  const sheets = [base(), base(), base()];
  sheets[k] = broken;
  return { what: `${key} in sheets[${k}]`, text: multi(sheets), path: `sheets[${k}]${key ? `.${key}` : ""}` };
}

function cases(): Case[] {
  const out: Case[] = [];
  // 1. misspelt keys, at every level (sheet, window, lines, cycles)
  for (const key of KNOWN_KEYS.sheet) {
    const typo = key.length > 3 ? key.slice(0, -1) + "x" : key + "x";
    const s = base();
    s[typo] = 1;
    out.push(at(out.length % 3, s, typo));
  }
  for (const key of KNOWN_KEYS.window) out.push(at(1, { ...base(), window: { [key + "x"]: "1bar" } }, `window.${key}x`));
  for (const key of KNOWN_KEYS.lines) out.push(at(2, { ...base(), lines: { [key + "z"]: 1 } }, `lines.${key}z`));
  for (const key of KNOWN_KEYS.cycle.slice(0, 10)) out.push(at(0, { ...base(), cycles: [{ [key + "q"]: "1" }] }, `cycles[0].${key}q`));
  // 2. wrong types
  const wrong: [string, unknown][] = [["fluid", 42], ["paper", true], ["orientation", "sideways"], ["units", "metric"], ["reference", "iso"],
    ["gauge", "yes"], ["saturationTable", "no"], ["title", 7], ["cycles", "design"], ["points", "a.csv"], ["dpi", "high"], ["cmyk", 1],
    ["lines", [1, 2]], ["window", "all"], ["formats", 3], ["name", false], ["date", 20261201], ["cropMarks", "true"], ["style", 5]];
  for (const [key, value] of wrong) for (const k of [0, 1, 2]) out.push(at(k, { ...base(), [key]: value }, key));
  // 3. values the engine or layout refuse
  for (const name of ["R134", "R-9999", "unobtainium", "water2", "CO3", "R-744b", "propanee", "R600x", "nitrogenn", "R1234zeX"])
    for (const k of [0, 1]) out.push(at(k, { ...base(), fluid: name }, "fluid"));
  for (const paper of ["A7", "B5", "letterx", "10x10", "99999x10", "A", "ARCH F", "Tabloidd"]) for (const k of [0, 1]) out.push(at(k, { ...base(), paper }, "paper"));
  for (const p of ["bar2", "torr", "psia2", "Pa/s"]) out.push(at(2, { ...base(), pressure: p }, "pressure"));
  for (const alt of ["300", "300furlongs", "20000m", "-900m", "lots"]) out.push(at(0, { ...base(), altitude: alt }, "altitude"));
  for (const style of ["nonexistent-style", "./missing-style.json"]) out.push(at(1, { ...base(), style }, "style"));
  for (const f of [["pdf", "docx"], ["tiff"], [], ["svg", "gif"]]) for (const k of [1, 2]) out.push(at(k, { ...base(), formats: f }, "formats"));
  for (const dpi of [0, 5, 100000]) out.push(at(0, { ...base(), dpi }, "dpi"));
  for (const d of ["2026-13-01", "yesterday", "2026-02-30"]) out.push(at(0, { ...base(), date: d }, "date"));
  for (const name of ["../escape", "/tmp/abs", "a/../../b", "bad|name", "..", "x/.."]) out.push(at(1, { ...base(), name }, "name"));
  for (const w of [{ pMax: "1e9bar" }, { pMin: "-1bar" }, { pMin: "5bar", pMax: "2bar" }, { hMin: "400kJ/kg", hMax: "300kJ/kg" }, { hMax: "99999kJ/kg" }, { pMin: "2furlongs" }]) {
    const key = Object.keys(w).length === 2 ? Object.keys(w)[1]! : Object.keys(w)[0]!;
    out.push(at(2, { ...base(), window: w }, `window.${key}`));
  }
  for (const l of [{ isotherm: "10furlong" }, { isentrope: "fine" }, { isenthalp: "25m" }]) out.push(at(0, { ...base(), lines: l }, `lines.${Object.keys(l)[0]}`));
  const cycle = { evaporating: "-10C", condensing: "40C", superheat: "5K", subcooling: "3K", efficiency: 0.7 };
  for (const c of [{ ...cycle, evaporating: "50C" }, { ...cycle, efficiency: 1.5 }, { ...cycle, superheat: "-5K" }, { ...cycle, condensing: "200C" },
    { ...cycle, evaporating: "-10" }, { ...cycle, efficiency: undefined }])
    out.push(at(1, { ...base(), cycles: [c] }, "cycles[0]"));
  for (const k of [0, 1, 2]) out.push(at(k, { ...base(), points: ["no-such-readings.csv"] }, "points[0]"));
  // 4. documents that are not specs at all, or YAML that does not parse
  out.push({ what: "a list", text: "- R134a\n- R32\n", path: "(top level)" });
  out.push({ what: "a number", text: "42\n", path: "(top level)" });
  out.push({ what: "empty sheets", text: "sheets: []\n", path: "sheets" });
  out.push({ what: "sheets not a list", text: "sheets: R134a\n", path: "sheets" });
  out.push({ what: "typo next to sheets", text: "sheets: [R134a]\ndefualts: {}\n", path: "defualts" });
  out.push({ what: "defaults typo", text: "defaults: { papr: A4 }\nsheets: [R134a]\n", path: "defaults.papr" });
  out.push({ what: "missing fluid", text: "paper: A4\n", path: "fluid" });
  out.push({ what: "bad YAML 1", text: "sheets:\n  - fluid: R134a\n   paper: A4\n", path: "line" });
  out.push({ what: "bad YAML 2", text: "fluid: [R134a\n", path: "line" });
  out.push({ what: "bad YAML 3", text: "fluid: R134a\nfluid: R32\n", path: "line" });
  out.push({ what: "bad JSON", text: '{"fluid": "R134a", "paper": "A4}', path: "line" });
  out.push({ what: "tab indent", text: "sheets:\n\t- fluid: R134a\n", path: "line" });
  return out;
}

describe("malformed specs are refused: exit code 2, the key path named, nothing written", () => {
  const all = cases();
  it(`generates at least 200 cases (${all.length})`, () => expect(all.length).toBeGreaterThanOrEqual(200));
  for (const c of all) {
    it(c.what, async () => {
      const dir = join(mkdtempSync(join(tmpdir(), "domeprint-bad-")), "out");
      let err: unknown;
      try {
        await buildText("spec.yaml", c.text, { outDir: dir, jobs: 1 });
      } catch (e) {
        err = e;
      }
      expect(err, `${c.what}: should be refused`).toBeInstanceOf(DomeprintError);
      const e = err as DomeprintError;
      expect(exitCodeFor(e)).toBe(2);
      expect(e.message.startsWith("spec.yaml: ")).toBe(true);
      expect(e.message, c.what).toContain(c.path === "line" ? "line " : `${c.path}`);
      expect(existsSync(dir), `${c.what}: nothing written`).toBe(false);
    });
  }
});
