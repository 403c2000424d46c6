// The cycle command end to end: the built CLI's states agree with `domeprint props` at the same inputs,
// bad input exits 2 naming the value and what is allowed, and every result carries the caution line.
import { spawnSync } from "node:child_process";
import { readdirSync, statSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeAll, describe, expect, it } from "vitest";
import { cli } from "../cli/run.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const fixture = (name: string) => fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url));

/** Newest modification time of the sources this file exercises. */
function newestSource(): number {
  const dirs = ["src/cycle", "src/cli", "src/eos", "src/units"];
  return Math.max(...dirs.flatMap((d) => readdirSync(root + d).filter((f) => f.endsWith(".ts")).map((f) => statSync(`${root}${d}/${f}`).mtimeMs)));
}

beforeAll(() => {
  // Build when the compiled CLI is older than its sources (`npm test` builds first; a lone vitest run may not).
  let built = 0;
  try {
    built = statSync(root + "dist/cli/cycle.js").mtimeMs;
  } catch { /* not built yet */ }
  if (built < newestSource()) spawnSync(process.execPath, [root + "node_modules/typescript/bin/tsc", "-p", root + "tsconfig.json"], { stdio: "ignore" });
});

interface JsonState { T: number; p: number; h: number; s: number; rho: number; phase: string; x: number | null }
interface JsonPoint { point: string; roles: string[]; state: JsonState }

describe("states agree with `domeprint props` at the same inputs", () => {
  for (const [fluid, args] of [
    ["R134a", ["--evaporating", "-10C", "--condensing", "40C", "--superheat", "5K", "--subcooling", "3K", "--efficiency", "0.7", "--reference", "iir"]],
    ["R407C", ["--evaporating", "0C", "--condensing", "45C", "--glide-point", "mid", "--superheat", "5K", "--ihx", "0.5", "--efficiency", "0.65"]],
  ] as const) {
    it(`${fluid}: every point, flashed by props (one batch) from its (p, h)`, () => {
      const res = cli(["cycle", fluid, ...args, "--json"]);
      expect(res.code, res.err).toBe(0);
      const out = JSON.parse(res.out) as { reference: string; points: JsonPoint[]; auxiliary: JsonPoint[] };
      const points = [...out.points, ...out.auxiliary];
      const input = points.map((pt) => JSON.stringify({ p: pt.state.p, h: pt.state.h })).join("\n") + "\n";
      const pr = cli(["props", fluid, "--batch", "--reference", out.reference], { input });
      expect(pr.code, pr.err).toBe(0);
      const states = pr.out.trim().split("\n").map((l) => JSON.parse(l) as JsonState);
      expect(states).toHaveLength(points.length);
      points.forEach((pt, i) => {
        const st = states[i]!;
        expect(Math.abs(st.T / pt.state.T - 1)).toBeLessThan(1e-9);
        expect(Math.abs(st.s - pt.state.s)).toBeLessThan(1e-9 * Math.max(Math.abs(pt.state.s), 1e3));
        expect(Math.abs(st.rho / pt.state.rho - 1)).toBeLessThan(1e-8);
        expect(st.phase).toBe(pt.state.phase);
      });
    });
  }
  it("the evaporator outlet is props' state at (T_dew + superheat, p)", () => {
    const out = JSON.parse(cli(["cycle", "R134a", "--evaporating", "-10C", "--condensing", "40C", "--superheat", "5K", "--efficiency", "0.7", "--json"]).out) as { points: JsonPoint[] };
    const sat = JSON.parse(cli(["props", "R134a", "T=-10C", "x=1", "--json"]).out) as JsonState;
    const st = JSON.parse(cli(["props", "R134a", `T=${sat.T + 5}K`, `p=${sat.p}Pa`, "--json"]).out) as JsonState;
    const p1 = out.points[0]!;
    expect(p1.roles).toEqual(["evaporator-outlet", "compressor-suction"]);
    expect(Math.abs(p1.state.h - st.h)).toBeLessThan(1e-6);
  });
});

