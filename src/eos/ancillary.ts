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
  const n = a.rows.map((r) => r[0]!);
  const t = a.rows.map((r) => r[1]!);
  const { Tr, valueR, form } = a;
  const sum = (theta: number) => {
    let s = 0;
    for (let i = 0; i < n.length; i++) s += n[i]! * Math.pow(theta, t[i]!);
    return s;
  };
  const dsum = (theta: number) => {
    let s = 0;
    for (let i = 0; i < n.length; i++) s += n[i]! * t[i]! * Math.pow(theta, t[i]! - 1);
    return s;
  };
  const value = (T: number) => {
    const theta = Math.max(1 - T / Tr, 0);
    const S = sum(theta);
    if (form === "linear") return valueR * (1 + S);
    if (form === "exp") return valueR * Math.exp(S);
    return valueR * Math.exp((Tr / T) * S);
  };
  const slope = (T: number) => {
    const theta = Math.max(1 - T / Tr, 1e-12);
    const S = sum(theta), dS = -dsum(theta) / Tr; // dS/dT
    if (form === "linear") return valueR * dS;
    if (form === "exp") return valueR * Math.exp(S) * dS;
    const e = (Tr / T) * S;
    return valueR * Math.exp(e) * ((Tr / T) * dS - (Tr / (T * T)) * S);
  };
  const Tmin = a.Tmin, Tmax = Math.min(a.Tmax, Tr);
  const invert = (v: number) => {
    // value is monotone in T for pressures; bisection guards the Newton steps.
    let lo = Tmin * 0.5, hi = Tmax;
    const increasing = value(hi) > value(Tmin);
    let T = Math.min(Math.max(Tmin, Tr * 0.7), hi);
    for (let k = 0; k < 100; k++) {
      const f = value(T) - v;
      if ((f > 0) === increasing) hi = T; else lo = T;
      let next = T - f / slope(T);
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (Math.abs(next - T) < 1e-12 * T) return next;
      T = next;
    }
    return T;
  };
  return { Tmin, Tmax, value, slope, invert };
}
