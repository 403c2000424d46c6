// Two-stage vapour compression with an intermediate pressure (default: geometric mean of evaporating
// and condensing pressures): with a flash tank, an open flash intercooler, or an economiser (subcooler).
// Real mixtures run with the economiser, the one arrangement that keeps the circulating composition whole.
import { DomeprintError } from "../errors.js";
import type { ReferenceName, State } from "../eos/index.js";
import { chainPoints, makePoint, type ChainStep } from "./chain.js";
import { requireRefrigeratingEffect } from "./circuit-checks.js";
import { cycleInputError, differenceText, pressureText, requireDifference, temperatureText } from "./check.js";
import { compress, compressorInput, type Compression, type Compressor } from "./compression.js";
import { resolveLevel, type Level, type ResolvedLevel } from "./level.js";
import { tracePath, type Leg } from "./path.js";
import { performanceOf, type Stage } from "./performance.js";
import type { CyclePoint, Role } from "./point.js";
import { mix, subcooledLiquid, superheatedVapour, throttle } from "./processes.js";
import type { CycleResult } from "./result.js";
import { commonNotes, levelText, lineDrops, requireBelow, workingInputs, type CommonSpec } from "./spec.js";
import { glides, isMixture, statePX, stateTP, type WorkingFluid as Fluid } from "./working-fluid.js";

/**
 * flash-tank: the tank's flash gas mixes with the low-stage discharge. open-intercooler: the low-stage
 * discharge also bubbles through the tank's liquid and leaves it saturated. economiser: a closed subcooler.
 */
export type Arrangement = "flash-tank" | "open-intercooler" | "economiser";

/**
 * How far the economiser's liquid outlet stays above the temperature of the injected refrigerant
 * entering it, when not given [K]. A few kelvin is usual for plate economisers (common practice).
 */
export const DEFAULT_ECONOMISER_APPROACH = 5;

export interface TwoStageSpec extends CommonSpec {
  condensing: Level;
  subcooling?: number;
  /** Intermediate level; default the geometric mean of the evaporating and condensing pressures. */
  intermediate?: Level;
  arrangement: Arrangement;
  /** Economiser liquid outlet minus injection inlet temperature [K]; default 5 K. */
  economiserApproach?: number;
  lowStage: Compressor;
  highStage: Compressor;
}

interface Levels { evaporating: ResolvedLevel; condensing: ResolvedLevel; intermediate: ResolvedLevel & { source: "given" | "geometric-mean" } }

function resolveLevels(f: Fluid, spec: TwoStageSpec): Levels {
  const evaporating = resolveLevel(f, "evaporating", spec.evaporating, spec.glidePoint);
  const condensing = resolveLevel(f, "condensing", spec.condensing, spec.glidePoint);
  requireBelow(evaporating, condensing);
  const given = spec.intermediate;
  const level = given ?? { p: Math.sqrt(evaporating.p * condensing.p) };
  const intermediate = { ...resolveLevel(f, "intermediate", level, spec.glidePoint), source: given ? "given" as const : "geometric-mean" as const };
  requireBelow(evaporating, intermediate);
  requireBelow(intermediate, condensing);
  return { evaporating, condensing, intermediate };
}

/** The two compressions and the states around them that both arrangements share. */
interface Common {
  evapOut: State; lowSuction: State; low: Compression;
  condOut: State;
}

function commonStates(f: Fluid, ref: ReferenceName, spec: TwoStageSpec, L: Levels, superheat: number, subcooling: number, suctionDrop: number): Common {
  const evapOut = superheatedVapour(f, L.evaporating.p, superheat, ref);
  const lowSuction = suctionDrop > 0 ? throttle(f, evapOut, L.evaporating.p - suctionDrop, ref) : evapOut;
  const low = compress(f, lowSuction, L.intermediate.p, spec.lowStage, ref, compressorInput(spec.lowStage, "low stage"));
  return { evapOut, lowSuction, low, condOut: subcooledLiquid(f, L.condensing.p, subcooling, ref) };
}

/** Vapour fraction of a state on the tie line at its pressure: below 0 for subcooled liquid. */
function vapourFraction(f: Fluid, st: State, ref: ReferenceName): number {
  const hL = statePX(f, st.p, 0, ref).h, hV = statePX(f, st.p, 1, ref).h;
  return (st.h - hL) / (hV - hL);
}

