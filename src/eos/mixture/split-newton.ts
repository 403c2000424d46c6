// The two-phase split of a mixture by one Newton iteration on (ln K₁ … ln K_N, T or ln p, β) together: equal
// fugacities, the Rachford–Rice balance Σ(yᵢ − xᵢ) = 0 and one target (h, s, quality or volume) at fixed p or T.
// With β an unknown instead of solved from the K-factors, the equations stay regular where K → 1 (an azeotrope).
import { CP, H, S } from "../properties.js";
import { solveLinear } from "./linear.js";
import type { Mixture } from "./mixture.js";
import { PhaseProbe } from "./phase-probe.js";
import { mixturePropertiesTRho } from "./properties.js";

const MAX_NEWTON = 30;

/** Work arrays and the two phase probes of one mixture, reused between splits (never nested). */
class SplitWorkspace {
  readonly N: number;
  readonly L: PhaseProbe;
  readonly V: PhaseProbe;
  readonly lnK: Float64Array;
  readonly K: Float64Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly t: Float64Array;
  readonly J: Float64Array;
  readonly Jkeep: Float64Array;
  readonly F: Float64Array;
  readonly out: Float64Array;

  constructor(mix: Mixture) {
    const N = (this.N = mix.N), n = N + 2;
    this.L = new PhaseProbe(mix.model);
    this.V = new PhaseProbe(mix.model);
    this.lnK = new Float64Array(N);
    this.K = new Float64Array(N);
    this.x = new Float64Array(N);
    this.y = new Float64Array(N);
    this.t = new Float64Array(N);
    this.J = new Float64Array(n * n);
    this.Jkeep = new Float64Array(n * n);
    this.F = new Float64Array(n);
    this.out = new Float64Array(12);
  }
}

const workspaces = new WeakMap<Mixture, SplitWorkspace>();

/** What is held fixed (p or T, with its value) and what the split must meet. */
export type SplitSpec =
  | { fixed: "p"; p: number; which: "h" | "s" | "x"; target: number }
  | { fixed: "T"; T: number; which: "x" | "v"; target: number };

/** Starting point, interpolated across the dome by the caller, and bounds on the free variable (T or p). */
export interface SplitStart {
  /** Starting T [K] at fixed p, or starting p [Pa] at fixed T. */
  free: number;
  lo: number;
  hi: number;
  lnK: ArrayLike<number>;
  beta: number;
  rhoL: number;
  rhoV: number;
  /**
   * Largest acceptable error of the target (J/mol, J/(mol K), a mass fraction, or m³/mol) once the iteration
   * has stalled at rounding: ln φ of a dense liquid carries about 1e-10 of it.
   */
  stallTolerance: number;
}

/** The converged split: T [K], p [Pa], vapour mole fraction, phase mole fractions and molar densities. */
export interface Split {
  T: number;
  p: number;
  beta: number;
  x: Float64Array;
  y: Float64Array;
  rhoL: number;
  rhoV: number;
  lnK: Float64Array;
}

/**
 * Solves the split for `spec` from `start`. Targets: total molar enthalpy h [J/mol] or entropy s [J/(mol K)]
 * (native reference), vapour mass fraction x, or overall molar volume v [m³/mol]. The target row's slopes
 * use partial molar quantities of the vapour's mole numbers n_k = β y_k (the liquid holds z_k − n_k):
 * H̄ᵛ − H̄ˡ = −RT²(∂ln φᵛ/∂T − ∂ln φˡ/∂T), S̄ᵛ − S̄ˡ = (H̄ᵛ − H̄ˡ)/T at equilibrium, V̄ = (1 − ρ⁻¹∂ρ/∂n)/ρ.
 * The Jacobian is kept while the residual falls tenfold per step. Null (for the caller's fallback) if β or
 * the free variable leaves its range, a phase has no density root, a solve fails or the cap is reached.
 */
