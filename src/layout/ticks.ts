// Tick and grid values: round steps for linear axes, decade ladders for logarithmic ones, and a thinning
// rule for scales whose spacing varies (saturation temperature, gauge pressure) — values only, no positions.

/** Round steps 1, 2, 2.5 and 5 × 10^k, the ones people read a scale in. */
const ROUND = [1, 2, 2.5, 5];

/** The round step nearest (in ratio) to a wanted step. */
export function roundStep(wanted: number): number {
  const decade = Math.pow(10, Math.floor(Math.log10(wanted)));
  let best = decade;
  for (const k of [...ROUND, 10]) {
    const step = k * decade;
    if (Math.abs(Math.log(step / wanted)) < Math.abs(Math.log(best / wanted))) best = step;
  }
  return best;
}

/** A minor step that divides the major step evenly (5, 4, 2 or 10 parts), nearest to the wanted one. */
export function minorStep(major: number, wanted: number): number {
  const mantissa = Number((major / Math.pow(10, Math.floor(Math.log10(major)))).toPrecision(6));
  let best = major;
  for (const n of [2, 4, 5, 10]) {
    const step = major / n;
    // 4 parts of a 2, 2.5 or 5 step give awkward values (0.5, 0.625, 1.25); only a round 1 or 2 is split in four.
    if (n === 4 && mantissa !== 1 && mantissa !== 2) continue;
    if (Math.abs(Math.log(step / wanted)) < Math.abs(Math.log(best / wanted))) best = step;
  }
  return best;
}

/** Multiples of step inside [min, max], free of float noise. */
export function multiples(min: number, max: number, step: number): number[] {
  const out: number[] = [];
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  const digits = Math.max(0, -Math.floor(Math.log10(step)) + 3);
  for (let i = first; i <= last; i++) out.push(Number((i * step).toFixed(digits)));
  return out;
}

/**
 * Subdivisions of one decade, coarse to fine. Each ladder's narrowest gap is given in decades, so a
 * caller can pick the finest ladder whose gaps still print at least a wanted distance apart.
 */
export const LOG_LADDERS: { mantissas: number[]; gap: number }[] = [
  { mantissas: [1], gap: 1 },
  { mantissas: [1, 2, 5], gap: Math.log10(2) },
  { mantissas: [1, 2, 3, 5, 7], gap: Math.log10(7 / 5) },
  { mantissas: [1, 2, 3, 4, 5, 6, 7, 8, 9], gap: Math.log10(10 / 9) },
  { mantissas: [1, 1.2, 1.4, 1.6, 1.8, 2, 2.5, 3, 3.5, 4, 4.5, 5, 6, 7, 8, 9], gap: Math.log10(2 / 1.8) },
  {
    // Tenths up to 2, quarters up to 5, halves up to 10: every gap near 0.022 decade, and a superset of the ladder above.
    mantissas: [
      1, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2, 2.25, 2.5, 2.75, 3, 3.25, 3.5, 3.75, 4, 4.25, 4.5, 4.75, 5, 5.5, 6, 6.5, 7,
      7.5, 8, 8.5, 9, 9.5,
    ],
    gap: Math.log10(5 / 4.75),
  },
];

/**
 * The finest ladder whose narrowest gap is at least `minGap` mm when a decade is `decadeMm` long, up to
 * ladder `finest` (labels stop at halves: a scale reading 42.5, 47.5 is harder to read, not easier).
 */
export function logLadder(decadeMm: number, minGap: number, finest = LOG_LADDERS.length - 1): number[] {
  let chosen = LOG_LADDERS[0]!.mantissas;
  LOG_LADDERS.forEach((ladder, i) => {
    if (i <= finest && ladder.gap * decadeMm >= minGap) chosen = ladder.mantissas;
  });
  return chosen;
}

/** Index of the finest ladder used for labels. */
export const FINEST_LABEL_LADDER = 4;

/** Values m × 10^k inside [min, max] for the ladder's mantissas m. */
export function logValues(min: number, max: number, mantissas: number[]): number[] {
  const out: number[] = [];
  for (let k = Math.floor(Math.log10(min)) - 1; k <= Math.ceil(Math.log10(max)); k++) {
    for (const m of mantissas) {
      const v = Number((m * Math.pow(10, k)).toPrecision(6));
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

export interface TickCandidate {
  value: number;
  /** Position along the axis in mm. */
  at: number;
  /** Lower is rounder and kept first (0 for multiples of the largest step). */
  rank: number;
}

/**
 * Keeps candidates roundest first, each only if it lies at least `minGap` mm from every value kept so
 * far; the result is sorted by position. Used where a scale's spacing varies along its length.
 */
export function thinTicks(candidates: TickCandidate[], minGap: number): TickCandidate[] {
  const byRank = [...candidates].sort((a, b) => a.rank - b.rank || a.at - b.at);
  const kept: TickCandidate[] = [];
  for (const c of byRank) {
    if (kept.every((k) => Math.abs(k.at - c.at) >= minGap)) kept.push(c);
  }
  return kept.sort((a, b) => a.at - b.at);
}

/** Rank of a value by the largest of `steps` (largest first) it is a multiple of; steps.length if none. */
export function rankBySteps(value: number, steps: number[]): number {
  for (let i = 0; i < steps.length; i++) {
    const q = value / steps[i]!;
    if (Math.abs(q - Math.round(q)) < 1e-6) return i;
  }
  return steps.length;
}
