// Ancillary equations: cheap correlations of saturation pressure and densities in T, used as
// starting values for pure fluids and as the two-phase boundary of pseudo-pure blends.
import type { AncillaryData } from "./fluid-file.js";

export interface Ancillary {
  readonly Tmin: number;
  readonly Tmax: number;
  value(T: number): number;
  /** d(value)/dT, for Newton inversions. */
  slope(T: number): number;
  /** The temperature at which value(T) = v, by a bracketed Newton iteration between Tmin and Tmax. */
  invert(v: number): number;
}

export function buildAncillary(a: AncillaryData): Ancillary {
  const n = Float64Array.from(a.rows, (r) => r[0]!);
  const t = Float64Array.from(a.rows, (r) => r[1]!);
  const { Tr, valueR, form } = a;
  const count = n.length;
  let lastT = NaN, lastV = 0, lastS = 0;
  /** Value and slope at T together: θ^t as exp(t ln θ), one log and one exp per term. */
  const evalAt = (T: number) => {
    if (T === lastT) return;
    const theta = Math.max(1 - T / Tr, 1e-12);
    const lnTheta = Math.log(theta);
    let S = 0, dS = 0;
    for (let i = 0; i < count; i++) {
      const u = n[i]! * Math.exp(t[i]! * lnTheta);
      S += u;
      dS += t[i]! * u;
    }
    dS = -dS / (theta * Tr); // dS/dT
    if (form === "linear") { lastV = valueR * (1 + S); lastS = valueR * dS; }
    else if (form === "exp") { lastV = valueR * Math.exp(S); lastS = lastV * dS; }
    else {
      const k = Tr / T;
      lastV = valueR * Math.exp(k * S);
      lastS = lastV * (k * dS - (k / T) * S);
    }
    lastT = T;
  };
  const value = (T: number) => { evalAt(T); return lastV; };
  const slope = (T: number) => { evalAt(T); return lastS; };
  const Tmin = a.Tmin, Tmax = Math.min(a.Tmax, Tr);
  const invert = (v: number) => {
    // Monotone in T for pressures: Newton on ln(value), guarded by bisection.
    let lo = Tmin * 0.5, hi = Tmax;
    const increasing = value(hi) > value(Tmin);
    const lv = Math.log(v);
    let T = Math.min(Math.max(Tmin, Tr * 0.7), hi);
    for (let k = 0; k < 100; k++) {
      evalAt(T);
      const f = Math.log(lastV) - lv;
      if ((f > 0) === increasing) hi = T; else lo = T;
      let next = T - f / (lastS / lastV);
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (Math.abs(next - T) < 1e-12 * T) return next;
      T = next;
    }
    return T;
  };
  return { Tmin, Tmax, value, slope, invert };
}
