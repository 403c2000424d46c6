// The multi-fluid mixture model α(δ, τ, x) = Σ xᵢ(α⁰ᵢ + ln xᵢ) + Σ xᵢ αʳᵢ(δ, τ) + Σᵢ<ⱼ xᵢxⱼ Fᵢⱼ αʳᵢⱼ(δ, τ).
// δ = ρ v_r(x), τ = T_r(x)/T; composition enters through the reducing functions, the weights and the departure sum.
import type { Fluid } from "../fluid.js";
import type { ResidualKernel } from "../terms/kernel.js";
import { binaryPair, type BinaryPair, type EstimateRule } from "./binary-data.js";
import { departureKernel } from "./departure.js";
import { ReducingFunction } from "./reducing.js";

export interface ModelPair extends BinaryPair {
  i: number;
  j: number;
}

export class MixtureModel {
  readonly fluids: readonly Fluid[];
  readonly N: number;
  /** The model's one molar gas constant [J/(mol K)]: Σ zᵢRᵢ at the composition it was built for (exact in each pure limit). */
  readonly R: number;
  /** Molar masses [kg/mol]. */
  readonly M: Float64Array;
  readonly pairs: readonly ModelPair[];
  readonly Tred: ReducingFunction;
  readonly vred: ReducingFunction;
  /** Residual part after evalResidual: αʳ and its scaled derivatives (slots as in terms/kernel.ts). */
  readonly r = new Float64Array(6);
  /** ∂αʳ/∂xᵢ at constant δ, τ and the other x, after evalResidual. */
  readonly ax: Float64Array;
  /** Ideal part after evalIdeal: α⁰ (with ln δᵢ and ln xᵢ), τα⁰_τ, τ²α⁰_ττ. */
  readonly i = new Float64Array(3);
  /** T_r [K] and v_r [m³/mol] of the last evaluation. */
  Tr = 0;
  vr = 0;
  private readonly kernels: (ResidualKernel | null)[];
  private readonly F: Float64Array;
  private readonly pairR: Float64Array[];
  private readonly pureA: Float64Array;
  private readonly Rratio: Float64Array;

  constructor(fluids: readonly Fluid[], z: ArrayLike<number>, rule: EstimateRule = "linear") {
    this.fluids = fluids;
    const N = (this.N = fluids.length);
    let R = 0;
    for (let k = 0; k < N; k++) R += z[k]! * fluids[k]!.R;
    this.R = R;
    this.M = Float64Array.from(fluids, (f) => f.M);
    this.Rratio = Float64Array.from(fluids, (f) => f.R / R);
    const pairs: ModelPair[] = [];
    for (let i = 0; i < N; i++) for (let j = i + 1; j < N; j++) pairs.push({ i, j, ...binaryPair(fluids[i]!, fluids[j]!, rule) });
    this.pairs = pairs;
    const T = fluids.map((f) => f.model.Tr), v = fluids.map((f) => 1 / f.model.rhor);
    this.Tred = new ReducingFunction(T, pairs.map((p) => [p.i, p.j, p.betaT, p.gammaT, Math.sqrt(T[p.i]! * T[p.j]!)] as const));
    this.vred = new ReducingFunction(v, pairs.map((p) => [p.i, p.j, p.betaV, p.gammaV, Math.pow(Math.cbrt(v[p.i]!) + Math.cbrt(v[p.j]!), 3) / 8] as const));
    this.kernels = pairs.map((p) => (p.departure && p.F !== 0 ? departureKernel(p.departure) : null));
    this.F = Float64Array.from(pairs, (p) => p.F);
    this.pairR = pairs.map(() => new Float64Array(6));
    this.pureA = new Float64Array(N);
    this.ax = new Float64Array(N);
  }

  /** Sets Tr and vr (and their x-slopes in Tred.dx, vred.dx) for composition x. */
  reduce(x: ArrayLike<number>): void {
    this.Tr = this.Tred.eval(x);
    this.vr = this.vred.eval(x);
  }

  /** Mixture residual part at (τ, δ) for composition x (call reduce(x) first to get τ and δ). */
  evalResidual(tau: number, delta: number, x: ArrayLike<number>): void {
    const r = this.r, N = this.N, ax = this.ax;
    r.fill(0);
    const lnTau = Math.log(tau), lnDelta = Math.log(delta);
    for (let k = 0; k < N; k++) {
      const m = this.fluids[k]!.model;
      m.evalResidual(tau, delta);
      const xk = x[k]!, pr = m.r;
      for (let s = 0; s < 6; s++) r[s]! += xk * pr[s]!;
      this.pureA[k] = pr[0]!;
      ax[k] = pr[0]!;
    }
    for (let k = 0; k < this.kernels.length; k++) {
      const ker = this.kernels[k];
      if (!ker) continue;
      const acc = this.pairR[k]!;
      acc.fill(0);
      ker.add(tau, delta, lnTau, lnDelta, acc);
      const p = this.pairs[k]!, F = this.F[k]!;
      const xi = x[p.i]!, xj = x[p.j]!, w = xi * xj * F;
      for (let s = 0; s < 6; s++) r[s]! += w * acc[s]!;
      ax[p.i]! += xj * F * acc[0]!;
      ax[p.j]! += xi * F * acc[0]!;
    }
  }

  /** Ideal part at T [K], molar density ρ [mol/m³], composition x: each component at its own reduced variables. */
  evalIdeal(T: number, rho: number, x: ArrayLike<number>): void {
    const o = this.i;
    o.fill(0);
    for (let k = 0; k < this.N; k++) {
      const xk = x[k]!;
      if (xk === 0) continue;
      const m = this.fluids[k]!.model;
      m.evalIdeal(m.Tr / T);
      const w = xk * this.Rratio[k]!;
      // τ-derivatives scaled by τ are the same whatever τ is proportional to 1/T, so the components' parts add.
      o[0]! += w * m.i[0]! + xk * (Math.log(rho / m.rhor) + Math.log(xk));
      o[1]! += w * m.i[1]!;
      o[2]! += w * m.i[2]!;
    }
  }

  /** Molar mass [kg/mol] of composition x. */
  molarMass(x: ArrayLike<number>): number {
    let M = 0;
    for (let k = 0; k < this.N; k++) M += x[k]! * this.M[k]!;
    return M;
  }
}
