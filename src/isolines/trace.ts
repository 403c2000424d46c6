// Adaptive tracing of one line given its exact point as a function of a parameter: subdivide until every
// chord stays within the page tolerance of the true line, clip to the window and stop where the equation does.
import { chordDeviation, inWindow, pageDistance, type PageMapping } from "./page.js";
import type { Point, TraceStats } from "./types.js";

/** The line's exact point at parameter t, or null where the line is not defined (outside the equation's range). */
export type Evaluate = (t: number) => Point | null;

export interface TraceSettings {
  mapping: PageMapping;
  toleranceMm: number;
  /** Equal parameter steps sampled before any subdivision. */
  initialSegments?: number;
  /** Halvings of an initial step, at most. */
  maxDepth?: number;
  /** Evaluations one call may spend before it stops refining (a guard, never reached in practice). */
  maxEvaluations?: number;
}

const IN = 0, OUT = 1, UNDEFINED = 2;
/** A chord still this long after the depth cap is a jump of the equation, not a curve: the line breaks there. */
const JUMP_MM = 0.5;
/**
 * Halving the parameter of a smooth curve halves its chords (for a square-root end, to 0.71 of the chord); across
 * a jump one half keeps nearly the whole chord, however fine the split. Such chords are refined down to the cap.
 */
const JUMP_SHARE = 0.9;
/** Window edges and validity ends are located to this distance on the page; ends closer than it are one point. */
export const EDGE_MM = 1e-3;
/** Levels of midpoints probed between two samples that both lie outside, to catch a short visit to the window. */
const PROBE_DEPTH = 2;

/**
 * Traces the line from t0 to t1 (either order) and returns its connected pieces inside the window, each in
 * parameter order. Counters are added to `stats`.
 */
export function traceCurve(evaluate: Evaluate, t0: number, t1: number, settings: TraceSettings, stats: TraceStats): Point[][] {
  const { mapping, toleranceMm } = settings;
  const n = settings.initialSegments ?? 8;
  const maxDepth = settings.maxDepth ?? 24;
  const budget = settings.maxEvaluations ?? 50_000;
  const window = mapping.window;
  const scale = Math.abs(t1 - t0);
  let used = 0;
  const pieces: Point[][] = [];
  let current: Point[] | null = null;

  const ev = (t: number): Point | null => {
    used++;
    return evaluate(t);
  };
  const status = (q: Point | null) => (q === null ? UNDEFINED : inWindow(window, q) ? IN : OUT);
  const start = (q: Point) => {
    current = [q];
    pieces.push(current);
  };
  const push = (q: Point) => current!.push(q);

  /** The last parameter inside, walking from tIn (inside) towards tOut (outside or undefined). */
  const boundary = (tIn: number, qIn: Point, tOut: number, qOut: Point | null): [number, Point] => {
    for (let k = 0; k < 60 && Math.abs(tOut - tIn) > 1e-10 * scale; k++) {
      if (qOut !== null && pageDistance(mapping, qIn, qOut) < EDGE_MM) break;
      const tm = 0.5 * (tIn + tOut);
      const qm = ev(tm);
      if (status(qm) === IN) { tIn = tm; qIn = qm!; } else { tOut = tm; qOut = qm; }
    }
    return [tIn, qIn];
  };

  /** Both ends inside; `a` is the current piece's last point. */
  const refine = (ta: number, a: Point, tb: number, b: Point, depth: number): void => {
    const tm = 0.5 * (ta + tb);
    const m = ev(tm);
    if (status(m) !== IN) {
      span(ta, a, tm, m, depth + 1);
      span(tm, m, tb, b, depth + 1);
      return;
    }
    const length = pageDistance(mapping, a, b);
    const lopsided = length > JUMP_MM && Math.max(pageDistance(mapping, a, m!), pageDistance(mapping, m!, b)) > JUMP_SHARE * length;
    if (!lopsided && chordDeviation(mapping, a, b, m!) <= toleranceMm) { push(b); return; }
    if (depth >= maxDepth || used >= budget) {
      if (length > JUMP_MM) { stats.breaks++; start(b); }
      else { stats.capped++; push(m!); push(b); }
      return;
    }
    refine(ta, a, tm, m!, depth + 1);
    refine(tm, m!, tb, b, depth + 1);
  };

  /** Any ends; if `a` is inside it is the current piece's last point. */
  const span = (ta: number, a: Point | null, tb: number, b: Point | null, depth: number): void => {
    const sa = status(a), sb = status(b);
    if (sa === IN && sb === IN) { refine(ta, a!, tb, b!, depth); return; }
    if (sa === IN) {
      const [t, q] = boundary(ta, a!, tb, b);
      if (t !== ta) refine(ta, a!, t, q, depth);
      current = null;
      return;
    }
    if (sb === IN) {
      const [t, q] = boundary(tb, b!, ta, a);
      start(q);
      if (t !== tb) refine(t, q, tb, b!, depth);
      return;
    }
    if (depth < PROBE_DEPTH) {
      const tm = 0.5 * (ta + tb);
      const m = ev(tm);
      span(ta, a, tm, m, depth + 1);
      span(tm, m, tb, b, depth + 1);
    }
  };

  let tPrev = t0;
  let qPrev = ev(t0);
  if (status(qPrev) === IN) start(qPrev!);
  for (let i = 1; i <= n; i++) {
    const t = i === n ? t1 : t0 + ((t1 - t0) * i) / n;
    const q = ev(t);
    span(tPrev, qPrev, t, q, 0);
    tPrev = t;
    qPrev = q;
  }
  stats.evaluations += used;
  return pieces.filter((p) => p.length >= 2);
}

/**
 * Joins the pieces of consecutive parts of one line (liquid, two-phase, vapour …) where one ends on the page
 * within a thousandth of a millimetre of where the next begins.
 */
export function joinParts(mapping: PageMapping, parts: Point[][][]): Point[][] {
  const out: Point[][] = [];
  for (const pieces of parts) {
    for (const piece of pieces) {
      const last = out[out.length - 1];
      if (last && pageDistance(mapping, last[last.length - 1]!, piece[0]!) < EDGE_MM) last.push(...piece.slice(1));
      else out.push([...piece]);
    }
  }
  return out;
}

/**
 * Connects the end of `before` to the start of `after` (counted in stats.bridges) when the two lie apart on the
 * page but within maxMm: across a gap the engine leaves close to the critical point. A gap no wider than mergeMm
 * is closed by letting the end stand in for the start, rather than by a chord of its own with a slope of chance.
 */
export function bridge(mapping: PageMapping, before: Point[][], after: Point[][], maxMm: number, stats: TraceStats, mergeMm = 0): boolean {
  const last = before[before.length - 1], first = after[0];
  if (!last || !first) return false;
  const end = last[last.length - 1]!;
  const gap = pageDistance(mapping, end, first[0]!);
  if (gap < EDGE_MM || gap > maxMm) return false;
  if (gap <= mergeMm && first.length > 2) first[0] = end;
  else first.unshift(end);
  stats.bridges++;
  stats.longestBridgeMm = Math.max(stats.longestBridgeMm, gap);
  return true;
}
