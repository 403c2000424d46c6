// Where a line of constant entropy or specific volume enters and leaves the two-phase region: the stretches of
// the tie-line parameter σ where the value lies between its saturated-liquid and saturated-vapour values.
import type { TieLine, TieLines } from "./tie-lines.js";

/** What bounds a two-phase stretch: the bubble (liquid) line, the dew (vapour) line, or the traced dome's end. */
export type Boundary = "liquid" | "vapour" | "range";

export interface TwoPhaseStretch {
  from: number;
  to: number;
  fromBoundary: Boundary;
  toBoundary: Boundary;
}

type Side = "liquid" | "two-phase" | "vapour";

/** Samples of σ over the dome that every line's search shares (the tie lines are cached). */
const GRID = 32;

function side(q: number, ends: [number, number]): Side {
  return q < ends[0] ? "liquid" : q > ends[1] ? "vapour" : "two-phase";
}

/** The root of g between a and b (g(a), g(b) of opposite signs) by the Illinois variant of regula falsi. */
function root(g: (sigma: number) => number | null, a: number, b: number): number {
  let ga = g(a), gb = g(b);
  if (ga === null || gb === null) return 0.5 * (a + b);
  for (let k = 0; k < 100 && Math.abs(b - a) > 1e-13 * (Math.abs(a) + Math.abs(b) + 1e-300); k++) {
    let c = (a * gb - b * ga) / (gb - ga);
    if (!(c > Math.min(a, b) && c < Math.max(a, b))) c = 0.5 * (a + b);
    const gc = g(c);
    if (gc === null || gc === 0) return c;
    if (Math.sign(gc) !== Math.sign(gb)) { a = b; ga = gb; } else ga *= 0.5;
    b = c;
    gb = gc;
  }
  return b;
}

/**
 * The two-phase stretches, in increasing σ, of the line q = const, where `ends` gives the saturated-liquid and
 * saturated-vapour values of q on a tie line (liquid below vapour).
 */
export function twoPhaseStretches(tie: TieLines, q: number, ends: (t: TieLine) => [number, number]): TwoPhaseStretch[] {
  const g = (which: 0 | 1) => (sigma: number) => {
    const t = tie.at(sigma);
    return t ? q - ends(t)[which] : null;
  };
  const out: TwoPhaseStretch[] = [];
  let open: { from: number; boundary: Boundary } | null = null;
  let prev: { sigma: number; side: Side } | null = null;
  for (let i = 0; i <= GRID; i++) {
    const sigma = i === GRID ? tie.hi : tie.lo + ((tie.hi - tie.lo) * i) / GRID;
    const t = tie.at(sigma);
    if (!t) continue;
    const s = side(q, ends(t));
    if (!prev) {
      if (s === "two-phase") open = { from: sigma, boundary: "range" };
    } else if (s !== prev.side) {
      const a = prev.sigma;
      if (prev.side === "two-phase") {
        const r = root(g(s === "vapour" ? 1 : 0), a, sigma);
        out.push({ from: open!.from, to: r, fromBoundary: open!.boundary, toBoundary: s === "vapour" ? "vapour" : "liquid" });
        open = null;
      } else if (s === "two-phase") {
        open = { from: root(g(prev.side === "vapour" ? 1 : 0), a, sigma), boundary: prev.side };
      } else {
        // Across the whole two-phase region within one step (near the top, where the dome is narrow).
        const rL = root(g(0), a, sigma), rV = root(g(1), a, sigma);
        const [from, to] = rL < rV ? [rL, rV] : [rV, rL];
        const [fb, tb]: [Boundary, Boundary] = rL < rV ? ["liquid", "vapour"] : ["vapour", "liquid"];
        if (to > from) out.push({ from, to, fromBoundary: fb, toBoundary: tb });
      }
    }
    prev = { sigma, side: s };
  }
  if (open && prev) out.push({ from: open.from, to: prev.sigma, fromBoundary: open.boundary, toBoundary: "range" });
  return out;
}
