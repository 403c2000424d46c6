// Saturation levels of a cycle: an evaporating, condensing or intermediate temperature or pressure
// turned into a pressure. For blends with glide a temperature names the dew, bubble or mid-point.
import { DomeprintError } from "../errors.js";
import { bubbleDewAtP, glides, stateTX, twoPhasePressureSpan, twoPhaseTemperatureTop, type WorkingFluid as Fluid } from "./working-fluid.js";
import { cycleInputError, pressureText, temperatureText } from "./check.js";

export type GlidePoint = "dew" | "bubble" | "mid";
export const GLIDE_POINTS: readonly GlidePoint[] = ["dew", "bubble", "mid"];

/**
 * A blend's temperature level is read at the dew point unless told otherwise: compressor ratings
 * state evaporating and condensing temperatures as dew points (common practice), and superheat is
 * counted from the dew point too, so a dew-point level and a superheat add up as the trade reads them.
 */
export const DEFAULT_GLIDE_POINT: GlidePoint = "dew";

/** A level as given: a saturation temperature [K] (read at a glide point for blends) or a pressure [Pa]. */
export type Level = { T: number; glidePoint?: GlidePoint } | { p: number };

export interface ResolvedLevel {
  /** The input's name, e.g. "evaporating". */
  input: string;
  given: Level;
  /** The glide point a temperature was read at; null for a level given as a pressure, or for a pure fluid. */
  glidePoint: GlidePoint | null;
  /** Absolute pressure [Pa]. */
  p: number;
  /** Bubble and dew temperatures at p [K]; equal for pure fluids. */
  bubble: number;
  dew: number;
}

const QUALITY: Record<GlidePoint, number> = { dew: 1, bubble: 0, mid: 0.5 };

/** The highest pressure at which the fluid has a two-phase region the engine solves [Pa]. */
export function twoPhasePressureLimit(f: Fluid): number {
  return twoPhasePressureSpan(f)[1];
}

/** The highest saturation temperature the engine solves [K]. */
export function twoPhaseTemperatureLimit(f: Fluid): number {
  return twoPhaseTemperatureTop(f);
}

function resolvePressure(f: Fluid, input: string, p: number): number {
  if (!(Number.isFinite(p) && p > 0)) throw cycleInputError(input, p, String(p), "not a positive pressure", "a pressure above 0 bar");
  const pMax = twoPhasePressureLimit(f);
  if (p >= pMax) {
    throw cycleInputError(input, p, pressureText(p), `at or above the critical pressure of ${f.id}, where nothing evaporates or condenses`,
      `below ${pressureText(pMax)} (above it, use a transcritical cycle: gas-cooler outlet and high-side pressure)`);
  }
  return p;
}

function pressureAtTemperature(f: Fluid, input: string, T: number, point: GlidePoint): number {
  if (!(Number.isFinite(T) && T > 0)) throw cycleInputError(input, T, String(T), "not an absolute temperature", "a temperature above 0 K");
  const Tmax = twoPhaseTemperatureLimit(f);
  if (T >= Tmax) {
    throw cycleInputError(input, T, temperatureText(T), `at or above the critical temperature of ${f.id}, where nothing evaporates or condenses`,
      `below ${temperatureText(Tmax)} (above it, use a transcritical cycle: gas-cooler outlet and high-side pressure)`);
  }
  if (T < f.Tmin) throw cycleInputError(input, T, temperatureText(T), `below the lowest temperature of the equation for ${f.id}`, `${temperatureText(f.Tmin)} up to ${temperatureText(Tmax)}`);
  return stateTX(f, T, QUALITY[point]).p;
}

/** Resolves a level to its pressure and the bubble and dew temperatures there. */
export function resolveLevel(f: Fluid, input: string, level: Level, defaultPoint: GlidePoint = DEFAULT_GLIDE_POINT): ResolvedLevel {
  const glidePoint = "T" in level ? level.glidePoint ?? defaultPoint : null;
  try {
    const p = "T" in level ? pressureAtTemperature(f, input, level.T, glidePoint!) : resolvePressure(f, input, level.p);
    const sat = bubbleDewAtP(f, p);
    return { input, given: level, glidePoint: glides(f) ? glidePoint : null, p, bubble: sat.TL, dew: sat.TV };
  } catch (e) {
    if (!(e instanceof DomeprintError) || e.details.input === input || e.code === "E_CONVERGENCE") throw e;
    const shown = "T" in level ? temperatureText(level.T) : pressureText(level.p);
    throw cycleInputError(input, "T" in level ? level.T : level.p, shown, `outside the saturation range of ${f.id} (${e.message})`, "a level inside the two-phase region of the fluid");
  }
}