/**
 * The high stage every arrangement shares: compression from `suction` (flow `highFlow` per unit through the
 * evaporator), the discharge line drop, and the steps from the low stage through to the condenser outlet.
 */
function highSide(f: Fluid, ref: ReferenceName, spec: TwoStageSpec, L: Levels, c: Common, suction: State, highFlow: number, dischargeDrop: number,
  suctionSame = false): { high: Compression; steps: ChainStep[] } {
  const high = compress(f, suction, L.condensing.p + dischargeDrop, spec.highStage, ref, compressorInput(spec.highStage, "high stage"));
  const condIn = dischargeDrop > 0 ? throttle(f, high.discharge, L.condensing.p, ref) : high.discharge;
  return {
    high,
    steps: [
      ...lowSteps(c),
      { state: suction, role: "high-stage-suction", flow: highFlow, process: "isobaric", same: suctionSame },
      { state: high.discharge, role: "high-stage-discharge", flow: highFlow, process: "compression" },
      { state: condIn, role: "condenser-inlet", flow: highFlow, process: "isenthalpic", same: dischargeDrop === 0 },
      { state: c.condOut, role: "condenser-outlet", flow: highFlow, process: "isobaric" },
    ],
  };
}

/** An arrangement's states in flow order, its side stream (leaving the main circuit at branchFrom, rejoining at branchJoin), and its flows. */
interface Built { steps: ChainStep[]; branch: ChainStep[]; branchFrom: Role; branchJoin: Role; highFlow: number; low: Compression; high: Compression; notes: string[]; approach?: number }

/** Flash tank: the condenser liquid flashes at the intermediate pressure; its vapour joins the low-stage discharge. */
function flashTank(f: Fluid, ref: ReferenceName, spec: TwoStageSpec, L: Levels, c: Common, dischargeDrop: number): Built {
  const pi = L.intermediate.p;
  const tankIn = throttle(f, c.condOut, pi, ref);
  const x = vapourFraction(f, tankIn, ref);
  if (x >= 1) throw cycleInputError("intermediate", pi, levelText(L.intermediate), "the liquid would flash entirely to vapour in the flash tank", `an intermediate pressure above ${pressureText(L.evaporating.p)} where the condenser liquid stays partly liquid`);
  const flashes = x > 0;
  const highFlow = flashes ? 1 / (1 - x) : 1;
  const tankLiquid = flashes ? statePX(f, pi, 0, ref) : tankIn;
  const tankVapour = statePX(f, pi, 1, ref);
  const highSuction = flashes ? mix(f, pi, [{ state: c.low.discharge, flow: 1 }, { state: tankVapour, flow: highFlow - 1 }], ref) : c.low.discharge;
  const { high, steps: shared } = highSide(f, ref, spec, L, c, highSuction, highFlow, dischargeDrop, !flashes);
  const steps: ChainStep[] = [
    ...shared,
    { state: tankIn, role: "flash-tank-inlet", flow: highFlow, process: "isenthalpic" },
    { state: tankLiquid, role: "flash-tank-liquid", flow: 1, process: "isobaric", same: !flashes },
    { state: throttle(f, tankLiquid, L.evaporating.p, ref), role: "evaporator-inlet", flow: 1, process: "isenthalpic" },
  ];
  const branch: ChainStep[] = flashes ? [{ state: tankVapour, role: "flash-tank-vapour", flow: highFlow - 1, process: "isobaric" }] : [];
  const notes = ["flash tank: the condenser liquid flashes at the intermediate pressure; saturated vapour from the tank mixes with the low-stage discharge, saturated liquid feeds the evaporator"];
  return { steps, branch, branchFrom: "flash-tank-inlet", branchJoin: "high-stage-suction", highFlow, low: c.low, high, notes };
}

/**
 * Open flash intercooler: the condenser liquid flashes in the tank and the low-stage discharge is
 * desuperheated in its liquid, so saturated vapour goes to the high stage. The tank's energy balance
 * sets the high-stage flow: m_high (h_vapour − h_condenser-outlet) = h_low-discharge − h_liquid.
 */
