// The phase envelope of a mixture at fixed composition, traced by Newton continuation in (ln K, ln T, ln p).
// The bubble side is continued through the critical point, found where the K-factors pass 1 between two
// steps; the dew side is traced from below and joined to the stretch beyond the critical point.
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
  /**
   * The critical point (T [K], p [Pa], molar ρ [mol/m³]), where ln K passes 0: interpolated within the
   * continuation step that crosses it (`bracketed` true), or across the gap between the two sides' ends
   * where the continuation could not be carried through (false).
   */
  critical: { T: number; p: number; rho: number; bracketed: boolean };
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

/** Beyond the critical point the bubble trace goes on until the phases' densities differ by this log ratio. */
const NEAR_CRITICAL = 0.25;
/** Within this log density ratio of the phases the bubble trace steps in the dominant ln K. */
const CLOSING = 0.7;
/** Within this log density ratio the bubble trace steps across the critical point (see traceSide). */
const MIRROR = 0.05;
/** Within this log density ratio of the phases, each phase's density follows its own last root (see IncipientSolver). */
const NEAR_SWAP = 0.1;
/** Close to the critical point no step may change ln K by more than this fraction of its largest value. */
const APPROACH = 0.35;
/** ... but not below this step in ln K, so the crossing comes in a few steps. */
const MIN_APPROACH = 0.02;

interface Traced {
  points: EnvelopePoint[];
  dXdS: Float64Array;
  /** Bubble side carried through the critical point: the last step before and the first after it, with their slopes. */
  crossing?: { before: EnvelopePoint; dBefore: Float64Array; after: EnvelopePoint; dAfter: Float64Array; beyond: EnvelopePoint[] };
}

/**
 * One side of the envelope from the bubble (feedLiquid) or dew point at T0 upwards in pressure, until the
 * phases come within MIRROR of each other (`through` false), or on through the critical point until they are
 * NEAR_CRITICAL apart again on the other side (`through` true); or until a step fails even when small
 * or the model's range ends.
 */
function traceSide(s: IncipientSolver, z: Float64Array, T0: number, feedLiquid: boolean, Tmax: number, pmax: number, through: boolean): Traced {
  const N = s.N, n = N + 2;
  s.feedLiquid = feedLiquid;
  s.solveFromScratch(z, "T", T0);
  const side = feedLiquid ? "bubble" : "dew";
  const points: EnvelopePoint[] = [record(s, side)];
  const ratio0 = Math.sign(Math.log(points[0]!.rhoFeed / points[0]!.rhoTrial));
  let crossing: Traced["crossing"];
  const Xprev = new Float64Array(n), dPrev = new Float64Array(n), dir = new Float64Array(n);
  let spec = N, h = 0.1;
  let lastD = s.dXdS.slice();
  // The smallest step in ln K near the critical point, scaled to the K-factors at the start: a near-azeotrope's
  // ln K are a few hundredths where a wide-glide blend's are of order one.
  let lnK0 = 0;
  for (let k = 0; k < N; k++) lnK0 = Math.max(lnK0, Math.abs(s.X[k]!));
  const minApproach = Math.min(MIN_APPROACH, MIN_APPROACH * lnK0);
  let closing = false, lastRatio = Math.log(points[0]!.rhoFeed / points[0]!.rhoTrial);
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
    // Close to the critical point T and p pass their extremes while every ln K runs through 0: the
    // dominant ln K is the one spec that stays regular there.
    if (closing) {
      spec = 0;
      for (let k = 1; k < N; k++) if (Math.abs(Xprev[k]!) > Math.abs(Xprev[spec]!)) spec = k;
    }
    const sgn = Math.sign(dir[spec]!);
    for (let k = 0; k < n; k++) dPrev[k] = dir[k]! / Math.abs(dir[spec]!);
    const rhoF = s.feed.rho, rhoT = s.trial.rho;
    let ok = false;
    for (let tries = 0; tries < 14; tries++) {
      let limit = h;
      for (let k = 0; k < n; k++) limit = Math.min(limit, (k === N ? 0.02 : 0.15) / Math.max(Math.abs(dPrev[k]!), 1e-12));
      {
        // Approach the critical point in shrinking steps, so the step that crosses it (or the gap left) is short.
        let lnK = 0;
        for (let k = 0; k < N; k++) lnK = Math.max(lnK, Math.abs(Xprev[k]!));
        for (let k = 0; k < N; k++) limit = Math.min(limit, Math.max(APPROACH * lnK, minApproach) / Math.max(Math.abs(dPrev[k]!), 1e-12));
      }
      let target = Xprev[spec]! + sgn * limit;
      // Within MIRROR of the critical point, step straight across it to the mirror image of the last point
      // (ln K of the opposite sign, the phases' densities swapped), then to nearer images: approaching in ever
      // shorter steps would stall where Newton slows on the nearly singular equations.
      const mirror = closing && !crossing && Math.abs(lastRatio) < MIRROR;
      if (mirror) {
        target = -Xprev[spec]! * 0.5 ** Math.min(tries, 3);
        s.feed.rho = rhoT;
        s.trial.rho = rhoF;
      }
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
    let dot = 0;
    for (let k = 0; k < n; k++) dot += s.dXdS[k]! * dPrev[k]!;
    const sd = dot < 0 ? -1 : 1;
    for (let k = 0; k < n; k++) dir[k] = sd * s.dXdS[k]!;
    const lnRatio = Math.log(pt.rhoFeed / pt.rhoTrial);
    lastRatio = lnRatio;
    s.nearCritical = Math.abs(lnRatio) < NEAR_SWAP;
    closing = Math.abs(lnRatio) < CLOSING;
    if (crossing) {
      // Beyond the critical point the feed is at its dew point.
      crossing.beyond.push({ ...pt, side: "dew" });
      if (Math.abs(lnRatio) >= NEAR_CRITICAL) break;
      continue;
    }
    if (through && Math.sign(lnRatio) !== ratio0) {
      crossing = { before: points[points.length - 1]!, dBefore: lastD, after: { ...pt, side: "dew" }, dAfter: s.dXdS.slice(), beyond: [{ ...pt, side: "dew" }] };
      continue;
    }
    points.push(pt);
    lastD = s.dXdS.slice();
    if (!through && Math.abs(lnRatio) < MIRROR) break;
  }
  s.nearCritical = false;
  // Leave the solver at the last recorded point, with its sensitivities.
  const last = points[points.length - 1]!;
  s.X.set(last.lnK);
  s.X[N] = Math.log(last.T);
  s.X[N + 1] = Math.log(last.p);
  return { points, dXdS: lastD, crossing };
}

