// The phase envelope of a mixture at fixed composition, traced by Newton continuation in (ln K, ln T, ln p)
// on each side up to close to the critical point, where the K-factors pass 1 and the two sides are joined.
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
  /** Bubble side and dew side, each in order of rising pressure up to close to the critical point. */
  bubble: EnvelopePoint[];
  dew: EnvelopePoint[];
  /** The critical point (T [K], p [Pa], molar ρ [mol/m³]), interpolated between the sides where ln K passes 0. */
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

/** Near-critical: the two phases' densities within this log ratio; the trace stops there on each side. */
const NEAR_CRITICAL = 0.25;

/**
 * One side of the envelope from the bubble (feedLiquid) or dew point at T0 upwards in pressure, until the
 * phases come within NEAR_CRITICAL of each other, a step fails even when small, or the model's range ends.
 */
function traceSide(s: IncipientSolver, z: Float64Array, T0: number, feedLiquid: boolean, Tmax: number, pmax: number): { points: EnvelopePoint[]; dXdS: Float64Array; spec: number } {
  const N = s.N, n = N + 2;
  s.feedLiquid = feedLiquid;
  s.solveFromScratch(z, "T", T0);
  const side = feedLiquid ? "bubble" : "dew";
  const points: EnvelopePoint[] = [record(s, side)];
  const Xprev = new Float64Array(n), dPrev = new Float64Array(n), dir = new Float64Array(n);
  let spec = N, h = 0.1;
  let lastD = s.dXdS.slice();
  for (let k = 0; k < n; k++) dir[k] = s.dXdS[k]! * Math.sign(s.dXdS[N + 1]!);
  for (let step = 0; step < MAX_STEPS; step++) {
    Xprev.set(s.X);
    // The next spec is the unknown that moves fastest along the curve; ln T moves about a tenth as far as
    // ln p or ln K, so it is weighted up to compete fairly.
    let big = 0;
    for (let k = 0; k < n; k++) {
      const w = Math.abs(dir[k]!) * (k === N ? 10 : 1);
      if (w > big) { big = w; spec = k; }
    }
    const sgn = Math.sign(dir[spec]!);
    for (let k = 0; k < n; k++) dPrev[k] = dir[k]! / Math.abs(dir[spec]!);
    const rhoF = s.feed.rho, rhoT = s.trial.rho;
    let ok = false;
    for (let tries = 0; tries < 14; tries++) {
      let limit = h;
      for (let k = 0; k < n; k++) limit = Math.min(limit, (k === N ? 0.02 : 0.15) / Math.max(Math.abs(dPrev[k]!), 1e-12));
      const target = Xprev[spec]! + sgn * limit;
      for (let k = 0; k < n; k++) s.X[k] = Xprev[k]! + dPrev[k]! * (target - Xprev[spec]!);
      try {
        s.newton(z, spec, target);
        ok = true;
        h = Math.min(s.iterations <= 3 ? h * 1.6 : s.iterations > 8 ? h * 0.6 : h, 0.3);
        break;
      } catch (e) {
        if (!(e instanceof DomeprintError)) throw e;
        h *= 0.5;
        s.X.set(Xprev);
        s.feed.rho = rhoF;
        s.trial.rho = rhoT;
      }
    }
    if (!ok) break;
    const pt = record(s, side);
    if (pt.T > Tmax || pt.p > pmax) break;
    points.push(pt);
    let dot = 0;
    for (let k = 0; k < n; k++) dot += s.dXdS[k]! * dPrev[k]!;
    const sd = dot < 0 ? -1 : 1;
    for (let k = 0; k < n; k++) dir[k] = sd * s.dXdS[k]!;
    lastD = s.dXdS.slice();
    if (Math.abs(Math.log(pt.rhoFeed / pt.rhoTrial)) < NEAR_CRITICAL) break;
  }
  // Leave the solver at the last recorded point, with its sensitivities.
  const last = points[points.length - 1]!;
  s.X.set(last.lnK);
  s.X[N] = Math.log(last.T);
  s.X[N + 1] = Math.log(last.p);
  return { points, dXdS: lastD, spec };
}

/**
 * Traces the envelope of feed z: the bubble side and the dew side, each from T0 upwards in pressure to close
 * to the critical point; the critical point itself is where both sides' ln K, continued by cubic Hermite
 * interpolation in the dominant ln K (which changes sign there), reach zero. Throws E_CONVERGENCE if a side
 * cannot be started.
 */
export function traceEnvelope(m: MixtureModel, z: Float64Array, T0: number, Tmax: number, pmax: number): Envelope {
  const N = m.N;
  const s = new IncipientSolver(m);
  const b = traceSide(s, z, T0, true, Tmax, pmax);
  const d = traceSide(s, z, T0, false, Tmax, pmax);
  const bubble = b.points, dew = d.points;
  const pb = bubble[bubble.length - 1]!, pd = dew[dew.length - 1]!;
  // The dominant component: largest |ln K| at the end of the bubble side.
  let k = 0;
  for (let i = 0; i < N; i++) if (Math.abs(pb.lnK[i]!) > Math.abs(pb.lnK[k]!)) k = i;
  const S0 = pb.lnK[k]!, S1 = pd.lnK[k]!;
  let critical: Envelope["critical"];
  const db = b.dXdS, dd = d.dXdS;
  if (S0 * S1 < 0 && Number.isFinite(db[k]!) && Number.isFinite(dd[k]!) && db[k] !== 0 && dd[k] !== 0) {
    const lnT = hermite(S0, Math.log(pb.T), db[N]! / db[k]!, S1, Math.log(pd.T), dd[N]! / dd[k]!, 0);
    const lnp = hermite(S0, Math.log(pb.p), db[N + 1]! / db[k]!, S1, Math.log(pd.p), dd[N + 1]! / dd[k]!, 0);
    const f = S0 / (S0 - S1);
    critical = { T: Math.exp(lnT), p: Math.exp(lnp), rho: 0.5 * ((1 - f) * (pb.rhoFeed + pb.rhoTrial) + f * (pd.rhoFeed + pd.rhoTrial)) };
  } else {
    // No sign change to interpolate across (an azeotrope-like end): the midpoint of the two ends.
    critical = { T: 0.5 * (pb.T + pd.T), p: Math.sqrt(pb.p * pd.p), rho: 0.25 * (pb.rhoFeed + pb.rhoTrial + pd.rhoFeed + pd.rhoTrial) };
  }
  // The interpolation must not fall below the sides it closes.
  critical.T = Math.max(critical.T, pb.T, pd.T);
  critical.p = Math.max(critical.p, pb.p, pd.p);
  if (!(critical.T > 0 && critical.p > 0)) throw convergenceError("phase envelope", "the critical point");
  const all = [...bubble, ...dew];
  const bar = all.reduce((a, q) => (q.p > a.p ? q : a));
  const therm = all.reduce((a, q) => (q.T > a.T ? q : a));
  return {
    bubble, dew, critical,
    cricondenbar: bar.p > critical.p ? { T: bar.T, p: bar.p } : { T: critical.T, p: critical.p },
    cricondentherm: therm.T > critical.T ? { T: therm.T, p: therm.p } : { T: critical.T, p: critical.p },
  };
}
