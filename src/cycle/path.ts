// The drawn path of a cycle in (h, p): each leg refined so that the polygon follows the real process —
// compressions through intermediate states, heat exchangers through the points where they cross the dome.
import type { ReferenceName, State } from "../eos/index.js";
import { statePS, statePX, type WorkingFluid as Fluid } from "./working-fluid.js";
import { twoPhasePressureLimit } from "./level.js";

export interface PathPoint { h: number; p: number }

/** How a leg runs: adiabatic compression, at constant pressure (heat exchangers, mixing), or at constant enthalpy (valves, lines). */
export type Process = "compression" | "isobaric" | "isenthalpic";

export interface Leg { to: State; process: Process }

/** Intermediate states per compression; a compression curve in (h, log p) bends gently, and 16 chords keep it within print accuracy. */
export const COMPRESSION_STEPS = 16;

/**
 * Intermediate states of an adiabatic compression. Only the ends are known; between them entropy is
 * taken to rise linearly with ln p, the shape of a compression with constant polytropic losses.
 */
export function compressionLeg(f: Fluid, from: State, to: State, ref: ReferenceName, steps = COMPRESSION_STEPS): PathPoint[] {
  const out: PathPoint[] = [];
  const lnA = Math.log(from.p), lnB = Math.log(to.p);
  for (let i = 1; i < steps; i++) {
    const t = i / steps;
    const p = Math.exp(lnA + t * (lnB - lnA));
    out.push(at(statePS(f, p, from.s + t * (to.s - from.s), ref)));
  }
  out.push(at(to));
  return out;
}

/** An isobar is straight in (h, p); the points where it crosses the dew and bubble lines are kept as vertices. */
export function isobaricLeg(f: Fluid, from: State, to: State, ref: ReferenceName): PathPoint[] {
  const out: PathPoint[] = [];
  if (from.p < twoPhasePressureLimit(f)) {
    const crossings = [statePX(f, from.p, 0, ref).h, statePX(f, from.p, 1, ref).h]
      .filter((h) => (h - from.h) * (to.h - h) > 0)
      .sort((a, b) => (to.h > from.h ? a - b : b - a));
    for (const h of crossings) out.push({ h, p: from.p });
  }
  out.push(at(to));
  return out;
}

/** The path through a chain of legs starting at `start`; a closed cycle ends its last leg on `start`. */
export function tracePath(f: Fluid, start: State, legs: readonly Leg[], ref: ReferenceName): PathPoint[] {
  const out: PathPoint[] = [at(start)];
  let from = start;
  for (const leg of legs) {
    if (leg.process === "compression") out.push(...compressionLeg(f, from, leg.to, ref));
    else if (leg.process === "isobaric") out.push(...isobaricLeg(f, from, leg.to, ref));
    else out.push(at(leg.to));
    from = leg.to;
  }
  return out;
}

function at(s: State): PathPoint {
  return { h: s.h, p: s.p };
}
