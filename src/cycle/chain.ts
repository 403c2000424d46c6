// Turns the states of a circuit, listed in flow order, into numbered points and drawable legs.
// A step that repeats its predecessor (a line with no pressure drop) adds its role, not a point.
import type { State } from "../eos/index.js";
import type { WorkingFluid as Fluid } from "./working-fluid.js";
import { saturationMargins } from "./margins.js";
import type { Leg, Process } from "./path.js";
import type { CyclePoint, Role } from "./point.js";

export interface ChainStep {
  state: State;
  role: Role;
  /** Mass flow per unit mass flow through the evaporator. */
  flow: number;
  /** How this step is reached from the previous one (ignored for the first). */
  process: Process;
  /** True when the step is the same state as the previous one. */
  same?: boolean;
}

/** A point for a state, with superheat and subcooling at its pressure where they apply. */
export function makePoint(f: Fluid, label: string, roles: Role[], state: State, flow: number): CyclePoint {
  const m = saturationMargins(f, state);
  const point: CyclePoint = { label, roles, state, flow };
  if (m.superheat !== undefined) point.superheat = m.superheat;
  if (m.subcooling !== undefined) point.subcooling = m.subcooling;
  return point;
}

/** Numbers the distinct steps from `first` and returns the legs between them. */
export function chainPoints(f: Fluid, steps: readonly ChainStep[], first = 1): { points: CyclePoint[]; legs: Leg[] } {
  const points: CyclePoint[] = [];
  const legs: Leg[] = [];
  for (const s of steps) {
    const prev = points[points.length - 1];
    if (s.same && prev) {
      prev.roles.push(s.role);
      continue;
    }
    if (prev) legs.push({ to: s.state, process: s.process });
    points.push(makePoint(f, String(first + points.length), [s.role], s.state, s.flow));
  }
  return { points, legs };
}
