// Water (IAPWS-95) against the release's verification tables and Debian's python3-iapws.
import { execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { flash, flashTRho, getFluid, saturationP, saturationT, propertiesTRho, PROP_SLOTS, P, H, S, CV, CP, W } from "../../src/eos/index.js";
import { rel, relScaled, rng } from "../support.js";

const water = getFluid("water");
const M = water.M;

describe("IAPWS-95 release, Table 6: α⁰, αʳ and their derivatives at T = 500 K, ρ = 838.025 kg/m³ (from memory)", () => {
  const tau = 647.096 / 500, delta = 838.025 / 322;
  const m = water.model;
  m.evalResidual(tau, delta);
  m.evalIdeal(tau);
  const cases: [string, number, number][] = [
    ["φ°", m.i[0]! + Math.log(delta), 0.204797733e1],
    ["φ°_δ", 1 / delta, 0.384236747],
    ["φ°_δδ", -1 / (delta * delta), -0.147637878],
    ["φ°_τ", m.i[1]! / tau, 0.904611106e1],
    ["φ°_ττ", m.i[2]! / (tau * tau), -0.193249185e1],
    ["φʳ", m.r[0]!, -0.342693206e1],
    ["φʳ_δ", m.r[1]! / delta, -0.364366650],
    ["φʳ_δδ", m.r[3]! / (delta * delta), 0.856063701],
    ["φʳ_τ", m.r[2]! / tau, -0.581403435e1],
    ["φʳ_ττ", m.r[4]! / (tau * tau), -0.223440737e1],
    ["φʳ_δτ", m.r[5]! / (delta * tau), -0.112176915e1],
  ];
  for (const [name, got, want] of cases) it(`${name} = ${want}`, () => expect(rel(got, want)).toBeLessThan(2e-8));
});

describe("IAPWS-95 release, Table 7: single-phase states (from memory)", () => {
  // T [K], ρ [kg/m³], p [MPa], c_v [kJ/(kg K)], w [m/s], s [kJ/(kg K)]
  const rows = [
    [300, 0.996556e3, 0.992418352e-1, 0.413018112e1, 0.150151914e4, 0.393062643],
    [300, 0.1005308e4, 0.200022515e2, 0.406798347e1, 0.153492501e4, 0.387405401],
    [300, 0.1188202e4, 0.700004704e3, 0.346135580e1, 0.244357992e4, 0.132609616],
    [500, 0.435, 0.999679423e-1, 0.150817541e1, 0.548314253e3, 0.794488271e1],
    [500, 0.4532e1, 0.999938125, 0.166991025e1, 0.535739001e3, 0.682502725e1],
    [500, 0.838025e3, 0.100003858e2, 0.322106219e1, 0.127128441e4, 0.256690919e1],
    [500, 0.1084564e4, 0.700000405e3, 0.307437693e1, 0.241200877e4, 0.203237509e1],
    [647, 0.358e3, 0.220384756e2, 0.618315728e1, 0.252145078e3, 0.432092307e1],
    [900, 0.241, 0.100062559, 0.175890657e1, 0.724027147e3, 0.916653194e1],
    [900, 0.52615e2, 0.200000690e2, 0.193510526e1, 0.698445674e3, 0.659070225e1],
    [900, 0.870769e3, 0.700000006e3, 0.266422350e1, 0.201933608e4, 0.417223802e1],
  ] as const;
  const out = new Float64Array(PROP_SLOTS);
  for (const [T, rho, p, cv, w, s] of rows) {
    it(`T = ${T} K, ρ = ${rho} kg/m³`, () => {
      propertiesTRho(water.model, M, T, rho / M, out);
      expect(rel(out[P]! / 1e6, p)).toBeLessThan(2e-8);
      expect(rel(out[CV]! / 1e3, cv)).toBeLessThan(2e-8);
      expect(rel(out[W]!, w)).toBeLessThan(2e-8);
      expect(rel(out[S]! / 1e3, s)).toBeLessThan(2e-8);
    });
  }
});

describe("IAPWS-95 release, Table 8: saturation (from memory)", () => {
  // T [K], p [MPa], ρ' ρ'' [kg/m³], h' h'' [kJ/kg], s' s'' [kJ/(kg K)]
  const rows = [
    [275, 0.698451167e-3, 0.999887406e3, 0.550664919e-2, 0.775972202e1, 0.250428995e4, 0.283094670e-1, 0.910660121e1],
    [450, 0.932203564, 0.890341250e3, 0.481200360e1, 0.749161585e3, 0.277441078e4, 0.210865845e1, 0.660921221e1],
    [625, 0.169082693e2, 0.567090385e3, 0.118290280e3, 0.168626976e4, 0.255071625e4, 0.380194683e1, 0.518506121e1],
  ] as const;
  for (const [T, p, rl, rv, hl, hv, sl, sv] of rows) {
    it(`T = ${T} K`, () => {
      const sat = saturationT(water, T);
      expect(rel(sat.pL / 1e6, p)).toBeLessThan(2e-8);
      expect(rel(sat.rhoL * M, rl)).toBeLessThan(2e-8);
      expect(rel(sat.rhoV * M, rv)).toBeLessThan(2e-8);
      const liq = flash(water, { T, x: 0 }), vap = flash(water, { T, x: 1 });
      expect(rel(liq.h / 1e3, hl)).toBeLessThan(2e-8);
      expect(rel(vap.h / 1e3, hv)).toBeLessThan(2e-8);
      expect(rel(liq.s / 1e3, sl)).toBeLessThan(2e-8);
      expect(rel(vap.s / 1e3, sv)).toBeLessThan(2e-8);
    });
  }
});

describe("Debian python3-iapws (IAPWS95 class): stored fixture, tests/fixtures/iapws.json", () => {
  const fixture = JSON.parse(readFileSync(new URL("../fixtures/iapws.json", import.meta.url), "utf8")) as { states: Record<string, number & string>[] };
  const states = fixture.states.filter((s) => s.fluid === "water");
  it("holds enough states to mean something", () => expect(states.length).toBeGreaterThan(50));
  const out = new Float64Array(PROP_SLOTS);
  it("single-phase p, h, s, c_v, c_p, w at (T, ρ) agree to 1e-9", () => {
    let worst = 0;
    for (const s of states.filter((x) => x.kind === "TD")) {
      propertiesTRho(water.model, M, s.T, s.rho / M, out);
      const scale = 461.51805 * s.T;
      worst = Math.max(worst, rel(out[P]!, s.p), relScaled(out[H]!, s.h, scale), relScaled(out[S]!, s.s, 461.51805), rel(out[CV]!, s.cv), rel(out[CP]!, s.cp), rel(out[W]!, s.w));
    }
    expect(worst).toBeLessThan(1e-9);
  });
  it("saturation pressure and densities agree to 1e-9 up to T_c − 0.5 K", () => {
    let worst = 0;
    for (const s of states.filter((x) => x.kind === "sat" && x.T <= 647.096 - 0.5)) {
      const sat = saturationT(water, s.T);
      worst = Math.max(worst, rel(sat.pL, s.p), rel(sat.rhoL * M, s.rhoL), rel(sat.rhoV * M, s.rhoV));
    }
    expect(worst).toBeLessThan(1e-9);
  });
});

// The live check runs python3-iapws at fresh random states; without it, this block is skipped and says so.
const python = "/usr/bin/python3";
function iapwsAvailable(): boolean {
  if (!existsSync(python)) return false;
  try {
    execFileSync(python, ["-c", "import iapws"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}
const live = iapwsAvailable();
if (!live) console.warn("python3-iapws is not installed: the live cross-check against it is SKIPPED (install Debian's python3-iapws)");

describe.skipIf(!live)("Debian python3-iapws (IAPWS95 class): live cross-check at fresh random states", () => {
  it("agrees to 1e-9 at 40 random single-phase states and 10 saturation temperatures", () => {
    const seed = Date.now() % 1e9;
    const rand = rng(seed);
    const reqs: { fluid: string; kind: string; T: number; rho?: number }[] = [];
    for (let i = 0; i < 40; i++) reqs.push({ fluid: "water", kind: "TD", T: 280 + rand() * 1000, rho: 10 ** (-2 + rand() * 5) });
    for (let i = 0; i < 10; i++) reqs.push({ fluid: "water", kind: "sat", T: 273.16 + rand() * (647.096 - 0.5 - 273.16) });
    const res = JSON.parse(execFileSync(python, [new URL("../reference/iapws_eval.py", import.meta.url).pathname], { input: JSON.stringify(reqs) }).toString()) as (Record<string, number> | null)[];
    const out = new Float64Array(PROP_SLOTS);
    let worst = 0, compared = 0;
    reqs.forEach((q, i) => {
      const r = res[i];
      if (!r) return; // inside the two-phase region, where the reference gives no single-phase state
      if (q.kind === "TD") {
        if (r.p! <= 0 || r.p! > 1e9) return;
        propertiesTRho(water.model, M, q.T, q.rho! / M, out);
        worst = Math.max(worst, rel(out[P]!, r.p!), relScaled(out[H]!, r.h!, 461.51805 * q.T), relScaled(out[S]!, r.s!, 461.51805));
      } else {
        const sat = saturationT(water, q.T);
        worst = Math.max(worst, rel(sat.pL, r.p!), rel(sat.rhoL * M, r.rhoL!), rel(sat.rhoV * M, r.rhoV!));
      }
      compared++;
    });
    expect(compared, `seed ${seed}`).toBeGreaterThan(25);
    expect(worst, `seed ${seed}`).toBeLessThan(1e-9);
  });
});

describe("water, facts of the trade (common practice)", () => {
  it("boils at 100 °C at 1.01325 bar (within 0.05 K: IAPWS-95 puts it at 99.974 °C)", () => {
    expect(Math.abs(saturationP(water, 101325).TL - 373.15)).toBeLessThan(0.05);
  });
  it("boils at about 120 °C at 2 bar absolute (within 0.5 K)", () => {
    expect(Math.abs(saturationP(water, 2e5).TL - 393.15)).toBeLessThan(0.5);
  });
  it("(T, ρ) inside the dome is reported as two-phase with the quality from the specific volume", () => {
    const st = flashTRho(water, 373.124, 10);
    expect(st.phase).toBe("two-phase");
    expect(st.x!).toBeGreaterThan(0);
    expect(st.x!).toBeLessThan(1);
  });
});