function openIntercooler(f: Fluid, ref: ReferenceName, spec: TwoStageSpec, L: Levels, c: Common, dischargeDrop: number): Built {
  const pi = L.intermediate.p;
  const tankIn = throttle(f, c.condOut, pi, ref);
  const tankLiquid = statePX(f, pi, 0, ref);
  const tankVapour = statePX(f, pi, 1, ref);
  if (!(c.condOut.h < tankVapour.h)) throw cycleInputError("intermediate", pi, levelText(L.intermediate), "the condenser liquid would arrive in the tank as vapour", "an intermediate level where the condenser liquid stays partly liquid");
  const highFlow = (c.low.discharge.h - tankLiquid.h) / (tankVapour.h - c.condOut.h);
  const { high, steps: shared } = highSide(f, ref, spec, L, c, tankVapour, highFlow, dischargeDrop);
  const steps: ChainStep[] = [
    ...shared,
    { state: tankIn, role: "flash-tank-inlet", flow: highFlow, process: "isenthalpic" },
    { state: tankLiquid, role: "flash-tank-liquid", flow: 1, process: "isobaric" },
    { state: throttle(f, tankLiquid, L.evaporating.p, ref), role: "evaporator-inlet", flow: 1, process: "isenthalpic" },
  ];
  const notes = ["open flash intercooler: the condenser liquid flashes at the intermediate pressure and the low-stage discharge is desuperheated in the tank's liquid; saturated vapour goes to the high stage, saturated liquid to the evaporator"];
  return { steps, branch: [], branchFrom: "flash-tank-inlet", branchJoin: "high-stage-suction", highFlow, low: c.low, high, notes };
}

/** Economiser: part of the condenser liquid, throttled to the intermediate pressure, subcools the rest and is injected into the high stage. */
function economiser(f: Fluid, ref: ReferenceName, spec: TwoStageSpec, L: Levels, c: Common, dischargeDrop: number): Built {
  const pi = L.intermediate.p;
  const approach = requireDifference("economiser-approach", spec.economiserApproach ?? DEFAULT_ECONOMISER_APPROACH);
  const injIn = throttle(f, c.condOut, pi, ref);
  const Tout = injIn.T + approach;
  if (!(Tout < c.condOut.T)) {
    throw cycleInputError("economiser-approach", approach, differenceText(approach), `the liquid would leave the economiser at ${temperatureText(Tout)}, not colder than it enters (${temperatureText(c.condOut.T)})`,
      `less than ${differenceText(c.condOut.T - injIn.T)}, or a lower intermediate level`);
  }
  const liquidOut = stateTP(f, Tout, L.condensing.p, ref);
  const injOut = statePX(f, pi, 1, ref);
  if (!(injOut.h > injIn.h)) throw cycleInputError("intermediate", pi, levelText(L.intermediate), "the condenser liquid would reach the economiser as vapour", "an intermediate level where the injected liquid can still evaporate");
  const injFlow = (c.condOut.h - liquidOut.h) / (injOut.h - injIn.h);
  const highFlow = 1 + injFlow;
  const highSuction = mix(f, pi, [{ state: c.low.discharge, flow: 1 }, { state: injOut, flow: injFlow }], ref);
  const { high, steps: shared } = highSide(f, ref, spec, L, c, highSuction, highFlow, dischargeDrop);
  const steps: ChainStep[] = [
    ...shared,
    { state: liquidOut, role: "economiser-liquid-outlet", flow: 1, process: "isobaric" },
    { state: throttle(f, liquidOut, L.evaporating.p, ref), role: "evaporator-inlet", flow: 1, process: "isenthalpic" },
  ];
  const branch: ChainStep[] = [
    { state: injIn, role: "economiser-injection-inlet", flow: injFlow, process: "isenthalpic" },
    { state: injOut, role: "economiser-injection-outlet", flow: injFlow, process: "isobaric" },
  ];
  const notes = ["economiser: part of the condenser liquid is throttled to the intermediate pressure, subcools the main liquid and leaves as saturated vapour that mixes with the low-stage discharge"];
  return { steps, branch, branchFrom: "condenser-outlet", branchJoin: "high-stage-suction", highFlow, low: c.low, high, notes, approach };
}

function lowSteps(c: Common): ChainStep[] {
  return [
    { state: c.evapOut, role: "evaporator-outlet", flow: 1, process: "isobaric" },
    { state: c.lowSuction, role: "low-stage-suction", flow: 1, process: "isenthalpic", same: c.lowSuction === c.evapOut },
    { state: c.low.discharge, role: "low-stage-discharge", flow: 1, process: "compression" },
  ];
}

