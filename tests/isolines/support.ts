// Independent evaluations for the isoline checks: each traced point and each segment's parameter midpoint
// recomputed with the engine's flashes (never with the tracer's own evaluators), and page-space geometry.
import { flashPH, flashPS, flashPX, flashTP, flashTRho, flashTS, flashTX, H, P, PROP_SLOTS, propertiesTRho, referenceOffset, type Fluid, type ReferenceName, type State } from "../../src/eos/index.js";
import { DomeprintError } from "../../src/errors.js";
import type { Line, LineSet, Point } from "../../src/isolines/index.js";
import { pageMapping, type PageMapping } from "../../src/isolines/index.js";

export function mappingOf(set: LineSet): PageMapping {
  return pageMapping(set.window, set.frame);
}

/** Distance [mm] from q to the segment a–b on the page. */
export function deviationMm(m: PageMapping, a: Point, b: Point, q: Point): number {
  const ax = m.x(a[0]), ay = m.y(a[1]);
  const dx = m.x(b[0]) - ax, dy = m.y(b[1]) - ay;
  const qx = m.x(q[0]) - ax, qy = m.y(q[1]) - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, (qx * dx + qy * dy) / len2)) : 0;
  return Math.hypot(qx - t * dx, qy - t * dy);
}

export function state(f: Fluid, q: Point, ref: ReferenceName): State {
  return flashPH(f, q[1], q[0], ref);
}

/** A state of a line's point, and which flash gave it. */
export interface PointState {
  state: State;
  via: "flashPH" | "flashTP" | "flashTX" | "flashPS";
}

const sameH = (st: State, q: Point) => Math.abs(st.h - q[0]) <= 1e-6 * (Math.abs(q[0]) + 1e3);

/**
 * The state at a line's point from flashPH. Close to the critical point flashPH can stop short and answer with a
 * state of another enthalpy (an engine fault the checks report); then the point is taken from the line's side:
 * (T, p) on an isotherm, or the tie line's end at T for a pure fluid's plateau end, or (p, s) on an isentrope.
 * The returned state always has the point's h, or the check that uses it fails.
 */
export function stateOfPoint(f: Fluid, line: Line, q: Point, ref: ReferenceName): PointState {
  const st = flashPH(f, q[1], q[0], ref);
  if (sameH(st, q)) return { state: st, via: "flashPH" };
  if (line.quantity === "temperature") {
    const tp = flashTP(f, line.value, q[1], ref);
    if (sameH(tp, q) || f.pseudoPure || line.value > f.satTmax) return { state: tp, via: "flashTP" };
    const ends = [flashTX(f, line.value, 0, ref), flashTX(f, line.value, 1, ref)];
    const end = Math.abs(ends[0]!.h - q[0]) < Math.abs(ends[1]!.h - q[0]) ? ends[0]! : ends[1]!;
    return { state: end, via: "flashTX" };
  }
  if (line.quantity === "entropy") return { state: flashPS(f, q[1], line.value, ref), via: "flashPS" };
  return { state: st, via: "flashPH" };
}

/** S: one phase; X: strictly two-phase; B: on the dome (quality 0 or 1 to rounding). */
export function endKind(st: State): "S" | "X" | "B" {
  if (st.x === null) return "S";
  return st.x < 1e-9 || st.x > 1 - 1e-9 ? "B" : "X";
}

/** Whether the segment lies inside the dome (parametrised along the tie lines) or in one phase. */
export function segmentInDome(a: State, b: State): boolean {
  const ka = endKind(a), kb = endKind(b);
  if (ka === "X" || kb === "X") return true;
  return !(ka === "S" || kb === "S");
}

/** The tie-line parameter of pure fluids: σ = −(T_c,eq − T)^(1/3); its midpoint back in T. */
function sigmaMidT(f: Fluid, Ta: number, Tb: number): number {
  const s = (T: number) => -Math.cbrt(f.TcEquation - T);
  const m = 0.5 * (s(Ta) + s(Tb));
  return f.TcEquation + m * m * m;
}

const asPoint = (st: State): Point => [st.h, st.p];

/**
 * The one-phase point at T [K] and mass density ρ [kg/m³] from the equation itself. flashTRho would do, but for
 * a blend it treats any density between the bubble and dew densities at T as two-phase, even at pressures the
 * engine elsewhere calls liquid (R407C just below T_c, where the bubble pressure exceeds p_c).
 */
function explicitPoint(f: Fluid, T: number, rho: number, ref: ReferenceName): Point {
  const o = new Float64Array(PROP_SLOTS);
  propertiesTRho(f.model, f.M, T, rho / f.M, o);
  return [o[H]! + referenceOffset(f, ref).dh, o[P]!];
}

/**
 * The true line's point at the parameter midpoint of segment a–b, from the engine's flashes; null for a pure
 * fluid's isotherm plateau (straight by physics) and for the dome's closing chord to the critical point.
 */
export function parameterMidpoint(f: Fluid, line: Line, a: State, b: State, ref: ReferenceName): Point | null {
  const inDome = segmentInDome(a, b);
  const pm = Math.sqrt(a.p * b.p);
  const Tm = 0.5 * (a.T + b.T);
  const v = line.value;
  switch (line.quantity) {
    case "temperature":
      // A pure fluid's plateau runs at one pressure between its two ends.
      if (!f.pseudoPure && Math.abs(a.p / b.p - 1) < 1e-12) return null;
      if (!inDome) return explicitPoint(f, v, Math.sqrt(a.rho * b.rho), ref);
      return f.pseudoPure ? asPoint(flashTP(f, v, pm, ref)) : null;
    case "entropy":
      if (!inDome) return asPoint(flashTS(f, Tm, v, ref));
      return asPoint(f.pseudoPure ? flashPS(f, pm, v, ref) : flashTS(f, sigmaMidT(f, a.T, b.T), v, ref));
    case "specific-volume":
      if (!inDome) return explicitPoint(f, Tm, 1 / v, ref);
      if (!f.pseudoPure) return asPoint(flashTRho(f, sigmaMidT(f, a.T, b.T), 1 / v, ref));
      {
        const vL = flashPX(f, pm, 0, ref).v, vV = flashPX(f, pm, 1, ref).v;
        return asPoint(flashPX(f, pm, (v - vL) / (vV - vL), ref));
      }
    case "quality":
    case "saturation-liquid":
    case "saturation-vapour":
      return asPoint(f.pseudoPure ? flashPX(f, pm, v, ref) : flashTX(f, sigmaMidT(f, a.T, b.T), v, ref));
    case "enthalpy":
      return null;
  }
}

/** Runs fn, returning the DomeprintError it throws (or null), so a check can name the failing point. */
export function failure(fn: () => unknown): DomeprintError | null {
  try {
    fn();
    return null;
  } catch (e) {
    if (e instanceof DomeprintError) return e;
    throw e;
  }
}

/** Lines grouped by quantity and value (a value the window cuts in two has two lines). */
export function byValue(set: LineSet): Map<string, Line[]> {
  const out = new Map<string, Line[]>();
  for (const l of set.lines) {
    const k = `${l.quantity} ${l.value}`;
    out.set(k, [...(out.get(k) ?? []), l]);
  }
  return out;
}