describe("bad input exits 2 with the value and what is allowed", () => {
  const base = ["cycle", "R134a", "--efficiency", "0.7"];
  const bad = (args: string[], re: RegExp) => {
    const r = cli(args);
    expect(r.code).toBe(2);
    expect(r.out).toBe("");
    expect(r.err).toMatch(re);
    expect(r.err).toMatch(/allowed: /);
  };
  it("evaporating above condensing", () => bad([...base, "--evaporating", "45C", "--condensing", "40C"], /evaporating = 45 °C \(318\.15 K\): its pressure .* is not below the condensing pressure/));
  it("negative superheat", () => bad([...base, "--evaporating", "-10C", "--condensing", "40C", "--superheat", "-5K"], /superheat = -5 K: negative; allowed: 0 K or more/));
  it("negative subcooling", () => bad([...base, "--evaporating", "-10C", "--condensing", "40C", "--subcooling", "-1K"], /subcooling = -1 K: negative/));
  it("a subcritical cycle above the critical point", () => bad(["cycle", "R744", "--efficiency", "0.7", "--evaporating", "-5C", "--condensing", "35C"], /condensing = 35 °C \(308\.15 K\): at or above the critical temperature of co2.*allowed: below 30\.9\d* °C/));
  it("a condensing pressure above the critical pressure", () => bad([...base, "--evaporating", "-10C", "--condensing", "45bar"], /condensing = 45 bar \(4500000 Pa\): at or above the critical pressure of R134a/));
  for (const eta of ["1.2", "0", "-0.5"]) {
    it(`efficiency ${eta}`, () => bad(["cycle", "R134a", "--evaporating", "-10C", "--condensing", "40C", "--efficiency", eta], new RegExp(`efficiency = ${eta}: outside \\(0, 1\\]; allowed: a number above 0 and at most 1`)));
  }
  it("a discharge temperature below the isentropic one", () => bad(["cycle", "R134a", "--evaporating", "-10C", "--condensing", "40C", "--discharge-temperature", "45C"], /discharge-temperature = 45 °C .*not above the isentropic discharge temperature/));
  it("a readings file without units", () => bad(["cycle", "R134a", "--readings", fixture("readings-no-units.csv")], /readings-no-units\.csv line 2: column "p" has no unit; allowed: p \[unit\] with unit one of/));
  it("no compressor description", () => bad(["cycle", "R134a", "--evaporating", "-10C", "--condensing", "40C"], /--efficiency: missing; allowed: --efficiency ETA/));
  it("a level without a unit", () => bad([...base, "--evaporating", "-10", "--condensing", "40C"], /--evaporating = "-10": not a temperature or pressure with a unit/));
  it("an unknown glide point", () => bad([...base, "--evaporating", "-10C", "--condensing", "40C", "--glide-point", "middle"], /--glide-point = "middle": not one of the choices; allowed: dew, bubble, mid/));
  it("cycle options with a readings file", () => bad(["cycle", "R134a", "--readings", fixture("readings-gauge.csv"), "--superheat", "5K"], /--superheat = "5K": not used with --readings/));
  it("a transcritical high side below the critical pressure", () => bad(["cycle", "R744", "--efficiency", "0.7", "--evaporating", "-5C", "--gas-cooler-outlet", "35C", "--high-pressure", "60bar"], /high-pressure = 60 bar .*not above the critical pressure 73\.77\d* bar/));
});

describe("output", () => {
  it("the table states the glide point, the assumptions and the caution", () => {
    const r = cli(["cycle", "R407C", "--evaporating", "0C", "--condensing", "45C", "--efficiency", "0.65", "--capacity", "10kW"]);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/evaporating +0\.0 °C at the dew point, at /);
    expect(r.out).toMatch(/pseudo-pure blend/);
    expect(r.out).toMatch(/suction volume flow +[\d.]+ m³\/h/);
    expect(r.out.trimEnd().split("\n").at(-1)).toMatch(/^Caution: .*documentation.*Local codes and licensed practice prevail\.$/);
  });
  it("JSON carries SI states with point numbers, performance and the caution", () => {
    const r = cli(["cycle", "ammonia", "--evaporating", "-35C", "--condensing", "35C", "--economiser", "--efficiency", "0.7,0.75", "--capacity", "50kW", "--json"]);
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out) as { model: string; points: JsonPoint[]; stages: { efficiency: number }[]; performance: Record<string, unknown>; caution: string };
    expect(j.model).toBe("two-stage-economiser");
    expect(j.points.map((p) => p.point)).toEqual(j.points.map((_, i) => String(i + 1)));
    expect(j.stages.map((s) => s.efficiency)).toEqual([0.7, 0.75]);
    for (const k of ["refrigeratingEffect", "compressorWork", "heatRejected", "copCooling", "copHeating", "pressureRatio", "dischargeTemperature", "volumetricCapacity", "capacity"]) expect(j.performance).toHaveProperty(k);
    expect(j.caution).toMatch(/^Caution: /);
  });
  it("transcritical search from the command line reports the optimum", () => {
    const r = cli(["cycle", "R744", "--evaporating", "-5C", "--gas-cooler-outlet", "35C", "--optimise-high-pressure", "--efficiency", "0.7", "--json"]);
    expect(r.code, r.err).toBe(0);
    const j = JSON.parse(r.out) as { optimum: { pressure: number; atBound: boolean }; highSide: { pressure: number } };
    expect(j.optimum.atBound).toBe(false);
    expect(j.highSide.pressure).toBe(j.optimum.pressure);
  });
  it("readings: a table with flags, or JSON with SI states", () => {
    const t = cli(["cycle", "R744", "--readings", fixture("readings-implausible.csv")]);
    expect(t.code, t.err).toBe(0);
    expect(t.out).toMatch(/4 of 5 readings flagged/);
    expect(t.out).toMatch(/suction wet: colder than the dew point/);
    expect(t.out).toMatch(/Caution: /);
    const j = JSON.parse(cli(["cycle", "R134a", "--readings", fixture("readings-gauge.csv"), "--json"]).out) as { atmosphere: number; readings: { state: JsonState; flags: unknown[] }[] };
    expect(j.readings).toHaveLength(4);
    expect(j.readings.every((x) => x.flags.length === 0)).toBe(true);
    expect(j.atmosphere).toBeGreaterThan(84000);
  });
  it("--help shows the models, the readings format and examples", () => {
    const r = cli(["cycle", "--help"]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Readings files/);
    expect(r.out).toMatch(/Examples:\n  domeprint cycle R134a --evaporating -10C --condensing 40C/);
  });
});