export function twoStageCycle(spec: TwoStageSpec): CycleResult {
  const { f, ref, superheat, capacity } = workingInputs(spec);
  if (isMixture(f) && spec.arrangement !== "economiser") {
    // A tank separates liquid from vapour; a zeotrope's two differ in composition, so the low stage would
    // circulate a shifted composition that a model of fixed overall composition cannot follow.
    throw new DomeprintError("E_UNSUPPORTED", `arrangement = ${JSON.stringify(spec.arrangement)}: a ${spec.arrangement} separates the liquid and vapour of the real mixture ${f.id}, whose compositions differ, and the fixed-composition model cannot follow the shifted circulation; allowed: economiser for a real mixture, or the pseudo-pure blend equation where there is one`,
      { input: "arrangement", value: spec.arrangement, allowed: "economiser (real mixtures)" });
  }
  const subcooling = requireDifference("subcooling", spec.subcooling ?? 0);
  const L = resolveLevels(f, spec);
  const drops = lineDrops(spec, L.evaporating.p, L.condensing.p);
  const c = commonStates(f, ref, spec, L, superheat, subcooling, drops.suction);
  const build = { "flash-tank": flashTank, "open-intercooler": openIntercooler, economiser }[spec.arrangement];
  const b = build(f, ref, spec, L, c, drops.discharge);
  const main = chainPoints(f, b.steps);
  const side = chainPoints(f, b.branch, main.points.length + 1);
  const points = [...main.points, ...side.points];
  const at = (role: Role) => points.find((p) => p.roles.includes(role))!;
  const stage = (name: Stage["name"], suction: Role, discharge: Role, comp: Compression, flow: number, iso: Role): Stage => {
    const d = at(discharge);
    return { name, suction: at(suction), discharge: d, isentropic: makePoint(f, `${d.label}s`, [iso], comp.isentropic, flow), efficiency: comp.efficiency, flow };
  };
  const stages = [
    stage("low stage", "low-stage-suction", "low-stage-discharge", b.low, 1, "isentropic-low-stage-discharge"),
    stage("high stage", "high-stage-suction", "high-stage-discharge", b.high, b.highFlow, "isentropic-high-stage-discharge"),
  ];
  const performance = performanceOf({ evaporatorInlet: at("evaporator-inlet"), evaporatorOutlet: at("evaporator-outlet"), rejectionInlet: at("condenser-inlet"), rejectionOutlet: at("condenser-outlet"), stages }, capacity);
  requireRefrigeratingEffect(performance.refrigeratingEffect, L.condensing);
  const path = tracePath(f, c.evapOut, [...main.legs, { to: c.evapOut, process: "isobaric" }], ref);
  path.pop();
  const result: CycleResult = {
    model: `two-stage-${spec.arrangement}`,
    fluid: f.id, blend: glides(f), reference: ref, levels: L, superheat, subcooling, drops,
    notes: [...commonNotes(f), ...stageNotes(spec), ...b.notes],
    points, auxiliary: stages.map((s) => s.isentropic), stages, performance, path,
    branches: side.points.length ? [branchPath(f, ref, b, main.points, side.points, side.legs)] : [],
  };
  if (b.approach !== undefined) result.economiserApproach = b.approach;
  return result;
}

function stageNotes(spec: TwoStageSpec): string[] {
  const how = (c: Compressor) => ("efficiency" in c ? "discharge from the given isentropic efficiency" : "isentropic efficiency derived from the given discharge temperature");
  return [`low stage: ${how(spec.lowStage)}; high stage: ${how(spec.highStage)}`];
}

/** The side stream's path: from where it leaves the main circuit, through its own points, to where it rejoins. */
function branchPath(f: Fluid, ref: ReferenceName, b: Built, main: CyclePoint[], side: CyclePoint[], legs: Leg[]) {
  const start = main.find((p) => p.roles.includes(b.branchFrom))!;
  const join = main.find((p) => p.roles.includes(b.branchJoin))!;
  return tracePath(f, start.state, [{ to: side[0]!.state, process: b.branch[0]!.process }, ...legs, { to: join.state, process: "isobaric" }], ref);
}
