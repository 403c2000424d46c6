// Bubble and dew points: a feed z in equilibrium with an incipient phase w = K·z. Wilson K-factors start
// successive substitution, which hands over to Newton on (ln K, ln T, ln p) with one of them specified.
import { convergenceError, DomeprintError } from "../../errors.js";
import type { Branch } from "../density.js";
import { solveLinear } from "./linear.js";
import type { MixtureModel } from "./model.js";
import { PhaseProbe } from "./phase-probe.js";

const MAX_NEWTON = 40;
const MAX_SS = 12;

/** Unknowns X = (ln K₁ … ln K_N, ln T, ln p); the spec fixes X[s] = S. */
export class IncipientSolver {
  readonly m: MixtureModel;
  readonly N: number;
  readonly feed: PhaseProbe;
  readonly trial: PhaseProbe;
  /** Current unknowns and, after a Newton solve, the sensitivities dX/dS of the converged point. */
  readonly X: Float64Array;
  readonly dXdS: Float64Array;
  /** True when the feed is the liquid (a bubble point), false when it is the vapour (a dew point). */
  feedLiquid = true;
  /** Newton iterations of the last solve. */
  iterations = 0;
  private readonly w: Float64Array;
  private readonly F: Float64Array;
  private readonly J: Float64Array;
  private readonly Jsave: Float64Array;
  private readonly step: Float64Array;
  private readonly omega: Float64Array;
  private readonly Tc: Float64Array;
  private readonly pc: Float64Array;

  constructor(m: MixtureModel) {
    this.m = m;
    const N = (this.N = m.N);
    this.feed = new PhaseProbe(m);
    this.trial = new PhaseProbe(m);
    this.X = new Float64Array(N + 2);
    this.dXdS = new Float64Array(N + 2);
    this.w = new Float64Array(N);
    this.F = new Float64Array(N + 2);
    this.J = new Float64Array((N + 2) * (N + 2));
    this.Jsave = new Float64Array((N + 2) * (N + 2));
    this.step = new Float64Array(N + 2);
    this.Tc = Float64Array.from(m.fluids, (f) => f.Tc);
    this.pc = Float64Array.from(m.fluids, (f) => f.pc);
    // Acentric factors from each fluid's vapour-pressure ancillary at 0.7 T_c (their definition).
    this.omega = Float64Array.from(m.fluids, (f) => (f.pSat ? -Math.log10(f.pSat.value(0.7 * f.Tc) / f.pc) - 1 : 0));
  }

  /**
   * Close to the critical point the liquid and vapour roots of each phase lie close together and swap roles
   * as the continuation passes it: there each phase takes the root its last density leads to.
   */
  nearCritical = false;

  private get branches(): [Branch, Branch] {
    if (this.nearCritical) return ["single", "single"];
    return this.feedLiquid ? ["liquid", "vapour"] : ["vapour", "liquid"];
  }

  /** Wilson's ln K (vapour over liquid) of component k at (T, p). */
  private wilson(k: number, T: number, p: number): number {
    return Math.log(this.pc[k]! / p) + 5.373 * (1 + this.omega[k]!) * (1 - this.Tc[k]! / T);
  }

  /**
   * Starting values from Wilson's K-factors for a bubble (feedLiquid) or dew point at given T or p,
   * written into X with K oriented as trial over feed.
   */
  wilsonStart(z: ArrayLike<number>, given: "T" | "p", value: number): void {
    const N = this.N, X = this.X, sign = this.feedLiquid ? 1 : -1;
    const sumAt = (T: number, p: number) => {
      let s = 0;
      for (let k = 0; k < N; k++) s += z[k]! * Math.exp(sign * this.wilson(k, T, p));
      return s;
    };
    let T: number, p: number;
    if (given === "T") {
      T = value;
      // Σ z K = 1 with K ∝ 1/p (bubble) or Σ z/K = 1 with 1/K ∝ p (dew): one division each.
      p = this.feedLiquid ? sumAt(T, 1) : 1 / sumAt(T, 1);
    } else {
      p = value;
      let lo = 20, hi = 2000;
      T = 300;
      for (let k = 0; k < 100 && hi - lo > 1e-6; k++) {
        T = 0.5 * (lo + hi);
        // Σ z K grows with T for a bubble point, Σ z/K falls with T for a dew point.
        if ((sumAt(T, p) > 1) === this.feedLiquid) hi = T; else lo = T;
      }
    }
    for (let k = 0; k < N; k++) X[k] = sign * this.wilson(k, T, p);
    X[N] = Math.log(T);
    X[N + 1] = Math.log(p);
    this.feed.rho = 0;
    this.trial.rho = 0;
  }

