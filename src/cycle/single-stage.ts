// The single-stage vapour-compression cycle, with or without an internal heat exchanger: evaporating
// and condensing levels, superheat, subcooling, compressor efficiency or discharge temperature.
import { circuitNotes, requireRefrigeratingEffect } from "./circuit-checks.js";
import { singleStageCircuit } from "./circuit.js";
import type { Compressor } from "./compression.js";
import { requireDifference } from "./check.js";
import { resolveLevel, type Level } from "./level.js";
import { subcooledLiquid } from "./processes.js";
import type { CycleResult } from "./result.js";
import { commonNotes, lineDrops, requireBelow, workingInputs, type CommonSpec } from "./spec.js";
import { glides } from "./working-fluid.js";

export interface SingleStageSpec extends CommonSpec {
  condensing: Level;
  /** Subcooling at the condenser outlet [K]; default 0. */
  subcooling?: number;
  compressor: Compressor;
  /** Effectiveness of an internal (suction–liquid) heat exchanger, in [0, 1]; none when absent. */
  ihx?: number;
}

export function singleStageCycle(spec: SingleStageSpec): CycleResult {
  const { f, ref, superheat, capacity } = workingInputs(spec);
  const subcooling = requireDifference("subcooling", spec.subcooling ?? 0);
  const evaporating = resolveLevel(f, "evaporating", spec.evaporating, spec.glidePoint);
  const condensing = resolveLevel(f, "condensing", spec.condensing, spec.glidePoint);
  requireBelow(evaporating, condensing);
  const drops = lineDrops(spec, evaporating.p, condensing.p);
  const circuit = singleStageCircuit(f, ref, {
    pEvaporator: evaporating.p, superheat, pHigh: condensing.p, highOutlet: subcooledLiquid(f, condensing.p, subcooling, ref), highSide: "condenser",
    compressor: spec.compressor, suctionDrop: drops.suction, dischargeDrop: drops.discharge,
    ...(spec.ihx !== undefined ? { ihx: spec.ihx } : {}), ...(capacity !== undefined ? { capacity } : {}),
  });
  requireRefrigeratingEffect(circuit.performance.refrigeratingEffect, condensing);
  const result: CycleResult = {
    model: "single-stage", fluid: f.id, blend: glides(f), reference: ref, levels: { evaporating, condensing }, superheat, subcooling, drops,
    notes: [...commonNotes(f), ...circuitNotes(spec.compressor, spec.ihx !== undefined)],
    points: circuit.points, auxiliary: circuit.auxiliary, stages: circuit.stages, performance: circuit.performance, path: circuit.path, branches: [],
  };
  if (spec.ihx !== undefined) result.ihx = { effectiveness: spec.ihx, duty: circuit.ihxDuty! };
  return result;
}
