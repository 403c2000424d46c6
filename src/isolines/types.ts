// The shapes the isoline generator hands to layout and export: a window, a page frame, lines of (h, p) points.
// Everything is SI (h J/kg in the chosen reference state, p Pa); display values travel beside the SI ones.
import type { ReferenceName } from "../eos/index.js";

export type UnitSystem = "si" | "ip";

export type Quantity =
  | "temperature"
  | "entropy"
  | "specific-volume"
  | "quality"
  | "saturation-liquid"
  | "saturation-vapour"
  | "enthalpy";

/** A point of a line: specific enthalpy [J/kg] and absolute pressure [Pa]. */
export type Point = readonly [h: number, p: number];

/** The part of the (h, p) plane the chart shows; p runs on a log scale. */
export interface ChartWindow {
  hMin: number;
  hMax: number;
  pMin: number;
  pMax: number;
}

/** The plot frame's size on the printed sheet [mm]. */
export interface Frame {
  widthMm: number;
  heightMm: number;
}

/** A value as the chart prints it: in the display unit of the unit system. */
export interface DisplayValue {
  value: number;
  unit: string;
}

/** One connected polyline. A family value the window or the equation cuts in two gives two lines. */
export interface Line {
  quantity: Quantity;
  /** The line's value in SI: K, J/(kg K), m³/kg, quality, J/kg (saturation lines carry their quality, 0 or 1). */
  value: number;
  unit: string;
  display: DisplayValue;
  /** Major lines carry labels; minor ones are the denser in-between values. */
  rank: "major" | "minor";
  points: Point[];
}

export interface TraceStats {
  /** Evaluations of a line's exact point. */
  evaluations: number;
  /** Segments left longer than the tolerance allows because the depth cap was reached. */
  capped: number;
  /** Places where a line broke because the equation jumped or could not be evaluated. */
  breaks: number;
  /**
   * Straight chords drawn across gaps the engine leaves close to a blend's critical point: where its isotherm
   * crosses the band below p_c without two-phase states, or its two-phase and one-phase states meet a little
   * apart.
   */
  bridges: number;
  /** The longest of those chords on the page [mm]. */
  longestBridgeMm: number;
}

export interface LineSet {
  fluid: string;
  units: UnitSystem;
  reference: ReferenceName;
  window: ChartWindow;
  frame: Frame;
  toleranceMm: number;
  /** The critical point as the dome closes on it: T [K], p [Pa], h [J/kg]. */
  critical: { T: number; p: number; h: number };
  lines: Line[];
  stats: TraceStats;
}
