// The phase envelope of a mixture at fixed composition, traced by Newton continuation in (ln K, ln T, ln p)
// from a low-pressure bubble point over the critical point (where every K passes 1) down the dew side.
import { convergenceError, DomeprintError } from "../../errors.js";
import { IncipientSolver } from "./incipient.js";
import type { MixtureModel } from "./model.js";

export interface EnvelopePoint {
  T: number;
  p: number;
  /** ln K of the incipient phase over the feed. */
  lnK: Float64Array;
  /** Molar densities [mol/m³] of the feed and the incipient phase. */
  rhoFeed: number;
  rhoTrial: number;
  /** Bubble side: the feed is the liquid; dew side: the feed is the vapour. */
  side: "bubble" | "dew";
}

export interface Envelope {
  /** Bubble side in order of rising pressure, then dew side in order of falling pressure. */
  bubble: EnvelopePoint[];
  dew: EnvelopePoint[];
  /** The critical point (T [K], p [Pa], molar ρ [mol/m³]), interpolated where the K-factors pass 1. */
  critical: { T: number; p: number; rho: number };
  /** Highest pressure and highest temperature on the envelope. */
  cricondenbar: { T: number; p: number };
  cricondentherm: { T: number; p: number };
}

const MAX_STEPS = 400;

function record(s: IncipientSolver, side: "bubble" | "dew"): EnvelopePoint {
  const N = s.N;
  return { T: Math.exp(s.X[N]!), p: Math.exp(s.X[N + 1]!), lnK: s.X.slice(0, N), rhoFeed: s.feed.rho, rhoTrial: s.trial.rho, side };
}

/** Cubic Hermite interpolation of y(S) between (S0, y0, dy0) and (S1, y1, dy1) at S. */
function hermite(S0: number, y0: number, d0: number, S1: number, y1: number, d1: number, S: number): number {
  const h = S1 - S0, t = (S - S0) / h, t2 = t * t, t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * h * d0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * h * d1;
}

/**
 * Traces the envelope of feed z, starting from the bubble point at T0 and ending on the dew side when the
 * pressure falls below the starting pressure (or T below Tmin). Throws E_CONVERGENCE if the trace breaks off.
 */
export function traceEnvelope(m: MixtureModel, z: Float64Array, T0: number, Tmin: number): Envelope {
  const N = m.N, n = N + 2;
  const s = new IncipientSolver(m);
  s.feedLiquid = true;
  s.solveFromScratch(z, "T", T0);
  const p0 = Math.exp(s.X[N + 1]!);
  const bubble: EnvelopePoint[] = [record(s, "bubble")], dew: EnvelopePoint[] = [];
  const Xprev = new Float64Array(n), dPrev = new Float64Array(n), dir = new Float64Array(n);
  let spec = N + 1;
  let h = 0.1;
  let critical: Envelope["critical"] | undefined;
  // Direction of travel in X: rising pressure at the start.
  for (let k = 0; k < n; k++) dir[k] = s.dXdS[k]! * Math.sign(s.dXdS[N + 1]!);
  for (let step = 0; step < MAX_STEPS; step++) {
    Xprev.set(s.X);
    // The next spec is the unknown that moves fastest along the curve; sensitivities are rescaled to it.
    let big = 0;
    for (let k = 0; k < n; k++) if (Math.abs(dir[k]!) > big) { big = Math.abs(dir[k]!); spec = k; }
    const sgn = Math.sign(dir[spec]!);
    for (let k = 0; k < n; k++) dPrev[k] = dir[k]! / Math.abs(dir[spec]!);
    const rhoF = s.feed.rho, rhoT = s.trial.rho;
    const wasLiquid: boolean = s.feedLiquid;
    let done = false;
    for (let tries = 0; ; tries++) {
      // Limit the step so that no log variable moves by more than about a tenth.
      let limit = h;
      for (let k = 0; k < n; k++) limit = Math.min(limit, (k === N ? 0.02 : 0.15) / Math.max(Math.abs(dPrev[k]!), 1e-12));
      let target = Xprev[spec]! + sgn * limit;
      let crossing = false;
      if (spec < N && Xprev[spec]! !== 0 && Math.sign(target) !== Math.sign(Xprev[spec]!)) {
        crossing = true;
        // Never aim at ln K = 0 itself (the trivial solution): land beyond it by at least a little.
        if (Math.abs(target) < 0.3 * Math.abs(Xprev[spec]!)) target = -0.3 * Xprev[spec]!;
      }
      const near = Math.abs(Math.log(rhoF / rhoT)) < 0.7;
      s.feedLiquid = crossing && near ? !wasLiquid : wasLiquid;
      for (let k = 0; k < n; k++) s.X[k] = Xprev[k]! + dPrev[k]! * (target - Xprev[spec]!);
      s.feed.rho = crossing && near ? rhoT : rhoF;
      s.trial.rho = crossing && near ? rhoF : rhoT;
      try {
        s.newton(z, spec, target);
      } catch (e) {
        if (!(e instanceof DomeprintError)) throw e;
        h *= 0.5;
        s.X.set(Xprev);
        s.feedLiquid = wasLiquid;
        s.feed.rho = rhoF;
        s.trial.rho = rhoT;
        if (h < 1e-5 || tries > 12) throw convergenceError("phase envelope", `T = ${Math.exp(Xprev[N]!)} K, p = ${Math.exp(Xprev[N + 1]!)} Pa`);
        continue;
      }
      if (crossing && near) {
        // The K-factors passed 1 between the two points: the critical point lies between them.
        const S0 = Xprev[spec]!, S1 = s.X[spec]!;
        const d1 = s.dXdS;
        const lnT = hermite(S0, Xprev[N]!, dPrev[N]!, S1, s.X[N]!, d1[N]!, 0);
        const lnp = hermite(S0, Xprev[N + 1]!, dPrev[N + 1]!, S1, s.X[N + 1]!, d1[N + 1]!, 0);
        const f = S0 / (S0 - S1);
        const rho = 0.5 * ((1 - f) * (rhoF + rhoT) + f * (s.feed.rho + s.trial.rho));
        critical = { T: Math.exp(lnT), p: Math.exp(lnp), rho };
      }
      h = Math.min(s.iterations <= 3 ? h * 1.6 : s.iterations > 8 ? h * 0.6 : h, 0.3);
      break;
    }
    const pt = record(s, s.feedLiquid ? "bubble" : "dew");
    (pt.side === "bubble" ? bubble : dew).push(pt);
    // Keep the direction of travel: the new sensitivities, signed to agree with the last direction.
    let dot = 0;
    for (let k = 0; k < n; k++) dot += s.dXdS[k]! * dPrev[k]!;
    const sd = dot < 0 ? -1 : 1;
    for (let k = 0; k < n; k++) dir[k] = sd * s.dXdS[k]!;
    if (!s.feedLiquid && (pt.p < p0 || pt.T < Tmin)) { done = true; }
    if (done) break;
  }
  if (!critical || dew.length === 0) throw convergenceError("phase envelope", `the trace did not close over the critical point (${bubble.length} bubble and ${dew.length} dew points)`);
  const all = [...bubble, ...dew];
  const bar = all.reduce((a, b) => (b.p > a.p ? b : a));
  const therm = all.reduce((a, b) => (b.T > a.T ? b : a));
  return { bubble, dew, critical, cricondenbar: { T: bar.T, p: bar.p }, cricondentherm: { T: therm.T, p: therm.p } };
}
