// The contract every Helmholtz term evaluator meets: add its share of α and of its scaled derivatives.
// Scaled derivatives (δ∂/∂δ, τ∂/∂τ …) keep every term form in one shape and avoid divisions per term.

/**
 * Residual accumulator slots: α, δα_δ, τα_τ, δ²α_δδ, τ²α_ττ, δτα_δτ.
 * Every residual evaluator adds into these six slots and never clears them.
 */
export const R_A = 0, R_D = 1, R_T = 2, R_DD = 3, R_TT = 4, R_DT = 5;

export interface ResidualKernel {
  /** Adds this term group's contribution at (τ, δ); lnTau and lnDelta are ln τ and ln δ, computed once by the caller. */
  add(tau: number, delta: number, lnTau: number, lnDelta: number, acc: Float64Array): void;
}

/** Ideal-gas accumulator slots (without the ln δ of the lead term): α⁰, τα⁰_τ, τ²α⁰_ττ. */
export const I_A = 0, I_T = 1, I_TT = 2;

export interface IdealKernel {
  add(tau: number, lnTau: number, acc: Float64Array): void;
}

/** Reads the rows of a term table into one typed array per column, in the column order asked for. */
export function columns(rows: number[][], names: string[], wanted: string[]): Float64Array[] {
  return wanted.map((w) => {
    const j = names.indexOf(w);
    if (j < 0) throw new Error(`term table lacks column ${w}`);
    return Float64Array.from(rows, (r) => r[j] as number);
  });
}
