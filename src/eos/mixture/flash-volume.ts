// Two-phase split of a mixture at fixed temperature and overall molar volume (the inside of an isochore):
// one Newton iteration on (ln K₁ … ln K_N, ln p), with the volume row from the phases' density slopes.
import { solveLinear } from "./linear.js";
import type { Mixture } from "./mixture.js";
import { splitWorkspace, type NewtonSplit } from "./flash-newton.js";
import { rachfordRice, splitSensitivities } from "./rachford-rice.js";

const MAX_NEWTON = 30;

/** Starting point: p, ln K and phase densities interpolated across the dome at T, and bounds on p. */
export interface VolumeStart {
  p: number;
  lnK: ArrayLike<number>;
  rhoL: number;
  rhoV: number;
  /** Dew and bubble pressures at T [Pa]: the two-phase range. */
  plo: number;
  phi: number;
}

/**
 * Solves equal fugacities and an overall molar volume (1 − β)/ρ_L + β/ρ_V equal to v [m³/mol] at T [K].
 * The fugacity rows' pressure column is p(∂ln φᵥ/∂p − ∂ln φₗ/∂p); the volume row takes the phases' density
 * slopes in composition and pressure (PhaseProbe), so the Jacobian is complete. Returns the split and its
 * pressure, or null (for the caller's fallback) if it leaves the two-phase region or does not converge.
 */
export function newtonAtTV(mix: Mixture, T: number, v: number, start: VolumeStart): (NewtonSplit & { p: number }) | null {
  const w = splitWorkspace(mix);
  const { L, V, lnK, x, y, K, dBeta, dx, dy, J, Jkeep, F } = w;
  const N = w.N, n1 = N + 1, z = mix.z;
  for (let k = 0; k < N; k++) lnK[k] = start.lnK[k]!;
  let lnp = Math.log(start.p);
  const lnLo = Math.log(start.plo), lnHi = Math.log(start.phi);
  L.rho = start.rhoL;
  V.rho = start.rhoV;
  let prev = Infinity, fresh = true;
  for (let it = 0; it < MAX_NEWTON; it++) {
    for (let k = 0; k < N; k++) K[k] = Math.exp(lnK[k]!);
    const beta = rachfordRice(z, K, N);
    if (!(beta > 0 && beta < 1)) return null;
    for (let k = 0; k < N; k++) {
      x[k] = z[k]! / (1 + beta * (K[k]! - 1));
      y[k] = K[k]! * x[k]!;
    }
    L.setComposition(x);
    V.setComposition(y);
    const p = Math.exp(lnp);
    // The slopes cost N + 3 evaluations of the chemical potentials per phase, ln φ alone one: the Jacobian is
    // kept while the residual falls at least tenfold per step, as in the (p, h) Newton.
    if (fresh) {
      L.eval(T, p, "liquid", true, true);
      V.eval(T, p, "vapour", true, true);
    } else {
      L.evalLnPhi(T, p, "liquid", true);
      V.evalLnPhi(T, p, "vapour", true);
    }
    const vL = 1 / L.rho, vV = 1 / V.rho;
    let resid = 0;
    for (let i = 0; i < N; i++) {
      F[i] = lnK[i]! + V.lnPhi[i]! - L.lnPhi[i]!;
      resid = Math.max(resid, Math.abs(F[i]!));
    }
    const fug = resid;
    F[N] = ((1 - beta) * vL + beta * vV) / v - 1;
    resid = Math.max(resid, Math.abs(F[N]!));
    if (!Number.isFinite(resid)) return null;
    // ln φ of a dense liquid (Z ≈ 1e-3) carries about 1e-10 of rounding, where the iteration stalls: there
    // the split is accepted with fugacities equal to 1e-9 and the volume met to 1e-11.
    const stalled = it >= 3 && fug <= 1e-9 && Math.abs(F[N]!) <= 1e-11;
    if (resid <= 1e-12 || stalled) return { T, p, beta, x, y, rhoL: L.rho, rhoV: V.rho, lnK };
    if (!fresh && resid > 0.1 * prev) {
      fresh = true;
      prev = Infinity;
      continue;
    }
    if (fresh) {
      splitSensitivities(z, K, beta, x, y, N, dBeta, dx, dy);
      for (let i = 0; i < N; i++) {
        for (let j = 0; j < N; j++) {
          let s = i === j ? 1 : 0;
          for (let k = 0; k < N; k++) s += V.dn[i * N + k]! * dy[k * N + j]! - L.dn[i * N + k]! * dx[k * N + j]!;
          Jkeep[i * n1 + j] = s;
        }
        Jkeep[i * n1 + N] = p * (V.dP[i]! - L.dP[i]!);
      }
      // d(v_total)/d ln K_j: through β and through each phase's composition (dv/dn = −(dρ/dn)/ρ²).
      for (let j = 0; j < N; j++) {
        let sL = 0, sV = 0;
        for (let k = 0; k < N; k++) {
          sL += L.dRhoDn[k]! * dx[k * N + j]!;
          sV += V.dRhoDn[k]! * dy[k * N + j]!;
        }
        Jkeep[N * n1 + j] = (dBeta[j]! * (vV - vL) - (1 - beta) * vL * vL * sL - beta * vV * vV * sV) / v;
      }
      Jkeep[N * n1 + N] = -p * ((1 - beta) * vL * vL * L.dRhoDp + beta * vV * vV * V.dRhoDp) / v;
      fresh = false;
    }
    prev = resid;
    J.set(Jkeep);
    for (let k = 0; k < n1; k++) F[k] = -F[k]!;
    if (!solveLinear(J, F, n1)) return null;
    // Moderate steps: ln K by at most 0.5, ln p by at most 0.2, and p kept inside the dew–bubble range.
    let big = 0;
    for (let k = 0; k < N; k++) big = Math.max(big, Math.abs(F[k]!));
    const damp = Math.min(1, 0.5 / Math.max(big, 1e-300), 0.2 / Math.max(Math.abs(F[N]!), 1e-300));
    for (let k = 0; k < N; k++) lnK[k]! += damp * F[k]!;
    let next = lnp + damp * F[N]!;
    if (next <= lnLo) next = 0.5 * (lnp + lnLo);
    if (next >= lnHi) next = 0.5 * (lnp + lnHi);
    lnp = next;
  }
  return null;
}
