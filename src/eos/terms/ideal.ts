// Ideal-gas term forms of α⁰(τ): constants, ln τ, powers of τ, Planck–Einstein terms and c_p⁰ polynomials.
// Each returns α⁰, τα⁰_τ and τ²α⁰_ττ; the ln δ of the lead term is added once by the model.
import { columns, I_A, I_T, I_TT, type IdealKernel } from "./kernel.js";
import { lit, powerStatements } from "./codegen.js";

/** a1 + a2·τ (the lead term's constants and the reference-state offsets). */
export function linearTau(a1: number, a2: number): IdealKernel {
  return {
    add(tau, _lnTau, acc) {
      acc[I_A]! += a1 + a2 * tau;
      acc[I_T]! += a2 * tau;
    },
  };
}

/** a·ln τ. */
export function logTau(a: number): IdealKernel {
  return {
    add(_tau, lnTau, acc) {
      acc[I_A]! += a * lnTau;
      acc[I_T]! += a;
      acc[I_TT]! -= a;
    },
  };
}

/** Σ n τ^t, compiled: exponents that are multiples of 1/8 come by multiplication and square roots. */
export function tauPower(rows: number[][], names: string[]): IdealKernel {
  const [n, t] = columns(rows, names, ["n", "t"]) as [Float64Array, Float64Array];
  const pw = powerStatements("tau", "lnTau", "P", Array.from(t));
  const body = [...pw.code, "let a = 0, aT = 0, aTT = 0;"];
  for (let k = 0; k < n.length; k++) {
    const tk = t[k]!;
    body.push(`{ const u = ${lit(n[k]!)} * ${pw.expr.get(tk)}; a += u; aT += ${lit(tk)} * u; aTT += ${lit(tk * (tk - 1))} * u; }`);
  }
  body.push(`acc[${I_A}] += a; acc[${I_T}] += aT; acc[${I_TT}] += aTT;`);
  return { add: new Function("tau", "lnTau", "acc", body.join("\n")) as IdealKernel["add"] };
}

/**
 * Σ n ln(1 − exp(−θτ)); `scale` turns θ given in kelvin into a reduced θ (θ/T_r). Compiled to straight-line
 * code, one exp and one log1p per term, as the residual tables are.
 */
export function planckEinstein(rows: number[][], names: string[], thetaColumn: string, scale = 1): IdealKernel {
  const [n, th] = columns(rows, names, ["n", thetaColumn]) as [Float64Array, Float64Array];
  const body: string[] = ["let a = 0, aT = 0, aTT = 0;"];
  for (let k = 0; k < n.length; k++) {
    const nk = n[k]!, tk = th[k]! * scale;
    body.push(`{ const x = ${tk} * tau, e = Math.exp(-x), om = 1 - e;`
      + ` a += ${nk} * Math.log1p(-e); aT += ${nk} * x * e / om; aTT -= ${nk} * x * x * e / (om * om); }`);
  }
  body.push(`acc[${I_A}] += a; acc[${I_T}] += aT; acc[${I_TT}] += aTT;`);
  return { add: new Function("tau", "lnTau", "acc", body.join("\n")) as IdealKernel["add"] };
}

/** Σ n ln(c + d·exp(θτ)). */
export function planckEinsteinGeneral(rows: number[][], names: string[]): IdealKernel {
  const [n, c, d, theta] = columns(rows, names, ["n", "c", "d", "theta"]) as [Float64Array, Float64Array, Float64Array, Float64Array];
  return {
    add(tau, _lnTau, acc) {
      for (let i = 0; i < n.length; i++) {
        const ni = n[i]!, ci = c[i]!, di = d[i]!, thi = theta[i]!;
        const e = Math.exp(thi * tau);
        const q = ci + di * e;
        acc[I_A]! += ni * Math.log(q);
        acc[I_T]! += (ni * di * thi * tau * e) / q;
        acc[I_TT]! += (ni * ci * di * thi * thi * tau * tau * e) / (q * q);
      }
    },
  };
}

/**
 * The α⁰ that follows from c_p⁰/R = Σ c·T^t with reference temperature T0 (T in kelvin), written in τ = T_r/T:
 * t = 0: c[1 − (T0/T_r)τ + ln τ − ln(T_r/T0)];  t ≠ 0: c[T_r^t τ^(−t)(1/(t+1) − 1/t) − T0^(t+1)τ/(T_r(t+1)) + T0^t/t].
 */
export function cp0Power(rows: number[][], names: string[], T0: number, Tr: number): IdealKernel {
  const [c, t] = columns(rows, names, ["c", "t"]) as [Float64Array, Float64Array];
  return {
    add(tau, lnTau, acc) {
      for (let i = 0; i < c.length; i++) {
        const ci = c[i]!, ti = t[i]!;
        if (ti === 0) {
          acc[I_A]! += ci * (1 - (T0 / Tr) * tau + lnTau - Math.log(Tr / T0));
          acc[I_T]! += ci * (1 - (T0 / Tr) * tau);
          acc[I_TT]! -= ci;
        } else {
          const Trt = Math.pow(Tr, ti) * Math.exp(-ti * lnTau); // T^t
          acc[I_A]! += ci * (Trt * (1 / (ti + 1) - 1 / ti) - (Math.pow(T0, ti + 1) * tau) / (Tr * (ti + 1)) + Math.pow(T0, ti) / ti);
          acc[I_T]! += ci * (Trt / (ti + 1) - (Math.pow(T0, ti + 1) * tau) / (Tr * (ti + 1)));
          acc[I_TT]! -= ci * Trt;
        }
      }
    },
  };
}