  /**
   * Successive substitution at the given T or p: K from the fugacity ratio, then p (or T) from Σw = 1.
   * Stops early once ln K settles to 1e-4, leaving Newton the rest.
   */
  substitute(z: ArrayLike<number>, given: "T" | "p"): void {
    const N = this.N, X = this.X, w = this.w;
    const [bz, bw] = this.branches;
    this.feed.setComposition(z);
    for (let it = 0; it < MAX_SS; it++) {
      const T = Math.exp(X[N]!), p = Math.exp(X[N + 1]!);
      for (let k = 0; k < N; k++) w[k] = z[k]! * Math.exp(X[k]!);
      this.trial.setComposition(w);
      this.feed.evalLnPhi(T, p, bz, true);
      this.trial.evalLnPhi(T, p, bw, true);
      let change = 0, sw = 0;
      for (let k = 0; k < N; k++) {
        const lnK = this.feed.lnPhi[k]! - this.trial.lnPhi[k]!;
        change = Math.max(change, Math.abs(lnK - X[k]!));
        X[k] = lnK;
        sw += z[k]! * Math.exp(lnK);
      }
      // The trial phase's amount Σw scales as 1/p for an incipient vapour and as p for an incipient liquid.
      const lnSw = Math.log(sw);
      if (given === "T") X[N + 1]! += this.feedLiquid ? lnSw : -lnSw;
      else {
        // d ln Σw / d ln T from Wilson's temperature slope, enough for a substitution step.
        let slope = 0;
        for (let k = 0; k < N; k++) slope += z[k]! * Math.exp(X[k]!) * 5.373 * (1 + this.omega[k]!) * this.Tc[k]! / T;
        slope = Math.abs(slope / sw);
        const dlnT = (this.feedLiquid ? -lnSw : lnSw) / Math.max(slope, 1);
        X[N]! += Math.max(-0.05, Math.min(0.05, dlnT));
      }
      if (change < 1e-4 && Math.abs(lnSw) < 1e-4) return;
    }
  }

