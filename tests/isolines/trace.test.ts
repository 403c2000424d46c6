// The adaptive tracer on curves whose geometry is known exactly: a circle, a clipped straight line, a gap where
// the curve is undefined, a jump, and noise that no subdivision can resolve (it must still stop). Analytic checks.
import { describe, expect, it } from "vitest";
import { bridge, joinParts, traceCurve, type Evaluate } from "../../src/isolines/trace.js";
import { pageMapping, type Point, type TraceStats } from "../../src/isolines/index.js";
import { rng } from "../support.js";
import { deviationMm } from "./support.js";

// A window of 100 × 100 mm whose mapping is the identity in h and exp in p: x = h, y = ln(p).
const window = { hMin: 0, hMax: 100, pMin: 1, pMax: Math.exp(100) };
const mapping = pageMapping(window, { widthMm: 100, heightMm: 100 });
const settings = { mapping, toleranceMm: 0.05 };
const stats = (): TraceStats => ({ evaluations: 0, capped: 0, breaks: 0, bridges: 0, longestBridgeMm: 0 });
const at = (x: number, y: number): Point => [x, Math.exp(y)];

describe("traceCurve", () => {
  it("keeps every chord of a circle within the tolerance, with about as few points as the sagitta allows", () => {
    const R = 40;
    const circle: Evaluate = (t) => at(50 + R * Math.cos(t), 50 + R * Math.sin(t));
    const st = stats();
    const [piece, ...rest] = traceCurve(circle, 0, 2 * Math.PI, settings, st);
    expect(rest).toEqual([]);
    let worst = 0;
    for (let i = 1; i < piece!.length; i++) {
      const a = piece![i - 1]!, b = piece![i]!;
      const t = (Math.atan2(Math.log(a[1]) - 50, a[0] - 50) + Math.atan2(Math.log(b[1]) - 50, b[0] - 50)) / 2;
      const ta = Math.atan2(Math.log(a[1]) - 50, a[0] - 50), tb = Math.atan2(Math.log(b[1]) - 50, b[0] - 50);
      const mid = Math.abs(tb - ta) > Math.PI ? t + Math.PI : t;
      worst = Math.max(worst, deviationMm(mapping, a, b, circle(mid)!));
    }
    expect(worst).toBeLessThanOrEqual(0.05);
    // A chord of angle θ has sagitta R(1 − cos θ/2); the fewest chords within 0.05 mm (halving can double them).
    const fewest = Math.ceil((2 * Math.PI) / (2 * Math.acos(1 - 0.05 / R)));
    expect(piece!.length - 1).toBeGreaterThanOrEqual(fewest);
    expect(piece!.length - 1).toBeLessThanOrEqual(2 * fewest);
    expect(st.capped).toBe(0);
  });

  it("clips a line to the window, its ends on the edges", () => {
    const line: Evaluate = (t) => at(-50 + 200 * t, 20 + 10 * t);
    const [piece, ...rest] = traceCurve(line, 0, 1, settings, stats());
    expect(rest).toEqual([]);
    for (const q of piece!) expect(Math.log(q[1])).toBeCloseTo(20 + (10 * (q[0] + 50)) / 200, 9);
    expect(piece![0]![0]).toBeGreaterThanOrEqual(0);
    expect(piece![0]![0]).toBeLessThan(1e-3);
    const end = piece![piece!.length - 1]!;
    expect(end[0]).toBeLessThanOrEqual(100);
    expect(end[0]).toBeGreaterThan(100 - 1e-3);
  });

  it("stops where the line is undefined and takes up again after", () => {
    const line: Evaluate = (t) => (t > 0.4 && t < 0.6 ? null : at(10 + 80 * t, 50));
    const pieces = traceCurve(line, 0, 1, settings, stats());
    expect(pieces.length).toBe(2);
    expect(pieces[0]![pieces[0]!.length - 1]![0]).toBeCloseTo(42, 6);
    expect(pieces[1]![0]![0]).toBeCloseTo(58, 6);
  });

  it("breaks at a jump instead of drawing across it", () => {
    for (const at0 of [0.5, 0.4567]) {
      const step: Evaluate = (t) => at(10 + 80 * t, t < at0 ? 30 : 60);
      const st = stats();
      const pieces = traceCurve(step, 0, 1, settings, st);
      expect(pieces.length).toBe(2);
      expect(st.breaks).toBe(1);
      expect(pieces[0]![pieces[0]!.length - 1]![0]).toBeCloseTo(10 + 80 * at0, 4);
    }
  });

  it("does not take a steep square-root end for a jump", () => {
    const root: Evaluate = (t) => at(10 + 80 * Math.sqrt(t), 10 + 80 * t);
    const st = stats();
    expect(traceCurve(root, 0, 1, settings, st).length).toBe(1);
    expect(st.breaks + st.capped).toBe(0);
  });

  it("finds a short visit to the window between samples outside it", () => {
    const dip: Evaluate = (t) => at(50, 150 - 1000 * Math.exp(-(((t - 0.53) / 0.02) ** 2)) / 8);
    expect(traceCurve(dip, 0, 1, settings, stats()).length).toBeGreaterThan(0);
  });

  it("stops on noise it cannot resolve, within its evaluation budget", () => {
    const r = rng(7);
    const noise: Evaluate = () => at(50 + 40 * r(), 50 + 40 * r());
    const st = stats();
    traceCurve(noise, 0, 1, { ...settings, maxEvaluations: 5000 }, st);
    expect(st.evaluations).toBeLessThan(5000 + 200);
    expect(st.capped + st.breaks).toBeGreaterThan(0);
  });
});

describe("joining parts", () => {
  it("joins parts that meet and keeps apart those that do not", () => {
    const a: Point[][] = [[at(0, 0), at(10, 10)]];
    const b: Point[][] = [[at(10, 10), at(20, 10)]];
    const c: Point[][] = [[at(30, 10), at(40, 10)]];
    const joined = joinParts(mapping, [a, b, c]);
    expect(joined.map((p) => p.length)).toEqual([3, 2]);
  });

  it("bridges a small gap with a chord and counts it; leaves a wide one", () => {
    const st = stats();
    const before: Point[][] = [[at(0, 0), at(10, 10)]];
    const near: Point[][] = [[at(10.5, 10), at(20, 10), at(30, 10)]];
    expect(bridge(mapping, before, near, 2, st)).toBe(true);
    expect(near[0]![0]).toEqual(at(10, 10));
    expect(st.bridges).toBe(1);
    expect(st.longestBridgeMm).toBeCloseTo(0.5, 9);
    const far: Point[][] = [[at(15, 10), at(20, 10)]];
    expect(bridge(mapping, before, far, 2, st)).toBe(false);
  });
});
