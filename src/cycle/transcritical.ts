// The transcritical single-stage cycle (carbon dioxide and the like): heat is rejected above the
// critical pressure in a gas cooler, so its outlet is set by a temperature and the high-side pressure.
import { flashTP, type Fluid } from "../eos/index.js";
import { circuitNotes, requireRefrigeratingEffect } from "./circuit-checks.js";
import { singleStageCircuit } from "./circuit.js";
import { cycleInputError, pressureText, requireEffectiveness, requireEfficiency, temperatureText } from "./check.js";
import type { Compressor } from "./compression.js";
import { resolveLevel } from "./level.js";
import type { CycleResult } from "./result.js";
import { commonInputs, commonNotes, lineDrops, type CommonSpec } from "./spec.js";

export interface TranscriticalSpec extends CommonSpec {
  /** Gas-cooler outlet temperature [K]. */
  gasCoolerOutlet: number;
  /** High-side (gas-cooler) pressure [Pa], above the critical pressure. */
  highPressure: number;
  compressor: Compressor;
  /** Effectiveness of an internal (suction–liquid) heat exchanger, in [0, 1]; none when absent. */
  ihx?: number;
}

/** A high-side pressure must lie above the critical pressure (else the cycle condenses) and inside the equation. */
export function requireHighPressure(f: Fluid, p: number, input = "high-pressure"): number {
  if (!(Number.isFinite(p) && p > f.pc)) {
    throw cycleInputError(input, p, Number.isFinite(p) ? pressureText(p) : String(p), `not above the critical pressure ${pressureText(f.pc)} of ${f.id}`,
      `above ${pressureText(f.pc)} up to ${pressureText(f.pmax)} (below the critical pressure the cycle condenses: give a condensing level instead)`);
  }
  if (p > f.pmax) throw cycleInputError(input, p, pressureText(p), `above the upper pressure limit of the equation for ${f.id}`, `above ${pressureText(f.pc)} up to ${pressureText(f.pmax)}`);
  return p;
}

function requireGasCoolerOutlet(f: Fluid, T: number, evaporatingDew: number): number {
  if (!(Number.isFinite(T) && T > evaporatingDew && T <= f.Tmax)) {
    throw cycleInputError("gas-cooler-outlet", T, Number.isFinite(T) ? temperatureText(T) : String(T), "not between the evaporating dew point and the equation's upper limit",
      `above ${temperatureText(evaporatingDew)} up to ${temperatureText(f.Tmax)}`);
  }
  return T;
}

/** The checks that do not depend on the high-side pressure, so a pressure search can make them once. */
export function checkTranscriticalInputs(spec: Omit<TranscriticalSpec, "highPressure">) {
  const common = commonInputs(spec, "a transcritical cycle");
  const evaporating = resolveLevel(common.f, "evaporating", spec.evaporating, spec.glidePoint);
  const Tgc = requireGasCoolerOutlet(common.f, spec.gasCoolerOutlet, evaporating.dew);
  if ("efficiency" in spec.compressor) requireEfficiency("efficiency", spec.compressor.efficiency);
  if (spec.ihx !== undefined) requireEffectiveness("ihx", spec.ihx);
  lineDrops(spec, evaporating.p, Infinity);
  return { ...common, evaporating, Tgc };
}

export function transcriticalCycle(spec: TranscriticalSpec): CycleResult {
  const { f, ref, superheat, capacity, evaporating, Tgc } = checkTranscriticalInputs(spec);
  const pHigh = requireHighPressure(f, spec.highPressure);
  const drops = lineDrops(spec, evaporating.p, pHigh);
  const circuit = singleStageCircuit(f, ref, {
    pEvaporator: evaporating.p, superheat, pHigh, highOutlet: flashTP(f, Tgc, pHigh, ref), highSide: "gas-cooler",
    compressor: spec.compressor, suctionDrop: drops.suction, dischargeDrop: drops.discharge,
    ...(spec.ihx !== undefined ? { ihx: spec.ihx } : {}), ...(capacity !== undefined ? { capacity } : {}),
  });
  requireRefrigeratingEffect(circuit.performance.refrigeratingEffect, { input: "gas-cooler-outlet", value: Tgc, shown: temperatureText(Tgc) });
  const result: CycleResult = {
    model: "transcritical", fluid: f.id, blend: f.pseudoPure, reference: ref, levels: { evaporating }, highSide: { pressure: pHigh, gasCoolerOutlet: Tgc }, superheat, drops,
    notes: [...commonNotes(f), ...circuitNotes(spec.compressor, spec.ihx !== undefined)],
    points: circuit.points, auxiliary: circuit.auxiliary, stages: circuit.stages, performance: circuit.performance, path: circuit.path, branches: [],
  };
  if (spec.ihx !== undefined) result.ihx = { effectiveness: spec.ihx, duty: circuit.ihxDuty! };
  return result;
}
