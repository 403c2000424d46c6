// Single-stage cycles of real mixtures: every point recomputed from the mixture flashes independently of
// the cycle code, the energy balance, glide points on the real bubble and dew points, the pure limit, CLI.
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { flashTP, getFluid, getMixture, mixtureFlash, mixtureSaturationP } from "../../src/eos/index.js";
import { findPoint, singleStageCycle, twoStageCycle, type CycleResult } from "../../src/cycle/index.js";
import { cli } from "../cli/run.js";
import { rel } from "../support.js";

const C = (t: number) => t + 273.15;
const at = (r: CycleResult, role: Parameters<typeof findPoint>[1]) => findPoint(r.points, role)!.state;

describe("single-stage cycle of a real mixture", () => {
  const base = { evaporating: { T: C(-10) }, condensing: { T: C(40) }, superheat: 5, subcooling: 3, compressor: { efficiency: 0.7 } };

  for (const [id, glidePoint] of [["R454B", "dew"], ["R407C-mix", "mid"], ["R448A", "bubble"]] as const) {
    it(`${id} at ${glidePoint} points: each point is its definition, and the energy balance closes`, () => {
      const mix = getMixture(id);
      const r = singleStageCycle({ ...base, fluid: id, glidePoint });
      const q = { dew: 1, bubble: 0, mid: 0.5 }[glidePoint];
      // The levels: the given temperature sits at the chosen point of the glide at the level's pressure.
      for (const [level, T] of [[r.levels.evaporating, C(-10)], [r.levels.condensing!, C(40)]] as const) {
        expect(rel(mixtureFlash(mix, { T, x: q }).p, level.p)).toBeLessThan(1e-9);
        const sat = mixtureSaturationP(mix, level.p);
        expect(Math.abs(level.bubble - sat.bubble.T)).toBeLessThan(1e-7);
        expect(Math.abs(level.dew - sat.dew.T)).toBeLessThan(1e-7);
        expect(level.dew - level.bubble).toBeGreaterThan(0.3); // these blends glide (ASHRAE 34 zeotropes, common practice)
      }
      const pe = r.levels.evaporating.p, pc = r.levels.condensing!.p;
      const p1 = at(r, "evaporator-outlet"), p2 = at(r, "compressor-discharge"), p3 = at(r, "condenser-outlet"), p4 = at(r, "evaporator-inlet");
      expect(Math.abs(p1.T - (mixtureSaturationP(mix, pe).dew.T + 5))).toBeLessThan(1e-7);
      expect(Math.abs(p3.T - (mixtureSaturationP(mix, pc).bubble.T - 3))).toBeLessThan(1e-7);
      const s2 = mixtureFlash(mix, { p: pc, s: p1.s });
      expect(Math.abs((s2.h - p1.h) / (p2.h - p1.h) - 0.7)).toBeLessThan(1e-9);
      expect(Math.abs(p4.h - p3.h)).toBeLessThan(1e-3); // the throttle flash hits h to its tolerance
      expect(p4.phase).toBe("two-phase");
      expect(Math.abs(mixtureFlash(mix, { p: pe, h: p3.h }).T - p4.T)).toBeLessThan(1e-9);
      const perf = r.performance;
      expect(Math.abs(perf.refrigeratingEffect + perf.compressorWork - perf.heatRejected)).toBeLessThan(1e-3); // J/kg: h3 − h4 of the throttle flash
      expect(rel(perf.heatRejected, p2.h - p3.h)).toBeLessThan(1e-12);
      expect(perf.copCooling).toBeGreaterThan(1);
      expect(perf.copCooling).toBeLessThan(C(-10) / (C(40) - C(-10))); // below the Carnot COP of the levels
    });
  }

  it("pure limit: a trace of R125 in R32 gives R32's cycle", () => {
    const a = singleStageCycle({ ...base, fluid: "R32:0.9999999+R125:0.0000001" });
    const b = singleStageCycle({ ...base, fluid: "R32" });
    expect(rel(a.performance.copCooling, b.performance.copCooling)).toBeLessThan(1e-4);
    expect(rel(a.levels.condensing!.p, b.levels.condensing!.p)).toBeLessThan(1e-5);
  });

  it("R410A-mix against the pseudo-pure R410A equation fitted to the same mixture model: COP within 1 %", () => {
    const a = singleStageCycle({ ...base, fluid: "R410A-mix" });
    const b = singleStageCycle({ ...base, fluid: "R410A" });
    expect(rel(a.performance.copCooling, b.performance.copCooling)).toBeLessThan(0.01);
  });

  it("superheat is counted from the real dew point: a pure-fluid flash at the same T would not be vapour-side", () => {
    const r = singleStageCycle({ ...base, fluid: "R407C-mix", superheat: 0 });
    expect(at(r, "evaporator-outlet").x).toBe(1);
    expect(flashTP(getFluid("R32"), 300, 1e5).phase).toBe("vapour");
  });
});

