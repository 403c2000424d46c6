// One phase of a mixture at (T, p): its density root, ln φᵢ, and the slopes of ln φᵢ in T, p and mole numbers
// that Newton iterations on phase equilibrium need. ln φ is analytic; its slopes are forward differences of it.
import type { Branch } from "../density.js";
import { mixtureDensityTP } from "./density.js";
import { lnFugacityCoefficients, residualChemicalPotentials } from "./fugacity.js";
import type { MixtureModel } from "./model.js";

const H_REL = 1e-6;

export class PhaseProbe {
  readonly m: MixtureModel;
  readonly N: number;
  /** Normalised composition (mole fractions). */
  readonly x: Float64Array;
  /** Molar density [mol/m³] of the last evaluation, and the starting value for the next. */
  rho = 0;
  readonly lnPhi: Float64Array;
  /** (∂ ln φᵢ/∂T)_p,n [1/K] and (∂ ln φᵢ/∂p)_T,n [1/Pa]. */
  readonly dT: Float64Array;
  readonly dP: Float64Array;
  /** (∂ ln φᵢ/∂n_j)_T,p at Σn = 1, row-major (i, j); filled only when asked for. */
  readonly dn: Float64Array;
  /** (∂ρ/∂n_j)_T,p at Σn = 1 [mol/m³], filled with dn; and (∂ρ/∂p)_T,n [mol/(m³ Pa)], after every eval. */
  readonly dRhoDn: Float64Array;
  dRhoDp = 0;
  private readonly g1: Float64Array;
  private readonly gRho: Float64Array;
  private readonly xp: Float64Array;
  private readonly mu0: Float64Array;

  constructor(m: MixtureModel) {
    this.m = m;
    const N = (this.N = m.N);
    this.x = new Float64Array(N);
    this.lnPhi = new Float64Array(N);
    this.dT = new Float64Array(N);
    this.dP = new Float64Array(N);
    this.dn = new Float64Array(N * N);
    this.dRhoDn = new Float64Array(N);
    this.g1 = new Float64Array(N);
    this.gRho = new Float64Array(N);
    this.xp = new Float64Array(N);
    this.mu0 = new Float64Array(N);
  }

  /** Sets the composition from mole numbers n (any positive sum). */
  setComposition(n: ArrayLike<number>): void {
    let s = 0;
    for (let k = 0; k < this.N; k++) s += n[k]!;
    for (let k = 0; k < this.N; k++) this.x[k] = n[k]! / s;
  }

  /** ln φ only (no slopes) at (T, p) on the branch; the density starts from the last one when `warm`. */
  evalLnPhi(T: number, p: number, branch: Branch, warm: boolean): void {
    const m = this.m;
    this.rho = mixtureDensityTP(m, T, p, this.x, branch, warm && this.rho > 0 ? this.rho : undefined);
    lnFugacityCoefficients(m, T, this.rho, this.x, this.lnPhi);
  }

  /**
   * ln φ and its slopes in T and p, and in the mole numbers when `composition` is set. Only the smooth part
   * μᵢ = ∂(nαʳ)/∂nᵢ is differenced; ln Z = ln p − ln ρ − ln RT is carried analytically, since in a dense
   * liquid Z is a near-cancelling difference whose finite differences would swamp the slopes.
   */
  eval(T: number, p: number, branch: Branch, warm: boolean, composition: boolean): void {
    const m = this.m, N = this.N, x = this.x, g1 = this.g1, muRho = this.gRho, mu0 = this.mu0;
    this.evalLnPhi(T, p, branch, warm);
    const rho = this.rho, r = m.r, R = m.R;
    // Slopes of the pressure from the base evaluation's residual derivatives (before m.r is overwritten).
    const pRho = R * T * (1 + 2 * r[1]! + r[3]!);
    const pT = rho * R * (1 + r[1]! - r[5]!);
    const Z0 = 1 + r[1]!;
    residualChemicalPotentials(m, T, rho, x, mu0);
    const hRho = H_REL * rho;
    residualChemicalPotentials(m, T, rho + hRho, x, g1);
    for (let i = 0; i < N; i++) muRho[i] = (g1[i]! - mu0[i]!) / hRho;
    const hT = H_REL * T;
    residualChemicalPotentials(m, T + hT, rho, x, g1);
    const rhoT = -pT / pRho;
    this.dRhoDp = 1 / pRho;
    for (let i = 0; i < N; i++) {
      this.dT[i] = (g1[i]! - mu0[i]!) / hT + (muRho[i]! + 1 / rho) * rhoT + 1 / T;
      this.dP[i] = (muRho[i]! + 1 / rho) / pRho - 1 / p;
    }
    if (!composition) return;
    const xp = this.xp;
    const inv = 1 / (1 + H_REL);
    for (let j = 0; j < N; j++) {
      // Mole numbers x + h e_j, normalised: ln φ is homogeneous of degree zero in n.
      for (let k = 0; k < N; k++) xp[k] = (x[k]! + (k === j ? H_REL : 0)) * inv;
      const Z = residualChemicalPotentials(m, T, rho, xp, g1);
      const rhoJ = -(rho * R * T * (Z - Z0)) / H_REL / pRho;
      this.dRhoDn[j] = rhoJ;
      for (let i = 0; i < N; i++) this.dn[i * N + j] = (g1[i]! - mu0[i]!) / H_REL + (muRho[i]! + 1 / rho) * rhoJ;
    }
  }
}
