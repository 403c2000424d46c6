// Bubble and dew points of a mixture at given T or p, solved by Newton on ln K from starting values
// interpolated on the traced phase envelope (or from Wilson's K-factors and substitution without one).
import { DomeprintError, rangeError } from "../../errors.js";
import type { EnvelopePoint } from "./envelope.js";
import type { Mixture } from "./mixture.js";

/** One converged bubble or dew point: the feed (overall composition) and its incipient phase. */
export interface SaturationPoint {
  kind: "bubble" | "dew";
  T: number;
  p: number;
  /** Molar densities [mol/m³] of the feed and of the incipient phase. */
  rhoFeed: number;
  rhoIncipient: number;
  /** Mole fractions of the incipient phase (vapour at a bubble point, liquid at a dew point). */
  incipient: Float64Array;
  /** ln K of the incipient phase over the feed (finite even for components absent from the feed). */
  lnK: Float64Array;
}

function interpolate(mix: Mixture, a: EnvelopePoint, b: EnvelopePoint, f: number, feedLiquid: boolean): void {
  const s = mix.solver, N = mix.N, X = s.X;
  for (let k = 0; k < N; k++) X[k] = a.lnK[k]! + f * (b.lnK[k]! - a.lnK[k]!);
  X[N] = Math.log(a.T) + f * (Math.log(b.T) - Math.log(a.T));
  X[N + 1] = Math.log(a.p) + f * (Math.log(b.p) - Math.log(a.p));
  s.feedLiquid = feedLiquid;
  s.feed.rho = a.rhoFeed + f * (b.rhoFeed - a.rhoFeed);
  s.trial.rho = a.rhoTrial + f * (b.rhoTrial - a.rhoTrial);
}

/** The bracketing segment of the envelope side for T or p, searched from its low-pressure end. */
function bracket(points: EnvelopePoint[], given: "T" | "p", v: number): [EnvelopePoint, EnvelopePoint, number] | undefined {
  const get = (q: EnvelopePoint) => (given === "T" ? Math.log(q.T) : Math.log(q.p));
  const lv = Math.log(v);
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k]!, b = points[k + 1]!;
    const ya = get(a), yb = get(b);
    if ((lv - ya) * (lv - yb) <= 0 && ya !== yb) return [a, b, (lv - ya) / (yb - ya)];
  }
  return undefined;
}

function result(mix: Mixture, kind: "bubble" | "dew"): SaturationPoint {
  const s = mix.solver, N = mix.N;
  return { kind, T: Math.exp(s.X[N]!), p: Math.exp(s.X[N + 1]!), rhoFeed: s.feed.rho, rhoIncipient: s.trial.rho, incipient: s.trial.x.slice(), lnK: s.X.slice(0, N) };
}

/**
 * A bubble or dew point at T [K] or p [Pa] read off the traced envelope by interpolation, without solving
 * it: a starting value for solvers that carry the equilibrium conditions themselves. Undefined outside the
 * traced range.
 */
export function estimatedSaturationPoint(mix: Mixture, kind: "bubble" | "dew", given: "T" | "p", v: number): SaturationPoint | undefined {
  const env = mix.envelope();
  const br = bracket(kind === "bubble" ? env.bubble : env.dew, given, v);
  if (!br) return undefined;
  const [a, b, f] = br;
  const lnK = new Float64Array(mix.N);
  for (let k = 0; k < mix.N; k++) lnK[k] = a.lnK[k]! + f * (b.lnK[k]! - a.lnK[k]!);
  return {
    kind, T: Math.exp(Math.log(a.T) + f * (Math.log(b.T) - Math.log(a.T))), p: Math.exp(Math.log(a.p) + f * (Math.log(b.p) - Math.log(a.p))),
    rhoFeed: a.rhoFeed + f * (b.rhoFeed - a.rhoFeed), rhoIncipient: a.rhoTrial + f * (b.rhoTrial - a.rhoTrial),
    incipient: new Float64Array(0), lnK,
  };
}

/** The bubble (feed liquid) or dew (feed vapour) point of the mixture at T [K] or p [Pa]. */
export function saturationPoint(mix: Mixture, kind: "bubble" | "dew", given: "T" | "p", v: number): SaturationPoint {
  const env = mix.envelope();
  const c = env.critical;
  const side = kind === "bubble" ? env.bubble : env.dew;
  const lowest = side[0]!;
  const limit = given === "T" ? c.T : c.p;
  const low = given === "T" ? lowest.T : lowest.p;
  const unit = given === "T" ? "K" : "Pa";
  const allowed = `${+low.toPrecision(6)} ${unit} to ${+limit.toPrecision(6)} ${unit} (the critical point) for the ${kind} point of ${mix.id}`;
  if (!(v <= limit)) throw rangeError(given, v, allowed);
  if (!(v >= low * (1 - 1e-12))) throw rangeError(given, v, allowed, given === "T" ? "E_BELOW_TRIPLE" : "E_RANGE");
  // Beyond the last traced point before the critical point, interpolate towards the critical point itself.
  const ext: EnvelopePoint[] = [...side, { T: c.T, p: c.p, lnK: new Float64Array(mix.N), rhoFeed: c.rho, rhoTrial: c.rho, side: side[0]!.side }];
  const br = bracket(ext, given, v);
  const N = mix.N, spec = given === "T" ? N : N + 1;
  if (br) {
    const [a, b, f] = br;
    // The critical point itself is the trivial solution: start just short of it.
    interpolate(mix, a, b, b === ext[ext.length - 1] ? Math.min(f, 0.9) : f, kind === "bubble");
    try {
      mix.solver.newton(mix.z, spec, Math.log(v));
      return result(mix, kind);
    } catch (e) {
      if (!(e instanceof DomeprintError)) throw e;
    }
  }
  mix.solver.feedLiquid = kind === "bubble";
  mix.solver.solveFromScratch(mix.z, given, v);
  return result(mix, kind);
}
