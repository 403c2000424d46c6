// Tie lines of the two-phase region as a function of one smooth parameter σ, cached for the whole build:
// pure fluids σ = −(T_c,eq − T)^(1/3) (saturationT), pseudo-pure blends σ = ln p (saturationP).
import { equationCriticalPoint, H, propertiesTRho, S, saturationP, saturationPressureRange, saturationT, type Fluid, type Saturation } from "../eos/index.js";
import { attempt, type Context } from "./context.js";

/** Both ends of a tie line (the engine's Saturation, densities molar [mol/m³]) with mass-based h, s and v in the chosen reference. */
export interface TieLine extends Saturation {
  hL: number;
  hV: number;
  sL: number;
  sV: number;
  vL: number;
  vV: number;
}

/** Blends run on ln p; pure fluids on σ(T), whose cube root keeps the dome's top smooth in σ. */
export interface TieLines {
  /** The traced range of σ: from the dome's bottom (window floor or triple point) to its highest reliable tie line. */
  readonly lo: number;
  readonly hi: number;
  at(sigma: number): TieLine | null;
}

/** The two-phase state at quality x on a tie line: (h, p), and T (which runs across a blend's glide). */
export function mixTie(t: TieLine, x: number): { h: number; p: number; T: number } {
  return { h: t.hL + x * (t.hV - t.hL), p: t.pL + x * (t.pV - t.pL), T: t.TL + x * (t.TV - t.TL) };
}

function fromSaturation(ctx: Context, sat: Saturation): TieLine {
  const { f, off } = ctx;
  const o = ctx.scratch;
  propertiesTRho(f.model, f.M, sat.TL, sat.rhoL, o);
  const hL = o[H]! + off.dh, sL = o[S]! + off.ds;
  propertiesTRho(f.model, f.M, sat.TV, sat.rhoV, o);
  const hV = o[H]! + off.dh, sV = o[S]! + off.ds;
  return {
    TL: sat.TL, TV: sat.TV, pL: sat.pL, pV: sat.pV,
    rhoL: sat.rhoL, rhoV: sat.rhoV, hL, hV, sL, sV, vL: 1 / (sat.rhoL * f.M), vV: 1 / (sat.rhoV * f.M),
  };
}

/**
 * Whether a pure fluid's saturation result is a tie line and not the trivial solution ρL ≈ ρV the solver can
 * fall onto within a few millikelvin of the critical point: the density gap must be at least ρc·√((Tc − T)/Tc).
 * Genuine tie lines of every fluid shipped have more than four times that, from 2 K below Tc to satTmax.
 */
export function isTieLine(f: Fluid, sat: Saturation): boolean {
  const d = Math.max(f.TcEquation - sat.TL, 0) / f.TcEquation;
  return sat.rhoL - sat.rhoV >= f.rhoc * Math.sqrt(d);
}

function pureSaturation(f: Fluid, T: number): Saturation | null {
  const sat = attempt(() => saturationT(f, T));
  return sat && isTieLine(f, sat) ? sat : null;
}

/**
 * The highest temperature up to satTmax whose saturation is a genuine tie line: satTmax, or 1, 2, 4 … mK below
 * it. Past 1 K down the solver is far from trouble; 2 K below satTmax stands in should it still fail.
 */
function pureTop(f: Fluid): number {
  for (let k = 0; k < 12; k++) {
    const T = f.satTmax - (k === 0 ? 0 : 1e-3 * 2 ** (k - 1));
    if (pureSaturation(f, T)) return T;
  }
  return f.satTmax - 2;
}

/** A blend's equation-of-state critical point (not the stated one the ancillaries meet at), cached per fluid. */
const blendCritical = new WeakMap<Fluid, { T: number; rho: number }>();
function equationCritical(f: Fluid): { T: number; rho: number } {
  let c = blendCritical.get(f);
  if (!c) blendCritical.set(f, (c = equationCriticalPoint(f)));
  return c;
}

/**
 * Whether a blend's bubble and dew ends are liquid and vapour. Below the equation's own critical temperature
 * the ancillary bubble pressure can fall under the liquid spinodal, where the only root left (or the one the
 * density solver lands on) is the vapour-like one: such an end is not a saturated liquid.
 */
function isBlendTieLine(f: Fluid, sat: Saturation): boolean {
  const c = equationCritical(f);
  return (sat.TL >= c.T || sat.rhoL > c.rho) && (sat.TV >= c.T || sat.rhoV < c.rho);
}

function blendSaturation(f: Fluid, p: number): Saturation | null {
  const sat = attempt(() => saturationP(f, p));
  return sat && isBlendTieLine(f, sat) ? sat : null;
}

/**
 * The highest pressure up to which a blend's tie lines stay genuine: a scan up from 0.9 p_c in steps that shrink
 * towards p_c (the last 1e-8 p_c short of it), then bisection on the first failure. Cached per fluid.
 */
const blendTopCache = new WeakMap<Fluid, number>();
function blendTop(f: Fluid): number {
  const cached = blendTopCache.get(f);
  if (cached !== undefined) return cached;
  const steps = 120;
  const at = (k: number) => f.pc * (1 - 0.1 * Math.pow(1e-7, k / steps));
  let good = at(0), bad = NaN;
  for (let k = 1; k <= steps; k++) {
    const p = at(k);
    if (!blendSaturation(f, p)) { bad = p; break; }
    good = p;
  }
  for (let k = 0; k < 40 && Number.isFinite(bad) && bad - good > 1e-12 * f.pc; k++) {
    const mid = 0.5 * (good + bad);
    if (blendSaturation(f, mid)) good = mid; else bad = mid;
  }
  blendTopCache.set(f, good);
  return good;
}

export function makeTieLines(ctx: Context): TieLines {
  const f = ctx.f;
  const cache = new Map<number, TieLine | null>();
  const pMin = ctx.mapping.window.pMin;
  if (f.pseudoPure) {
    const floor = saturationPressureRange(f)[0];
    const lo = Math.log(Math.max(floor, pMin));
    const hi = Math.log(blendTop(f));
    const at = (sigma: number): TieLine | null => {
      let t = cache.get(sigma);
      if (t === undefined) {
        // exp(ln p) can round below the lowest bubble pressure, which the engine would then call solid.
        const sat = blendSaturation(f, Math.max(Math.exp(sigma), floor));
        t = sat ? fromSaturation(ctx, sat) : null;
        cache.set(sigma, t);
      }
      return t;
    };
    return { lo, hi: Math.max(lo, hi), at };
  }
  const top = pureTop(f);
  // satTmax lies at least 1 mK below the equation's own critical temperature, so σ stays negative.
  const Tref = f.TcEquation;
  const sigmaOfT = (T: number) => -Math.cbrt(Tref - T);
  const TofSigma = (sigma: number) => Tref + sigma * sigma * sigma;
  const at = (sigma: number): TieLine | null => {
    let t = cache.get(sigma);
    if (t === undefined) {
      const T = Math.min(Math.max(TofSigma(sigma), f.Tmin), top);
      const sat = pureSaturation(f, T);
      t = sat ? fromSaturation(ctx, sat) : null;
      cache.set(sigma, t);
    }
    return t;
  };
  const Tfloor = pMin > saturationPressureRange(f)[0] ? attempt(() => saturationP(f, pMin))?.TL ?? f.Tmin : f.Tmin;
  const lo = sigmaOfT(Math.min(Math.max(Tfloor, f.Tmin), top));
  return { lo, hi: sigmaOfT(top), at };
}