describe("two-stage economiser cycle of a real mixture", () => {
  it("R448A: levels at the glide point, economiser heat balance, injection leaving at the dew point, energy balance", () => {
    const mix = getMixture("R448A");
    const r = twoStageCycle({ fluid: "R448A", evaporating: { T: C(-35) }, condensing: { T: C(40) }, glidePoint: "mid", superheat: 5, subcooling: 2,
      arrangement: "economiser", economiserApproach: 4, lowStage: { efficiency: 0.65 }, highStage: { efficiency: 0.7 } });
    expect(r.blend).toBe(true);
    expect(rel(mixtureFlash(mix, { T: C(-35), x: 0.5 }).p, r.levels.evaporating.p)).toBeLessThan(1e-9);
    const pi = r.levels.intermediate!.p;
    expect(rel(pi, Math.sqrt(r.levels.evaporating.p * r.levels.condensing!.p))).toBeLessThan(1e-12);
    const pt = (role: Parameters<typeof findPoint>[1]) => findPoint(r.points, role)!;
    const cond = pt("condenser-outlet"), out = pt("economiser-liquid-outlet"), injIn = pt("economiser-injection-inlet"), injOut = pt("economiser-injection-outlet");
    const main = out.flow * (cond.state.h - out.state.h), side = injIn.flow * (injOut.state.h - injIn.state.h);
    expect(Math.abs(main - side) / main).toBeLessThan(1e-7); // mixture flashes meet h to about 1e-3 J/kg
    expect(Math.abs(out.state.T - (injIn.state.T + 4))).toBeLessThan(1e-7);
    expect(Math.abs(injOut.state.h - mixtureSaturationP(mix, pi).dew.h)).toBeLessThan(1e-3);
    expect(Math.abs(cond.state.T - (mixtureSaturationP(mix, r.levels.condensing!.p).bubble.T - 2))).toBeLessThan(1e-7);
    const perf = r.performance;
    expect(Math.abs(perf.refrigeratingEffect + perf.compressorWork - perf.heatRejected) / perf.heatRejected).toBeLessThan(1e-8);
    expect(perf.copCooling).toBeLessThan(C(-35) / (C(40) - C(-35))); // below the Carnot COP of the levels
  });
  it("R407C-mix against the pseudo-pure R407C equation: economiser COP within 2 % (estimated HFC pair parameters)", () => {
    const spec = { evaporating: { T: C(-30) }, condensing: { T: C(40) }, glidePoint: "mid" as const, superheat: 5, arrangement: "economiser" as const, lowStage: { efficiency: 0.65 }, highStage: { efficiency: 0.7 } };
    const a = twoStageCycle({ ...spec, fluid: "R407C-mix" }), b = twoStageCycle({ ...spec, fluid: "R407C" });
    expect(rel(a.performance.copCooling, b.performance.copCooling)).toBeLessThan(0.02);
  });
});

describe("domeprint cycle with a real mixture", () => {
  it("R454B --json: levels at dew points with their glide, states and an energy balance that closes", () => {
    const r = cli(["cycle", "R454B", "--evaporating", "-10C", "--condensing", "40C", "--superheat", "5K", "--subcooling", "3K", "--efficiency", "0.7", "--json"]);
    expect(r.code).toBe(0);
    const o = JSON.parse(r.out);
    expect(o.fluid).toBe("R454B");
    expect(o.blend).toBe(true);
    expect(Math.abs(o.levels.evaporating.dew - C(-10))).toBeLessThan(1e-6);
    expect(o.levels.evaporating.bubble).toBeLessThan(o.levels.evaporating.dew);
    const p = o.performance;
    expect(Math.abs(p.refrigeratingEffect + p.compressorWork - p.heatRejected)).toBeLessThan(1e-3);
    expect(o.notes.join(" ")).toMatch(/real mixture/);
  });
  it("the table flags estimated pairs; a flash tank for a mixture is refused naming what is allowed", () => {
    const t = cli(["cycle", "R407C-mix", "--evaporating", "0C", "--condensing", "45C", "--efficiency", "0.65"]);
    expect(t.code).toBe(0);
    expect(t.out).toMatch(/binary parameters estimated for R32\/R125/);
    const r = cli(["cycle", "R454B", "--evaporating", "-35C", "--condensing", "35C", "--flash-tank", "--efficiency", "0.7"]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/arrangement = "flash-tank": .*compositions differ.*allowed: economiser for a real mixture/);
  });
});

describe("readings against a real mixture", () => {
  it("each reading's state is the (T, p) flash; margins from the real bubble and dew points; a warm liquid is flagged", () => {
    const file = join(mkdtempSync(join(tmpdir(), "domeprint-readings-")), "r.csv");
    writeFileSync(file, "name,p [bar],T [C],expect\nsuction,5.2,-4,vapour\nwarm,22,45,liquid\n");
    const r = cli(["cycle", "R454B", "--readings", file, "--json"]);
    expect(r.code).toBe(0);
    const o = JSON.parse(r.out);
    const mix = getMixture("R454B");
    const [a, b] = o.readings;
    expect(a.state.h).toBe(mixtureFlash(mix, { T: C(-4), p: 5.2e5 }).h);
    const sat = mixtureSaturationP(mix, 5.2e5);
    expect(Math.abs(a.superheat - (C(-4) - sat.dew.T))).toBeLessThan(1e-9);
    expect(a.flags).toEqual([]);
    expect(b.flags[0].kind).toBe("above-bubble");
    expect(Math.abs(b.flags[0].limit - mixtureSaturationP(mix, 22e5).bubble.T)).toBeLessThan(1e-9);
  });
});
