// GERG-type reducing functions T_r(x) and v_r(x) = 1/ρ_r(x) of a mixture and their first derivatives in x.
// Y_r = Σ xᵢ² Yᵢ + Σᵢ<ⱼ c_ij xᵢxⱼ(xᵢ + xⱼ)/(β² xᵢ + xⱼ), with c_ij = 2βγ Y_ij (Kunz & Wagner 2012, eqs. 7.9–7.10).

/** One reducing function over N components; pair (k) joins components pi[k] < pj[k]. */
export class ReducingFunction {
  readonly N: number;
  private readonly Y: Float64Array;
  private readonly pi: Int32Array;
  private readonly pj: Int32Array;
  private readonly c: Float64Array;
  private readonly b2: Float64Array;
  /** After eval: the value and ∂Y_r/∂xᵢ (every x independent). */
  value = 0;
  readonly dx: Float64Array;

  /** Y: pure values; pairs: [i, j, β, γ, Y_ij] with β, γ oriented to the order (i, j). */
  constructor(Y: ArrayLike<number>, pairs: ReadonlyArray<readonly [number, number, number, number, number]>) {
    this.N = Y.length;
    this.Y = Float64Array.from(Y);
    this.pi = Int32Array.from(pairs, (p) => p[0]);
    this.pj = Int32Array.from(pairs, (p) => p[1]);
    this.c = Float64Array.from(pairs, (p) => 2 * p[2] * p[3] * p[4]);
    this.b2 = Float64Array.from(pairs, (p) => p[2] * p[2]);
    this.dx = new Float64Array(this.N);
  }

  eval(x: ArrayLike<number>): number {
    const N = this.N, Y = this.Y, dx = this.dx;
    let v = 0;
    for (let i = 0; i < N; i++) {
      const xi = x[i]!;
      v += xi * xi * Y[i]!;
      dx[i] = 2 * xi * Y[i]!;
    }
    for (let k = 0; k < this.pi.length; k++) {
      const i = this.pi[k]!, j = this.pj[k]!;
      const xi = x[i]!, xj = x[j]!;
      const q = this.b2[k]! * xi + xj;
      // With both fractions zero the pair term and its slopes vanish (x_i x_j s / q is bounded by x_i x_j / min(β², 1)).
      if (q === 0) continue;
      const c = this.c[k]!, s = xi + xj, xx = xi * xj;
      const f = s / q;
      v += c * xx * f;
      dx[i]! += c * ((xj * s + xx) / q - (xx * s * this.b2[k]!) / (q * q));
      dx[j]! += c * ((xi * s + xx) / q - (xx * s) / (q * q));
    }
    this.value = v;
    return v;
  }
}