  /**
   * Newton on F(X) = 0 with X[spec] = S, from the current X. Leaves the converged X, the feed and trial
   * phases evaluated at it, and dX/dS. Throws E_CONVERGENCE when the cap is reached or the phases merge.
   */
  newton(z: ArrayLike<number>, spec: number, S: number): void {
    const N = this.N, n = N + 2, X = this.X, F = this.F, J = this.J, w = this.w, st = this.step;
    const [bz, bw] = this.branches;
    this.feed.setComposition(z);
    X[spec] = S;
    let backtracks = 0, lastScale = 0;
    for (let it = 0; it < MAX_NEWTON; it++) {
      this.iterations = it;
      const T = Math.exp(X[N]!), p = Math.exp(X[N + 1]!);
      let sw = 0;
      for (let k = 0; k < N; k++) sw += (w[k] = z[k]! * Math.exp(X[k]!));
      this.trial.setComposition(w);
      let failed: Branch | null = null;
      try {
        failed = bz;
        this.feed.eval(T, p, bz, true, false);
        failed = bw;
        this.trial.eval(T, p, bw, true, true);
      } catch (e) {
        if (!(e instanceof DomeprintError) || backtracks >= 10) throw e;
        backtracks++;
        if (it === 0 || lastScale === 0) {
          // No root at the starting point: a missing vapour means p too high (or T too low), a missing
          // liquid the reverse; move the free variable that way and start again.
          const up = failed === "liquid";
          if (spec !== N + 1) X[N + 1]! += up ? 0.1 : -0.1;
          else X[N]! += up ? -0.01 : 0.01;
          this.feed.rho = 0;
          this.trial.rho = 0;
          it = -1;
        } else {
          // A step that leaves a phase without a density root on its branch is halved.
          lastScale *= 0.5;
          for (let k = 0; k < n; k++) X[k]! -= lastScale * st[k]!;
        }
        continue;
      }
      backtracks = 0;
      const fz = this.feed, ft = this.trial;
      let big = 0;
      J.fill(0);
      for (let i = 0; i < N; i++) {
        F[i] = X[i]! + ft.lnPhi[i]! - fz.lnPhi[i]!;
        for (let j = 0; j < N; j++) J[i * n + j] = (i === j ? 1 : 0) + (ft.dn[i * N + j]! * w[j]!) / sw;
        J[i * n + N] = T * (ft.dT[i]! - fz.dT[i]!);
        J[i * n + N + 1] = p * (ft.dP[i]! - fz.dP[i]!);
        J[N * n + i] = w[i]!;
        big = Math.max(big, Math.abs(F[i]!));
      }
      F[N] = sw - 1;
      F[N + 1] = 0;
      J[(N + 1) * n + spec] = 1;
      big = Math.max(big, Math.abs(F[N]!));
      if (!Number.isFinite(big)) break;
      // Equal densities mean the trivial solution w = z, not an equilibrium.
      if (Math.abs(fz.rho - ft.rho) <= 1e-7 * fz.rho) break;
      for (let k = 0; k < n; k++) st[k] = -F[k]!;
      // The Jacobian is kept: the sensitivities dX/dS of a converged point solve J dX/dS = e_(spec row).
      this.Jsave.set(J);
      if (!solveLinear(J, st, n)) break;
      let move = 0;
      for (let k = 0; k < n; k++) move = Math.max(move, Math.abs(st[k]!));
      // Converged when the residuals are at rounding level or the Newton step is: ln Z of a dense liquid
      // (Z ≈ 1e-3) carries ~1e-10 of rounding, so steps stall there; the state evaluated here is then
      // within that step of the solution.
      if (big <= 1e-12 || (move <= 1e-9 && big <= 1e-7)) {
        this.dXdS.fill(0);
        this.dXdS[N + 1] = 1;
        if (!solveLinear(this.Jsave, this.dXdS, n)) this.dXdS.fill(NaN);
        return;
      }
      // Damping: no step may move ln K by more than 1, ln T by more than 0.02 or ln p by more than 0.3.
      let scale = 1;
      for (let k = 0; k < N; k++) scale = Math.min(scale, 1 / Math.max(Math.abs(st[k]!), 1e-300));
      scale = Math.min(scale, 0.02 / Math.max(Math.abs(st[N]!), 1e-300), 0.3 / Math.max(Math.abs(st[N + 1]!), 1e-300));
      for (let k = 0; k < n; k++) X[k]! += scale * st[k]!;
      lastScale = scale;
    }
    throw convergenceError(this.feedLiquid ? "bubble point" : "dew point", `${spec === N ? "T" : spec === N + 1 ? "p" : `ln K${spec + 1}`} = ${spec >= N ? Math.exp(S) : S}`);
  }

  /** A bubble (feedLiquid) or dew point at given T or p from Wilson's start: substitution, then Newton. */
  solveFromScratch(z: ArrayLike<number>, given: "T" | "p", value: number): void {
    this.wilsonStart(z, given, value);
    try {
      this.substitute(z, given);
    } catch {
      // A failed substitution step (no density root on the way) leaves Newton to start from Wilson's values.
      this.wilsonStart(z, given, value);
    }
    this.newton(z, given === "T" ? this.N : this.N + 1, Math.log(value));
  }
}