export function splitNewton(mix: Mixture, spec: SplitSpec, start: SplitStart): Split | null {
  let w = workspaces.get(mix);
  if (!w) workspaces.set(mix, (w = new SplitWorkspace(mix)));
  const { L, V, lnK, K, x, y, t, J, Jkeep, F, out } = w;
  const N = w.N, n = N + 2, z = mix.z, R = mix.model.R, M = mix.model.M, Mz = mix.M;
  const atP = spec.fixed === "p";
  for (let k = 0; k < N; k++) lnK[k] = start.lnK[k]!;
  // The free unknown: T at fixed p, ln p at fixed T.
  let u = atP ? start.free : Math.log(start.free);
  const uLo = atP ? start.lo : Math.log(start.lo), uHi = atP ? start.hi : Math.log(start.hi);
  let beta = Math.min(Math.max(start.beta, 1e-6), 1 - 1e-6);
  L.rho = start.rhoL;
  V.rho = start.rhoV;
  let prev = Infinity, fresh = true;
  for (let it = 0; it < MAX_NEWTON; it++) {
    const T = atP ? u : spec.T, p = atP ? spec.p : Math.exp(u);
    let Sx = 0, Sy = 0;
    for (let k = 0; k < N; k++) {
      K[k] = Math.exp(lnK[k]!);
      t[k] = 1 + beta * (K[k]! - 1);
      if (!(t[k]! > 0)) return null;
      x[k] = z[k]! / t[k]!;
      y[k] = K[k]! * x[k]!;
      Sx += x[k]!;
      Sy += y[k]!;
    }
    L.setComposition(x);
    V.setComposition(y);
    try {
      if (fresh) {
        L.eval(T, p, "liquid", true, true);
        V.eval(T, p, "vapour", true, true);
      } else {
        L.evalLnPhi(T, p, "liquid", true);
        V.evalLnPhi(T, p, "vapour", true);
      }
    } catch {
      return null; // no density root on a branch at this trial state
    }
    const nL = (1 - beta) * Sx, nV = beta * Sy;
    let fug = 0;
    for (let i = 0; i < N; i++) {
      F[i] = lnK[i]! + V.lnPhi[i]! - L.lnPhi[i]!;
      fug = Math.max(fug, Math.abs(F[i]!));
    }
    F[N] = Sy - Sx;
    // The target row, scaled to order one, and the heat capacity its T column needs.
    let scale = 1, cpTotal = 0;
    if (spec.which === "h" || spec.which === "s") {
      mixturePropertiesTRho(mix.model, T, L.rho, L.x, out);
      const ML = mix.model.molarMass(L.x);
      const yL = (spec.which === "h" ? out[H]! : out[S]!) * ML, cpL = out[CP]! * ML;
      mixturePropertiesTRho(mix.model, T, V.rho, V.x, out);
      const MV = mix.model.molarMass(V.x);
      const yV = (spec.which === "h" ? out[H]! : out[S]!) * MV, cpV = out[CP]! * MV;
      scale = spec.which === "h" ? R * T : R;
      cpTotal = nL * cpL + nV * cpV;
      F[N + 1] = (nL * yL + nV * yV - spec.target) / scale;
    } else if (spec.which === "x") {
      let m = 0;
      for (let k = 0; k < N; k++) m += M[k]! * beta * y[k]!;
      F[N + 1] = m / Mz - spec.target;
    } else {
      scale = spec.target;
      F[N + 1] = (nL / L.rho + nV / V.rho) / spec.target - 1;
    }
    let resid = fug;
    for (let i = N; i < n; i++) resid = Math.max(resid, Math.abs(F[i]!));
    if (!Number.isFinite(resid)) return null;
    const stalled = it >= 3 && fug <= 1e-9 && Math.abs(F[N]!) <= 1e-10 && Math.abs(F[N + 1]!) * scale <= start.stallTolerance;
    if (resid <= 1e-12 || stalled) {
      // Near the critical point the equations also have near-trivial roots (both phases almost the feed) and
      // roots with the labels swapped: only a split whose liquid is denser than its vapour by at least half
      // the log density ratio of the start (interpolated between the bubble and dew points) is the answer.
      if (!(Math.log(L.rho / V.rho) > 0.5 * Math.log(start.rhoL / start.rhoV))) return null;
      return { T, p, beta, x: Float64Array.from(L.x), y: Float64Array.from(V.x), rhoL: L.rho, rhoV: V.rho, lnK: lnK.slice() };
    }
    if (!fresh && resid > 0.1 * prev) {
      fresh = true;
      prev = Infinity;
      continue;
    }
    if (fresh) {
      Jkeep.fill(0);
      // Slopes of the (unnormalised) phase amounts: ∂x_k/∂ln K_k, ∂y_k/∂ln K_k (diagonal), ∂x_k/∂β, ∂y_k/∂β.
      for (let i = 0; i < N; i++) {
        for (let j = 0; j < N; j++) {
          const dxj = (-x[j]! * beta * K[j]!) / t[j]!, dyj = (y[j]! * (1 - beta)) / t[j]!;
          Jkeep[i * n + j] = (i === j ? 1 : 0) + (V.dn[i * N + j]! * dyj) / Sy - (L.dn[i * N + j]! * dxj) / Sx;
        }
        let dBeta = 0;
        for (let k = 0; k < N; k++) {
          const dxk = (-x[k]! * (K[k]! - 1)) / t[k]!;
          dBeta += (V.dn[i * N + k]! * K[k]! * dxk) / Sy - (L.dn[i * N + k]! * dxk) / Sx;
        }
        Jkeep[i * n + N] = atP ? V.dT[i]! - L.dT[i]! : p * (V.dP[i]! - L.dP[i]!);
        Jkeep[i * n + N + 1] = dBeta;
      }
      let rrBeta = 0;
      for (let k = 0; k < N; k++) {
        Jkeep[N * n + k] = (x[k]! * K[k]!) / t[k]!;
        rrBeta -= (x[k]! * (K[k]! - 1) ** 2) / t[k]!;
      }
      Jkeep[N * n + N + 1] = rrBeta;
      // The target row through the vapour mole numbers n_k = β y_k: ∂n_k/∂ln K_k = β(1 − β)y_k/t_k, ∂n_k/∂β = y_k + β∂y_k/∂β.
      const per = (k: number): number => {
        if (spec.which === "x") return M[k]! / Mz;
        if (spec.which === "v") {
          const vL = (1 - L.dRhoDn[k]! / L.rho) / L.rho, vV = (1 - V.dRhoDn[k]! / V.rho) / V.rho;
          return (vV - vL) / scale;
        }
        const dH = -R * T * T * (V.dT[k]! - L.dT[k]!);
        return (spec.which === "h" ? dH : dH / T) / scale;
      };
      let rowBeta = 0;
      for (let k = 0; k < N; k++) {
        const g = per(k);
        Jkeep[(N + 1) * n + k] = (g * beta * (1 - beta) * y[k]!) / t[k]!;
        rowBeta += g * (y[k]! + (beta * K[k]! * (-x[k]! * (K[k]! - 1))) / t[k]!);
      }
      Jkeep[(N + 1) * n + N + 1] = rowBeta;
      Jkeep[(N + 1) * n + N] = spec.which === "h" ? cpTotal / scale : spec.which === "s" ? cpTotal / (T * scale) : spec.which === "v"
        ? (-p * (nL * L.dRhoDp / (L.rho * L.rho) + nV * V.dRhoDp / (V.rho * V.rho))) / scale : 0;
      fresh = false;
    }
    prev = resid;
    J.set(Jkeep);
    for (let k = 0; k < n; k++) F[k] = -F[k]!;
    if (!solveLinear(J, F, n)) return null;
    // Moderate steps: ln K by at most 0.5; T by at most 2 % or ln p by at most 0.2; β and the free variable
    // kept inside their ranges by halving towards the bound they would cross.
    let big = 0;
    for (let k = 0; k < N; k++) big = Math.max(big, Math.abs(F[k]!));
    const du = F[N]!, db = F[N + 1]!;
    const uMax = atP ? 0.02 * u : 0.2;
    const damp = Math.min(1, 0.5 / Math.max(big, 1e-300), uMax / Math.max(Math.abs(du), 1e-300));
    for (let k = 0; k < N; k++) lnK[k]! += damp * F[k]!;
    let un = u + damp * du;
    if (un <= uLo) un = 0.5 * (u + uLo);
    if (un >= uHi) un = 0.5 * (u + uHi);
    u = un;
    let bn = beta + damp * db;
    if (bn <= 0) bn = 0.5 * beta;
    if (bn >= 1) bn = 0.5 * (1 + beta);
    beta = bn;
  }
  return null;
}
