// Round numbers for window limits and line values: mantissa series (1–2–5 and finer) and step multiples.
// Values are cleaned of binary noise so 0.1 + 0.2 prints as 0.3.

/** Mantissas for the ends of a window: fine enough that a limit lands within about 25 % of the aim. */
export const WINDOW_MANTISSAS: readonly number[] = [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8];
export const ONE_TWO_FIVE: readonly number[] = [1, 2, 5];

/** Rounds to 12 significant digits, which removes the noise of k·step in binary. */
export function clean(x: number): number {
  return x === 0 ? 0 : +x.toPrecision(12);
}

function decades(lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(lo)) - 1; e <= Math.ceil(Math.log10(hi)) + 1; e++) out.push(e);
  return out;
}

/** All m·10^k (m from the series) between lo and hi, both positive, inclusive, ascending. */
export function seriesBetween(lo: number, hi: number, mantissas: readonly number[]): number[] {
  const out: number[] = [];
  for (const e of decades(lo, hi)) {
    for (const m of mantissas) {
      const v = clean(m * 10 ** e);
      if (v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12)) out.push(v);
    }
  }
  return out.sort((a, b) => a - b);
}

/** The smallest m·10^k not below x (x > 0). */
export function niceAtLeast(x: number, mantissas: readonly number[]): number {
  for (const e of decades(x, x)) for (const m of mantissas) { const v = clean(m * 10 ** e); if (v >= x * (1 - 1e-12)) return v; }
  return x;
}

/** The largest m·10^k not above x (x > 0). */
export function niceAtMost(x: number, mantissas: readonly number[]): number {
  let best = x;
  for (const e of decades(x, x)) for (const m of mantissas) { const v = clean(m * 10 ** e); if (v <= x * (1 + 1e-12)) best = v; }
  return best;
}

/** The multiples k·step between lo and hi, inclusive, ascending. */
export function multiplesBetween(lo: number, hi: number, step: number): number[] {
  const out: number[] = [];
  const k0 = Math.ceil(lo / step - 1e-9), k1 = Math.floor(hi / step + 1e-9);
  for (let k = k0; k <= k1; k++) out.push(clean(k * step));
  return out;
}

/** The first step of the candidates (ascending) that divides a range into at most maxCount parts; else the last. */
export function stepFor(range: number, candidates: readonly number[], maxCount: number): number {
  for (const c of candidates) if (range / c <= maxCount) return c;
  return candidates[candidates.length - 1]!;
}
