// Two-phase flash of a mixture at fixed pressure and enthalpy, entropy or quality: one Newton iteration on
// (ln K₁ … ln K_N, T) together, instead of an outer root search in T around a converged inner split.
import { CP, H, S } from "../properties.js";
import { solveLinear } from "./linear.js";
import type { Mixture } from "./mixture.js";
import { PhaseProbe } from "./phase-probe.js";
import { mixturePropertiesTRho } from "./properties.js";
import { rachfordRice, splitSensitivities } from "./rachford-rice.js";

const MAX_NEWTON = 24;

/** Work arrays and the two phase probes of one mixture, reused between flashes (never nested). */
export class SplitWorkspace {
  readonly N: number;
  readonly L: PhaseProbe;
  readonly V: PhaseProbe;
  readonly lnK: Float64Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
  beta = 0;
  T = 0;
  readonly K: Float64Array;
  readonly dBeta: Float64Array;
  readonly dx: Float64Array;
  readonly dy: Float64Array;
  readonly J: Float64Array;
  readonly Jkeep: Float64Array;
  readonly F: Float64Array;
  readonly out: Float64Array;

  constructor(mix: Mixture) {
    const N = (this.N = mix.N);
    this.L = new PhaseProbe(mix.model);
    this.V = new PhaseProbe(mix.model);
    this.lnK = new Float64Array(N);
    this.x = new Float64Array(N);
    this.y = new Float64Array(N);
    this.K = new Float64Array(N);
    this.dBeta = new Float64Array(N);
    this.dx = new Float64Array(N * N);
    this.dy = new Float64Array(N * N);
    this.J = new Float64Array((N + 1) * (N + 1));
    this.Jkeep = new Float64Array((N + 1) * (N + 1));
    this.F = new Float64Array(N + 1);
    this.out = new Float64Array(12);
  }
}

const solvers = new WeakMap<Mixture, SplitWorkspace>();

/** The mixture's split workspace, made at first use. */
export function splitWorkspace(mix: Mixture): SplitWorkspace {
  let w = solvers.get(mix);
  if (!w) solvers.set(mix, (w = new SplitWorkspace(mix)));
  return w;
}

/** The starting point: T, ln K and phase densities the caller interpolated across the dome. */
export interface NewtonStart {
  T: number;
  lnK: ArrayLike<number>;
  rhoL: number;
  rhoV: number;
  /** Bounds on T (the bubble and dew temperatures at this pressure). */
  Tlo: number;
  Thi: number;
  /**
   * Largest acceptable error of the target [J/mol or J/(mol K)] once the iteration has stalled. With almost no
   * glide the two-phase enthalpy climbs the whole dome within a few ulps of T, so it cannot reach 1e-12.
   */
  stallTolerance: number;
}

/** The converged split: T, vapour mole fraction, phase compositions and molar densities. */
export interface NewtonSplit {
  T: number;
  beta: number;
  x: Float64Array;
  y: Float64Array;
  rhoL: number;
  rhoV: number;
  lnK: Float64Array;
}

/**
 * Solves equal fugacities and a total molar enthalpy (which = "h") or entropy ("s") equal to `target`
 * [J/mol or J/(mol K), native reference], or a vapour mass fraction ("x") equal to `target`, at pressure p.
 * The enthalpy row uses partial molar enthalpies H̄ᵢ − H̄ᵢ^ig = −RT² ∂ln φᵢ/∂T, so the Jacobian is complete;
 * the entropy row uses S̄ᵛ − S̄ˡ = (H̄ᵛ − H̄ˡ)/T, exact at equilibrium, where Newton converges; the quality
 * row βM(y)/M(z) depends on ln K alone. Returns null (the caller falls back) if the split leaves the
 * two-phase region, a linear solve fails or the cap is reached.
 */
