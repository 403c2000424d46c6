// Two-phase flash of a mixture at (T, p): successive substitution on the K-factors with Rachford–Rice,
// started from K-factors the caller interpolates across the dome, so a few substitutions suffice.
import { convergenceError } from "../../errors.js";
import type { MixtureModel } from "./model.js";
import { PhaseProbe } from "./phase-probe.js";
import { rachfordRice } from "./rachford-rice.js";

const MAX_SS = 300;

/** The split of a feed into liquid x and vapour y (mole fractions) with vapour mole fraction beta. */
export class TwoPhaseSplit {
  readonly N: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly lnK: Float64Array;
  readonly liquid: PhaseProbe;
  readonly vapour: PhaseProbe;
  beta = 0;
  private readonly K: Float64Array;

  constructor(m: MixtureModel) {
    this.N = m.N;
    this.x = new Float64Array(m.N);
    this.y = new Float64Array(m.N);
    this.lnK = new Float64Array(m.N);
    this.K = new Float64Array(m.N);
    this.liquid = new PhaseProbe(m);
    this.vapour = new PhaseProbe(m);
  }

  /**
   * Splits feed z at (T, p) from the ln K (vapour over liquid) already in this.lnK. Returns false if the
   * K-factors put the feed outside the two-phase region (β outside 0…1).
   */
  flash(z: ArrayLike<number>, T: number, p: number): boolean {
    const N = this.N, x = this.x, y = this.y, K = this.K, lnK = this.lnK, L = this.liquid, V = this.vapour;
    for (let it = 0; it < MAX_SS; it++) {
      for (let i = 0; i < N; i++) K[i] = Math.exp(lnK[i]!);
      const b = rachfordRice(z, K, N);
      if (!(b > 0 && b < 1)) return false;
      this.beta = b;
      for (let i = 0; i < N; i++) {
        x[i] = z[i]! / (1 + b * (K[i]! - 1));
        y[i] = K[i]! * x[i]!;
      }
      L.setComposition(x);
      V.setComposition(y);
      L.evalLnPhi(T, p, "liquid", true);
      V.evalLnPhi(T, p, "vapour", true);
      let change = 0;
      for (let i = 0; i < N; i++) {
        const next = L.lnPhi[i]! - V.lnPhi[i]!;
        change = Math.max(change, Math.abs(next - lnK[i]!));
        lnK[i] = next;
      }
      if (change <= 1e-11) {
        // The compositions and β belong to the K-factors just replaced; one more split makes them agree.
        for (let i = 0; i < N; i++) K[i] = Math.exp(lnK[i]!);
        const b2 = rachfordRice(z, K, N);
        if (!(b2 > 0 && b2 < 1)) return false;
        this.beta = b2;
        for (let i = 0; i < N; i++) {
          x[i] = z[i]! / (1 + b2 * (K[i]! - 1));
          y[i] = K[i]! * x[i]!;
        }
        return true;
      }
    }
    throw convergenceError("two-phase flash", `T = ${T} K, p = ${p} Pa`);
  }
}
