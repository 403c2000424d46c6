// The robustness sweep: random (p, h) and (p, s) states across the window a chart would draw, for every
// fluid. Each must give a state with finite numbers or a typed DomeprintError; none may hang.
import { DomeprintError } from "../src/errors.js";
import { flashPH, flashPS, flashTP, fluidIds, getFluid, saturationT, type Fluid, type State } from "../src/eos/index.js";
import { rng } from "./support.js";

export interface SweepResult {
  fluid: string;
  tried: number;
  solved: number;
  typed: Record<string, number>;
  /** Untyped failures or non-finite numbers (must be zero). */
  defects: string[];
  /** Worst relative deviation of h (or s) after (p, h) → (T, p) → h. */
  worstRoundTrip: number;
  /** Slowest single flash [ms]. */
  slowestMs: number;
}

const NUMERIC: (keyof State)[] = ["T", "p", "rho", "v", "h", "s", "u", "g"];

function finite(st: State): boolean {
  for (const k of NUMERIC) if (!Number.isFinite(st[k] as number)) return false;
  for (const k of ["cv", "cp", "w", "x"] as const) if (st[k] !== null && !Number.isFinite(st[k]!)) return false;
  return true;
}

/** Window of a chart: p from the lowest saturation pressure (≥ 1 Pa) to 1.5 p_c, h and s from the triple liquid to T_max vapour. */
function window(f: Fluid) {
  const pLow = Math.max(f.pseudoPure ? f.pBubble!.value(f.Tmin) : f.data.triple.pVapour, 1);
  const pHigh = Math.min(1.5 * f.pc, f.pmax);
  const liq = saturationT(f, f.Tmin);
  const l = flashTP(f, f.Tmin, Math.max(liq.pL, pLow) * 1.0001);
  const v = flashTP(f, f.Tmax, pLow);
  const dh = v.h - l.h, ds = v.s - l.s;
  return { pLow, pHigh, h: [l.h - 0.05 * dh, v.h + 0.05 * dh], s: [l.s - 0.05 * ds, v.s + 0.05 * ds] };
}

export function sweepFluid(id: string, states: number, seed: number): SweepResult {
  const f = getFluid(id);
  const w = window(f);
  const rand = rng(seed);
  const res: SweepResult = { fluid: id, tried: 0, solved: 0, typed: {}, defects: [], worstRoundTrip: 0, slowestMs: 0 };
  for (let i = 0; i < states; i++) {
    const p = w.pLow * Math.pow(w.pHigh / w.pLow, rand());
    const byH = i % 2 === 0;
    const [a, b] = byH ? w.h : w.s;
    const y = a! + (b! - a!) * rand();
    res.tried++;
    const t0 = performance.now();
    try {
      const st = byH ? flashPH(f, p, y) : flashPS(f, p, y);
      if (!finite(st)) {
        res.defects.push(`${byH ? "h" : "s"} = ${y} at p = ${p}: non-finite value in ${JSON.stringify(st)}`);
        continue;
      }
      res.solved++;
      if (st.phase !== "two-phase") {
        const back = flashTP(f, st.T, st.p);
        const dev = Math.abs((byH ? back.h - y : back.s - y) / (byH ? Math.abs(y) + 1e4 : Math.abs(y) + 10));
        res.worstRoundTrip = Math.max(res.worstRoundTrip, dev);
      }
    } catch (e) {
      if (e instanceof DomeprintError) res.typed[e.code] = (res.typed[e.code] ?? 0) + 1;
      else res.defects.push(`${byH ? "h" : "s"} = ${y} at p = ${p}: ${String(e)}`);
    }
    res.slowestMs = Math.max(res.slowestMs, performance.now() - t0);
  }
  return res;
}

export function sweepAll(states: number, seed = 20261201): SweepResult[] {
  return fluidIds().map((id, k) => sweepFluid(id, states, seed + k));
}