export function newtonAtP(mix: Mixture, p: number, which: "h" | "s" | "x", target: number, start: NewtonStart): NewtonSplit | null {
  const w = splitWorkspace(mix);
  const N = w.N, n1 = N + 1, z = mix.z, R = mix.model.R;
  const { L, V, lnK, x, y, K, dBeta, dx, dy, J, Jkeep, F, out } = w;
  for (let k = 0; k < N; k++) lnK[k] = start.lnK[k]!;
  let T = start.T;
  L.rho = start.rhoL;
  V.rho = start.rhoV;
  let beta = 0, prev = Infinity, fresh = true;
  for (let it = 0; it < MAX_NEWTON; it++) {
    for (let k = 0; k < N; k++) K[k] = Math.exp(lnK[k]!);
    beta = rachfordRice(z, K, N);
    if (!(beta > 0 && beta < 1)) return null;
    for (let k = 0; k < N; k++) {
      x[k] = z[k]! / (1 + beta * (K[k]! - 1));
      y[k] = K[k]! * x[k]!;
    }
    L.setComposition(x);
    V.setComposition(y);
    // The slopes of ln φ (in composition and T) cost N + 3 evaluations of the chemical potentials and ln φ
    // alone one, so the Jacobian is kept while the residual falls at least tenfold per step.
    if (fresh) {
      L.eval(T, p, "liquid", true, true);
      V.eval(T, p, "vapour", true, true);
    } else {
      L.evalLnPhi(T, p, "liquid", true);
      V.evalLnPhi(T, p, "vapour", true);
    }
    // Phase enthalpies (or entropies) per mole and heat capacities, native reference; a quality needs neither.
    const ML = mix.model.molarMass(x), MV = mix.model.molarMass(y);
    let yL = 0, yV = 0, cpL = 0, cpV = 0;
    if (which !== "x") {
      mixturePropertiesTRho(mix.model, T, L.rho, x, out);
      yL = (which === "h" ? out[H]! : out[S]!) * ML; cpL = out[CP]! * ML;
      mixturePropertiesTRho(mix.model, T, V.rho, y, out);
      yV = (which === "h" ? out[H]! : out[S]!) * MV; cpV = out[CP]! * MV;
    }
    const scale = which === "h" ? R * T : which === "s" ? R : 1;
    let resid = 0;
    for (let i = 0; i < N; i++) {
      F[i] = lnK[i]! + V.lnPhi[i]! - L.lnPhi[i]!;
      resid = Math.max(resid, Math.abs(F[i]!));
    }
    const fug = resid;
    F[N] = which === "x" ? (beta * MV) / mix.M - target : ((1 - beta) * yL + beta * yV - target) / scale;
    resid = Math.max(resid, Math.abs(F[N]!));
    if (!Number.isFinite(resid)) return null;
    const stalledButClose = it >= 6 && fug <= 1e-9 && Math.abs(F[N]!) * scale <= start.stallTolerance;
    if (resid <= 1e-12 || stalledButClose) {
      w.T = T;
      w.beta = beta;
      return { T, beta, x, y, rhoL: L.rho, rhoV: V.rho, lnK };
    }
    if (!fresh && resid > 0.1 * prev) {
      fresh = true;
      prev = Infinity;
      continue;
    }
    if (fresh) {
      // Rachford–Rice sensitivities: dβ/d ln K_j, then dx_i/d ln K_j and dy_i/d ln K_j.
      splitSensitivities(z, K, beta, x, y, N, dBeta, dx, dy);
      for (let i = 0; i < N; i++) {
        for (let j = 0; j < N; j++) {
          let s = i === j ? 1 : 0;
          for (let k = 0; k < N; k++) s += V.dn[i * N + k]! * dy[k * N + j]! - L.dn[i * N + k]! * dx[k * N + j]!;
          Jkeep[i * n1 + j] = s;
        }
        Jkeep[i * n1 + N] = V.dT[i]! - L.dT[i]!;
      }
      // d(total)/d ln K_j through the vapour mole numbers n_k = β y_k, at partial molar values (for a
      // quality, through the vapour's mass Σ M_k n_k, which does not depend on T).
      for (let j = 0; j < N; j++) {
        let s = 0;
        for (let k = 0; k < N; k++) {
          const dn = dBeta[j]! * y[k]! + beta * dy[k * N + j]!;
          if (which === "x") { s += mix.model.M[k]! * dn; continue; }
          const dH = -R * T * T * (V.dT[k]! - L.dT[k]!);
          s += (which === "h" ? dH : dH / T) * dn;
        }
        Jkeep[N * n1 + j] = which === "x" ? s / mix.M : s / scale;
      }
      Jkeep[N * n1 + N] = which === "x" ? 0 : ((1 - beta) * cpL + beta * cpV) / (which === "h" ? scale : scale * T);
      fresh = false;
    }
    prev = resid;
    J.set(Jkeep);
    for (let k = 0; k < n1; k++) F[k] = -F[k]!;
    if (!solveLinear(J, F, n1)) return null;
    // Keep T inside the bubble–dew interval and steps in ln K moderate: Newton from a poor start overshoots.
    let maxK = 0;
    for (let k = 0; k < N; k++) maxK = Math.max(maxK, Math.abs(F[k]!));
    const damp = maxK > 0.5 ? 0.5 / maxK : 1;
    let Tn = T + damp * F[N]!;
    if (Tn <= start.Tlo) Tn = 0.5 * (T + start.Tlo);
    if (Tn >= start.Thi) Tn = 0.5 * (T + start.Thi);
    for (let k = 0; k < N; k++) lnK[k]! += damp * F[k]!;
    T = Tn;
  }
  return null;
}