/** The critical point where the dominant ln K, continued by cubic Hermite interpolation between a and b, is 0. */
function interpolateCritical(N: number, a: EnvelopePoint, da: Float64Array, b: EnvelopePoint, db: Float64Array, bracketed: boolean): Envelope["critical"] | undefined {
  let k = 0;
  for (let i = 0; i < N; i++) if (Math.abs(a.lnK[i]!) > Math.abs(a.lnK[k]!)) k = i;
  const S0 = a.lnK[k]!, S1 = b.lnK[k]!;
  if (!(S0 * S1 < 0 && Number.isFinite(da[k]!) && Number.isFinite(db[k]!) && da[k] !== 0 && db[k] !== 0)) return undefined;
  const f = S0 / (S0 - S1);
  // Cubic Hermite where the end slopes are sound; a slope taken where Newton barely converged can throw the
  // cubic far outside its ends, and then the linear interpolation (error of order the step squared) is used.
  const cubic = (ya: number, sa: number, yb: number, sb: number) => {
    const y = hermite(S0, ya, sa, S1, yb, sb, 0), span = Math.abs(yb - ya);
    return Number.isFinite(y) && y >= Math.min(ya, yb) - 0.5 * span && y <= Math.max(ya, yb) + 0.5 * span ? y : ya + f * (yb - ya);
  };
  const lnT = cubic(Math.log(a.T), da[N]! / da[k]!, Math.log(b.T), db[N]! / db[k]!);
  const lnp = cubic(Math.log(a.p), da[N + 1]! / da[k]!, Math.log(b.p), db[N + 1]! / db[k]!);
  return { T: Math.exp(lnT), p: Math.exp(lnp), rho: 0.5 * ((1 - f) * (a.rhoFeed + a.rhoTrial) + f * (b.rhoFeed + b.rhoTrial)), bracketed };
}

/**
 * Traces the envelope of feed z. The bubble side runs from T0 upwards in pressure and on through the critical
 * point, located within the crossing step where every ln K changes sign (cubic Hermite in the dominant ln K,
 * which is how continuation methods usually place it); the dew side runs from T0 up to near the critical
 * point and is completed by the bubble trace's points beyond it. Where the bubble trace cannot be carried
 * through, the critical point is interpolated across the gap between the two sides' ends instead, and
 * marked so. Throws E_CONVERGENCE if a side cannot be started.
 */
export function traceEnvelope(m: MixtureModel, z: Float64Array, T0: number, Tmax: number, pmax: number): Envelope {
  const N = m.N;
  const s = new IncipientSolver(m);
  const b = traceSide(s, z, T0, true, Tmax, pmax, true);
  const d = traceSide(s, z, T0, false, Tmax, pmax, false);
  const bubble = b.points;
  let dew = d.points;
  const pb = bubble[bubble.length - 1]!, pd = dew[dew.length - 1]!;
  let critical: Envelope["critical"] | undefined;
  if (b.crossing) {
    const c = b.crossing;
    critical = interpolateCritical(N, c.before, c.dBefore, c.after, c.dAfter, true);
    // The dew side, traced from below, is joined to the points beyond the critical point that lie closer to it.
    const gapEnd = Math.abs(Math.log(pd.rhoFeed / pd.rhoTrial));
    const closer = c.beyond.filter((q) => Math.abs(Math.log(q.rhoFeed / q.rhoTrial)) < gapEnd).reverse();
    dew = [...dew, ...closer];
  }
  critical ??= interpolateCritical(N, pb, b.dXdS, pd, d.dXdS, false)
    // No sign change to interpolate across (an azeotrope-like end): the midpoint of the two ends.
    ?? { T: 0.5 * (pb.T + pd.T), p: Math.sqrt(pb.p * pd.p), rho: 0.25 * (pb.rhoFeed + pb.rhoTrial + pd.rhoFeed + pd.rhoTrial), bracketed: false };
  // An interpolation across the gap must not fall below the sides it closes.
  if (!critical.bracketed) {
    critical.T = Math.max(critical.T, pb.T, pd.T);
    critical.p = Math.max(critical.p, pb.p, pd.p);
  }
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
